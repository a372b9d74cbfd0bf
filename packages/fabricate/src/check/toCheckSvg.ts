import { countMarks, type CheckResult } from '@umbrafab/geometry';
import { CHECK_SVG_WIDTH, curvePanel, formatMm, r2, serialiseSvg, type SvgRecord } from './checkSvgRecords.ts';

/** Plot box in SVG user units (px). */
const W = CHECK_SVG_WIDTH;
const H = 480;
const M = { left: 70, right: 160, top: 40, bottom: 50 } as const;
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/**
 * check.svg: the geometric error of every mark (shadow x − mark x, mm) over
 * the simulated year, one polyline per mark (morning marks blue, afternoon
 * red, the noon band grey), broken on days the mark is unlit or not reached;
 * dashed lines at ± the tolerance; months along the bottom. With a nodus,
 * below it the date lines and mean-time curves check.json `curves` lists,
 * one labelled row each: a bar of its worst distance from the nodus shadow
 * against the dashed curve tolerance, the value and the day (`curvePanel`,
 * shared with the planar plot). SVG 1.1, numbers rounded to 2 decimals
 * through `roundTo`, no timestamps (byte-stable).
 *
 * @example toCheckSvg(checkDial(layout))
 */
export function toCheckSvg(result: CheckResult): string {
  const days = result.days;
  const n = Math.max(1, days.length - 1);
  let peak = result.toleranceMm * 1.5;
  for (const m of result.marks) for (const e of m.errorsMm) if (e !== null) peak = Math.max(peak, Math.abs(e) * 1.1);
  const px = (i: number) => M.left + ((W - M.left - M.right) * i) / n;
  const py = (e: number) => M.top + ((H - M.top - M.bottom) * (peak - e)) / (2 * peak);
  const r = r2;
  const rec: SvgRecord[] = [];

  // Axes, zero line, tolerance band.
  rec.push({ kind: 'line', x1: M.left, y1: M.top, x2: M.left, y2: H - M.bottom, cls: 'axis' });
  rec.push({ kind: 'line', x1: M.left, y1: py(0), x2: W - M.right, y2: py(0), cls: 'axis' });
  for (const t of [result.toleranceMm, -result.toleranceMm]) {
    rec.push({ kind: 'line', x1: M.left, y1: py(t), x2: W - M.right, y2: py(t), cls: 'tol' });
    rec.push({ kind: 'text', x: W - M.right + 4, y: py(t) + 4, text: `${t > 0 ? '+' : '−'}${result.toleranceMm} mm tolerance`, cls: 'small', anchor: 'start' });
  }
  for (const e of [peak, peak / 2, -peak / 2, -peak]) {
    rec.push({ kind: 'text', x: M.left - 6, y: py(e) + 4, text: formatMm(e).replace(' mm', ''), cls: 'small', anchor: 'end' });
  }
  days.forEach((d, i) => {
    if (d.date.endsWith('-01') || (i === 0 && result.everyDays > 1)) {
      const month = Number(d.date.slice(5, 7));
      rec.push({ kind: 'line', x1: px(i), y1: H - M.bottom, x2: px(i), y2: H - M.bottom + 5, cls: 'axis' });
      rec.push({ kind: 'text', x: px(i) + 4, y: H - M.bottom + 18, text: MONTHS[month - 1], cls: 'small', anchor: 'start' });
    }
  });

  for (const m of result.marks) {
    let d = '';
    let pen = false;
    m.errorsMm.forEach((e, i) => {
      if (e === null) {
        pen = false;
        return;
      }
      d += `${pen ? 'L' : 'M'}${r(px(i))} ${r(py(e))}`;
      pen = true;
    });
    if (d === '') continue;
    const cls = m.hourAngleDeg < 0 ? 'am' : m.hourAngleDeg > 0 ? 'pm' : 'noon';
    rec.push({ kind: 'path', d, cls, title: `${m.label} ${m.style}: worst ${formatMm(m.errorMm.worst)} on ${m.worstDate ?? '-'}` });
  }

  const w = result.worst;
  rec.push({ kind: 'text', x: M.left, y: 24, text: `Shadow minus mark over ${result.year}, ${countMarks(result.marks).marks} engraved marks (${result.source}); worst ${w ? `${formatMm(w.errorMm)} at ${w.label} ${w.style} on ${w.date}` : 'none'}; ${result.pass ? 'PASS' : 'FAIL'}`, cls: 'title', anchor: 'start' });
  rec.push({ kind: 'text', x: 16, y: M.top + (H - M.top - M.bottom) / 2, text: 'mm', cls: 'small', anchor: 'start' });

  const curves = curvePanel(result, H);
  rec.push(...curves.records);
  return serialiseSvg(rec, H + curves.height);
}
