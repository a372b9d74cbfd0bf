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

/** Where the tool enters a path traced in the given direction. */
export function entryOf(p: OrderablePath, reversed: boolean): Vec2 {
  if (p.closed) return p.points[0];
  return reversed ? p.points[p.points.length - 1] : p.points[0];
}

/** Where the tool leaves a path traced in the given direction. */
export function exitOf(p: OrderablePath, reversed: boolean): Vec2 {
  if (p.closed || p.endsAtStart) return entryOf(p, reversed);
  return reversed ? p.points[0] : p.points[p.points.length - 1];
}

/** End points a path can be entered or left at. */
export function endsOf(p: OrderablePath): readonly Vec2[] {
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

/**
 * The larger of the spanning-tree and incoming-rapid bounds (see the file
 * comment), in one pass of Prim's algorithm over the complete graph of nodes
 * {start, path 1, …, path n}, with no weight matrix: when a node joins the
 * tree, its weight to every node outside is computed once and lowers that
 * node's key (the tree) and both nodes' least weight (the incoming rapids).
 * Every pair is met exactly once (when the first of the two joins), so each
 * node's least weight is its least over all others, as a full scan gives;
 * O(n²) time, O(n) memory.
 */
export function travelLowerBoundMm(paths: readonly OrderablePath[], start: Vec2 = [0, 0]): number {
  const n = paths.length;
  if (n === 0) return 0;
  const ends: (readonly Vec2[])[] = [[start], ...paths.map(endsOf)];
  const m = n + 1;
  const ax = new Float64Array(m);
  const ay = new Float64Array(m);
  const bx = new Float64Array(m);
  const by = new Float64Array(m);
  const two = new Uint8Array(m);
  ends.forEach((e, i) => {
    ax[i] = e[0][0];
    ay[i] = e[0][1];
    two[i] = e.length > 1 ? 1 : 0;
    bx[i] = e[e.length - 1][0];
    by[i] = e[e.length - 1][1];
  });
  /** The least distance between any end of node i and any end of node j (the same for (j, i): the same four squares). */
  const weight = (i: number, j: number): number => {
    // The root of the least squared sum is the least root (the root is monotone): one root per pair.
    let best = (ax[i] - ax[j]) ** 2 + (ay[i] - ay[j]) ** 2;
    if (two[j]) best = Math.min(best, (ax[i] - bx[j]) ** 2 + (ay[i] - by[j]) ** 2);
    if (two[i]) {
      best = Math.min(best, (bx[i] - ax[j]) ** 2 + (by[i] - ay[j]) ** 2);
      if (two[j]) best = Math.min(best, (bx[i] - bx[j]) ** 2 + (by[i] - by[j]) ** 2);
    }
    return Math.sqrt(best);
  };
  const inTree = new Uint8Array(m);
  const key = new Float64Array(m).fill(Infinity);
  const least = new Float64Array(m).fill(Infinity);
  key[0] = 0;
  let mst = 0;
  for (let step = 0; step < m; step += 1) {
    let u = -1;
    for (let v = 0; v < m; v += 1) if (!inTree[v] && (u < 0 || key[v] < key[u])) u = v;
    inTree[u] = 1;
    mst += key[u];
    for (let v = 0; v < m; v += 1) {
      if (inTree[v]) continue;
      const w = weight(u, v);
      if (w < key[v]) key[v] = w;
      if (w < least[v]) least[v] = w;
      if (w < least[u]) least[u] = w;
    }
  }
  let incoming = 0;
  for (let i = 1; i <= n; i += 1) incoming += least[i];
  return Math.max(mst, incoming);
}

/** Below this many paths left, the nearest-neighbour step scans them all. */
const NN_SCAN_BELOW = 24;

/**
 * Nearest neighbour from `start`: each step takes the entry nearest the
 * tool's position, ties to the lower index, then the forward direction.
 * The entries sit in a uniform grid (about one per cell), searched ring by
 * ring outwards from the tool until no nearer cell can hold a nearer entry,
 * so a step reads a few cells instead of every path; distances are the same
 * `distanceMm` and the tie rule the same, so the order is the one a full
 * scan gives.
 */
function nearestNeighbour(paths: readonly OrderablePath[], start: Vec2): PathVisit[] {
  const n = paths.length;
  // Candidates: (path, direction) with their entry points; index 2i forward, 2i + 1 reversed.
  const cx = new Float64Array(2 * n);
  const cy = new Float64Array(2 * n);
  let x0 = Infinity;
  let y0 = Infinity;
  let x1 = -Infinity;
  let y1 = -Infinity;
  for (let i = 0; i < n; i += 1) {
    for (let r = 0; r < 2; r += 1) {
      const e = entryOf(paths[i], r === 1);
      cx[2 * i + r] = e[0];
      cy[2 * i + r] = e[1];
      x0 = Math.min(x0, e[0]);
      y0 = Math.min(y0, e[1]);
      x1 = Math.max(x1, e[0]);
      y1 = Math.max(y1, e[1]);
    }
  }
  const side = Math.max(1, Math.ceil(Math.sqrt(n)));
  const cell = Math.max((x1 - x0) / side, (y1 - y0) / side, 1e-9);
  const nx = Math.max(1, Math.floor((x1 - x0) / cell) + 1);
  const ny = Math.max(1, Math.floor((y1 - y0) / cell) + 1);
  const cellX = (x: number): number => Math.min(nx - 1, Math.max(0, Math.floor((x - x0) / cell)));
  const cellY = (y: number): number => Math.min(ny - 1, Math.max(0, Math.floor((y - y0) / cell)));
  // Each cell's candidates, kept in ascending candidate order (so ties resolve as in a full scan).
  const cells: number[][] = Array.from({ length: nx * ny }, () => []);
  for (let c = 0; c < 2 * n; c += 1) {
    if (c % 2 === 1 && paths[(c - 1) / 2].closed) continue;
    cells[cellY(cy[c]) * nx + cellX(cx[c])].push(c);
  }
  const done = new Uint8Array(n);
  let remaining = n;
  const visits: PathVisit[] = [];
  let at = start;
  while (remaining > 0) {
    let best = -1;
    let bestD = Infinity;
    const consider = (c: number): void => {
      const d = distanceMm(at, [cx[c], cy[c]]);
      if (d < bestD || (d === bestD && c < best)) {
        bestD = d;
        best = c;
      }
    };
    if (remaining < NN_SCAN_BELOW) {
      for (let i = 0; i < n; i += 1) {
        if (done[i]) continue;
        consider(2 * i);
        if (!paths[i].closed) consider(2 * i + 1);
      }
    } else {
      // Rings are counted from the tool's cell (clamped into the grid when the tool stands outside it). A cell
      // in ring r lies at least (r - 1) cells from the tool along x or y, and every cell at least `outside`.
      const ax = cellX(at[0]);
      const ay = cellY(at[1]);
      const outside = Math.max(x0 - at[0], at[0] - (x0 + nx * cell), y0 - at[1], at[1] - (y0 + ny * cell), 0);
      const rings = Math.max(ax, nx - 1 - ax, ay, ny - 1 - ay);
      for (let r = 0; r <= rings; r += 1) {
        // Stop once ring r cannot hold an entry as near as the best found (with a margin for rounding).
        if (r >= 1 && Math.max((r - 1) * cell, outside) > bestD * (1 + 1e-9) + 1e-9) break;
        for (let gy = ay - r; gy <= ay + r; gy += 1) {
          if (gy < 0 || gy >= ny) continue;
          const edge = gy === ay - r || gy === ay + r;
          for (let gx = ax - r; gx <= ax + r; gx += edge ? 1 : 2 * r) {
            if (gx >= 0 && gx < nx) for (const c of cells[gy * nx + gx]) if (!done[c >> 1]) consider(c);
            if (r === 0) break;
          }
        }
      }
    }
    const index = best >> 1;
    const reversed = (best & 1) === 1;
    visits.push({ index, reversed });
    done[index] = 1;
    remaining -= 1;
    at = exitOf(paths[index], reversed);
  }
  return visits;
}

/** The sequence's entry and exit points by position, and the squared rapid from each exit to the next entry. */
interface RunEnds {
  readonly enX: Float64Array;
  readonly enY: Float64Array;
  readonly exX: Float64Array;
  readonly exY: Float64Array;
  readonly sqLink: Float64Array;
}

/**
 * The first k ≥ kFrom at which reversing the run i..k shortens the travel by
 * more than `eps`, or -1 (the 2-opt scan of `improve`; B = (bx, by) is where
 * the tool stands before position i). A small function of its own, so that
 * V8 optimises this hot loop early and the moves never deoptimise it.
 */
function firstShorterRun(e: RunEnds, i: number, kFrom: number, bx: number, by: number, eps: number): number {
  const { enX, enY, exX, exY, sqLink } = e;
  const n = enX.length;
  const ix = enX[i];
  const iy = enY[i];
  const sqIn = (bx - ix) * (bx - ix) + (by - iy) * (by - iy);
  for (let k = kFrom; k < n; k += 1) {
    const hasNext = k + 1 < n;
    const ax = bx - exX[k];
    const ay = by - exY[k];
    const sqA = ax * ax + ay * ay;
    let sqC = 0;
    if (hasNext) {
      const cx = ix - enX[k + 1];
      const cy = iy - enY[k + 1];
      sqC = cx * cx + cy * cy;
    }
    // Neither new rapid shorter than the one it replaces: no gain (exact on the squared sums, as the root is monotone).
    if (sqA >= sqIn && (!hasNext || sqC >= sqLink[k])) continue;
    const oldCost = Math.sqrt(sqIn) + (hasNext ? Math.sqrt(sqLink[k]) : 0);
    const newCost = Math.sqrt(sqA) + (hasNext ? Math.sqrt(sqC) : 0);
    if (newCost < oldCost - eps) return k;
  }
  return -1;
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
    // A move replaces the rapids B→entry(i) and exit(k)→entry(k+1) with
    // B→exit(k) and entry(i)→entry(k+1); it can only shorten the travel if one
    // of the new rapids is shorter than the one it replaces. The test is made
    // first on the squared sums the distances are the roots of (the root is
    // monotone, so it gives the same answer), and only a candidate that passes
    // it is costed exactly as before: the same moves in the same order.
    const sqLink = new Float64Array(n); // squared rapid from position k's exit to k + 1's entry
    const setLink = (k: number): void => {
      if (k < 0 || k + 1 >= n) return;
      const dx = exX[k] - enX[k + 1];
      const dy = exY[k] - enY[k + 1];
      sqLink[k] = dx * dx + dy * dy;
    };
    for (let k = 0; k + 1 < n; k += 1) setLink(k);
    const ends: RunEnds = { enX, enY, exX, exY, sqLink };
    for (let i = 0; i < n - 1; i += 1) {
      const bx = i === 0 ? start[0] : exX[i - 1];
      const by = i === 0 ? start[1] : exY[i - 1];
      for (let k = firstShorterRun(ends, i, i + 1, bx, by, EPS); k >= 0; k = firstShorterRun(ends, i, k + 1, bx, by, EPS)) {
        const run = seq.slice(i, k + 1).reverse().map((v): PathVisit => {
          const p = paths[v.index];
          const turns = !p.closed && !p.endsAtStart;
          return turns ? { index: v.index, reversed: !v.reversed } : v;
        });
        seq.splice(i, run.length, ...run);
        for (let j = i; j <= k; j += 1) refresh(j);
        for (let j = i - 1; j <= k; j += 1) setLink(j);
        improved = true;
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
