import type { FastenerRow } from '@umbrafab/geometry';
import { roundTo } from '../process/roundTo.ts';

/**
 * The "Fasteners" section of an install.md (CommonMark): a heading, then one
 * table row per fastener (lengths to the whole mm, '–' where a length does
 * not apply), or "None listed." when there are none.
 */
export function fastenerSectionMd(rows: readonly FastenerRow[]): string[] {
  const out = ['## Fasteners', ''];
  if (rows.length === 0) return [...out, 'None listed.', ''];
  out.push('| for | item | size | length (mm) | count | countersink |', '|---|---|---|---|---|---|');
  for (const f of rows) out.push(`| ${f.use} | ${f.item} | ${f.size} | ${f.lengthMm === null ? '–' : roundTo(f.lengthMm, 0).toFixed(0)} | ${f.count} | ${f.countersink} |`);
  out.push('');
  return out;
}
