import type { RefractionModel } from '../sun/sunTrack.ts';
import type { CurveCheck } from './curveCheck.ts';
import type { WorstMean } from './markErrorTally.ts';

/** A mark's year as both checks sum it up (`markErrorSummary`), whichever face it is on. */
export interface MarkSummary {
  readonly label: string;
  readonly hourAngleDeg: number;
  /** days on which the Sun is up and in front of the face at this mark's hour angle */
  readonly litDays: number;
  /** lit days on which the style's shadow reaches the drawn line */
  readonly reachedDays: number;
  /** distance of the style's shadow from the drawn line, mm: worst (signed) and mean |·| over the reached days */
  readonly errorMm: WorstMean;
  /** the same in seconds of time (the distance over the shadow's speed across the line; +: the dial reads late there) */
  readonly errorS: WorstMean;
  /** date of the worst error, 'YYYY-MM-DD' (null if never reached) */
  readonly worstDate: string | null;
  /** reached days whose |error| exceeds the tolerance */
  readonly daysOverTolerance: number;
}

/** The single worst (mark, day) of a check; each check adds which style edge cast it. */
export interface WorstMark {
  readonly label: string;
  readonly date: string;
  readonly errorMm: number;
  readonly errorS: number;
}

/** A mark beyond the tolerance on some day (its worst day); each check adds its own detail. */
export interface MarkFailure {
  readonly label: string;
  readonly date: string;
  readonly errorMm: number;
}

/**
 * What the polar check (`checkDial`, `CheckResult`) and the planar check
 * (`checkPlanar`, `PlanarCheckResult`) report alike: the year and its
 * sampling, the tolerances, the Sun positions counted, the method notes, the
 * marks, the worst and the failures, the date lines and mean-time curves,
 * and the verdict. The writers of both (`checkSummaryText.ts` in fabricate,
 * the plot) read these fields only.
 */
export interface CheckSummary {
  readonly year: number;
  /** largest accepted distance of the shadow from a drawn mark, mm */
  readonly toleranceMm: number;
  /** tolerance of the date lines and mean-time curves, mm: the same as the marks' (they are drawn to 0.0005 mm of the shadow) */
  readonly curveToleranceMm: number;
  /** the sampling: the sweep step in minutes, every n-th day simulated, the refraction model */
  readonly stepMinutes: number;
  readonly everyDays: number;
  readonly refraction: RefractionModel;
  /** Sun positions computed (the sweep samples, the per-mark instants and the curves' samples), and how the check measured, one note a line */
  readonly sunPositions: number;
  readonly method: readonly string[];
  readonly marks: readonly MarkSummary[];
  /** the single worst (mark, day), or null if no mark is ever reached */
  readonly worst: WorstMark | null;
  /** marks beyond the tolerance, worst first */
  readonly failures: readonly MarkFailure[];
  /** each drawn date line and mean-time curve against the nodus shadow (`measureCurve`); empty without a nodus */
  readonly curves: readonly CurveCheck[];
  /** every mark and every curve within its tolerance */
  readonly pass: boolean;
}

/**
 * The reached mark whose worst error is the largest in magnitude (the first
 * of equals), or null if no mark is ever reached: the source of a result's `worst`.
 * @example worstReachedMark(marks)?.label
 */
export function worstReachedMark<M extends MarkSummary>(marks: readonly M[]): (M & { readonly worstDate: string }) | null {
  let worst: (M & { readonly worstDate: string }) | null = null;
  for (const m of marks) {
    if (m.worstDate !== null && (worst === null || Math.abs(m.errorMm.worst) > Math.abs(worst.errorMm.worst))) worst = m as M & { readonly worstDate: string };
  }
  return worst;
}

/**
 * The marks beyond the tolerance on some day, worst first (then by label):
 * the source of a result's `failures`.
 * @example marksOverTolerance(marks).length
 */
export function marksOverTolerance<M extends MarkSummary>(marks: readonly M[]): (M & { readonly worstDate: string })[] {
  return marks
    .filter((m): m is M & { readonly worstDate: string } => m.daysOverTolerance > 0 && m.worstDate !== null)
    .sort((p, q) => Math.abs(q.errorMm.worst) - Math.abs(p.errorMm.worst) || p.label.localeCompare(q.label));
}

/** Sun positions the curves' measures took (`CurveCheck.samples`, summed). */
export function curveSunPositions(curves: readonly CurveCheck[]): number {
  return curves.reduce((n, c) => n + c.samples, 0);
}

/** The verdict of a check: no mark beyond its tolerance and every curve within its own. */
export function checkPasses(failures: readonly MarkFailure[], curves: readonly CurveCheck[]): boolean {
  return failures.length === 0 && curves.every((c) => c.pass);
}
