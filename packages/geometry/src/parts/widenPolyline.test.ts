import { describe, expect, it } from 'vitest';
import { circlePolygon, widenPolyline } from './widenPolyline.ts';
import { shoelaceArea } from './ring2d.ts';

describe('widenPolyline', () => {
  it('gives one CCW rectangle per segment, square ends, round joins inside', () => {
    const polys = widenPolyline([[0, 0], [10, 0], [10, 10]], 0.8, false);
    expect(polys.length).toBe(3); // two rectangles and one join
    expect(polys[0]).toEqual([[0, -0.4], [10, -0.4], [10, 0.4], [0, 0.4]]);
    for (const p of polys) expect(shoelaceArea(p)).toBeGreaterThan(0);
  });

  it('adds round caps for strokes and a dot for a one-point stroke', () => {
    expect(widenPolyline([[0, 0], [1, 0]], 0.5, true).length).toBe(3);
    expect(widenPolyline([[2, 2]], 0.5, true).length).toBe(1);
  });

  it('circlePolygon circumscribes the circle: every edge midpoint at the radius', () => {
    const p = circlePolygon([1, 2], 3, 16);
    for (let k = 0; k < p.length; k++) {
      const a = p[k];
      const b = p[(k + 1) % p.length];
      expect(Math.hypot((a[0] + b[0]) / 2 - 1, (a[1] + b[1]) / 2 - 2)).toBeCloseTo(3, 12);
    }
  });
});
