import { arcPoints, CHORD_TOLERANCE_MM } from '../sheet/arcPoints.ts';
import type { Path, RoundedRect, Vec2 } from '../types.ts';
import { dropRepeats } from './dropRepeats.ts';

/**
 * The one rounded rectangle: its sides, its corner radius clamped to half the
 * shorter side, and its four corner arcs counter-clockwise from the lower
 * right, each a quarter turn starting at `quarter` · 90°.
 */
export interface RoundedRectCorners {
  readonly x0: number;
  readonly x1: number;
  readonly y0: number;
  readonly y1: number;
  /** the corner radius actually drawn, mm (0 or less: sharp corners) */
  readonly radiusMm: number;
  readonly corners: readonly { readonly centre: Vec2; readonly quarter: -1 | 0 | 1 | 2 }[];
}

/**
 * A rounded rectangle's sides, clamped radius and corner arcs (see `RoundedRectCorners`).
 * @example roundedRectCorners({ kind: 'rect', cx: 0, cy: 0, widthMm: 4, heightMm: 2, cornerRadiusMm: 5 }).radiusMm // 1
 */
export function roundedRectCorners(r: RoundedRect): RoundedRectCorners {
  const x0 = r.cx - r.widthMm / 2;
  const x1 = r.cx + r.widthMm / 2;
  const y0 = r.cy - r.heightMm / 2;
  const y1 = r.cy + r.heightMm / 2;
  const c = Math.min(r.cornerRadiusMm, r.widthMm / 2, r.heightMm / 2);
  return {
    x0, x1, y0, y1,
    radiusMm: c,
    corners: [
      { centre: [x1 - c, y0 + c], quarter: -1 },
      { centre: [x1 - c, y1 - c], quarter: 0 },
      { centre: [x0 + c, y1 - c], quarter: 1 },
      { centre: [x0 + c, y0 + c], quarter: 2 },
    ],
  };
}

/** The four corners of the sharp rectangle, counter-clockwise from the lower left. */
function sharpCorners(k: RoundedRectCorners): Vec2[] {
  return [[k.x0, k.y0], [k.x1, k.y0], [k.x1, k.y1], [k.x0, k.y1]];
}

/**
 * Area of a rounded rectangle, mm²: w·h − (4 − π)·r² (each corner loses a square less a quarter disc).
 * @example roundedRectArea({ kind: 'rect', cx: 0, cy: 0, widthMm: 10, heightMm: 10, cornerRadiusMm: 0 }) // 100
 */
export function roundedRectArea(r: RoundedRect): number {
  const c = roundedRectCorners(r).radiusMm;
  return r.widthMm * r.heightMm - (4 - Math.PI) * c * c;
}

/**
 * A rounded rectangle as a counter-clockwise polygon, each corner arc as `cornerSegments` chords
 * (radius 0 gives the four corners). For solids and pictures, where a fixed count keeps meshes small.
 * @param r the rectangle (centre, size, corner radius, mm)
 * @param cornerSegments chords per quarter-turn corner (default 8)
 * @example roundedRectPolygon({ kind: 'rect', cx: 0, cy: 0, widthMm: 4, heightMm: 2, cornerRadiusMm: 0 }).length // 4
 */
export function roundedRectPolygon(r: RoundedRect, cornerSegments = 8): Vec2[] {
  const k = roundedRectCorners(r);
  const c = k.radiusMm;
  if (!(c > 0)) return sharpCorners(k);
  const out: Vec2[] = [];
  for (const { centre: [cx, cy], quarter } of k.corners) {
    const start = 90 * quarter;
    for (let i = 0; i <= cornerSegments; i++) {
      const t = ((start + (90 * i) / cornerSegments) * Math.PI) / 180;
      out.push([cx + c * Math.cos(t), cy + c * Math.sin(t)]);
    }
  }
  return out;
}

/**
 * A rounded rectangle as a closed counter-clockwise polyline, corner arcs
 * within `toleranceMm` (vertices on the arcs); sharp corners stay single
 * vertices. For cut drawings, where the chord tolerance is the contract.
 * @example roundedRectPath({ kind: 'rect', cx: 5, cy: 5, widthMm: 10, heightMm: 10, cornerRadiusMm: 0 }).points.length // 4
 */
export function roundedRectPath(r: RoundedRect, toleranceMm = CHORD_TOLERANCE_MM): Path {
  const k = roundedRectCorners(r);
  const c = k.radiusMm;
  if (!(c > 0)) return { kind: 'path', closed: true, points: sharpCorners(k) };
  const q = Math.PI / 2;
  const pts = k.corners.flatMap(({ centre, quarter }) => arcPoints(centre, c, quarter * q, q, toleranceMm));
  return { kind: 'path', closed: true, points: dropRepeats(pts) };
}
