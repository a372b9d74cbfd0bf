import { describe, expect, it } from 'vitest';
import { markErrorSummary, newMarkErrorTally, tallyReached } from './markErrorTally.ts';

describe('markErrorTally', () => {
  it('an empty tally reads as no lit days and zero errors', () => {
    expect(markErrorSummary(newMarkErrorTally())).toEqual({ litDays: 0, reachedDays: 0, errorMm: { worst: 0, meanAbs: 0 }, errorS: { worst: 0, meanAbs: 0 }, worstDate: null, daysOverTolerance: 0 });
  });

  it('counts reached days, means the magnitudes, keeps the signed worst (first of equals) and the days over tolerance', () => {
    const t = newMarkErrorTally();
    t.lit = 4;
    tallyReached(t, 0.02, -1, 0.05, 'd1');
    tallyReached(t, -0.08, 4, 0.05, 'd2');
    tallyReached(t, 0.08, -4, 0.05, 'd3');
    const s = markErrorSummary(t);
    expect(s.litDays).toBe(4);
    expect(s.reachedDays).toBe(3);
    expect(s.errorMm.worst).toBe(-0.08);
    expect(s.errorMm.meanAbs).toBeCloseTo(0.06, 12);
    expect(s.errorS).toEqual({ worst: 4, meanAbs: 3 });
    expect(s.worstDate).toBe('d2');
    expect(s.daysOverTolerance).toBe(2);
  });
});
