import type { Vec2 } from '../types.ts';
import type { MarkField } from './markField.ts';

/**
 * Clip an open polyline to an axis-aligned rectangle (Liang–Barsky clipping of
 * each segment: Y.-D. Liang and B. A. Barsky, "A New Concept and Method for
 * Line Clipping", ACM TOG 3(1), 1984). Returns the pieces inside, each with at
 * least two points, in order. Points on the boundary count as inside.
 * @example clipPolyline([[-10, 0], [10, 0]], {xMinMm: -5, xMaxMm: 5, yMinMm: -1, yMaxMm: 1}) // [[[-5, 0], [5, 0]]]
 */
export function clipPolyline(points: readonly Vec2[], box: MarkField): Vec2[][] {
  const out: Vec2[][] = [];
  let cur: Vec2[] = [];
  const flush = () => {
    if (cur.length >= 2) out.push(cur);
    cur = [];
  };
  for (let i = 0; i + 1 < points.length; i++) {
    const seg = clipSegment(points[i], points[i + 1], box);
    if (!seg) {
      flush();
      continue;
    }
    const [a, b] = seg;
    const last = cur[cur.length - 1];
    if (!last || Math.hypot(last[0] - a[0], last[1] - a[1]) > 1e-9) {
      flush();
      cur.push(a);
    }
    cur.push(b);
    if (b !== points[i + 1]) flush();
  }
  flush();
  return out;
}

function clipSegment(a: Vec2, b: Vec2, box: MarkField): [Vec2, Vec2] | null {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  let t0 = 0;
  let t1 = 1;
  const tests: [number, number][] = [
    [-dx, a[0] - box.xMinMm],
    [dx, box.xMaxMm - a[0]],
    [-dy, a[1] - box.yMinMm],
    [dy, box.yMaxMm - a[1]],
  ];
  for (const [p, q] of tests) {
    if (p === 0) {
      if (q < 0) return null;
    } else {
      const r = q / p;
      if (p < 0) t0 = Math.max(t0, r);
      else t1 = Math.min(t1, r);
    }
  }
  if (t0 > t1) return null;
  const at = (t: number): Vec2 => [a[0] + t * dx, a[1] + t * dy];
  return [t0 === 0 ? a : at(t0), t1 === 1 ? b : at(t1)];
}
