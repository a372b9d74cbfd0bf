import { describe, expect, it } from 'vitest';
import { DEG } from '../guards.ts';
import { planarDateLine } from './planarDateLine.ts';
import { planarFace } from './planarFace.ts';
import { planarMeanTimeCurve } from './planarMeanTimeCurve.ts';

const hours = Array.from({ length: 141 }, (_, i) => (-70 + i) * DEG);

describe('date lines of a nodus on any face', () => {
  it('polar face: y = −tan δ · √(h² + (|x| − t/2)²) (docs/design.md §2, the handbook formula)', () => {
    const face = planarFace({ type: 'polar', latitudeRad: 48 * DEG });
    const g = { thicknessMm: 3, heightMm: 50 };
    let worst = 0;
    for (const d of [-23.44, -11.5, 11.5, 23.44]) {
      for (const run of planarDateLine(face, g, d * DEG, hours)) {
        for (const [x, y] of run.points) worst = Math.max(worst, Math.abs(y + Math.tan(d * DEG) * Math.hypot(50, Math.abs(x) - 1.5)));
      }
    }
    expect(worst).toBeLessThan(1e-9);
  });

  it('horizontal and declining faces: the equinox line is straight (the equinoctial line, common practice)', () => {
    for (const face of [planarFace({ type: 'horizontal', latitudeRad: 52 * DEG }), planarFace({ type: 'vertical', latitudeRad: 40 * DEG, declinationRad: 30 * DEG, reclinationRad: 10 * DEG })]) {
      const runs = planarDateLine(face, { thicknessMm: 0, heightMm: 60 }, 0, hours);
      const pts = runs.flatMap((r) => r.points);
      expect(pts.length).toBeGreaterThan(50);
      const [a, b] = [pts[0], pts[pts.length - 1]];
      const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
      const off = Math.max(...pts.map((p) => Math.abs((p[0] - a[0]) * (b[1] - a[1]) - (p[1] - a[1]) * (b[0] - a[0])) / len));
      expect(off).toBeLessThan(1e-9);
    }
  });

  it('summer and winter lines lie on opposite sides of the equinox line on a horizontal face', () => {
    const face = planarFace({ type: 'horizontal', latitudeRad: 52 * DEG });
    const g = { thicknessMm: 0, heightMm: 60 };
    const yAtNoon = (d: number) => planarDateLine(face, g, d * DEG, [0, 1e-6]).flatMap((r) => r.points)[0][1];
    // Seen from above, north up: summer noon shadows are short (close to the root), winter ones long.
    expect(yAtNoon(23.44)).toBeLessThan(yAtNoon(0));
    expect(yAtNoon(0)).toBeLessThan(yAtNoon(-23.44));
  });

  it('mean-time curve at noon on a vertical south wall is a figure of eight spanning the equation of time', () => {
    const face = planarFace({ type: 'vertical', latitudeRad: 50 * DEG, declinationRad: 0 });
    const runs = planarMeanTimeCurve(face, { thicknessMm: 0, heightMm: 80 }, { clockMinutes: 720, year: 2026, shiftDeg: 0, standardMeridianDeg: 0, stepDays: 3 });
    const xs = runs.flatMap((r) => r.points.map((p) => p[0]));
    // E ranges about −14…+16 min (common practice): ±(3.5°…4°) of hour angle, a few mm either side at 80 mm.
    expect(Math.min(...xs)).toBeLessThan(-3);
    expect(Math.max(...xs)).toBeGreaterThan(3);
  });
});
