import { projectOnSegment } from '../calendar/refineByChord.ts';
import type { Vec3 } from '../parts/mesh.ts';
import type { SunDay } from '../sun/sunTrack.ts';
import type { Vec2 } from '../types.ts';

/** Hour-angle step of a date line's test positions in both checks, degrees (started half a step in from the first line). */
export const DATE_LINE_TEST_STEP_DEG = 0.1;

/** The year's result for one date line or mean-time curve (the polar and the planar check). */
export interface CurveCheck {
  readonly label: string;
  readonly kind: 'date' | 'meanTime';
  /** sun positions tested (those whose nodus shadow falls inside the drawn field) */
  readonly samples: number;
  /** largest distance of the nodus shadow from the drawn curve, mm */
  readonly worstMm: number;
  /** the same in seconds of time (that distance over the shadow's motion in one second) */
  readonly worstS: number;
  readonly worstDate: string | null;
  readonly pass: boolean;
}

/** A date line or mean-time curve as drawn: polylines in the face frame, mm. */
export interface DrawnCurve {
  readonly label: string;
  readonly kind: 'date' | 'meanTime';
  readonly paths: readonly (readonly Vec2[])[];
}

/** One Sun position a curve is measured at, everything in the face frame (x, y in the face, z the outward normal). */
export interface CurveSunPosition {
  /** unit vector toward the Sun */
  readonly sun: Vec3;
  /** the same one second later (for the shadow's speed) */
  readonly later: Vec3;
  /** the nodus that casts the shadow, mm, or null where none does */
  readonly nodus: Vec3 | null;
  /** the day, 'YYYY-MM-DD' */
  readonly date: string;
}

/**
 * Measure one drawn curve against the nodus shadow at the given Sun
 * positions: each nodus projected along the rays onto the face (z = 0); a
 * position counts where the face is lit (sun z > 0), the shadow falls
 * `inside` the drawn field and its nearest drawn point is not beyond a
 * drawn end (where the drawing stops, the curve claims nothing). The worst
 * distance, in mm and in seconds (through the shadow's motion to `later`),
 * and whether it stays within `toleranceMm`.
 *
 * @example measureCurve(curve, positions, (X) => Math.abs(X[0]) < 100, 0.05).worstMm
 */
export function measureCurve(curve: DrawnCurve, positions: Iterable<CurveSunPosition>, inside: (X: Vec2) => boolean, toleranceMm: number): CurveCheck {
  let worstMm = 0;
  let worstS = 0;
  let worstDate: string | null = null;
  let samples = 0;
  for (const p of positions) {
    if (!(p.sun[2] > 0) || !p.nodus) continue;
    const X = projectOnFace(p.nodus, p.sun);
    if (!inside(X)) continue;
    const dist = distanceToPaths(X, curve.paths);
    if (dist === null) continue;
    samples++;
    if (dist > worstMm) {
      const X2 = projectOnFace(p.nodus, p.later);
      const speed = Math.hypot(X2[0] - X[0], X2[1] - X[1]);
      worstMm = dist;
      worstS = speed > 0 ? dist / speed : 0;
      worstDate = p.date;
    }
  }
  return { label: curve.label, kind: curve.kind, samples, worstMm, worstS, worstDate, pass: worstMm <= toleranceMm };
}

/** A point's shadow along the Sun's rays on the face z = 0, mm. */
export function projectOnFace(p: Vec3, sun: Vec3): Vec2 {
  const k = p[2] / sun[2];
  return [p[0] - k * sun[0], p[1] - k * sun[1]];
}

/** Whether X lies inside a box shrunk by `insetMm` on every side (the drawn field, where the curves were kept). */
export function insideBox(box: { readonly xMinMm: number; readonly xMaxMm: number; readonly yMinMm: number; readonly yMaxMm: number }, X: Vec2, insetMm: number): boolean {
  return X[0] > box.xMinMm + insetMm && X[0] < box.xMaxMm - insetMm && X[1] > box.yMinMm + insetMm && X[1] < box.yMaxMm - insetMm;
}

/** Distance from X to the nearest drawn polyline, or null when the nearest point is a run's end and X lies beyond it. */
export function distanceToPaths(X: Vec2, paths: readonly (readonly Vec2[])[]): number | null {
  let best = Infinity;
  let beyondEnd = false;
  for (const path of paths) {
    for (let i = 0; i + 1 < path.length; i++) {
      const { along, distanceMm } = projectOnSegment(path[i], X, path[i + 1]);
      if (distanceMm < best) {
        best = distanceMm;
        beyondEnd = (i === 0 && along < 0) || (i + 2 === path.length && along > 1);
      }
    }
  }
  return beyondEnd ? null : best;
}

/** The simulated day of a date, or the nearest one (a check run every n-th day). */
export function nearestDay(days: readonly SunDay[], date: string): SunDay {
  const ms = Date.parse(date);
  return days.find((d) => d.date === date) ?? days.reduce((best, d) => (Math.abs(Date.parse(d.date) - ms) < Math.abs(Date.parse(best.date) - ms) ? d : best), days[0]);
}
