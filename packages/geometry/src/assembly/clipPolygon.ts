import type { Vec2 } from '../types.ts';
import type { Vec3 } from '../parts/mesh.ts';

/**
 * Clip a polygon by a convex polygon (both CCW), Sutherland–Hodgman
 * (I. E. Sutherland and G. W. Hodgman, "Reentrant polygon clipping",
 * Communications of the ACM 17(1), 1974). Returns the part of `subject`
 * inside `clip` (possibly empty).
 */
export function clipPolygonConvex(subject: readonly Vec2[], clip: readonly Vec2[]): Vec2[] {
  let out: Vec2[] = [...subject];
  for (let i = 0; i < clip.length && out.length > 0; i++) {
    const a = clip[i];
    const b = clip[(i + 1) % clip.length];
    const side = (p: Vec2) => (b[0] - a[0]) * (p[1] - a[1]) - (b[1] - a[1]) * (p[0] - a[0]);
    const input = out;
    out = [];
    for (let k = 0; k < input.length; k++) {
      const p = input[k];
      const q = input[(k + 1) % input.length];
      const sp = side(p);
      const sq = side(q);
      if (sp >= 0) out.push(p);
      if ((sp >= 0) !== (sq >= 0)) {
        const t = sp / (sp - sq);
        out.push([p[0] + t * (q[0] - p[0]), p[1] + t * (q[1] - p[1])]);
      }
    }
  }
  return out;
}

/** Keep the part of a 3D polygon where `height(p) ≥ 0` (one Sutherland–Hodgman plane step). */
export function clipPolygonAbovePlane(points: readonly Vec3[], height: (p: Vec3) => number): Vec3[] {
  const out: Vec3[] = [];
  for (let k = 0; k < points.length; k++) {
    const p = points[k];
    const q = points[(k + 1) % points.length];
    const hp = height(p);
    const hq = height(q);
    if (hp >= 0) out.push(p);
    if ((hp >= 0) !== (hq >= 0)) {
      const t = hp / (hp - hq);
      out.push([p[0] + t * (q[0] - p[0]), p[1] + t * (q[1] - p[1]), p[2] + t * (q[2] - p[2])]);
    }
  }
  return out;
}
