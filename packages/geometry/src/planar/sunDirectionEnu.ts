import type { Vec3 } from '../parts/mesh.ts';

/**
 * The celestial (north) pole axis in the horizon frame (x east, y north,
 * z up) at latitude φ: p = (0, cos φ, sin φ) (docs/design.md §8; the standard
 * rotation from the equatorial to the horizon frame, e.g. J. Meeus,
 * "Astronomical Algorithms", 2nd ed. 1998, ch. 13).
 */
export function poleAxisEnu(latitudeRad: number): Vec3 {
  return [0, Math.cos(latitudeRad), Math.sin(latitudeRad)];
}

/**
 * Unit vector toward the Sun in the horizon frame from its hour angle H
 * (0 at apparent noon, negative in the morning) and declination δ (north
 * positive), at latitude φ (docs/design.md §8; Meeus 1998, eq. 13.5–13.6 written as a
 * vector):
 *
 *     s = (−cos δ sin H,  cos φ sin δ − sin φ cos δ cos H,  sin φ sin δ + cos φ cos δ cos H)
 *
 * @example sunDirectionEnu(0.9, 0, 0) // noon at the equinox: due south, altitude 90° − φ
 */
export function sunDirectionEnu(latitudeRad: number, hourAngleRad: number, declinationRad: number): Vec3 {
  const sf = Math.sin(latitudeRad);
  const cf = Math.cos(latitudeRad);
  const sd = Math.sin(declinationRad);
  const cd = Math.cos(declinationRad);
  const ch = Math.cos(hourAngleRad);
  return [-cd * Math.sin(hourAngleRad), cf * sd - sf * cd * ch, sf * sd + cf * cd * ch];
}
