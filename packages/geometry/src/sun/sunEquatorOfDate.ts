import { Body, Equator, MakeTime, Observer } from 'astronomy-engine';
import { SpecError } from '../errors.ts';
import { EARTH_EQUATORIAL_RADIUS_KM } from './earthFigure.ts';


/**
 * An "observer" at the centre of the Earth: on the equator (where the
 * ellipsoid's radius equals the equatorial radius) at a height of minus that
 * radius. astronomy-engine's `terra()` then yields the zero vector, so
 * `Equator(…)` returns geocentric coordinates (checked in the test against
 * GeoVector rotated to the equator of date).
 */
const GEOCENTRE = new Observer(0, 0, -EARTH_EQUATORIAL_RADIUS_KM * 1000);

/** Geocentric apparent place of the Sun, true equator and equinox of date. */
export interface SunEquatorial {
  /** apparent right ascension, radians in [0, 2π) */
  readonly rightAscensionRad: number;
  /** apparent declination, radians, north positive */
  readonly declinationRad: number;
  /** geocentric distance, astronomical units */
  readonly distanceAu: number;
}

/**
 * Geocentric apparent right ascension and declination of the Sun (corrected
 * for light time and aberration, referred to the true equator and equinox of
 * date), from astronomy-engine: `Equator(Body.Sun, t, geocentre, ofdate=true,
 * aberration=true)`.
 *
 * The Date is read as UT (astronomy-engine ignores the < 0.9 s between UTC
 * and UT1) and converted to TT with astronomy-engine's ΔT model.
 *
 * @example sunEquatorOfDate(new Date('2025-06-21T12:00:00Z')).declinationRad // ≈ 0.4090 (23.44°)
 */
export function sunEquatorOfDate(dateUtc: Date): SunEquatorial {
  assertDate('dateUtc', dateUtc);
  const eq = Equator(Body.Sun, MakeTime(dateUtc), GEOCENTRE, true, true);
  return {
    rightAscensionRad: ((eq.ra * 15 * Math.PI) / 180) % (2 * Math.PI),
    declinationRad: (eq.dec * Math.PI) / 180,
    distanceAu: eq.dist,
  };
}

/** Throw a SpecError unless `value` is a valid Date. */
export function assertDate(field: string, value: unknown): Date {
  if (!(value instanceof Date) || !Number.isFinite(value.getTime())) {
    throw new SpecError(field, value instanceof Date ? 'Invalid Date' : value, 'allowed: a valid JavaScript Date (a UTC instant)');
  }
  return value;
}
