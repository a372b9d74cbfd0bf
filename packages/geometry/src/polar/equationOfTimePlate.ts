import type { FacePolyline } from '../calendar/types.ts';
import { SpecError } from '../errors.ts';
import { equationOfTimeMin } from '../sun/equationOfTimeMin.ts';
import { zoneYearOffsets } from '../sun/zoneOffsets.ts';
import { strokeText, strokeTextWidthMm } from '../text/strokeText.ts';
import type { TextBlock } from '../types.ts';
import type { DialLayout } from './layoutDial.ts';

/** The engraved equation of time: lines (face coordinates, mm) and single-stroke text. */
export interface EquationOfTimePlate {
  readonly lines: readonly { readonly label: string; readonly points: FacePolyline; readonly closed: boolean }[];
  readonly text: readonly TextBlock[];
}

const GAP_MM = 3;
const HOLE_CLEAR_MM = 2;
const ROW_PITCH = 1.6;
const MONTH_INITIALS = ['J', 'F', 'M', 'A', 'M', 'J', 'J', 'A', 'S', 'O', 'N', 'D'] as const;
/** Half the height of the graph's E axis, minutes (E stays within about ±16.5 min, common practice). */
const GRAPH_RANGE_MIN = 18;

/**
 * The equation of time engraved on the plate (`calendar.table`), in the band
 * of the title block to the right of the gnomon (free on every layout):
 * - `table`: E in whole minutes on the 1st and 15th of each month of
 *   `calendar.year` (12:00 UT, from `equationOfTimeMin`), under a caption
 *   saying how to get clock time from the dial;
 * - `graph`: E over the year as a curve in a box, zero line, ±15 min ticks
 *   and month initials.
 * Clock = dial − E for a standard-time dial, dial − E + 4·(λs − λ) min for a
 * solar one (docs/design.md §3); "+1 H IN SUMMER" when the zone keeps daylight saving
 * and the dial has no summer numerals.
 *
 * @throws SpecError naming `calendar.table` when the band has no room for 1.5 mm text
 * @example equationOfTimePlate(layout).text[0].text // 'E MIN: CLOCK = DIAL - E'
 */
export function equationOfTimePlate(layout: DialLayout): EquationOfTimePlate {
  const { spec, plate, gnomon } = layout;
  const kind = spec.calendar.table;
  if (kind === 'none') return { lines: [], text: [] };
  const top = plate.lengthMm - plate.faceOriginY - spec.plate.margin;
  const bottom = Math.max(gnomon.y1Mm, ...layout.marks.map((m) => m.y1Mm)) + GAP_MM;
  const left = gnomon.thicknessMm / 2 + spec.process.clearance + GAP_MM;
  const right = plate.widthMm / 2 - (spec.holes.count === 4 ? spec.holes.inset + spec.holes.diameter / 2 + HOLE_CLEAR_MM : spec.plate.margin);
  const w = right - left;
  const hgt = top - bottom;
  const caption = captionText(layout);
  const year = spec.calendar.year;
  const eAt = (month: number, day: number) => equationOfTimeMin(new Date(Date.UTC(year, month, day, 12)));
  const stroke = (th: number) => Math.max(0.2, Math.min(spec.marks.quarter.width, th / 10));
  const block = (text: string, th: number, x: number, y: number, align: 'left' | 'center' | 'right' = 'left'): TextBlock => ({
    role: 'label',
    text,
    heightMm: th,
    strokeWidthMm: stroke(th),
    strokes: strokeText(text, { heightMm: th, at: [x, y], align }),
  });

  if (kind === 'table') {
    const cell = (v: number) => (Math.round(v) === 0 ? '0' : `${v > 0 ? '+' : '-'}${Math.abs(Math.round(v))}`);
    const rows = [1, 15].map((day) => ({ day, values: MONTH_INITIALS.map((_, m) => cell(eAt(m, day))) }));
    const labelUnit = strokeTextWidthMm('15 ', 1);
    const cellUnit = Math.max(...rows.flatMap((r) => r.values.map((v) => strokeTextWidthMm(v, 1)))) * 1.25;
    const th = fit(spec, Math.min(spec.dial.textHeight, hgt / (3 * ROW_PITCH + 1), w / (labelUnit + 12 * cellUnit), w / strokeTextWidthMm(caption, 1)), w, hgt);
    const col = (w - labelUnit * th) / 12;
    const text: TextBlock[] = [block(caption, th, left, top - th)];
    const rowY = (i: number) => top - th - (i + 1) * ROW_PITCH * th;
    MONTH_INITIALS.forEach((mi, m) => text.push(block(mi, th, left + labelUnit * th + (m + 0.5) * col, rowY(0), 'center')));
    rows.forEach((r, i) => {
      text.push(block(String(r.day), th, left, rowY(i + 1)));
      r.values.forEach((v, m) => text.push(block(v, th, left + labelUnit * th + (m + 0.5) * col, rowY(i + 1), 'center')));
    });
    return { lines: [], text };
  }

  // graph
  const th = fit(spec, Math.min(0.8 * spec.dial.textHeight, hgt / 6, w / strokeTextWidthMm(caption, 1)), w, hgt);
  const tickUnit = strokeTextWidthMm('+15 ', 1);
  const gx0 = left + tickUnit * th;
  const gx1 = right;
  const gy1 = top - th - 0.8 * th;
  const gy0 = bottom + 1.6 * th;
  if (!(gx1 - gx0 > 20 && gy1 - gy0 > 6)) throw noRoom(spec, w, hgt);
  const days = (Date.UTC(year + 1, 0, 1) - Date.UTC(year, 0, 1)) / 86_400_000;
  const X = (d: number) => gx0 + ((gx1 - gx0) * d) / days;
  const Y = (e: number) => (gy0 + gy1) / 2 + ((gy1 - gy0) / 2) * (e / GRAPH_RANGE_MIN);
  const curve: [number, number][] = [];
  for (let d = 0; d <= days; d += 2) curve.push([X(d), Y(equationOfTimeMin(new Date(Date.UTC(year, 0, 1 + d, 12))))]);
  const lines = [
    { label: 'EoT graph box', points: [[gx0, gy0], [gx1, gy0], [gx1, gy1], [gx0, gy1]] as FacePolyline, closed: true },
    { label: 'EoT graph zero', points: [[gx0, Y(0)], [gx1, Y(0)]] as FacePolyline, closed: false },
    { label: 'EoT graph +15', points: [[gx0 - 0.5 * th, Y(15)], [gx0, Y(15)]] as FacePolyline, closed: false },
    { label: 'EoT graph -15', points: [[gx0 - 0.5 * th, Y(-15)], [gx0, Y(-15)]] as FacePolyline, closed: false },
    { label: 'EoT graph curve', points: curve as FacePolyline, closed: false },
  ];
  const text: TextBlock[] = [block(caption, th, left, top - th)];
  text.push(block('+15', 0.8 * th, gx0 - 0.7 * th, Y(15) - 0.4 * th, 'right'), block('-15', 0.8 * th, gx0 - 0.7 * th, Y(-15) - 0.4 * th, 'right'));
  MONTH_INITIALS.forEach((mi, m) => {
    const d0 = (Date.UTC(year, m, 1) - Date.UTC(year, 0, 1)) / 86_400_000;
    const d1 = (Date.UTC(year, m + 1, 1) - Date.UTC(year, 0, 1)) / 86_400_000;
    text.push(block(mi, 0.8 * th, X((d0 + d1) / 2), gy0 - 1.2 * th, 'center'));
  });
  return { lines, text };
}

function captionText(layout: DialLayout): string {
  const { spec, time } = layout;
  const corr = time.longitudeCorrectionMin;
  const base = time.reads === 'standard' || Math.abs(corr) < 0.05 ? 'E MIN: CLOCK = DIAL - E' : `E MIN: CLOCK = DIAL - E ${corr > 0 ? '+' : '-'} ${Math.abs(corr).toFixed(1)}`;
  const shift = zoneYearOffsets(spec.site.timezone, spec.calendar.year).daylightShiftHours;
  return shift > 0 && !spec.dial.summerNumerals ? `${base}, +${shift} H IN SUMMER` : base;
}

function fit(spec: DialLayout['spec'], th: number, w: number, h: number): number {
  const r = Math.floor(th * 10) / 10;
  if (r < 1.5) throw noRoom(spec, w, h);
  return r;
}

function noRoom(spec: DialLayout['spec'], w: number, h: number): SpecError {
  return new SpecError('calendar.table', spec.calendar.table, 'allowed: "none", or a wider or longer plate (or a smaller plate.margin)', `the free band beside the title is ${w.toFixed(0)} x ${h.toFixed(0)} mm, too small for 1.5 mm text`);
}
