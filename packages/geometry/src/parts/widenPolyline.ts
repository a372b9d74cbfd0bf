import type { Vec2 } from './mesh.ts';

/** Sides of the polygon standing for a round join or cap (and for drilled holes in the body). */
export const ROUND_SEGMENTS = 16;

/**
 * A regular polygon circumscribing the circle (centre, radius): counter-
 * clockwise, `segments` corners at radius r / cos(π/segments), so the
 * polygon covers the whole circle (a groove is never narrower than asked,
 * a screw still passes a hole).
 */
export function circlePolygon(centre: Vec2, radiusMm: number, segments = ROUND_SEGMENTS): Vec2[] {
  const rv = radiusMm / Math.cos(Math.PI / segments);
  return Array.from({ length: segments }, (_, k): Vec2 => {
    const t = (2 * Math.PI * k) / segments;
    return [centre[0] + rv * Math.cos(t), centre[1] + rv * Math.sin(t)];
  });
}

/**
 * The area an engraving tool of width `widthMm` sweeps along a polyline, as
 * overlapping counter-clockwise polygons whose union is the groove: one
 * rectangle per segment (square ends, like plate.dxf's etch outlines), a
 * round join at every inner corner, and with `roundEnds` round caps too
 * (single-stroke lettering, traced by a round tool). Union them with a
 * positive or non-zero fill rule. A one-point polyline gives a dot.
 *
 * @example widenPolyline([[0, 0], [10, 0]], 0.8, false) // one 10 × 0.8 rectangle
 */
export function widenPolyline(points: readonly Vec2[], widthMm: number, roundEnds: boolean): Vec2[][] {
  const r = widthMm / 2;
  const out: Vec2[][] = [];
  const pts = points.filter((p, i) => i === 0 || p[0] !== points[i - 1][0] || p[1] !== points[i - 1][1]);
  if (pts.length === 1) return [circlePolygon(pts[0], r)];
  for (let i = 0; i + 1 < pts.length; i++) {
    const a = pts[i];
    const b = pts[i + 1];
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
    const nx = (-(b[1] - a[1]) / len) * r;
    const ny = ((b[0] - a[0]) / len) * r;
    out.push([
      [a[0] - nx, a[1] - ny],
      [b[0] - nx, b[1] - ny],
      [b[0] + nx, b[1] + ny],
      [a[0] + nx, a[1] + ny],
    ]);
  }
  pts.forEach((p, i) => {
    const end = i === 0 || i === pts.length - 1;
    if (!end || roundEnds) out.push(circlePolygon(p, r));
  });
  return out;
}
