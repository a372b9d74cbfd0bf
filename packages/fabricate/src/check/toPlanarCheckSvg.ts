import type { PlanarCheckResult } from '@umbrafab/geometry';
import { curvePanel, formatMm, serialiseSvg, worstRowsPanel, type SvgRecord } from './checkSvgRecords.ts';

/**
 * check.svg of a horizontal, wall, meridian or equatorial face (both faces
 * of an equatorial plate engraved on both, one under the other): per face a
 * title with the verdict, then one labelled row per drawn hour line (a bar
 * of its worst distance from the style's shadow over the year against the
 * dashed tolerance, the signed value and the day), then, with a nodus, one
 * per date line and mean-time curve as in the polar plot (`curvePanel`).
 * SVG 1.1, numbers rounded to 2 decimals, no timestamps (byte-stable).
 *
 * @example toPlanarCheckSvg([checkPlanar(layoutPlanar(spec))])
 */
export function toPlanarCheckSvg(results: readonly PlanarCheckResult[]): string {
  const rec: SvgRecord[] = [];
  let top = 0;
  for (const r of results) {
    const w = r.worst;
    rec.push({ kind: 'text', x: 16, y: top + 24, text: `${r.pass ? 'PASS' : 'FAIL'}: ${r.faceType}${r.side ? ` ${r.side}` : ''} face over ${r.year}, ${r.marks.length} lines; worst ${w ? `${formatMm(w.errorMm)} at ${w.label} ${w.edge} on ${w.date}` : 'none'}`, cls: 'title', anchor: 'start' });
    top += 36;
    const lines = worstRowsPanel(`Hour lines: worst distance of the style's shadow from the drawn line over ${r.year}`, 'line', r.marks.map((m) => ({ label: `${m.label} ${m.edge}`, worstMm: m.errorMm.worst, date: m.worstDate, pass: m.daysOverTolerance === 0 })), r.toleranceMm, top);
    rec.push(...lines.records);
    top += lines.height;
    const curves = curvePanel(r, top);
    rec.push(...curves.records);
    top += curves.height;
  }
  return serialiseSvg(rec, top + 10);
}
