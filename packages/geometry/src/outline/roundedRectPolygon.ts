import type { RoundedRect, Vec2 } from '../types.ts';

/**
 * A rounded rectangle as a counter-clockwise polygon, each corner arc as `cornerSegments` chords
 * (radius clamped to half the shorter side; radius 0 gives the four corners).
 * @param r the rectangle (centre, size, corner radius, mm)
 * @param cornerSegments chords per quarter-turn corner (default 8)
 * @example roundedRectPolygon({ kind: 'rect', cx: 0, cy: 0, widthMm: 4, heightMm: 2, cornerRadiusMm: 0 }).length // 4
 */
export function roundedRectPolygon(r: RoundedRect, cornerSegments = 8): Vec2[] {
  const x0 = r.cx - r.widthMm / 2;
  const x1 = r.cx + r.widthMm / 2;
  const y0 = r.cy - r.heightMm / 2;
  const y1 = r.cy + r.heightMm / 2;
  const c = Math.min(r.cornerRadiusMm, r.widthMm / 2, r.heightMm / 2);
  if (c <= 0) return [[x0, y0], [x1, y0], [x1, y1], [x0, y1]];
  const out: Vec2[] = [];
  const corners: [number, number, number][] = [[x1 - c, y0 + c, -90], [x1 - c, y1 - c, 0], [x0 + c, y1 - c, 90], [x0 + c, y0 + c, 180]];
  for (const [cx, cy, start] of corners) {
    for (let k = 0; k <= cornerSegments; k++) {
      const t = ((start + (90 * k) / cornerSegments) * Math.PI) / 180;
      out.push([cx + c * Math.cos(t), cy + c * Math.sin(t)]);
    }
  }
  return out;
}
