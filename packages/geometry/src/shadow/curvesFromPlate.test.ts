import { describe, expect, it } from 'vitest';
import type { Vec2 } from '../types.ts';
import type { DrawnCurve } from './curveCheck.ts';
import { curvesFromPlate } from './curvesFromPlate.ts';
import type { PlateLine } from './plateLine.ts';

const plate = { substyleX: 100, faceOriginY: 50 };
const arc = (x0: number, n: number): Vec2[] => Array.from({ length: n }, (_, k) => [x0 + k, 0.01 * (k - n / 2) ** 2] as const);
const toPlate = (p: readonly Vec2[], dy = 0): Vec2[] => p.map(([x, y]) => [x + plate.substyleX, y + plate.faceOriginY + dy]);
const curves: DrawnCurve[] = [
  { label: 'June solstice', kind: 'date', paths: [arc(-30, 25), arc(5, 25)] },
  { label: '12:00 mean time', kind: 'meanTime', paths: [arc(-2, 4)] },
];

describe('curvesFromPlate', () => {
  it("gives each piece the drawing's nearest polyline (either way round), leaves two-point mark lines and far lines alone", () => {
    const moved = toPlate(curves[0].paths[1], 0.3);
    const lines: PlateLine[] = [
      { layer: 'LINE_SCORE', points: [[100, 40], [100, 60]], closed: false },
      { layer: 'LINE_SCORE', points: toPlate(curves[1].paths[0]).reverse(), closed: false },
      { layer: 'MARK_CENTRE_NO_CUT', points: moved, closed: false },
      { layer: 'LINE_SCORE', points: toPlate(curves[0].paths[0]), closed: false },
      { layer: 'LINE_SCORE', points: toPlate(arc(60, 10)), closed: false },
      { layer: 'TEXT_ENGRAVE', points: toPlate(curves[0].paths[0]), closed: false },
    ];
    const found = curvesFromPlate(curves, lines, plate);
    expect(found.curves!.map((c) => c.label)).toEqual(['June solstice', '12:00 mean time']);
    expect(found.curves![0].paths[1][3][1]).toBeCloseTo(curves[0].paths[1][3][1] + 0.3, 12);
    const gap = (p: readonly Vec2[], q: readonly Vec2[]) => Math.max(...p.map((a, i) => Math.hypot(a[0] - q[i][0], a[1] - q[i][1])));
    expect(gap(found.curves![0].paths[0], curves[0].paths[0])).toBeLessThan(1e-9);
    // Drawn the other way round: taken as drawn.
    expect(gap(found.curves![1].paths[0], [...curves[1].paths[0]].reverse())).toBeLessThan(1e-9);
    expect(found.taken.size).toBe(3);
    for (const k of [1, 2, 3]) expect(found.taken.has(lines[k])).toBe(true);
  });

  it('refuses a drawing with curve lines that lacks a piece, naming --plate and the curve; no curve lines at all gives null', () => {
    const some: PlateLine[] = [{ layer: 'LINE_SCORE', points: toPlate(curves[0].paths[0]), closed: false }, { layer: 'LINE_SCORE', points: toPlate(curves[1].paths[0]), closed: false }];
    expect(() => curvesFromPlate(curves, some, plate)).toThrow(/--plate.*June solstice/s);
    expect(curvesFromPlate(curves, [{ layer: 'LINE_ETCH_OUTLINE', points: toPlate(arc(0, 9)), closed: true }], plate).curves).toBeNull();
    expect(curvesFromPlate([], some, plate).curves).toEqual([]);
  });
});
