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

function roundDeep(v: unknown, decimals: number): unknown {
  if (typeof v === 'number') {
    if (!Number.isFinite(v)) throw new Error(`report.json: a non-finite number (${v}) reached the report`);
    return roundTo(v, decimals);
  }
  if (Array.isArray(v)) return v.map((x) => roundDeep(x, decimals));
  if (v && typeof v === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, x] of Object.entries(v)) if (x !== undefined) out[k] = roundDeep(x, decimals);
    return out;
  }
  return v;
}
