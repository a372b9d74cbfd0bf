import type { Vec2 } from './engraveInput.ts';
import { distanceMm } from './polylineLength.ts';

/**
 * Order engraving paths to shorten the rapid (tool-up) travel between them.
 *
 * Model: the tool starts at `start` (default the origin, the plate's
 * lower-left corner), enters each path at its entry point, leaves it at its
 * exit point and rapids to the next path's entry; travel after the last path
 * is not counted (the program ends where it stops).
 * - An open path may be traced in either direction (`reversed`). It exits at
 *   its far end, or back at its entry when `endsAtStart` (an open path cut in
 *   an even number of back-and-forth passes).
 * - A closed loop keeps its own start vertex: entry = exit = points[0]. This
 *   keeps every loop's seam where the layout put it and the search simple;
 *   loops are few on a dial plate.
 *
 * Method: nearest neighbour from `start` (ties to the lower index, then the
 * forward direction), then 2-opt on the visiting order, where reversing a run
 * of paths also reverses each open path in it whose entry and exit differ, and
 * single-path direction flips; repeated until no move shortens the travel by
 * more than 1e-9 mm or `maxRounds` rounds. Deterministic: no randomness, fixed
 * scan order.
 *
 * Lower bound (`rapidTravelMm.lowerBound`), the larger of two valid bounds:
 * - spanning tree: the rapids of any order form a path through the nodes
 *   {start, path 1, …, path n}, and each rapid from node i to node j is at least
 *   w(i, j), the least distance between any end point of i and any end point of
 *   j. A path through all nodes is a spanning tree, so its cost is at least the
 *   minimum spanning tree's under w.
 * - incoming rapids: every path is entered exactly once, from `start` or from
 *   another path's exit, so the travel is at least the sum over paths of the
 *   least distance from any of its possible entries to `start` or to any other
 *   path's possible exit.
 */

/** What the ordering needs to know about a path. */
export interface OrderablePath {
  readonly points: readonly Vec2[];
  readonly closed: boolean;
  /** true when the tool leaves an open path where it entered it (even pass count). Default false. */
  readonly endsAtStart?: boolean;
}

/** One visit: which input path, in which direction. */
export interface PathVisit {
  readonly index: number;
  readonly reversed: boolean;
}

export interface OrderPathsOptions {
  /** Where the tool starts, mm. Default [0, 0]. */
  readonly start?: Vec2;
  /** false: keep the input order and directions (figures still computed). Default true. */
  readonly optimize?: boolean;
  /** Cap on improvement rounds. Default 100. */
  readonly maxRounds?: number;
}

export interface OrderedPaths<T extends OrderablePath> {
  /** Visiting order. */
  readonly visits: readonly PathVisit[];
  /** The paths in visiting order, with `points` reversed where `reversed`. */
  readonly paths: readonly T[];
  /** XY rapid travel, mm: the input order, the result and a lower bound. */
  readonly rapidTravelMm: { readonly inputOrder: number; readonly ordered: number; readonly lowerBound: number };
  /** Where the tool is after the last path. */
  readonly end: Vec2;
}

function entryOf(p: OrderablePath, reversed: boolean): Vec2 {
  if (p.closed) return p.points[0];
  return reversed ? p.points[p.points.length - 1] : p.points[0];
}

function exitOf(p: OrderablePath, reversed: boolean): Vec2 {
  if (p.closed || p.endsAtStart) return entryOf(p, reversed);
  return reversed ? p.points[0] : p.points[p.points.length - 1];
}

/** End points a path can be entered or left at. */
function endsOf(p: OrderablePath): readonly Vec2[] {
  return p.closed ? [p.points[0]] : [p.points[0], p.points[p.points.length - 1]];
}

/** XY rapid travel of a visiting order from `start`, mm. */
export function rapidTravelMm(paths: readonly OrderablePath[], visits: readonly PathVisit[], start: Vec2 = [0, 0]): number {
  let at = start;
  let sum = 0;
  for (const v of visits) {
    const p = paths[v.index];
    sum += distanceMm(at, entryOf(p, v.reversed));
    at = exitOf(p, v.reversed);
  }
  return sum;
}

/** The larger of the spanning-tree and incoming-rapid bounds (see the file comment). */
export function travelLowerBoundMm(paths: readonly OrderablePath[], start: Vec2 = [0, 0]): number {
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

function nearestNeighbour(paths: readonly OrderablePath[], start: Vec2): PathVisit[] {
  const left = new Set(paths.map((_, i) => i));
  const visits: PathVisit[] = [];
  let at = start;
  while (left.size > 0) {
    let best: PathVisit | undefined;
    let bestD = Infinity;
    for (const i of left) {
      for (const reversed of paths[i].closed ? [false] : [false, true]) {
        const d = distanceMm(at, entryOf(paths[i], reversed));
        if (d < bestD) {
          bestD = d;
          best = { index: i, reversed };
        }
      }
    }
    const chosen = best as PathVisit;
    visits.push(chosen);
    left.delete(chosen.index);
    at = exitOf(paths[chosen.index], chosen.reversed);
  }
  return visits;
}

function improve(paths: readonly OrderablePath[], initial: readonly PathVisit[], start: Vec2, maxRounds: number): PathVisit[] {
  const seq = [...initial];
  const n = seq.length;
  const EPS = 1e-9;
  // Entry and exit points of each position in the sequence, kept in flat
  // arrays and refreshed only where a move changed them (the inner 2-opt loop
  // is O(n²) per round, so it must not allocate).
  const enX = new Float64Array(n);
  const enY = new Float64Array(n);
  const exX = new Float64Array(n);
  const exY = new Float64Array(n);
  const refresh = (k: number): void => {
    const p = paths[seq[k].index];
    const a = entryOf(p, seq[k].reversed);
    const b = exitOf(p, seq[k].reversed);
    enX[k] = a[0];
    enY[k] = a[1];
    exX[k] = b[0];
    exY[k] = b[1];
  };
  for (let k = 0; k < n; k += 1) refresh(k);
  const d = (ax: number, ay: number, bx: number, by: number): number => {
    // sqrt of the sum of squares: Math.hypot is several times slower, and this loop runs O(n²) per round.
    const dx = ax - bx;
    const dy = ay - by;
    return Math.sqrt(dx * dx + dy * dy);
  };
  for (let round = 0; round < maxRounds; round += 1) {
    let improved = false;
    // Single-path direction flips.
    for (let i = 0; i < n; i += 1) {
      const p = paths[seq[i].index];
      if (p.closed) continue;
      const bx = i === 0 ? start[0] : exX[i - 1];
      const by = i === 0 ? start[1] : exY[i - 1];
      const flipped = !seq[i].reversed;
      const fe = entryOf(p, flipped);
      const fx = exitOf(p, flipped);
      const hasNext = i + 1 < n;
      const oldCost = d(bx, by, enX[i], enY[i]) + (hasNext ? d(exX[i], exY[i], enX[i + 1], enY[i + 1]) : 0);
      const newCost = d(bx, by, fe[0], fe[1]) + (hasNext ? d(fx[0], fx[1], enX[i + 1], enY[i + 1]) : 0);
      if (newCost < oldCost - EPS) {
        seq[i] = { index: seq[i].index, reversed: flipped };
        refresh(i);
        improved = true;
      }
    }
    // 2-opt: reverse the run i..k. Paths whose entry and exit differ flip
    // direction, the others keep it; either way the new run enters at exit(k)
    // and leaves at entry(i), and the rapids inside the run keep their lengths.
    for (let i = 0; i < n - 1; i += 1) {
      for (let k = i + 1; k < n; k += 1) {
        const bx = i === 0 ? start[0] : exX[i - 1];
        const by = i === 0 ? start[1] : exY[i - 1];
        const hasNext = k + 1 < n;
        const oldCost = d(bx, by, enX[i], enY[i]) + (hasNext ? d(exX[k], exY[k], enX[k + 1], enY[k + 1]) : 0);
        const newCost = d(bx, by, exX[k], exY[k]) + (hasNext ? d(enX[i], enY[i], enX[k + 1], enY[k + 1]) : 0);
        if (newCost < oldCost - EPS) {
          const run = seq.slice(i, k + 1).reverse().map((v): PathVisit => {
            const p = paths[v.index];
            const turns = !p.closed && !p.endsAtStart;
            return turns ? { index: v.index, reversed: !v.reversed } : v;
          });
          seq.splice(i, run.length, ...run);
          for (let j = i; j <= k; j += 1) refresh(j);
          improved = true;
        }
      }
    }
    if (!improved) break;
  }
  return seq;
}

/**
 * Order paths for short rapid travel (see the file comment for the model,
 * method and bound).
 *
 * @param paths the paths; not modified
 * @param options start (default [0, 0]), optimize (default true), maxRounds (default 100)
 * @example orderPaths([{ points: [[10, 0], [0, 0]], closed: false }]).visits // [{ index: 0, reversed: true }]
 */
export function orderPaths<T extends OrderablePath>(paths: readonly T[], options: OrderPathsOptions = {}): OrderedPaths<T> {
  const start = options.start ?? [0, 0];
  const maxRounds = options.maxRounds ?? 100;
  const inputVisits: PathVisit[] = paths.map((_, index) => ({ index, reversed: false }));
  const visits = options.optimize === false ? inputVisits : improve(paths, nearestNeighbour(paths, start), start, maxRounds);
  const ordered = visits.map((v): T => {
    const p = paths[v.index];
    return v.reversed ? { ...p, points: [...p.points].reverse() } : p;
  });
  const last = visits[visits.length - 1];
  return {
    visits,
    paths: ordered,
    rapidTravelMm: {
      inputOrder: rapidTravelMm(paths, inputVisits, start),
      ordered: rapidTravelMm(paths, visits, start),
      lowerBound: travelLowerBoundMm(paths, start),
    },
    end: last ? exitOf(paths[last.index], last.reversed) : start,
  };
}
