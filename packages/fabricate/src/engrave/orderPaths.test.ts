import { describe, expect, it } from 'vitest';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import type { Vec2 } from './engraveInput.ts';
import { orderPaths, rapidTravelMm, travelLowerBoundMm, type OrderablePath, type PathVisit } from './orderPaths.ts';
import { SAMPLE_PLATE_JOB } from './sampleEngraveJobs.ts';

/** Deterministic pseudo-random numbers (Park–Miller minimal standard LCG). */
function lcg(seed: number): () => number {
  let x = seed;
  return () => {
    x = (x * 48271) % 2147483647;
    return x / 2147483647;
  };
}

function randomSegments(n: number, seed: number, endsAtStartEvery = 0): OrderablePath[] {
  const r = lcg(seed);
  return Array.from({ length: n }, (_, i): OrderablePath => {
    const a: Vec2 = [r() * 200, r() * 150];
    const b: Vec2 = [a[0] + (r() - 0.5) * 40, a[1] + (r() - 0.5) * 40];
    return { points: [a, b], closed: false, endsAtStart: endsAtStartEvery > 0 && i % endsAtStartEvery === 0 };
  });
}

/** Exact optimum by trying every order and direction (small n only). */
function bruteForce(paths: readonly OrderablePath[]): number {
  let best = Infinity;
  const n = paths.length;
  const permute = (prefix: number[], left: number[]): void => {
    if (left.length === 0) {
      for (let mask = 0; mask < 1 << n; mask += 1) {
        const visits: PathVisit[] = prefix.map((index, k) => ({ index, reversed: (mask >> k) % 2 === 1 }));
        best = Math.min(best, rapidTravelMm(paths, visits));
      }
      return;
    }
    left.forEach((v, i) => permute([...prefix, v], [...left.slice(0, i), ...left.slice(i + 1)]));
  };
  permute([], paths.map((_, i) => i));
  return best;
}

describe('orderPaths', () => {
  it('reverses an open path whose far end is nearer the start', () => {
    const r = orderPaths([{ points: [[10, 0], [0, 0]], closed: false }]);
    expect(r.visits).toEqual([{ index: 0, reversed: true }]);
    expect(r.paths[0].points).toEqual([[0, 0], [10, 0]]);
    expect(r.rapidTravelMm.ordered).toBe(0);
    expect(r.end).toEqual([10, 0]);
  });

  it('keeps a closed loop on its own start vertex', () => {
    const loop: OrderablePath = { points: [[10, 10], [20, 10], [20, 20]], closed: true };
    const r = orderPaths([loop]);
    expect(r.visits).toEqual([{ index: 0, reversed: false }]);
    expectClose(r.rapidTravelMm.ordered, Math.hypot(10, 10), 1e-12, 'travel', ' mm');
    expect(r.end).toEqual([10, 10]);
  });

  it('leaves an endsAtStart path where it entered it', () => {
    const r = orderPaths([{ points: [[0, 0], [10, 0]], closed: false, endsAtStart: true }, { points: [[0, 5], [10, 5]], closed: false }]);
    expect(r.visits.map((v) => v.index)).toEqual([0, 1]);
    expect(r.rapidTravelMm.ordered).toBe(5);
  });

  it('keeps input order with optimize: false and does not modify the input', () => {
    const paths = randomSegments(10, 7);
    const copy = JSON.stringify(paths);
    const r = orderPaths(paths, { optimize: false });
    expect(r.visits).toEqual(paths.map((_, index) => ({ index, reversed: false })));
    expect(r.rapidTravelMm.ordered).toBe(r.rapidTravelMm.inputOrder);
    orderPaths(paths);
    expect(JSON.stringify(paths)).toBe(copy);
  });

  it('is deterministic', () => {
    const paths = randomSegments(60, 3, 3);
    expect(orderPaths(paths)).toEqual(orderPaths(paths));
  });

  it('sample plate: ordered ≤ input order and ≥ the lower bound', () => {
    const r = orderPaths(SAMPLE_PLATE_JOB.paths);
    const t = r.rapidTravelMm;
    console.log(
      `orderPaths sample plate: input ${t.inputOrder.toFixed(1)} mm, ordered ${t.ordered.toFixed(1)} mm, bound ${t.lowerBound.toFixed(1)} mm, ordered/bound ${(t.ordered / t.lowerBound).toFixed(3)}, ordered/input ${(t.ordered / t.inputOrder).toFixed(3)}`,
    );
    expect(t.ordered).toBeLessThanOrEqual(t.inputOrder);
    expect(t.ordered).toBeGreaterThanOrEqual(t.lowerBound);
  });

  it('random strokes: ordered ≤ input order and ≥ the lower bound', () => {
    for (const [n, seed] of [[40, 1], [150, 2], [400, 5]] as const) {
      const t = orderPaths(randomSegments(n, seed, 4)).rapidTravelMm;
      console.log(
        `orderPaths ${n} random strokes: input ${t.inputOrder.toFixed(1)} mm, ordered ${t.ordered.toFixed(1)} mm, bound ${t.lowerBound.toFixed(1)} mm, ordered/bound ${(t.ordered / t.lowerBound).toFixed(3)}, ordered/input ${(t.ordered / t.inputOrder).toFixed(3)}`,
      );
      expect(t.ordered).toBeLessThanOrEqual(t.inputOrder);
      expect(t.ordered).toBeGreaterThanOrEqual(t.lowerBound);
    }
  });

  it('the lower bound never exceeds the exact optimum (exhaustive search, n ≤ 6)', () => {
    let worst = 1;
    for (let seed = 1; seed <= 12; seed += 1) {
      const paths = randomSegments(3 + (seed % 4), seed * 17, 2);
      const optimum = bruteForce(paths);
      const bound = travelLowerBoundMm(paths);
      const ordered = orderPaths(paths).rapidTravelMm.ordered;
      expect(bound).toBeLessThanOrEqual(optimum + 1e-9);
      expect(ordered).toBeGreaterThanOrEqual(optimum - 1e-9);
      worst = Math.max(worst, ordered / optimum);
    }
    console.log(`orderPaths vs exhaustive optimum (12 cases, 3–6 strokes): worst ordered/optimum ${worst.toFixed(3)}`);
  });

  it('handles no paths', () => {
    const r = orderPaths([]);
    expect(r.visits).toEqual([]);
    expect(r.rapidTravelMm).toEqual({ inputOrder: 0, ordered: 0, lowerBound: 0 });
    expect(r.end).toEqual([0, 0]);
  });
});
