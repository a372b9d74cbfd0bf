import geomagnetism from 'geomagnetism';
import { SpecError } from '../errors.ts';
import { assertFinite, assertRange } from '../guards.ts';
import { assertDate } from './sunEquatorOfDate.ts';

/** Options of `magneticDeclinationDeg`. */
export interface MagneticDeclinationOptions {
  /** geodetic latitude, degrees north positive */
  readonly latitudeDeg: number;
  /** longitude, degrees east positive */
  readonly longitudeDeg: number;
  /** height above the WGS 84 ellipsoid, km (default 0) */
  readonly altitudeKm?: number;
  /** the instant (the model's secular variation is applied to it) */
  readonly date: Date;
}

/**
 * Validity of WMM2025 as shipped by geomagnetism 0.2.0 (its index.js):
 * 2024-11-13T03:00Z to 2029-11-13T03:00Z.
 */
export const WMM2025_VALID_FROM = new Date('2024-11-13T03:00:00.000Z');
export const WMM2025_VALID_UNTIL = new Date('2029-11-13T03:00:00.000Z');

/**
 * Magnetic declination (variation), degrees, east positive: the angle from
 * true (geographic) north to the direction a compass needle points, from the
 * World Magnetic Model WMM2025 (NOAA NCEI / BGS) through the `geomagnetism`
 * package (docs/design.md §4, §7).
 *
 * geomagnetism turns the date into a decimal year as
 * year + (ms since Jan 1 00:00 UTC) / (365 days).
 *
 * @throws SpecError for a date outside WMM2025's validity (2024-11-13 …
 *   2029-11-13): a newer model is needed then
 * @example magneticDeclinationDeg({latitudeDeg: 38.7, longitudeDeg: -9.14, date: new Date('2026-01-01')}) // ≈ -1 (west)
 */
export function magneticDeclinationDeg(options: MagneticDeclinationOptions): number {
  const lat = assertRange('site.latitude', options.latitudeDeg, -90, 90, '°');
  const lon = assertRange('site.longitude', options.longitudeDeg, -180, 180, '°');
  const alt = assertRange('altitudeKm', options.altitudeKm ?? 0, -1, 850, ' km');
  const date = assertDate('date', options.date);
  if (date < WMM2025_VALID_FROM || date > WMM2025_VALID_UNTIL) {
    throw new SpecError('date', date.toISOString(), 'allowed: a date from 2024-11-13 to 2029-11-13 (validity of WMM2025); later dates need a newer World Magnetic Model');
  }
  return assertFinite('declination', geomagnetism.model(date).point([lat, lon, alt]).decl);
}
