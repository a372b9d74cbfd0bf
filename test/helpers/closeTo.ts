import { expect } from 'vitest';

/**
 * Assert |actual - expected| <= tol, printing both values and the unit on failure.
 * @param unit a label for the message, e.g. 'mm', 's', 'arcsec'
 */
export function expectClose(actual: number, expected: number, tol: number, what = 'value', unit = ''): void {
  const diff = Math.abs(actual - expected);
  if (!(diff <= tol)) {
    expect.fail(`${what}: computed ${actual}${unit}, expected ${expected}${unit}, |diff| ${diff}${unit} > ${tol}${unit}`);
  }
}

/** Largest absolute difference of paired numbers, for reporting. */
export function maxAbsDiff(pairs: ReadonlyArray<readonly [number, number]>): number {
  return pairs.reduce((m, [a, b]) => Math.max(m, Math.abs(a - b)), 0);
}
