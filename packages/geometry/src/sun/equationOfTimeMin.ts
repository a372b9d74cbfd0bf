import { MakeTime, SiderealTime } from 'astronomy-engine';
import { MS_PER_DAY } from './localDate.ts';
import { assertDate, sunEquatorOfDate } from './sunEquatorOfDate.ts';

/**
 * Equation of time E = apparent solar time − mean solar time, minutes
 * (positive when the sun dial is ahead of the clock, e.g. +16 min in early
 * November).
 *
 * Derivation (all at Greenwich, then valid everywhere since both times shift
 * by the same longitude):
 * - the Greenwich hour angle of the true Sun is GHA = GAST − α, with GAST the
 *   Greenwich apparent sidereal time and α the Sun's apparent right ascension
 *   of date (both referred to the true equinox of date, so nutation cancels);
 * - apparent solar time at Greenwich = GHA + 12 h (it is 12:00 when the Sun
 *   crosses the meridian);
 * - mean solar time at Greenwich = UT (UT1 ≈ UTC within 0.9 s, which
 *   astronomy-engine does not distinguish).
 * Hence E = GAST − α + 12 h − UT, reduced to (−12 h, +12 h].
 * GAST from astronomy-engine `SiderealTime`, α from `sunEquatorOfDate`
 * (geocentric, apparent, of date — docs/design.md §7).
 *
 * This "UT-based" mean sun differs from Meeus's L0-based one (Astronomical
 * Algorithms 2nd ed., ch. 28) by about 0.2 s (docs/design.md §7).
 *
 * @example equationOfTimeMin(new Date('2025-11-03T12:00:00Z')) // ≈ +16.4
 */
export function equationOfTimeMin(dateUtc: Date): number {
  assertDate('dateUtc', dateUtc);
  const t = MakeTime(dateUtc);
  const gastHours = SiderealTime(t);
  const raHours = (sunEquatorOfDate(dateUtc).rightAscensionRad * 12) / Math.PI;
  const ms = dateUtc.getTime();
  const utHours = (((ms % MS_PER_DAY) + MS_PER_DAY) % MS_PER_DAY) / 3_600_000;
  const eHours = wrapHours(gastHours - raHours + 12 - utHours);
  return eHours * 60;
}

/** Reduce hours to (−12, +12]. */
function wrapHours(h: number): number {
  let r = h % 24;
  if (r > 12) r -= 24;
  if (r <= -12) r += 24;
  return r;
}
