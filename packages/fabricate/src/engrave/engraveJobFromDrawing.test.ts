import { describe, expect, it } from 'vitest';
import type { PlateDrawing } from '@umbrafab/geometry';
import { engraveJobFromDrawing } from './engraveJobFromDrawing.ts';

// A hand-made drawing (invented data): two marks, one curve, one two-stroke numeral, a slot the noon mark crosses.
const drawing: PlateDrawing = {
  widthMm: 100,
  lengthMm: 60,
  substyleX: 50,
  faceOriginY: 10,
  outline: { kind: 'rect', cx: 50, cy: 30, widthMm: 100, heightMm: 60, cornerRadiusMm: 3 },
  holes: [],
  slots: [{ kind: 'rect', cx: 50, cy: 30, widthMm: 3.2, heightMm: 10, cornerRadiusMm: 0 }],
  lines: [
    { label: '09:00 west', kind: 'hour', widthMm: 0.8, path: { kind: 'path', points: [[20, 10], [20, 50]], closed: false } },
    { label: '12:00 west', kind: 'hour', widthMm: 0.8, path: { kind: 'path', points: [[48.5, 10], [48.5, 50]], closed: false } },
    { label: 'solstice', kind: 'curve', widthMm: 0.3, path: { kind: 'path', points: [[10, 52], [50, 54], [90, 52]], closed: false } },
  ],
  text: [{ role: 'numeral', text: 'X', strokeWidthMm: 0.45, strokes: [{ kind: 'path', points: [[60, 3], [64, 8]], closed: false }, { kind: 'path', points: [[64, 3], [60, 8]], closed: false }] }],
  reference: [{ label: 'substyle', path: { kind: 'path', points: [[50, 0], [50, 60]], closed: false } }],
};

describe('engraveJobFromDrawing', () => {
  const job = engraveJobFromDrawing(drawing, { thicknessMm: 3, material: 'brass' }, ['title line']);

  it('takes every line at its width and every text stroke at the stroke width, no cut profiles or reference lines', () => {
    expect(job.stock).toEqual({ widthMm: 100, lengthMm: 60, thicknessMm: 3, material: 'brass' });
    expect(job.title).toEqual(['title line']);
    expect(job.paths.map((p) => [p.operation, p.label, p.widthMm])).toEqual([
      ['marks', 'hour 09:00 west', 0.8],
      ['marks', 'hour 12:00 west piece 1/2', 0.8],
      ['marks', 'hour 12:00 west piece 2/2', 0.8],
      ['curves', 'solstice', 0.3],
      ['text', 'numeral X stroke 1/2', 0.45],
      ['text', 'numeral X stroke 2/2', 0.45],
    ]);
  });

  it('leaves out the part of a line over a gnomon slot', () => {
    expect(job.paths[1].points).toEqual([[48.5, 10], [48.5, 25]]);
    expect(job.paths[2].points).toEqual([[48.5, 35], [48.5, 50]]);
    expect(job.paths[0].points).toBe(drawing.lines[0].path.points);
  });
});
