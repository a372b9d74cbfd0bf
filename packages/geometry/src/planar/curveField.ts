import { clipPolyline } from '../polar/clipPolyline.ts';
import { insideBox } from '../shadow/curveCheck.ts';
import type { Vec2 } from '../types.ts';

/**
 * Where a planar face's date lines and mean-time curves are drawn, face
 * coordinates, mm: the box of the hour lines' ends, and on an equatorial
 * face (lines round the rod) only the part of that box inside the disc they
 * reach, centred on the rod.
 */
export interface CurveField {
  readonly box: { readonly xMinMm: number; readonly xMaxMm: number; readonly yMinMm: number; readonly yMaxMm: number };
  /** an equatorial face: the lines' reach from the rod, mm */
  readonly discRadiusMm?: number;
}

/**
 * The curve field of a face's marks (the layout and the check use this one).
 * @example curveFieldOf([{ a: [10, 0], b: [50, 0] }], true) // { kind: 'disc', radiusMm: 50 }
 */
export function curveFieldOf(marks: readonly { readonly a: Vec2; readonly b: Vec2 }[], equatorial: boolean): CurveField {
  const pts = marks.flatMap((m) => [m.a, m.b]);
  const xs = pts.map((p) => p[0]);
  const ys = pts.map((p) => p[1]);
  const box = { xMinMm: Math.min(...xs), xMaxMm: Math.max(...xs), yMinMm: Math.min(...ys), yMaxMm: Math.max(...ys) };
  return equatorial ? { box, discRadiusMm: Math.max(...pts.map(([x, y]) => Math.hypot(x, y))) } : { box };
}

/** Whether X lies inside the field, at least `insetMm` from its edge. */
export function insideCurveField(field: CurveField, X: Vec2, insetMm: number): boolean {
  return insideBox(field.box, X, insetMm) && (field.discRadiusMm === undefined || Math.hypot(X[0], X[1]) < field.discRadiusMm - insetMm);
}

/**
 * The pieces of an open polyline inside the field, in order, each of at
 * least two points: the box by `clipPolyline`, then the disc by cutting each
 * segment where it crosses the circle (the root of |a + t (b − a)| = r).
 */
export function clipToCurveField(points: readonly Vec2[], field: CurveField): Vec2[][] {
  const inBox = clipPolyline(points, field.box);
  const r = field.discRadiusMm;
  return r === undefined ? inBox : inBox.flatMap((piece) => clipToDisc(piece, r));
}

function clipToDisc(points: readonly Vec2[], r: number): Vec2[][] {
  const inside = (p: Vec2) => Math.hypot(p[0], p[1]) <= r;
  const crossing = (a: Vec2, b: Vec2): Vec2 => {
    const d: Vec2 = [b[0] - a[0], b[1] - a[1]];
    const A = d[0] * d[0] + d[1] * d[1];
    const B = 2 * (a[0] * d[0] + a[1] * d[1]);
    const C = a[0] * a[0] + a[1] * a[1] - r * r;
    const disc = Math.sqrt(Math.max(0, B * B - 4 * A * C));
    // The root within [0, 1]: entering (C > 0) the smaller, leaving (C ≤ 0) the larger.
    const t = C > 0 ? (-B - disc) / (2 * A) : (-B + disc) / (2 * A);
    return [a[0] + t * d[0], a[1] + t * d[1]];
  };
  const out: Vec2[][] = [];
  let cur: Vec2[] = [];
  const flush = () => {
    if (cur.length >= 2) out.push(cur);
    cur = [];
  };
  points.forEach((p, i) => {
    if (i === 0) {
      if (inside(p)) cur.push(p);
      return;
    }
    const q = points[i - 1];
    if (inside(p) && inside(q)) cur.push(p);
    else if (inside(p)) cur.push(crossing(q, p), p);
    else if (inside(q)) {
      cur.push(crossing(q, p));
      flush();
    }
  });
  flush();
  return out;
}
