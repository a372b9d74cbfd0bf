import { describe, expect, it } from 'vitest';
import type { EngraveJob } from './engraveInput.ts';
import { laserFillPasses } from './laserFill.ts';

// Closed forms (common geometry): a w × L rectangle moved in by d is
// (w − 2d) × (L − 2d); concentric passes of a beam b at b/2, b/2 + i, …
// cover a strip of half-width h when the last lies within b/2 of the middle.

const job = (widthMm: number, points: EngraveJob['paths'][number]['points'] = [[10, 10], [10, 30]]): EngraveJob => ({
  stock: { widthMm: 40, lengthMm: 40, thicknessMm: 3, material: 'aluminium' },
  title: ['fill test'],
  paths: [{ points, closed: false, widthMm, operation: 'marks', label: 'hour 12' }],
});

const O = { beamMm: 0.15, intervalMm: 0.15, chordToleranceMm: 0.005, holes: [], slots: [] };

const xs = (p: { points: readonly (readonly [number, number])[] }): number[] => p.points.map((q) => q[0]);

describe('laserFillPasses', () => {
  it('fills a 0.8 mm mark with three rings at 0.075, 0.225 and 0.375 mm inside its edge', async () => {
    const f = await laserFillPasses(job(0.8), O);
    expect(f.scored).toBe(0);
    expect(f.regions).toBe(1);
    const rings = f.passes.filter((p) => p.label.startsWith('fill ring'));
    expect(rings).toHaveLength(3);
    const halfWidths = rings.map((r) => (Math.max(...xs(r)) - Math.min(...xs(r))) / 2).sort((a, b) => b - a);
    for (const [k, d] of [0.075, 0.225, 0.375].entries()) expect(halfWidths[k]).toBeCloseTo(0.4 - d, 6);
    expect(f.filledAreaMm2).toBeCloseTo(0.8 * 20, 6);
    // 0.4 − 0.375 = 0.025 < b/2: the last ring reaches the middle, no core pass.
    expect(f.passes.some((p) => p.label.startsWith('fill core'))).toBe(false);
  });

  it('traces the strip a ring cannot reach (0.35 mm: one ring at 0.075 mm leaves 0.05 mm in the middle)', async () => {
    const f = await laserFillPasses(job(0.35), O);
    expect(f.passes.filter((p) => p.label.startsWith('fill ring'))).toHaveLength(1);
    const core = f.passes.filter((p) => p.label.startsWith('fill core'));
    expect(core).toHaveLength(1);
    expect(Math.max(...xs(core[0])) - Math.min(...xs(core[0]))).toBeCloseTo(0.05, 6);
  });

  it('scores a line no wider than the beam along its centre', async () => {
    const f = await laserFillPasses(job(0.15), O);
    expect(f.scored).toBe(1);
    expect(f.passes).toHaveLength(1);
    expect(f.passes[0].points).toEqual([[10, 10], [10, 30]]);
  });

  it('burns the crossing of two marks once (their union is one region)', async () => {
    const j: EngraveJob = { ...job(0.8), paths: [...job(0.8).paths, { ...job(0.8).paths[0], points: [[0.5, 20], [20, 20]], label: 'cross' }] };
    const f = await laserFillPasses(j, O);
    expect(f.regions).toBe(1);
    expect(f.filledAreaMm2).toBeCloseTo(0.8 * 20 + 0.8 * 19.5 - 0.8 * 0.8, 6);
  });

  it('refuses an interval wider than the beam', async () => {
    await expect(laserFillPasses(job(0.8), { ...O, intervalMm: 0.2 })).rejects.toThrow(/0 < intervalMm <= beamMm/);
  });
});
