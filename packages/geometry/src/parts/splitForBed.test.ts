import { describe, expect, it } from 'vitest';
import type { Mesh, Vec3 } from './mesh.ts';
import { meshVolumeMm3 } from './meshVolumeMm3.ts';
import { DOVETAIL_KEY, fitsBed, planBedCuts, splitForBed } from './splitForBed.ts';
import { validateMesh } from './validateMesh.ts';

/** An axis-aligned box as a closed, outward-wound mesh (12 triangles). */
function box(x: number, y: number, z: number): Mesh {
  const positions: Vec3[] = [[0, 0, 0], [x, 0, 0], [x, y, 0], [0, y, 0], [0, 0, z], [x, 0, z], [x, y, z], [0, y, z]];
  const quads = [[0, 3, 2, 1], [4, 5, 6, 7], [0, 1, 5, 4], [1, 2, 6, 5], [2, 3, 7, 6], [3, 0, 4, 7]];
  return { positions, triangles: quads.flatMap(([a, b, c, d]) => [[a, b, c], [a, c, d]] as const) };
}

const BED = { widthMm: 220, depthMm: 220, heightMm: 250 };

describe('fitsBed', () => {
  it('takes a part as it lies or turned a quarter turn, never taller than the bed', () => {
    expect(fitsBed(220, 100, 10, BED)).toBe(true);
    expect(fitsBed(221, 100, 10, BED)).toBe(false);
    expect(fitsBed(100, 250, 10, { widthMm: 250, depthMm: 120, heightMm: 100 })).toBe(true);
    expect(fitsBed(100, 100, 251, BED)).toBe(false);
  });
});

describe('planBedCuts', () => {
  it('needs no cut for a part that fits and one cut for a 300 mm box', () => {
    const b = (x: number) => ({ min: [0, 0, 0] as Vec3, max: [x, 100, 10] as Vec3 });
    const none = planBedCuts(b(200), BED, { x: [], y: [] });
    expect(none.ok && none.plan.xCutsMm.length === 0 && none.plan.yCutsMm.length === 0).toBe(true);
    const one = planBedCuts(b(300), BED, { x: [], y: [] });
    expect(one.ok).toBe(true);
    if (one.ok) {
      expect(one.plan.xCutsMm.length).toBe(1);
      expect(one.plan.yCutsMm.length).toBe(0);
    }
  });
  it('moves a cut out of a forbidden band', () => {
    const r = planBedCuts({ min: [0, 0, 0], max: [300, 100, 10] }, BED, { x: [[140, 160]], y: [] });
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.plan.xCutsMm[0] < 140 || r.plan.xCutsMm[0] > 160).toBe(true);
  });
  it('refuses a part taller than the bed, saying why', () => {
    const r = planBedCuts({ min: [0, 0, 0], max: [300, 100, 260] }, BED, { x: [], y: [] });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(/stands 260\.0 mm tall and the bed takes 250 mm/);
  });
});

describe('splitForBed', () => {
  it('cuts a 300 × 100 × 10 mm box into two pieces that fit, with Σ pieces + key gaps = whole', async () => {
    const mesh = box(300, 100, 10);
    const cuts = planBedCuts({ min: [0, 0, 0], max: [300, 100, 10] }, BED, { x: [], y: [] });
    if (!cuts.ok) throw new Error(cuts.reason);
    const c = 0.2;
    const s = await splitForBed(mesh, cuts.plan, c);
    expect(s.pieces.length).toBe(2);
    expect(s.keys).toBe(1);
    for (const p of s.pieces) {
      validateMesh(p.mesh);
      const [dx, dy, dz] = [0, 1, 2].map((k) => p.bounds.max[k] - p.bounds.min[k]);
      expect(fitsBed(dx, dy, dz, BED)).toBe(true);
      expect(p.volumeMm3).toBeCloseTo(meshVolumeMm3(p.mesh), 9);
    }
    const sum = s.pieces.reduce((t, p) => t + p.volumeMm3, 0);
    expect(Math.abs(sum + s.gapVolumeMm3 - 300 * 100 * 10)).toBeLessThan(1e-3 * 300 * 100 * 10 * 1e-3);
    // The gap is a band c wide along the key's flanks and tip inside the neighbour, over the
    // height: ≈ c · length · h to first order (common practice), corners add a little.
    const { rootHalfMm: r0, tipHalfMm: r1, depthMm: d } = DOVETAIL_KEY;
    const flank = Math.hypot(d, ((r1 - r0) * d) / (d + 1));
    const firstOrder = c * (2 * flank + 2 * r1) * 10;
    expect(s.gapVolumeMm3).toBeGreaterThan(0.9 * firstOrder);
    expect(s.gapVolumeMm3).toBeLessThan(1.1 * firstOrder);
    // The key piece is longer by the key depth on its cut side.
    const first = s.pieces.find((p) => p.cell[0] === 0)!;
    expect(first.bounds.max[0]).toBeCloseTo(cuts.plan.xCutsMm[0] + d, 5);
    console.log(`box split at x = ${cuts.plan.xCutsMm[0]} mm: pieces ${s.pieces.map((p) => p.volumeMm3.toFixed(1)).join(' + ')} + gap ${s.gapVolumeMm3.toFixed(2)} (first order ${firstOrder.toFixed(2)}) mm³`);
  });
});
