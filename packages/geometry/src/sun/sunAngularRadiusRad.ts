import { Body, GeoVector, KM_PER_AU, MakeTime } from 'astronomy-engine';
import { assertDate } from './sunEquatorOfDate.ts';

/**
 * Nominal solar radius, km: IAU 2015 Resolution B3 (R☉ = 695 700 km), the
 * same value astronomy-engine uses (SUN_RADIUS_KM).
 */
export const SUN_RADIUS_KM = 695_700;

/**
 * Apparent angular radius of the Sun's disc seen from the Earth's centre,
 * radians: asin(R☉ / d), with d the geocentric distance from astronomy-engine
 * `GeoVector(Body.Sun, t, aberration=true)`. Runs from 15.72′ (aphelion) to
 * 16.26′ (perihelion), 15.99′ at 1 AU (docs/design.md §7).
 *
 * @example sunAngularRadiusRad(new Date('2025-01-04T12:00Z')) // ≈ 0.004729 (16.26′)
 */
export function sunAngularRadiusRad(dateUtc: Date): number {
  assertDate('dateUtc', dateUtc);
  const distKm = GeoVector(Body.Sun, MakeTime(dateUtc), true).Length() * KM_PER_AU;
  return Math.asin(SUN_RADIUS_KM / distKm);
}
