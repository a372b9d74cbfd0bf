import type { Vec2 } from './engraveInput.ts';

/** Distance between two points, mm. */
export function distanceMm(a: Vec2, b: Vec2): number {
  return Math.hypot(b[0] - a[0], b[1] - a[1]);
}

/**
 * Length of a polyline, mm; a closed one includes the segment back to its
 * first point.
 */
export function polylineLengthMm(points: readonly Vec2[], closed: boolean): number {
  let sum = 0;
  for (let i = 1; i < points.length; i += 1) sum += distanceMm(points[i - 1], points[i]);
  if (closed && points.length > 1) sum += distanceMm(points[points.length - 1], points[0]);
  return sum;
}
