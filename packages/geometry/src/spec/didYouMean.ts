/**
 * Closest candidate to `word` by Levenshtein edit distance, or undefined when
 * nothing is within max(2, a third of the word's length).
 * Levenshtein, V. I. (1966), "Binary codes capable of correcting deletions,
 * insertions, and reversals", Soviet Physics Doklady 10(8) — the classic
 * dynamic-programming distance.
 */
export function didYouMean(word: string, candidates: readonly string[]): string | undefined {
  let best: string | undefined;
  let bestD = Infinity;
  const w = word.toLowerCase();
  for (const c of candidates) {
    const d = editDistance(w, c.toLowerCase());
    if (d < bestD) {
      bestD = d;
      best = c;
    }
  }
  return bestD <= Math.max(2, Math.floor(word.length / 3)) ? best : undefined;
}

/** Levenshtein distance between two strings (insert, delete, substitute cost 1). */
export function editDistance(a: string, b: string): number {
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const cur = [i];
    for (let j = 1; j <= b.length; j++) {
      cur[j] = Math.min(prev[j] + 1, cur[j - 1] + 1, prev[j - 1] + (a[i - 1] === b[j - 1] ? 0 : 1));
    }
    prev = cur;
  }
  return prev[b.length];
}
