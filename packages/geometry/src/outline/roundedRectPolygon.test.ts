import { describe, expect, it } from 'vitest';
import { roundedRectPolygon } from './roundedRectPolygon.ts';
import { shoelaceArea } from '../parts/ring2d.ts';

describe('roundedRectPolygon', () => {
  it('gives the four corners, counter-clockwise from lower left, for a sharp rectangle', () => {
    const r = { kind: 'rect', cx: 5, cy: 1, widthMm: 10, heightMm: 2, cornerRadiusMm: 0 } as const;
    expect(roundedRectPolygon(r)).toEqual([[0, 0], [10, 0], [10, 2], [0, 2]]);
  });

  it('puts cornerSegments + 1 points on each corner arc, all at the radius from its centre', () => {
    const r = { kind: 'rect', cx: 0, cy: 0, widthMm: 20, heightMm: 10, cornerRadiusMm: 2 } as const;
    const p = roundedRectPolygon(r, 6);
    expect(p.length).toBe(4 * 7);
    expect(shoelaceArea(p)).toBeGreaterThan(0);
    // first arc: lower-right corner, centre (8, −3), from straight below to straight right
    for (const [x, y] of p.slice(0, 7)) expect(Math.hypot(x - 8, y + 3)).toBeCloseTo(2, 12);
    expect(p[0][0]).toBeCloseTo(8, 12);
    expect(p[0][1]).toBeCloseTo(-5, 12);
    expect(p[6][0]).toBeCloseTo(10, 12);
    expect(p[6][1]).toBeCloseTo(-3, 12);
  });

  it('clamps the radius to half the shorter side (a stadium, area below the rectangle)', () => {
    const r = { kind: 'rect', cx: 0, cy: 0, widthMm: 10, heightMm: 4, cornerRadiusMm: 9 } as const;
    const p = roundedRectPolygon(r);
    for (const [, y] of p) expect(Math.abs(y)).toBeLessThanOrEqual(2 + 1e-12);
    expect(shoelaceArea(p)).toBeLessThan(40);
    expect(shoelaceArea(p)).toBeGreaterThan(6 * 4 + Math.PI * 4 * 0.98);
  });
});
