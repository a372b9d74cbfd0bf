import { sunEquatorOfDate } from './sunEquatorOfDate.ts';

/**
 * Geocentric apparent declination of the Sun, of date (aberration-corrected),
 * radians, north positive. Source: astronomy-engine `Equator(Body.Sun, …,
 * ofdate=true, aberration=true)` seen from the Earth's centre (docs/design.md §7).
 *
 * @example sunDeclinationRad(new Date('2025-12-21T12:00:00Z')) // ≈ -0.4090 (-23.44°)
 */
export function sunDeclinationRad(dateUtc: Date): number {
  return sunEquatorOfDate(dateUtc).declinationRad;
}
