import type { Vec2 } from '../types.ts';
import type { Vec3 } from '../parts/mesh.ts';
import type { Edge3 } from './styleEdges.ts';

/** Where the shadow of a style falls on one drawn line. */
export interface ShadowOnLine {
  /** largest |shadow x − line x| over the part of the line the style's shadow reaches, signed, mm */
  readonly errorMm: number;
  /** shadow x at the middle of that part, mm (face coordinates) */
  readonly shadowXMm: number;
  /** fraction of the line's length (in y) the style's shadow reaches, 0…1 */
  readonly coverage: number;
}

/**
 * Project a point of the solid onto the face plane z = 0 along the Sun's rays:
 * p − (p_z / s_z) · s, with s the direction toward the Sun in the dial frame
 * (s_z > 0: the Sun in front of the face).
 */
export function projectToFace(p: Vec3, sun: Vec3): Vec2 {
  const k = p[2] / sun[2];
  return [p[0] - k * sun[0], p[1] - k * sun[1]];
}

/**
 * Cast the shadow of style edges onto the face and read it off against a
 * drawn line from `a` to `b` (face coordinates, the line running along y).
 * Each edge is projected along the Sun's rays (`projectToFace`); where a
 * projected edge overlaps the line's y-range, the shadow's x and the line's x
 * are compared at both ends of the overlap (both are straight, so the
 * extremes lie there). Returns null when the style's shadow misses the
 * line's y-range altogether or the Sun is not in front of the face.
 *
 * @example shadowOnLine(edges.plusX, [-0.7, 0, 0.7], [52, -40], [52, 40])
 */
export function shadowOnLine(edges: readonly Edge3[], sun: Vec3, a: Vec2, b: Vec2): ShadowOnLine | null {
  if (!(sun[2] > 0)) return null;
  const ly0 = Math.min(a[1], b[1]);
  const ly1 = Math.max(a[1], b[1]);
  const lineSlope = b[1] === a[1] ? 0 : (b[0] - a[0]) / (b[1] - a[1]);
  const lineX0 = b[1] === a[1] ? (a[0] + b[0]) / 2 : a[0];
  let worst = 0;
  let covered = 0;
  let sumX = 0;
  for (const [p, q] of edges) {
    const pa = projectToFace(p, sun);
    const pb = projectToFace(q, sun);
    const dy = pb[1] - pa[1];
    if (Math.abs(dy) < 1e-12) continue;
    const lo = Math.max(Math.min(pa[1], pb[1]), ly0);
    const hi = Math.min(Math.max(pa[1], pb[1]), ly1);
    if (!(hi > lo)) continue;
    // Both lines are straight: x at y = pa_x + (y − pa_y)·slope (written out, no closures in this hot loop).
    const slope = (pb[0] - pa[0]) / dy;
    const eLo = pa[0] + (lo - pa[1]) * slope - (lineX0 + (b[1] === a[1] ? 0 : (lo - a[1]) * lineSlope));
    const eHi = pa[0] + (hi - pa[1]) * slope - (lineX0 + (b[1] === a[1] ? 0 : (hi - a[1]) * lineSlope));
    if (Math.abs(eLo) > Math.abs(worst)) worst = eLo;
    if (Math.abs(eHi) > Math.abs(worst)) worst = eHi;
    covered += hi - lo;
    sumX += (pa[0] + ((lo + hi) / 2 - pa[1]) * slope) * (hi - lo);
  }
  if (!(covered > 0)) return null;
  const len = ly1 - ly0;
  return { errorMm: worst, shadowXMm: sumX / covered, coverage: len > 0 ? Math.min(1, covered / len) : 1 };
}
