import { SpecError } from '../errors.ts';
import { assertRange } from '../guards.ts';
import { instantMs } from './clockAtHourAngle.ts';
import { equationOfTimeMin } from './equationOfTimeMin.ts';
import { longitudeDifferenceDeg } from './longitudeCorrectionMin.ts';
import { parseClock } from '../spec/parseClock.ts';
import { dateToUtcMidnightMs, parseLocalDate } from './localDate.ts';
import { assertZone, zoneYearOffsets } from './zoneOffsets.ts';

/** Options of `hourAngleAtClock`. */
export interface HourAngleAtClockOptions {
  /** local calendar date 'YYYY-MM-DD' */
  readonly dateLocal: string;
  /** local clock reading 'HH:MM' or 'HH:MM:SS' */
  readonly clock: string;
  /** site longitude, degrees east positive */
  readonly longitudeDeg: number;
  /** IANA time zone of the site */
  readonly timezone: string;
  /**
   * true when the clock reading is summer (daylight-saving) time: the zone's
   * shift that year is removed first (+1 h for a zone without one).
   */
  readonly daylightSaving: boolean;
}

/**
 * Hour angle of the real Sun, radians in (−π, π], at a local clock reading
 * (docs/design.md §3):
 *
 *     H = 15°·(T − 12 h) + (λ − λs) + E/4 min·°
 *
 * with T the standard clock time (daylight-saving shift removed), λ the site
 * longitude, λs = 15° × the zone's standard offset, and E the equation of time
 * (minutes) at that very instant.
 *
 * @example hourAngleAtClock({dateLocal: '2025-03-20', clock: '12:00', longitudeDeg: 0, timezone: 'UTC', daylightSaving: false})
 *   // ≈ -0.0065 rad (E ≈ -7.4 min)
 */
export function hourAngleAtClock(options: HourAngleAtClockOptions): number {
  const day = parseLocalDate(options.dateLocal, 'dateLocal');
  const clockMin = parseClock('clock', options.clock, { seconds: true });
  const lon = assertRange('site.longitude', options.longitudeDeg, -180, 180, '°');
  const zone = assertZone(options.timezone);
  if (typeof options.daylightSaving !== 'boolean') {
    throw new SpecError('daylightSaving', options.daylightSaving, 'allowed: true or false');
  }
  const { standardOffsetHours: std, daylightShiftHours } = zoneYearOffsets(zone, day.year);
  const shift = options.daylightSaving ? (daylightShiftHours > 0 ? daylightShiftHours : 1) : 0;
  const tStd = clockMin - shift * 60;
  const e = equationOfTimeMin(new Date(instantMs(dateToUtcMidnightMs(day), tStd, std)));
  const hDeg = 15 * (tStd / 60 - 12) + longitudeDifferenceDeg(lon, 15 * std) + e / 4;
  return (wrapDeg(hDeg) * Math.PI) / 180;
}

/** Reduce degrees to (−180, 180]. */
function wrapDeg(d: number): number {
  let r = d % 360;
  if (r > 180) r -= 360;
  if (r <= -180) r += 360;
  return r;
}
