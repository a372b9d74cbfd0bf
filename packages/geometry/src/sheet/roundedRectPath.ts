import type { Path, RoundedRect, Vec2 } from '../types.ts';
import { arcPoints, CHORD_TOLERANCE_MM } from './arcPoints.ts';

/**
 * A rounded rectangle as a closed counter-clockwise polyline, corner arcs
 * within `toleranceMm` (vertices on the arcs); sharp corners stay single
 * vertices.
 * @example roundedRectPath({ kind: 'rect', cx: 5, cy: 5, widthMm: 10, heightMm: 10, cornerRadiusMm: 0 }).points.length // 4
 */
export function roundedRectPath(r: RoundedRect, toleranceMm = CHORD_TOLERANCE_MM): Path {
  const x0 = r.cx - r.widthMm / 2;
  const x1 = r.cx + r.widthMm / 2;
  const y0 = r.cy - r.heightMm / 2;
  const y1 = r.cy + r.heightMm / 2;
  const c = Math.min(r.cornerRadiusMm, r.widthMm / 2, r.heightMm / 2);
  if (!(c > 0)) return { kind: 'path', closed: true, points: [[x0, y0], [x1, y0], [x1, y1], [x0, y1]] };
  const q = Math.PI / 2;
  const pts: Vec2[] = [
    ...arcPoints([x1 - c, y0 + c], c, -q, q, toleranceMm),
    ...arcPoints([x1 - c, y1 - c], c, 0, q, toleranceMm),
    ...arcPoints([x0 + c, y1 - c], c, q, q, toleranceMm),
    ...arcPoints([x0 + c, y0 + c], c, 2 * q, q, toleranceMm),
  ];
  return { kind: 'path', closed: true, points: dropRepeats(pts) };
}

/** Drop consecutive (and closing) repeated points, within 1e-9 mm. */
export function dropRepeats(pts: readonly Vec2[]): Vec2[] {
  const out: Vec2[] = [];
  for (const p of pts) {
    const q = out[out.length - 1];
    if (!q || Math.hypot(p[0] - q[0], p[1] - q[1]) > 1e-9) out.push(p);
  }
  while (out.length > 1 && Math.hypot(out[0][0] - out[out.length - 1][0], out[0][1] - out[out.length - 1][1]) <= 1e-9) out.pop();
  return out;
}
