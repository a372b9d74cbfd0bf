import { assertRange } from '../guards.ts';

/**
 * Longitude correction from apparent to standard time, minutes:
 * 4 min/° × (λs − λ), with λ the site longitude and λs the zone's standard
 * meridian, both degrees east positive (docs/design.md §3; the Earth turns 1° in
 * 4 min of mean time).
 *
 * Sign: standard time = apparent time − E + (λs − λ)/15 h, so the correction
 * is positive when the site lies west of its standard meridian (the Sun
 * crosses the site's meridian later by the clock).
 *
 * The difference is taken the short way round (see `longitudeDifferenceDeg`).
 *
 * @example longitudeCorrectionMin(-9.14, 0) // +36.56 (Lisbon is west of 0°)
 */
export function longitudeCorrectionMin(longitudeDeg: number, standardMeridianDeg: number): number {
  assertRange('site.longitude', longitudeDeg, -180, 180, '°');
  assertRange('standardMeridianDeg', standardMeridianDeg, -180, 225, '°');
  const c = -4 * longitudeDifferenceDeg(longitudeDeg, standardMeridianDeg);
  return c === 0 ? 0 : c; // no −0 in reports
}

/**
 * λ − λs, degrees, reduced to (−180, 180]: a zone whose standard meridian
 * lies across the date line (Pacific/Kiritimati, UTC+14, λs = 210° ≡ −150°)
 * still gets the short way round.
 * @example longitudeDifferenceDeg(-157.4, 210) // -7.4
 */
export function longitudeDifferenceDeg(longitudeDeg: number, standardMeridianDeg: number): number {
  let d = (longitudeDeg - standardMeridianDeg) % 360;
  if (d > 180) d -= 360;
  if (d <= -180) d += 360;
  return d;
}
