import { KM_PER_AU } from 'astronomy-engine';
import { DEG } from '../guards.ts';
import type { Vec3 } from '../parts/mesh.ts';
import { EARTH_EQUATORIAL_RADIUS_KM, EARTH_FLATTENING } from './earthFigure.ts';

/** The Sun seen from the site: topocentric hour angle, declination and horizon-frame direction (no refraction). */
export interface TopocentricSun {
  /** topocentric local hour angle, radians in (−π, π], negative in the morning */
  readonly hourAngleRad: number;
  /** topocentric declination of date, radians */
  readonly declinationRad: number;
  /** unit vector toward the Sun in the horizon frame (x east, y north, z up), geometric */
  readonly enu: Vec3;
}

/**
 * The observer's geocentric position in its meridian plane, AU: [distance
 * from the Earth's axis, height above the equator]. astronomy-engine's
 * `terra()` (from NOVAS) on its ellipsoid: c = 1/√(cos²φ + f²sin²φ),
 * s = f²c, distance (a·c + h)·cos φ, height (a·s + h)·sin φ.
 *
 * @example observerMeridianAu(47.4, 0) // [≈ 2.9e-5, ≈ 3.1e-5]
 */
export function observerMeridianAu(latitudeDeg: number, heightM: number): readonly [number, number] {
  const phi = latitudeDeg * DEG;
  const c = 1 / Math.hypot(Math.cos(phi), EARTH_FLATTENING * Math.sin(phi));
  const s = EARTH_FLATTENING * EARTH_FLATTENING * c;
  const hKm = heightM / 1000;
  return [((EARTH_EQUATORIAL_RADIUS_KM * c + hKm) * Math.cos(phi)) / KM_PER_AU, ((EARTH_EQUATORIAL_RADIUS_KM * s + hKm) * Math.sin(phi)) / KM_PER_AU];
}

/**
 * Remove the diurnal parallax: the geocentric Sun (local hour angle H,
 * declination δ, distance r) as seen from the observer at `observerAu`
 * (`observerMeridianAu`), turned into the horizon frame with the same
 * spherical rotation as astronomy-engine's `Horizon` (NOVAS equ2hor).
 * The shift is at most the Sun's horizontal parallax, 8.8″ (about 0.6 s of
 * hour angle and 8″ of declination at mid latitudes).
 *
 * @example topocentricSun(0, 0, 1, 47.4 * Math.PI / 180, observerMeridianAu(47.4, 0)).enu
 */
export function topocentricSun(hourAngleGeoRad: number, declinationGeoRad: number, distanceAu: number, latitudeRad: number, observerAu: readonly [number, number]): TopocentricSun {
  // Geocentric Sun in the local meridian frame (toward the equator on the
  // meridian, east, north), minus the observer: the topocentric Sun.
  const cd = Math.cos(declinationGeoRad);
  const vx = distanceAu * cd * Math.cos(hourAngleGeoRad) - observerAu[0];
  const vy = -distanceAu * cd * Math.sin(hourAngleGeoRad);
  const vz = distanceAu * Math.sin(declinationGeoRad) - observerAu[1];
  const r = Math.sqrt(vx * vx + vy * vy + vz * vz);
  const mx = vx / r;
  const my = vy / r;
  const mz = vz / r;
  const sp = Math.sin(latitudeRad);
  const cp = Math.cos(latitudeRad);
  return {
    hourAngleRad: Math.atan2(-my, mx),
    declinationRad: Math.asin(Math.max(-1, Math.min(1, mz))),
    enu: [my, -sp * mx + cp * mz, cp * mx + sp * mz],
  };
}
