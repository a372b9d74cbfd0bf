import { describe, expect, it } from 'vitest';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import type { Vec2 } from './engraveInput.ts';
import { distanceMm } from './polylineLength.ts';
import { endsOf, entryOf, exitOf, orderPaths, rapidTravelMm, travelLowerBoundMm, type OrderablePath, type PathVisit } from './orderPaths.ts';
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

/**
 * Test reference for orderPaths.ts: the same rules written the plain way
 * (every nearest-neighbour step scans every path left; every 2-opt candidate
 * is costed in full; the bound's weights take a root per end pair), as
 * orderPaths was before its searches were made faster. The tests hold the
 * fast version to the same visits and the same figures, bit for bit.
 */

function referenceLowerBoundMm(paths: readonly OrderablePath[], start: Vec2 = [0, 0]): number {
  const n = paths.length;
  if (n === 0) return 0;
  const ends: (readonly Vec2[])[] = [[start], ...paths.map(endsOf)];
  // Node-to-node weights (the shortest distance between any of their ends),
  // computed once into a flat matrix: both bounds read each weight often.
  const W = new Float64Array((n + 1) * (n + 1));
  for (let i = 0; i <= n; i += 1) {
    for (let j = i + 1; j <= n; j += 1) {
      let best = Infinity;
      for (const a of ends[i]) for (const b of ends[j]) best = Math.min(best, Math.sqrt((a[0] - b[0]) ** 2 + (a[1] - b[1]) ** 2));
      W[i * (n + 1) + j] = best;
      W[j * (n + 1) + i] = best;
    }
  }
  const w = (i: number, j: number): number => W[i * (n + 1) + j];
  // Prim's algorithm over nodes 0 (start) … n.
  const inTree = new Array<boolean>(n + 1).fill(false);
  const key = new Array<number>(n + 1).fill(Infinity);
  key[0] = 0;
  let mst = 0;
  for (let step = 0; step <= n; step += 1) {
    let u = -1;
    for (let v = 0; v <= n; v += 1) if (!inTree[v] && (u < 0 || key[v] < key[u])) u = v;
    inTree[u] = true;
    mst += key[u];
    for (let v = 0; v <= n; v += 1) if (!inTree[v]) key[v] = Math.min(key[v], w(u, v));
  }
  let incoming = 0;
  for (let i = 1; i <= n; i += 1) {
    let best = Infinity;
    for (let j = 0; j <= n; j += 1) if (j !== i) best = Math.min(best, w(i, j));
    incoming += best;
  }
  return Math.max(mst, incoming);
}

function referenceNearestNeighbour(paths: readonly OrderablePath[], start: Vec2): PathVisit[] {
  const left = new Set(paths.map((_, i) => i));
  const visits: PathVisit[] = [];
  let at = start;
  while (left.size > 0) {
    let best: PathVisit = { index: -1, reversed: false };
    let bestD = Infinity;
    for (const i of left) {
      for (const reversed of paths[i].closed ? [false] : [false, true]) {
        const d = distanceMm(at, entryOf(paths[i], reversed));
        if (d < bestD) [bestD, best] = [d, { index: i, reversed }];
      }
    }
    visits.push(best);
    left.delete(best.index);
    at = exitOf(paths[best.index], best.reversed);
  }
  return visits;
}

function referenceImprove(paths: readonly OrderablePath[], initial: readonly PathVisit[], start: Vec2, maxRounds: number): PathVisit[] {
  const seq = [...initial];
  const n = seq.length;
  const en = (k: number): Vec2 => entryOf(paths[seq[k].index], seq[k].reversed);
  const ex = (k: number): Vec2 => exitOf(paths[seq[k].index], seq[k].reversed);
  const before = (i: number): Vec2 => (i === 0 ? start : ex(i - 1));
  const dist = (a: Vec2, b: Vec2): number => Math.sqrt((a[0] - b[0]) * (a[0] - b[0]) + (a[1] - b[1]) * (a[1] - b[1]));
  for (let round = 0; round < maxRounds; round += 1) {
    let improved = false;
    seq.forEach((v, i) => {
      const p = paths[v.index];
      if (p.closed) return;
      const next = i + 1 < n ? en(i + 1) : undefined;
      const was = dist(before(i), en(i)) + (next ? dist(ex(i), next) : 0);
      const now = dist(before(i), entryOf(p, !v.reversed)) + (next ? dist(exitOf(p, !v.reversed), next) : 0);
      if (now < was - 1e-9) [seq[i], improved] = [{ index: v.index, reversed: !v.reversed }, true];
    });
    for (let i = 0; i + 1 < n; i += 1) {
      for (let k = i + 1; k < n; k += 1) {
        const next = k + 1 < n ? en(k + 1) : undefined;
        const was = dist(before(i), en(i)) + (next ? dist(ex(k), next) : 0);
        const now = dist(before(i), ex(k)) + (next ? dist(en(i), next) : 0);
        if (!(now < was - 1e-9)) continue;
        const turned = seq.slice(i, k + 1).reverse().map((v) => (paths[v.index].closed || paths[v.index].endsAtStart ? v : { index: v.index, reversed: !v.reversed }));
        seq.splice(i, turned.length, ...turned);
        improved = true;
      }
    }
    if (!improved) break;
  }
  return seq;
}

/** Segments in clusters, with repeated end points (ties) and some closed loops: the cases a grid search can get wrong. */
function clusteredPaths(n: number, seed: number): OrderablePath[] {
  const r = lcg(seed);
  const centres: Vec2[] = Array.from({ length: 5 }, () => [r() * 300 - 50, r() * 200 - 30]);
  const snap = (v: number): number => Math.round(v * 2) / 2;
  return Array.from({ length: n }, (_, i): OrderablePath => {
    const c = centres[i % centres.length];
    const a: Vec2 = [snap(c[0] + (r() - 0.5) * 20), snap(c[1] + (r() - 0.5) * 20)];
    const b: Vec2 = [snap(a[0] + (r() - 0.5) * 8), snap(a[1] + (r() - 0.5) * 8)];
    if (i % 5 === 0) return { points: [a, b, [b[0], a[1]]], closed: true };
    return { points: [a, b], closed: false, endsAtStart: i % 7 === 0 };
  });
}

describe('orderPaths', () => {
  it('gives the visits and figures of the plain full-scan search, bit for bit', () => {
    const cases: [string, OrderablePath[], Vec2][] = [
      ['random 300', randomSegments(300, 11, 4), [0, 0]],
      ['random 90, start inside', randomSegments(90, 5), [100, 70]],
      ['clustered 400 with ties', clusteredPaths(400, 9), [0, 0]],
      ['clustered 250, start far outside', clusteredPaths(250, 4), [-900, 1200]],
      ['sample plate', [...SAMPLE_PLATE_JOB.paths], [0, 0]],
    ];
    for (const [name, paths, start] of cases) {
      const expected = referenceImprove(paths, referenceNearestNeighbour(paths, start), start, 100);
      const r = orderPaths(paths, { start });
      expect(r.visits, name).toEqual(expected);
      expect(r.rapidTravelMm.ordered, name).toBe(rapidTravelMm(paths, expected, start));
      expect(r.rapidTravelMm.lowerBound, name).toBe(referenceLowerBoundMm(paths, start));
    }
  });

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
