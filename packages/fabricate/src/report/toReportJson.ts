import { roundTo } from '../process/roundTo.ts';

/**
 * Serialise report.json: keys in insertion order, every number rounded to
 * `decimals` places (default 6) so the file is byte-stable, two-space indent,
 * trailing newline. The report's shape is the output contract of docs/design.md §6;
 * it is assembled by the caller from the layout and the writers' figures.
 */
export function toReportJson(report: unknown, decimals = 6): string {
  return JSON.stringify(roundDeep(report, decimals), null, 2) + '\n';
}

/**
 * Every number of a plain-data tree rounded to `decimals` places through
 * `roundTo` (keys in insertion order, undefined members left out); a
 * non-finite number is a bug, thrown naming the file (`file`) and what it
 * holds (`what`). Shared by report.json and check.json.
 */
export function roundDeep(v: unknown, decimals: number, file = 'report.json', what = 'report'): unknown {
  if (typeof v === 'number') {
    if (!Number.isFinite(v)) throw new Error(`${file}: a non-finite number (${v}) reached the ${what}`);
    return roundTo(v, decimals);
  }
  if (Array.isArray(v)) return v.map((x) => roundDeep(x, decimals, file, what));
  if (v && typeof v === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, x] of Object.entries(v)) if (x !== undefined) out[k] = roundDeep(x, decimals, file, what);
    return out;
  }
  return v;
}
