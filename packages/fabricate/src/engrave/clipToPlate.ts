import type { Circle, RoundedRect } from '@umbrafab/geometry';
import type { Vec2 } from './engraveInput.ts';

/**
 * Cut an engraving polyline where it crosses a through-cut (a mounting hole
 * or a gnomon slot), so no tool or beam moves over a hole: the parts inside
 * are dropped and the rest comes back as open pieces in the input's order and
 * direction. A closed path is treated as the open path through its points
 * and back to the first one; untouched paths come back as they were.
 *
 * Holes are circles; slots are clipped as their full rectangle (a rounded
 * slot corner then trims a line a little early, never late). Touching a
 * boundary without entering does not cut. Pieces shorter than `minPieceMm`
 * are dropped.
 *
 * Method: per segment, the parameter intervals inside each circle (the
 * roots of |a + t(b − a) − c|² = r²) and inside each rectangle (slab
 * clipping, Liang and Barsky, "A new concept and method for line clipping",
 * ACM TOG 3(1), 1984; memory), merged; the complement is kept.
 *
 * @returns the pieces; `touched` is false when nothing was removed
 */
export function clipToPlate(
  points: readonly Vec2[],
  closed: boolean,
  holes: readonly Circle[],
  slots: readonly RoundedRect[],
  minPieceMm = 1e-3,
): { readonly pieces: readonly (readonly Vec2[])[]; readonly touched: boolean; readonly removedMm: number } {
  const pts = closed ? [...points, points[0]] : points;
  const pieces: Vec2[][] = [];
  let current: Vec2[] = [];
  let touched = false;
  let removedMm = 0;
  const flush = (): void => {
    if (current.length >= 2 && lengthOf(current) >= minPieceMm) pieces.push(current);
    current = [];
  };
  for (let i = 1; i < pts.length; i += 1) {
    const a = pts[i - 1];
    const b = pts[i];
    const inside = mergeIntervals([...holes.map((h) => circleInterval(a, b, h)), ...slots.map((s) => rectInterval(a, b, s))]);
    if (inside.length === 0) {
      if (current.length === 0) current.push(a);
      current.push(b);
      continue;
    }
    touched = true;
    const segMm = Math.hypot(b[0] - a[0], b[1] - a[1]);
    const at = (t: number): Vec2 => [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];
    let t = 0;
    for (const [t0, t1] of inside) {
      if (t0 > t) {
        if (current.length === 0) current.push(at(t));
        current.push(at(t0));
      }
      flush();
      removedMm += (t1 - t0) * segMm;
      t = t1;
    }
    if (t < 1) current.push(at(t), b);
  }
  flush();
  if (!touched) return { pieces: [points], touched: false, removedMm: 0 };
  // A loop cut open: the piece that runs into the seam continues into the one that leaves it.
  const seam = pts[0];
  const first = pieces[0];
  const last = pieces[pieces.length - 1];
  const isSeam = (p: Vec2): boolean => p[0] === seam[0] && p[1] === seam[1];
  if (closed && pieces.length > 1 && isSeam(first[0]) && isSeam(last[last.length - 1])) {
    pieces.splice(0, 1);
    pieces[pieces.length - 1] = [...last, ...first.slice(1)];
  }
  return { pieces, touched, removedMm };
}

function lengthOf(p: readonly Vec2[]): number {
  let s = 0;
  for (let i = 1; i < p.length; i += 1) s += Math.hypot(p[i][0] - p[i - 1][0], p[i][1] - p[i - 1][1]);
  return s;
}

const EPS = 1e-12;

/** Parameter interval of segment a→b strictly inside a circle, or undefined. */
function circleInterval(a: Vec2, b: Vec2, c: Circle): readonly [number, number] | undefined {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const fx = a[0] - c.cx;
  const fy = a[1] - c.cy;
  const A = dx * dx + dy * dy;
  if (A < EPS) return undefined;
  const B = 2 * (fx * dx + fy * dy);
  const C = fx * fx + fy * fy - c.radiusMm * c.radiusMm;
  const disc = B * B - 4 * A * C;
  if (disc <= 0) return undefined;
  const root = Math.sqrt(disc);
  const t0 = Math.max(0, (-B - root) / (2 * A));
  const t1 = Math.min(1, (-B + root) / (2 * A));
  return t1 - t0 > EPS ? [t0, t1] : undefined;
}

/** Parameter interval of segment a→b strictly inside an axis-aligned rectangle, or undefined. */
function rectInterval(a: Vec2, b: Vec2, r: RoundedRect): readonly [number, number] | undefined {
  let t0 = 0;
  let t1 = 1;
  const axes: [number, number, number, number][] = [
    [a[0], b[0] - a[0], r.cx - r.widthMm / 2, r.cx + r.widthMm / 2],
    [a[1], b[1] - a[1], r.cy - r.heightMm / 2, r.cy + r.heightMm / 2],
  ];
  for (const [p, d, lo, hi] of axes) {
    if (Math.abs(d) < EPS) {
      if (!(p > lo && p < hi)) return undefined;
      continue;
    }
    let ta = (lo - p) / d;
    let tb = (hi - p) / d;
    if (ta > tb) [ta, tb] = [tb, ta];
    t0 = Math.max(t0, ta);
    t1 = Math.min(t1, tb);
  }
  return t1 - t0 > EPS ? [t0, t1] : undefined;
}

function mergeIntervals(list: readonly (readonly [number, number] | undefined)[]): [number, number][] {
  const sorted = list.filter((x): x is readonly [number, number] => x !== undefined).sort((p, q) => p[0] - q[0]);
  const out: [number, number][] = [];
  for (const [s, e] of sorted) {
    const last = out[out.length - 1];
    if (last && s <= last[1]) last[1] = Math.max(last[1], e);
    else out.push([s, e]);
  }
  return out;
}
