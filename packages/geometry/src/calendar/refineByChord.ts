import type { Vec2 } from '../types.ts';

/**
 * Largest distance of a drawn date line or mean-time curve from its chords,
 * mm: half the 0.001 mm the shadow-check tests hold every mark and curve to,
 * leaving the other half to the ephemeris and the check's own sampling.
 */
export const CURVE_CHORD_TOLERANCE_MM = 0.0005;

/** A point of a sampled curve, and whatever else its sampler keeps with it. */
export interface CurveSample {
  readonly point: Vec2;
}

/** Options of `refineByChord`. */
export interface RefineByChordOptions<S extends CurveSample> {
  /** largest distance of the curve's point at a step's middle from the step's chord, mm */
  readonly toleranceMm: number;
  /** halvings of a first step at most */
  readonly maxHalvings: number;
  /** whether two samples belong to one drawn run (e.g. cast by the same style edge); default: always */
  readonly sameRun?: (a: S, b: S) => boolean;
  /**
   * set: a first step from a drawn to an undrawn parameter (or back) is
   * bisected to the curve's end, down to this width of the parameter, and
   * the curve drawn up to that end (`curveEnd`); unset: the curve stops at
   * its last drawn first parameter
   */
  readonly endWidth?: number;
}

/**
 * Sample a curve given by a parameter (a date, an hour angle) finely enough
 * to be drawn as chords: the curve at every first parameter, and each step
 * halved, recursively, while the curve's point at the step's middle lies
 * more than `toleranceMm` from the chord between the step's ends (at most
 * `maxHalvings` times). With `endWidth`, a first step with one end undrawn
 * gains the curve's last drawn point before it (`curveEnd`), refined like
 * the rest. A step is not refined where either end is null
 * (the curve is not drawn there) or the ends, or the middle, fall in
 * different runs (`sameRun`): the curve breaks there anyway. Returns the
 * samples in parameter order, nulls kept, for the caller to split in runs.
 * Shared by the polar and planar date lines and mean-time curves.
 *
 * @param params the first parameters, in drawing order
 * @param at the curve at a parameter, or null where it is not drawn
 * @example refineByChord([0, 1], (u) => ({ point: [u, u * u] }), { toleranceMm: 0.01, maxHalvings: 12 }).length // 7
 */
export function refineByChord<S extends CurveSample>(params: readonly number[], at: (u: number) => S | null, options: RefineByChordOptions<S>): (S | null)[] {
  const { toleranceMm, maxHalvings } = options;
  const sameRun = options.sameRun ?? (() => true);
  const out: (S | null)[] = [];
  const refine = (ua: number, a: S | null, ub: number, b: S | null, depth: number) => {
    if (!a || !b || !sameRun(a, b) || depth >= maxHalvings) return;
    const um = (ua + ub) / 2;
    const m = at(um);
    if (!m || !sameRun(a, m) || chordSag(a.point, m.point, b.point) <= toleranceMm) return;
    refine(ua, a, um, m, depth + 1);
    out.push(m);
    refine(um, m, ub, b, depth + 1);
  };
  if (params.length === 0) return out;
  let prev = at(params[0]);
  out.push(prev);
  for (let i = 1; i < params.length; i++) {
    const next = at(params[i]);
    if (options.endWidth !== undefined && !prev !== !next) {
      const end = curveEnd(params[i - 1], prev, params[i], next, at, options.endWidth);
      if (prev) {
        refine(params[i - 1], prev, end.u, end.sample, 0);
        out.push(end.sample);
      } else {
        out.push(end.sample);
        refine(end.u, end.sample, params[i], next, 0);
      }
    } else refine(params[i - 1], prev, params[i], next, 0);
    out.push(next);
    prev = next;
  }
  return out;
}

/**
 * The end of a curve within a step whose one end is drawn (`a` or `b`
 * non-null) and the other not: the drawn end kept, the step halved toward
 * the undrawn one while it is wider than `width`. Returns the last drawn
 * parameter found and its sample, within `width` of where the curve stops.
 */
export function curveEnd<S>(ua: number, a: S | null, ub: number, b: S | null, at: (u: number) => S | null, width: number): { readonly u: number; readonly sample: S } {
  if ((a === null) === (b === null)) throw new Error('curveEnd: exactly one end of the step must be drawn');
  let drawn = a !== null ? { u: ua, sample: a } : { u: ub, sample: b! };
  let undrawn = a !== null ? ub : ua;
  while (Math.abs(undrawn - drawn.u) > width) {
    const u = (drawn.u + undrawn) / 2;
    const m = at(u);
    if (m !== null) drawn = { u, sample: m };
    else undrawn = u;
  }
  return drawn;
}

/** Distance of m from the segment a–b, mm. */
export function chordSag(a: Vec2, m: Vec2, b: Vec2): number {
  return projectOnSegment(a, m, b).distanceMm;
}

/**
 * m projected on the line a–b: where along it (`along`, 0 at a, 1 at b,
 * unclamped) and the distance from m to the nearest point of the segment.
 */
export function projectOnSegment(a: Vec2, m: Vec2, b: Vec2): { readonly along: number; readonly distanceMm: number } {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const l2 = dx * dx + dy * dy;
  const along = l2 > 0 ? ((m[0] - a[0]) * dx + (m[1] - a[1]) * dy) / l2 : 0;
  const u = Math.max(0, Math.min(1, along));
  return { along, distanceMm: Math.hypot(m[0] - a[0] - u * dx, m[1] - a[1] - u * dy) };
}
