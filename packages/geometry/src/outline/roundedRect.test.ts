import { describe, expect, it } from 'vitest';
import { roundedRectArea, roundedRectCorners, roundedRectPath, roundedRectPolygon } from './roundedRect.ts';
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

describe('roundedRectCorners', () => {
  it('clamps the radius and lists the corner centres counter-clockwise from the lower right', () => {
    const k = roundedRectCorners({ kind: 'rect', cx: 0, cy: 0, widthMm: 10, heightMm: 4, cornerRadiusMm: 9 });
    expect(k.radiusMm).toBe(2);
    expect(k.corners.map((c) => c.centre)).toEqual([[3, 0], [3, 0], [-3, 0], [-3, 0]]);
    expect(k.corners.map((c) => c.quarter)).toEqual([-1, 0, 1, 2]);
  });
});

describe('roundedRectArea', () => {
  // w·h − (4 − π)·r²: a square less a quarter disc at each corner (plane geometry, common practice)
  it('is w·h for sharp corners and a disc for a square with the full radius', () => {
    expect(roundedRectArea({ kind: 'rect', cx: 1, cy: 1, widthMm: 10, heightMm: 3, cornerRadiusMm: 0 })).toBe(30);
    expect(roundedRectArea({ kind: 'rect', cx: 0, cy: 0, widthMm: 6, heightMm: 6, cornerRadiusMm: 3 })).toBeCloseTo(Math.PI * 9, 12);
  });

  it('agrees with the shoelace area of a finely drawn path (within the chord tolerance times the perimeter)', () => {
    const r = { kind: 'rect', cx: 0, cy: 0, widthMm: 40, heightMm: 25, cornerRadiusMm: 6 } as const;
    const drawn = shoelaceArea(roundedRectPath(r, 0.001).points);
    const perimeter = 2 * (40 + 25) - (8 - 2 * Math.PI) * 6;
    expect(Math.abs(drawn - roundedRectArea(r))).toBeLessThan(0.001 * perimeter);
  });
});

describe('roundedRectPath', () => {
  it('keeps a sharp rectangle to its four corners', () => {
    const p = roundedRectPath({ kind: 'rect', cx: 5, cy: 5, widthMm: 10, heightMm: 10, cornerRadiusMm: 0 });
    expect(p.closed).toBe(true);
    expect(p.points).toEqual([[0, 0], [10, 0], [10, 10], [0, 10]]);
  });

  it('puts every vertex of a corner on its arc and keeps chords within the tolerance', () => {
    const r = { kind: 'rect', cx: 0, cy: 0, widthMm: 20, heightMm: 10, cornerRadiusMm: 2 } as const;
    const tol = 0.01;
    const pts = roundedRectPath(r, tol).points;
    const onArc = pts.filter(([x, y]) => Math.abs(Math.hypot(x - 8, y + 3) - 2) < 1e-9 && x >= 8 - 1e-9 && y <= -3 + 1e-9);
    expect(onArc.length).toBeGreaterThan(2);
    for (let i = 1; i < onArc.length; i++) {
      const [a, b] = [onArc[i - 1], onArc[i]];
      const mid = [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
      expect(2 - Math.hypot(mid[0] - 8, mid[1] + 3)).toBeLessThanOrEqual(tol + 1e-12);
    }
  });

  it('drops the repeated point where the arcs of a stadium meet', () => {
    const pts = roundedRectPath({ kind: 'rect', cx: 0, cy: 0, widthMm: 10, heightMm: 4, cornerRadiusMm: 2 }).points;
    for (let i = 0; i < pts.length; i++) {
      const [a, b] = [pts[i], pts[(i + 1) % pts.length]];
      expect(Math.hypot(a[0] - b[0], a[1] - b[1])).toBeGreaterThan(1e-9);
    }
  });
});
