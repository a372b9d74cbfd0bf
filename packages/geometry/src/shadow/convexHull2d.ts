import type { Vec2 } from '../types.ts';

/**
 * Convex hull of points in the plane, counter-clockwise, no collinear
 * points: Andrew's monotone chain (A. M. Andrew, "Another efficient
 * algorithm for convex hulls in two dimensions", Inf. Proc. Letters 9,
 * 1979). Fewer than three points come back sorted.
 * @example convexHull2d([[0, 0], [1, 0], [0.5, 0.2], [1, 1], [0, 1]]) // the unit square's four corners
 */
export function convexHull2d(points: readonly Vec2[]): Vec2[] {
  const pts = [...points].sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  if (pts.length < 3) return pts;
  const cross = (o: Vec2, a: Vec2, b: Vec2) => (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
  const lower: Vec2[] = [];
  for (const p of pts) {
    while (lower.length >= 2 && cross(lower[lower.length - 2], lower[lower.length - 1], p) <= 1e-12) lower.pop();
    lower.push(p);
  }
  const upper: Vec2[] = [];
  for (let i = pts.length - 1; i >= 0; i--) {
    const p = pts[i];
    while (upper.length >= 2 && cross(upper[upper.length - 2], upper[upper.length - 1], p) <= 1e-12) upper.pop();
    upper.push(p);
  }
  return [...lower.slice(0, -1), ...upper.slice(0, -1)];
}
