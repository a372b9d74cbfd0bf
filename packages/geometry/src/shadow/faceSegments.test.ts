import { describe, expect, it } from 'vitest';
import { faceSegments } from './faceSegments.ts';
import { MARK_LAYERS, type PlateLine } from './plateLine.ts';

const plate = { substyleX: 50, faceOriginY: 20 };
const firstLast = (l: PlateLine) => (l.points.length < 2 ? null : ([l.points[0], l.points[l.points.length - 1]] as const));

describe('faceSegments', () => {
  it('reads score and mark-centre lines, skips other layers, and moves them to face coordinates', () => {
    const lines: PlateLine[] = [
      { layer: MARK_LAYERS.score, points: [[60, 25], [60, 45]], closed: false },
      { layer: MARK_LAYERS.centres, points: [[40, 30], [40, 35]], closed: false },
      { layer: 'SOMETHING_ELSE', points: [[0, 0], [1, 1]], closed: false },
      { layer: MARK_LAYERS.etch, points: [[1, 1], [2, 1], [2, 2], [1, 2]], closed: true },
    ];
    expect(faceSegments(lines, plate, firstLast)).toEqual([
      [[10, 5], [10, 25]],
      [[-10, 10], [-10, 15]],
    ]);
  });

  it('falls back to closed etch outlines only when the drawing has no centre-lines', () => {
    const lines: PlateLine[] = [
      { layer: MARK_LAYERS.etch, points: [[50, 20], [52, 20], [52, 30]], closed: true },
      { layer: MARK_LAYERS.etch, points: [[0, 0], [9, 9]], closed: false },
    ];
    expect(faceSegments(lines, plate, firstLast)).toEqual([[[0, 0], [2, 10]]]);
  });

  it('drops the lines endsOf refuses', () => {
    const lines: PlateLine[] = [{ layer: MARK_LAYERS.score, points: [[60, 25]], closed: false }];
    expect(faceSegments(lines, plate, firstLast)).toEqual([]);
  });
});
