import type { CheckSummary, CurveCheck } from '@umbrafab/geometry';
import { roundTo } from '../process/roundTo.ts';

/** Width of both checks' plots, SVG user units (px). */
export const CHECK_SVG_WIDTH = 900;

/** One plot record before serialisation. */
export type SvgRecord =
  | { readonly kind: 'line'; readonly x1: number; readonly y1: number; readonly x2: number; readonly y2: number; readonly cls: string }
  | { readonly kind: 'path'; readonly d: string; readonly cls: string; readonly title: string }
  | { readonly kind: 'rect'; readonly x: number; readonly y: number; readonly w: number; readonly h: number; readonly cls: string; readonly title: string }
  | { readonly kind: 'text'; readonly x: number; readonly y: number; readonly text: string; readonly cls: string; readonly anchor: 'start' | 'middle' | 'end' };

/** Numbers in the plot: 2 decimals. */
export const r2 = (v: number): number => roundTo(v, 2);

/** Millimetres with enough digits for the scale (µm-level errors still readable). */
export function formatMm(v: number): string {
  const a = Math.abs(v);
  if (a !== 0 && a < 1e-4) return `${v < 0 ? '−' : ''}${a.toExponential(1)} mm`;
  const d = a === 0 ? 0 : a >= 0.1 ? 3 : 4;
  return `${v < 0 ? '−' : ''}${a.toFixed(d)} mm`;
}

function esc(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

const STYLE = '.axis{stroke:#444;stroke-width:1}.tol{stroke:#c60;stroke-width:1;stroke-dasharray:6 4}.am,.pm,.noon{fill:none;stroke-width:1}.am{stroke:#2860c0}.pm{stroke:#c02828}.noon{stroke:#777}text{font-family:sans-serif;fill:#222}.small{font-size:11px}.title{font-size:14px}';
/** The rows' bars, only in a plot that has them (a plot without keeps its bytes). */
const ROW_STYLE = '.curve,.line{fill:#2860c0}.fail{fill:#c02828}.heading{font-size:12px;font-weight:bold}';

/** The SVG 1.1 text of a plot's records, numbers through `r2`, no timestamps (byte-stable). */
export function serialiseSvg(records: readonly SvgRecord[], height: number): string {
  const W = CHECK_SVG_WIDTH;
  const r = r2;
  const out: string[] = [
    `<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="${W}" height="${height}" viewBox="0 0 ${W} ${height}">`,
    `<style>${STYLE}${records.some((k) => k.kind === 'rect') ? ROW_STYLE : ''}</style>`,
    `<rect x="0" y="0" width="${W}" height="${height}" fill="#fff"/>`,
  ];
  for (const rec of records) {
    switch (rec.kind) {
      case 'line':
        out.push(`<line class="${rec.cls}" x1="${r(rec.x1)}" y1="${r(rec.y1)}" x2="${r(rec.x2)}" y2="${r(rec.y2)}"/>`);
        break;
      case 'path':
        out.push(`<path class="${rec.cls}" d="${rec.d}"><title>${esc(rec.title)}</title></path>`);
        break;
      case 'rect':
        out.push(`<rect class="${rec.cls}" x="${r(rec.x)}" y="${r(rec.y)}" width="${r(rec.w)}" height="${r(rec.h)}"><title>${esc(rec.title)}</title></rect>`);
        break;
      case 'text':
        out.push(`<text class="${rec.cls}" x="${r(rec.x)}" y="${r(rec.y)}" text-anchor="${rec.anchor}">${esc(rec.text)}</text>`);
        break;
      default: {
        const never: never = rec;
        throw new Error(`unknown SVG record ${JSON.stringify(never)}`);
      }
    }
  }
  out.push('</svg>');
  return out.join('\n') + '\n';
}

/** One row of a worst-error panel: a drawn line or curve and its worst distance from the shadow over the year. */
export interface WorstRow {
  readonly label: string;
  /** worst distance, mm (signed for a line: the bar shows its size, the text its sign) */
  readonly worstMm: number;
  readonly date: string | null;
  readonly pass: boolean;
}

/** Row pitch and bar height of a worst-error panel, px. */
const ROW = 16;
const BAR = 10;
/** Where the bars start (the labels end-aligned before it) and end, px. */
const BAR_X0 = 220;
const BAR_X1 = CHECK_SVG_WIDTH - 190;

/**
 * A worst-error panel from `top` (px): a heading, then one labelled row per
 * line or curve with a bar of its worst |distance| (classed `cls`, and
 * `fail` beyond the tolerance) on a scale from 0 to 1.5 × the tolerance
 * or 1.1 × the largest, the tolerance as a dashed line across the rows,
 * the worst value and its day at the right. Returns the records and the
 * height the panel takes.
 */
export function worstRowsPanel(heading: string, cls: 'curve' | 'line', rows: readonly WorstRow[], toleranceMm: number, top: number): { readonly records: SvgRecord[]; readonly height: number } {
  const peak = Math.max(toleranceMm * 1.5, ...rows.map((w) => Math.abs(w.worstMm) * 1.1));
  const px = (mm: number) => BAR_X0 + ((BAR_X1 - BAR_X0) * mm) / peak;
  const y0 = top + 42;
  const y1 = y0 + rows.length * ROW;
  const records: SvgRecord[] = [
    { kind: 'text', x: 16, y: top + 14, text: heading, cls: 'heading', anchor: 'start' },
    { kind: 'line', x1: BAR_X0, y1: y0 - 4, x2: BAR_X0, y2: y1, cls: 'axis' },
    { kind: 'line', x1: px(toleranceMm), y1: y0 - 4, x2: px(toleranceMm), y2: y1, cls: 'tol' },
    { kind: 'text', x: px(toleranceMm), y: y0 - 8, text: `${toleranceMm} mm tolerance`, cls: 'small', anchor: 'middle' },
  ];
  rows.forEach((w, i) => {
    const y = y0 + i * ROW;
    const worst = `${formatMm(w.worstMm)}${w.date ? ` on ${w.date}` : ''}`;
    records.push({ kind: 'text', x: BAR_X0 - 6, y: y + BAR - 1, text: w.label, cls: 'small', anchor: 'end' });
    records.push({ kind: 'rect', x: BAR_X0, y, w: px(Math.abs(w.worstMm)) - BAR_X0, h: BAR, cls: w.pass ? cls : `${cls} fail`, title: `${w.label}: worst ${worst}${w.pass ? '' : ', beyond the tolerance'}` });
    records.push({ kind: 'text', x: BAR_X1 + 8, y: y + BAR - 1, text: `${worst}${w.pass ? '' : ' FAIL'}`, cls: 'small', anchor: 'start' });
  });
  return { records, height: y1 - top + 16 };
}

/** The curves of a check as worst-error rows. */
export function curveRows(curves: readonly CurveCheck[]): WorstRow[] {
  return curves.map((c) => ({ label: c.label, worstMm: c.worstMm, date: c.worstDate, pass: c.pass }));
}

/** The date-line and mean-time-curve panel of either check's plot from `top`, or nothing without curves. */
export function curvePanel(r: CheckSummary, top: number): { readonly records: SvgRecord[]; readonly height: number } {
  if (r.curves.length === 0) return { records: [], height: 0 };
  return worstRowsPanel(`Date lines and mean-time curves: worst distance of the nodus shadow from the drawn curve over ${r.year}`, 'curve', curveRows(r.curves), r.curveToleranceMm, top);
}
