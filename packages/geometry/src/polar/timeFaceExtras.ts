import type { DrawnLine, DrawnText } from '../plate/plateDrawing.ts';
import type { Path, Vec2 } from '../types.ts';
import { calendarLines } from './calendarLines.ts';
import { curveLabels } from './curveLabels.ts';
import { equationOfTimePlate } from './equationOfTimePlate.ts';
import type { DialLayout } from './layoutDial.ts';
import { markField, nodusFootY } from './markField.ts';
import { meanTimeLines } from './meanTimeLines.ts';

/** The sun-to-clock-time engravings of a face, in plate coordinates, ready for `plateDrawing(layout, lines, text)`. */
export interface TimeFaceExtras {
  readonly lines: readonly DrawnLine[];
  readonly text: readonly DrawnText[];
  /** date-line labels that found no free place on the face: "line (label)" */
  readonly unlabelled: readonly string[];
}

/** Label cap height as a fraction of the title text height. */
const LABEL_SCALE = 0.75;

/**
 * Date lines (with their labels), mean-time curves and the engraved
 * equation of time of a layout, moved to plate coordinates
 * (x + substyleX, y + faceOriginY). All curves have kind 'curve' and the
 * width of the quarter marks; labels have role 'label'.
 * @example plateDrawing(layout, timeFaceExtras(layout).lines, timeFaceExtras(layout).text)
 */
export function timeFaceExtras(layout: DialLayout): TimeFaceExtras {
  const { plate, spec } = layout;
  const move = (p: Vec2): Vec2 => [p[0] + plate.substyleX, p[1] + plate.faceOriginY];
  const path = (pts: readonly Vec2[], closed = false): Path => ({ kind: 'path', points: pts.map(move), closed });
  const width = spec.marks.quarter.width;
  const lines: DrawnLine[] = [];
  const text: DrawnText[] = [];

  const dateLines = calendarLines(layout);
  const ny = dateLines.length > 0 ? nodusFootY(layout) : 0;
  const onFace = dateLines.map((l) => l.branches.map((b) => b.map(([x, y]): Vec2 => [x, y + ny])));
  for (const [i, l] of dateLines.entries()) for (const b of onFace[i]) lines.push({ label: `date line ${l.label}`, kind: 'curve', widthMm: width, path: path(b), readBack: true });
  const mean = meanTimeLines(layout);
  // A line shared by two dates (e.g. the equinoxes) gets one label on each half of the face.
  const toLabel = dateLines.flatMap((l, i) =>
    l.engravedLabels.length === 2
      ? [{ text: l.engravedLabels[0], polylines: onFace[i], side: 'left' as const, of: l.label }, { text: l.engravedLabels[1], polylines: onFace[i], side: 'right' as const, of: l.label }]
      : [{ text: l.engravedLabel, polylines: onFace[i], of: l.label }],
  );
  const labels = curveLabels(toLabel, layout.marks, markField(layout), LABEL_SCALE * spec.dial.textHeight, mean.flatMap((c) => c.polylines));
  const unlabelled: string[] = [];
  labels.forEach((b, i) => {
    if (b) text.push({ role: 'label', text: b.text, strokeWidthMm: b.strokeWidthMm, strokes: b.strokes.map((s) => path(s.points)) });
    else unlabelled.push(`${toLabel[i].of} (${toLabel[i].text})`);
  });

  for (const c of mean) for (const p of c.polylines) lines.push({ label: `mean time ${c.clockTime}`, kind: 'curve', widthMm: width, path: path(p), readBack: true });

  const eot = equationOfTimePlate(layout);
  for (const l of eot.lines) lines.push({ label: l.label, kind: 'curve', widthMm: width, path: path(l.points, l.closed) });
  for (const b of eot.text) text.push({ role: 'label', text: b.text, strokeWidthMm: b.strokeWidthMm, strokes: b.strokes.map((s) => path(s.points)) });
  return { lines, text, unlabelled };
}
