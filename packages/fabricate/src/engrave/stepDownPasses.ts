import { assertPositive } from '@umbrafab/geometry';

/**
 * Depths of the passes that reach `depthMm` in equal steps no deeper than
 * `stepDownMm`: n = ceil(depth / stepDown) passes at depth·k/n, k = 1…n, the
 * last one exactly `depthMm` (equal steps load the bit evenly; common practice).
 *
 * @returns increasing positive depths, mm; the last element === depthMm
 * @example stepDownPasses(0.25, 0.1) // [0.08333…, 0.16666…, 0.25]
 */
export function stepDownPasses(depthMm: number, stepDownMm: number): readonly number[] {
  assertPositive('depthMm', depthMm);
  assertPositive('stepDownMm', stepDownMm);
  // The 1e-9 keeps 0.3 / 0.1 = 3.0000000000000004 from becoming 4 passes.
  const n = Math.max(1, Math.ceil(depthMm / stepDownMm - 1e-9));
  return Array.from({ length: n }, (_, k) => (k === n - 1 ? depthMm : (depthMm * (k + 1)) / n));
}
