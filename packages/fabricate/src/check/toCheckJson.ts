import type { CheckResult } from '@umbrafab/geometry';
import { roundTo } from '../process/roundTo.ts';

/** Decimal places per quantity in check.json (mm to 0.1 µm, seconds to 1 ms, minutes to 0.001 min). */
const DECIMALS = 6;

/**
 * check.json: the whole `CheckResult` of `umbrafab check` (plain data from
 * geometry's `checkDial`), with every number rounded through `roundTo` to 6
 * places for a byte-stable file, keys in the result's order, two-space indent
 * and a trailing newline. Per-day errors (`marks[].errorsMm`) are null on days
 * the mark is unlit or not reached by the style's shadow.
 *
 * @example toCheckJson(checkDial(layout))
 */
export function toCheckJson(result: CheckResult): string {
  return JSON.stringify(roundDeep(result), null, 2) + '\n';
}

function roundDeep(v: unknown): unknown {
  if (typeof v === 'number') {
    if (!Number.isFinite(v)) throw new Error(`check.json: a non-finite number (${v}) reached the result`);
    return roundTo(v, DECIMALS);
  }
  if (Array.isArray(v)) return v.map(roundDeep);
  if (v && typeof v === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, x] of Object.entries(v)) if (x !== undefined) out[k] = roundDeep(x);
    return out;
  }
  return v;
}
