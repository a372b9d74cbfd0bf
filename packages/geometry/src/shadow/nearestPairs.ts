/** A candidate pairing of layout mark `i` with drawn line `j` at distance `d`, mm. */
export interface CandidatePair {
  readonly i: number;
  readonly j: number;
  readonly d: number;
}

/**
 * Each mark to one drawn line at most and each line to one mark, nearest
 * pairs first (ties by mark, then line index, so the result is stable): the
 * matching both plate checks use.
 * @returns the chosen pair of each matched mark, and the lines taken
 * @example nearestPairs([{ i: 0, j: 1, d: 0.2 }, { i: 0, j: 0, d: 0.1 }]).chosen.get(0)?.j // 0
 */
export function nearestPairs<P extends CandidatePair>(pairs: readonly P[]): { readonly chosen: ReadonlyMap<number, P>; readonly usedLines: ReadonlySet<number> } {
  const sorted = [...pairs].sort((p, q) => p.d - q.d || p.i - q.i || p.j - q.j);
  const chosen = new Map<number, P>();
  const usedLines = new Set<number>();
  for (const p of sorted) {
    if (chosen.has(p.i) || usedLines.has(p.j)) continue;
    chosen.set(p.i, p);
    usedLines.add(p.j);
  }
  return { chosen, usedLines };
}
