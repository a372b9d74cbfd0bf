import type { Vec3 } from '../parts/mesh.ts';
import { cross3, dot3, length3, normalize3 } from '../parts/vec3.ts';
import { faceNormalEnu } from './faceNormal.ts';
import type { FaceOrientation, PlanarFace } from './planarTypes.ts';
import { poleAxisEnu } from './sunDirectionEnu.ts';
import { hourAngleOfEquatorVector } from './hourAngleOfEquatorVector.ts';

/** Below this |p · n| the style counts as parallel to the face (ψ = 0). */
const PARALLEL_EPS = 1e-12;

/**
 * A face and its style by the general vector method (docs/design.md §8; the
 * relations are the handbook ones, A. E. Waugh, "Sundials: Their Theory and
 * Construction", Dover 1973, ch. 7–10; R. R. J. Rohr, "Sundials", Dover 1996,
 * ch. 4 — memory):
 * - style height ψ: sin ψ = |p · n|;
 * - style direction d = sign(p · n) p, the sense that leaves the face
 *   (ψ = 0: the elevated pole's sense);
 * - substyle: unit(d − (d · n) n);
 * - H₀: the hour angle of the plane's meridian, where the hour plane holds n,
 *   i.e. the hour angle of n's projection on the equator, n − (n · p) p;
 * - f = unit(n × p), across the fin;
 * - drawing axes: up = unit(z − (z · n) n), the line of steepest ascent of the
 *   face (for a level face, toward the elevated pole), right = up × n, so a
 *   wall is drawn as seen standing in front of it, top up.
 *
 * @example planarFace({ type: 'horizontal', latitudeRad: 0.9 }).styleHeightRad // 0.9: ψ = φ
 */
export function planarFace(orientation: FaceOrientation): PlanarFace {
  const phi = orientation.latitudeRad;
  const e = phi >= 0 ? 1 : -1;
  const n = faceNormalEnu(orientation);
  const p = poleAxisEnu(phi);
  const pn = dot3(p, n);
  const psi = Math.asin(Math.min(1, Math.abs(pn)));
  const sense = Math.abs(pn) > PARALLEL_EPS ? Math.sign(pn) : e;
  const d: Vec3 = [sense * p[0], sense * p[1], sense * p[2]];

  const zen: Vec3 = [0, 0, 1];
  const zUp: Vec3 = [zen[0] - n[2] * n[0], zen[1] - n[2] * n[1], zen[2] - n[2] * n[2]];
  const up = length3(zUp) > 1e-9 ? normalize3(zUp) : ([0, e, 0] as Vec3);
  const right = cross3(up, n);

  const nxp = cross3(n, p);
  const fin = length3(nxp) > 1e-12 ? normalize3(nxp) : right;
  const dn = dot3(d, n);
  const sub: Vec3 = [d[0] - dn * n[0], d[1] - dn * n[1], d[2] - dn * n[2]];
  const substyle = length3(sub) > 1e-12 ? normalize3(sub) : ([-up[0], -up[1], -up[2]] as Vec3);

  const nEq: Vec3 = [n[0] - pn * p[0], n[1] - pn * p[1], n[2] - pn * p[2]];
  const H0 = length3(nEq) > 1e-12 ? hourAngleOfEquatorVector(phi, nEq) : 0;
  return { orientation, normal: n, pole: p, style: d, styleHeightRad: psi, substyle, substyleHourAngleRad: H0, fin, right, up };
}
