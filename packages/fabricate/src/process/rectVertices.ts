import type { RoundedRect } from '@umbrafab/geometry';

/** A polyline vertex with the DXF bulge of the segment that starts at it (0 = straight). */
export type BulgeVertex = readonly [x: number, y: number, bulge: number];

/** Bulge of a counter-clockwise quarter arc: tan(90°/4) (DXF LWPOLYLINE group 42: tan of a quarter of the included angle). */
const QUARTER_BULGE = Math.tan(Math.PI / 8);

/**
 * A rounded rectangle as a closed, counter-clockwise list of bulge vertices,
 * starting at the bottom edge. Sharp corners give four vertices.
 */
export function rectVertices(r: RoundedRect): BulgeVertex[] {
  const x0 = r.cx - r.widthMm / 2;
  const x1 = r.cx + r.widthMm / 2;
  const y0 = r.cy - r.heightMm / 2;
  const y1 = r.cy + r.heightMm / 2;
  const c = Math.min(r.cornerRadiusMm, r.widthMm / 2, r.heightMm / 2);
  if (c <= 0) return [[x0, y0, 0], [x1, y0, 0], [x1, y1, 0], [x0, y1, 0]];
  const b = QUARTER_BULGE;
  return [
    [x0 + c, y0, 0], [x1 - c, y0, b],
    [x1, y0 + c, 0], [x1, y1 - c, b],
    [x1 - c, y1, 0], [x0 + c, y1, b],
    [x0, y1 - c, 0], [x0, y0 + c, b],
  ];
}
