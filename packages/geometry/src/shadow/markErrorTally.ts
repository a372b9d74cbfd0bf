/** Worst (largest magnitude, signed) and mean magnitude of a quantity over the lit days. */
export interface WorstMean {
  readonly worst: number;
  readonly meanAbs: number;
}

/** One mark's running count over the simulated days, both checks alike (`checkDial`, `checkPlanar`); filled in place as the days run. */
export interface MarkErrorTally {
  /** days the face was lit at the mark's hour angle */
  lit: number;
  /** lit days the style's shadow reached the drawn line */
  reached: number;
  /** reached days beyond the tolerance */
  over: number;
  /** the error of largest magnitude so far, mm, and the same day's in seconds */
  worstMm: number;
  worstS: number;
  worstDate: string | null;
  sumAbsMm: number;
  sumAbsS: number;
}

/** An empty tally. */
export function newMarkErrorTally(): MarkErrorTally {
  return { lit: 0, reached: 0, over: 0, worstMm: 0, worstS: 0, worstDate: null, sumAbsMm: 0, sumAbsS: 0 };
}

/**
 * Count one reached day into a tally: the error (shadow − line, mm) and its
 * time (s), over the tolerance or not, and the worst day (the first of
 * equal magnitudes kept).
 * @example tallyReached(t, 0.01, -0.5, 0.05, '2027-06-21')
 */
export function tallyReached(t: MarkErrorTally, errorMm: number, errorS: number, toleranceMm: number, date: string): void {
  t.reached++;
  t.sumAbsMm += Math.abs(errorMm);
  t.sumAbsS += Math.abs(errorS);
  if (Math.abs(errorMm) > toleranceMm) t.over++;
  if (t.worstDate === null || Math.abs(errorMm) > Math.abs(t.worstMm)) {
    t.worstMm = errorMm;
    t.worstS = errorS;
    t.worstDate = date;
  }
}

/**
 * A tally as a mark's year reads in the check results: lit and reached days,
 * worst and mean |error| in mm and s over the reached days, the worst day,
 * the days over tolerance.
 * @example markErrorSummary(newMarkErrorTally()).errorMm // { worst: 0, meanAbs: 0 }
 */
export function markErrorSummary(t: MarkErrorTally): { litDays: number; reachedDays: number; errorMm: WorstMean; errorS: WorstMean; worstDate: string | null; daysOverTolerance: number } {
  return {
    litDays: t.lit,
    reachedDays: t.reached,
    errorMm: { worst: t.worstMm, meanAbs: t.reached ? t.sumAbsMm / t.reached : 0 },
    errorS: { worst: t.worstS, meanAbs: t.reached ? t.sumAbsS / t.reached : 0 },
    worstDate: t.worstDate,
    daysOverTolerance: t.over,
  };
}
