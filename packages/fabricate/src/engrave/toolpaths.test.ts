import { describe, expect, it } from 'vitest';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import type { EngraveJob } from './engraveInput.ts';
import { resolveEngraveSettings } from './materialPresets.ts';
import { SAMPLE_PLATE_JOB, SAMPLE_WIDE_MARK_JOB } from './sampleEngraveJobs.ts';
import { buildToolpaths, maxEngraveDepthMm } from './toolpaths.ts';

const job = (widthMm: number, thicknessMm = 3, material = 'aluminium'): EngraveJob => ({
  stock: { widthMm: 50, lengthMm: 40, thicknessMm, material },
  title: [],
  paths: [
    { points: [[10, 5], [10, 35]], closed: false, widthMm: 0.3, operation: 'marks', label: 'hour 11' },
    { points: [[20, 5], [20, 35]], closed: false, widthMm, operation: 'marks', label: 'hour 12' },
  ],
});

describe('buildToolpaths', () => {
  it('gives each cut V-bit depth passes and keeps every path once', () => {
    const s = resolveEngraveSettings('aluminium');
    const tp = buildToolpaths(SAMPLE_PLATE_JOB, s);
    expect(tp.cuts.map((c) => c.sourceIndex).sort((a, b) => a - b)).toEqual(SAMPLE_PLATE_JOB.paths.map((_, i) => i));
    // 90° bit (common practice d = w/2): 0.5 → 0.25 in 2 passes of 0.125 (step-down 0.15), 0.3 → 0.15 in 1.
    const hour = tp.cuts.find((c) => c.label === 'hour 12');
    expect(hour?.depthPassesMm.length).toBe(2);
    expectClose(hour?.depthPassesMm[0] ?? NaN, 0.125, 1e-12, 'hour pass 1', ' mm');
    expectClose(hour?.depthPassesMm[1] ?? NaN, 0.25, 1e-12, 'hour pass 2', ' mm');
    const border = tp.cuts.find((c) => c.label === 'border')?.depthPassesMm ?? [];
    expect(border.length).toBe(1);
    expectClose(border[0], 0.15, 1e-12, 'border depth', ' mm');
    expectClose(tp.maxDepthMm, 0.25, 1e-12, 'max depth', ' mm');
    expect(tp.depthLimitMm).toBe(1.5);
    expect(tp.rapidTravelMm.ordered).toBeLessThanOrEqual(tp.rapidTravelMm.inputOrder);
  });

  it('rejects a V-bit too narrow for the widest mark, naming the field and value', () => {
    expect(() => buildToolpaths(job(4, 10), resolveEngraveSettings('aluminium'))).toThrow(
      /vbitMaxWidthMm 3.175 is too narrow for paths\[1\].widthMm 4 \('hour 12'\)/,
    );
  });

  it('rejects a depth deeper than the stock allows, naming the field and value', () => {
    // 2 mm stock: limit 2 − max(0.5, 1) = 1 mm; a 3 mm groove with a 90° bit is 1.5 mm deep.
    expect(maxEngraveDepthMm(2)).toBe(1);
    expect(maxEngraveDepthMm(0.8)).toBeCloseTo(0.3, 12);
    expect(() => buildToolpaths(job(3, 2), resolveEngraveSettings('aluminium'))).toThrow(
      /depth 1.500 mm of paths\[1\] \('hour 12', widthMm 3\) is deeper than stock.thicknessMm 2 allows: at most 1.000 mm/,
    );
  });

  it('rejects a mark not wider than the V-bit tip', () => {
    expect(() => buildToolpaths(job(0.05), resolveEngraveSettings('aluminium', { vbitTipMm: 0.1 }))).toThrow(
      /paths\[1\].widthMm 0.05 \('hour 12'\) must exceed vbitTipMm 0.1/,
    );
  });

  it('rejects a bad path', () => {
    const bad: EngraveJob = { ...job(0.5), paths: [{ points: [[1, 1]], closed: false, widthMm: 0.5, operation: 'marks', label: 'x' }] };
    expect(() => buildToolpaths(bad, resolveEngraveSettings('aluminium'))).toThrow(/paths\[0\].points must hold at least 2 points/);
  });

  it('rejects a point off the stock', () => {
    const off: EngraveJob = { ...job(0.5), paths: [{ points: [[1, 1], [51, 1]], closed: false, widthMm: 0.5, operation: 'marks', label: 'x' }] };
    expect(() => buildToolpaths(off, resolveEngraveSettings('aluminium'))).toThrow(/paths\[0\].points\[1\] \[51, 1\] lies off the stock; allowed: 0 <= x <= stock.widthMm 50/);
  });

  it('sends wide marks to the flat end mill, after the V-bit cuts', () => {
    const s = resolveEngraveSettings('brass', { flatEndMillMm: 1 });
    const tp = buildToolpaths(SAMPLE_WIDE_MARK_JOB, s);
    expect(tp.cuts.map((c) => c.tool)).toEqual(['vbit', 'flat', 'flat']);
    const flat = tp.cuts[1];
    expect(flat.depthPassesMm).toEqual([0.15, 0.3]);
    // 2.4 mm groove, 1 mm mill, step-over ≤ 0.5 mm: span 1.4 → 4 rows of 2 points.
    expect(flat.points.length).toBe(8);
    // Without a flat end mill the 2.4 mm mark would be a 1.2 mm deep V-groove in 4 mm brass (limit 2 mm): allowed.
    expect(buildToolpaths(SAMPLE_WIDE_MARK_JOB, resolveEngraveSettings('brass')).cuts.every((c) => c.tool === 'vbit')).toBe(true);
    // A higher threshold keeps the marks on the V-bit.
    expect(buildToolpaths(SAMPLE_WIDE_MARK_JOB, resolveEngraveSettings('brass', { flatEndMillMm: 1, flatMinWidthMm: 3 })).cuts.every((c) => c.tool === 'vbit')).toBe(true);
  });
});
