import { assertFinite } from '@umbrafab/geometry';
import type { Vec2 } from './engraveInput.ts';

/**
 * Offset an open polyline sideways by `distanceMm` (positive = to the left of
 * the direction of travel), with mitred corners. The end points move along
 * the end segments' normals, so the offsets of one polyline line up across
 * its width. Zero-length segments are dropped first.
 *
 * Corners sharper than about 30° would make a miter longer than 4·distance;
 * those are clamped to 4·distance (the offset is then not exact there).
 *
 * @example offsetPolyline([[0, 0], [10, 0]], 1) // [[0, 1], [10, 1]]
 */
export function offsetPolyline(points: readonly Vec2[], distanceMm: number): readonly Vec2[] {
  assertFinite('distanceMm', distanceMm);
  const pts = points.filter((p, i) => i === 0 || p[0] !== points[i - 1][0] || p[1] !== points[i - 1][1]);
  if (pts.length < 2) return pts.map((p) => [p[0], p[1]] as const);
  const normals = pts.slice(1).map((p, i) => {
    const dx = p[0] - pts[i][0];
    const dy = p[1] - pts[i][1];
    const len = Math.hypot(dx, dy);
    return [-dy / len, dx / len] as const;
  });
  const MAX_MITER = 4;
  return pts.map((p, i): Vec2 => {
    const n1 = normals[Math.max(0, i - 1)];
    const n2 = normals[Math.min(normals.length - 1, i)];
    const mx = n1[0] + n2[0];
    const my = n1[1] + n2[1];
    // Miter vector m = (n1 + n2) / (1 + n1·n2) has |m| = 1 / cos(turn / 2).
    const denom = 1 + n1[0] * n2[0] + n1[1] * n2[1];
    let sx = denom > 1e-12 ? mx / denom : n1[0];
    let sy = denom > 1e-12 ? my / denom : n1[1];
    const len = Math.hypot(sx, sy);
    if (len > MAX_MITER) {
      sx = (sx / len) * MAX_MITER;
      sy = (sy / len) * MAX_MITER;
    }
    return [p[0] + distanceMm * sx, p[1] + distanceMm * sy];
  });
}
