import { SpecError } from '../errors.ts';
import { assertFinite, assertPositive, assertRange } from '../guards.ts';
import { assertHemisphere } from './declinationTowardPoleRad.ts';
import type { FacePoint, FacePolyline, Hemisphere } from './types.ts';

/** Options of `dateLinePoints` (lengths mm, angles radians). */
export interface DateLineOptions {
  /**
   * declination measured toward the elevated pole (use
   * `declinationTowardPoleRad`: δ in the north, −δ in the south); |δ| < π/2
   */
  readonly declinationRad: number;
  /** nodus height above the style edge, mm, > 0 */
  readonly heightMm: number;
  /** gnomon thickness t, mm, ≥ 0 (default 0): the styles sit at x = ±t/2 */
  readonly thicknessMm?: number;
  /** left end of the line in the face drawing, mm */
  readonly xMinMm: number;
  /** right end, mm, > xMinMm */
  readonly xMaxMm: number;
  /** sampling step along x, mm, > 0 (default 2) */
  readonly stepMm?: number;
  /** where east lies on the face: right in the north, left in the south */
  readonly hemisphere: Hemisphere;
}

/** The two branches of a date line, one per style edge. */
export interface DateLineBranches {
  /** morning branch: shadow of the nodus on the west style edge */
  readonly west: FacePolyline;
  /** afternoon branch: shadow of the nodus on the east style edge */
  readonly east: FacePolyline;
}

/** Defaults of `dateLinePoints`. */
export const DATE_LINE_DEFAULTS = { thicknessMm: 0, stepMm: 2 } as const;

/** Most points one call may return, to refuse a runaway step. */
const MAX_POINTS = 200_000;

/**
 * Date (declination) line of a nodus on a polar face, sampled along x:
 *
 *     y = −tan δ · √(h² + (|x| − t/2)²)      for |x| ≥ t/2
 *
 * the handbook hyperbola (docs/design.md §2) measured from whichever style edge casts
 * the shadow (x = ±t/2). Points under the gnomon (|x| < t/2) are skipped, so
 * the line comes as two branches, each sampled outward from its style edge
 * at `stepMm` (edge point and range ends included), listed by increasing x.
 * Face frame: x right-positive in the face drawing, east on the right in the
 * north and on the left in the south (so the west branch is the x < 0 one in
 * the north and the x > 0 one in the south); y toward the elevated pole,
 * origin at the nodus foot.
 *
 * @example dateLinePoints({declinationRad: 0.409, heightMm: 50, xMinMm: -100, xMaxMm: 100, stepMm: 10, hemisphere: 'north'})
 *   // {west: [[-100, -48.6…], …, [0, -21.7…]], east: [[0, -21.7…], …]}
 */
export function dateLinePoints(options: DateLineOptions): DateLineBranches {
  const o = { ...DATE_LINE_DEFAULTS, ...options };
  const delta = assertFinite('declinationRad', o.declinationRad);
  if (!(Math.abs(delta) < Math.PI / 2)) throw new SpecError('declinationRad', delta, 'allowed: |declination| < π/2');
  const h = assertPositive('heightMm', o.heightMm);
  const t = assertRange('thicknessMm', o.thicknessMm, 0, Number.MAX_VALUE, ' mm');
  const xMin = assertFinite('xMinMm', o.xMinMm);
  const xMax = assertFinite('xMaxMm', o.xMaxMm);
  if (!(xMax > xMin)) throw new SpecError('xMaxMm', xMax, `allowed: a value greater than xMinMm (${xMin})`);
  const step = assertPositive('stepMm', o.stepMm);
  if ((xMax - xMin) / step > MAX_POINTS) {
    throw new SpecError('stepMm', step, `allowed: a step giving at most ${MAX_POINTS} points over ${xMax - xMin} mm`);
  }
  const hemisphere = assertHemisphere(o.hemisphere);
  const tanD = Math.tan(delta);
  const half = t / 2;
  const yAt = (x: number): number => -tanD * Math.hypot(h, Math.abs(x) - half);

  const right = sideXs(half, xMax, -xMin, step).map((x): FacePoint => [x, yAt(x)]);
  const left = sideXs(half, -xMin, xMax, step)
    .map((u): FacePoint => [-u, yAt(-u)])
    .reverse();
  return hemisphere === 'north' ? { west: left, east: right } : { west: right, east: left };
}

/**
 * Distances u ≥ edge from the centre plane on one side, increasing: the
 * range is u ∈ [max(edge, −far), near], sampled at edge + k·step plus the ends.
 * `near` is the range end on this side, `far` the other end mirrored.
 */
function sideXs(edge: number, near: number, far: number, step: number): number[] {
  const lo = Math.max(edge, -far);
  const hi = near;
  if (hi < lo) return [];
  const xs: number[] = [lo];
  const k0 = Math.floor((lo - edge) / step) + 1;
  for (let k = k0; edge + k * step < hi; k++) {
    const u = edge + k * step;
    if (u - xs[xs.length - 1] > 1e-9) xs.push(u);
  }
  if (hi - xs[xs.length - 1] > 1e-9) xs.push(hi);
  return xs;
}
