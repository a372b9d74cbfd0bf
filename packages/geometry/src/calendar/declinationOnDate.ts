import { assertRange } from '../guards.ts';
import { dateToUtcMidnightMs, parseLocalDate } from '../sun/localDate.ts';
import { sunDeclinationRad } from '../sun/sunDeclinationRad.ts';

/**
 * The Sun's geocentric apparent declination (radians, north positive) for a
 * custom date line: at local mean noon of `dateLocal` when `longitudeDeg` is
 * given (12:00 UT − λ/15 h), else at 12:00 UT. Declination moves by up to
 * 0.4° a day near the equinoxes, so the hour chosen matters at that level.
 *
 * @example declinationOnDate('2025-06-21') // ≈ 0.4091 (23.44°)
 */
export function declinationOnDate(dateLocal: string, longitudeDeg?: number): number {
  const day = parseLocalDate(dateLocal, 'dateLocal');
  const lon = longitudeDeg === undefined ? 0 : assertRange('site.longitude', longitudeDeg, -180, 180, '°');
  const ms = dateToUtcMidnightMs(day) + 12 * 3_600_000 - (lon / 15) * 3_600_000;
  return sunDeclinationRad(new Date(ms));
}
