import { describe, expect, it } from 'vitest';
import type { Circle, RoundedRect } from '@umbrafab/geometry';
import { clipToPlate } from './clipToPlate.ts';

const hole: Circle = { kind: 'circle', cx: 10, cy: 0, radiusMm: 2 };
const slot: RoundedRect = { kind: 'rect', cx: 30, cy: 0, widthMm: 4, heightMm: 2, cornerRadiusMm: 0 };

describe('clipToPlate', () => {
  it('returns a path clear of every hole and slot unchanged (closed stays closed)', () => {
    const loop = [[0, 5], [5, 5], [5, 8]] as const;
    const r = clipToPlate(loop, true, [hole], [slot]);
    expect(r.touched).toBe(false);
    expect(r.pieces).toEqual([loop]);
    expect(r.removedMm).toBe(0);
  });

  it('cuts a line through a hole and a slot into three pieces (plain geometry)', () => {
    const r = clipToPlate([[0, 0], [40, 0]], false, [hole], [slot]);
    expect(r.touched).toBe(true);
    expect(r.pieces).toEqual([
      [[0, 0], [8, 0]],
      [[12, 0], [28, 0]],
      [[32, 0], [40, 0]],
    ]);
    expect(r.removedMm).toBeCloseTo(8, 12); // chord 2r = 4 plus slot width 4
  });

  it('does not cut a line that only touches a hole or runs along a slot edge', () => {
    expect(clipToPlate([[0, 2], [20, 2]], false, [hole], []).touched).toBe(false);
    expect(clipToPlate([[20, 1], [40, 1]], false, [], [slot]).touched).toBe(false);
  });

  it('keeps the pieces of a polyline joined across vertices outside the through-cuts', () => {
    const r = clipToPlate([[0, 0], [5, 0], [5, 5], [15, 5], [15, 0], [20, 0]], false, [{ ...hole, cx: 15, cy: 2.5, radiusMm: 1 }], []);
    expect(r.pieces.length).toBe(2);
    expect(r.pieces[0].slice(0, 4)).toEqual([[0, 0], [5, 0], [5, 5], [15, 5]]);
    expect(r.pieces[0].at(-1)).toEqual([15, 3.5]);
    expect(r.pieces[1]).toEqual([[15, 1.5], [15, 0], [20, 0]]);
  });

  it('opens a closed loop that crosses a hole', () => {
    const r = clipToPlate([[6, 0], [14, 0], [14, 10], [6, 10]], true, [hole], []);
    expect(r.touched).toBe(true);
    expect(r.pieces.length).toBe(1);
    expect(r.pieces[0]).toEqual([[12, 0], [14, 0], [14, 10], [6, 10], [6, 0], [8, 0]]);
  });
});
