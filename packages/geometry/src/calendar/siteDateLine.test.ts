import { describe, expect, it } from 'vitest';
import type { FacePoint, FacePolyline } from './types.ts';
import { chordSag } from './refineByChord.ts';
import { siteDateLine } from './siteDateLine.ts';

const DEG = Math.PI / 180;
const H = 60;
const T = 3;
/** The handbook hyperbola of a polar face's date line (docs/design.md §2; Waugh 1973, memory), from the casting style edge. */
const hyperbola = (x: number, dp: number): number => -Math.tan(dp) * Math.hypot(H, Math.abs(x) - T / 2);

function distanceTo(p: FacePoint, line: FacePolyline): number {
  let best = Infinity;
  for (let i = 0; i + 1 < line.length; i++) best = Math.min(best, chordSag(line[i], p, line[i + 1]));
  return best;
}

describe('siteDateLine', () => {
  const base = { declinationRad: 23.44 * DEG, latitudeDeg: 47, heightMm: H, thicknessMm: T, maxHourAngleRad: 60 * DEG } as const;

  it('with the Sun infinitely far (no parallax) it is the handbook hyperbola, every chord within 0.0005 mm of it', () => {
    for (const hemisphere of ['north', 'south'] as const) {
      const b = siteDateLine({ ...base, distanceAu: 1e12, hemisphere });
      const dp = hemisphere === 'north' ? base.declinationRad : -base.declinationRad;
      let onCurve = 0;
      for (const p of [...b.west, ...b.east]) onCurve = Math.max(onCurve, Math.abs(p[1] - hyperbola(p[0], dp)));
      expect(onCurve).toBeLessThan(1e-9);
      // The drawn chords against the hyperbola sampled every 0.01 mm of x.
      let sag = 0;
      for (const line of [b.west, b.east]) {
        const x0 = line[0][0];
        const x1 = line[line.length - 1][0];
        for (let x = x0; x <= x1; x += 0.01) sag = Math.max(sag, distanceTo([x, hyperbola(x, dp)], line));
        for (let i = 1; i < line.length; i++) expect(line[i][0]).toBeGreaterThan(line[i - 1][0]);
      }
      console.log(`${hemisphere}: ${b.west.length + b.east.length} points, chord sag ${sag.toExponential(2)} mm`);
      expect(sag).toBeLessThanOrEqual(0.0005);
      // West branch (morning) on the left in the north, on the right in the south; both start at their style edge.
      const westSign = hemisphere === 'north' ? -1 : 1;
      expect(Math.sign(b.west[0][0] + b.west[b.west.length - 1][0])).toBe(westSign);
      expect(Math.min(...[...b.west, ...b.east].map((p) => Math.abs(p[0])))).toBeCloseTo(T / 2, 12);
      expect(Math.max(...b.east.map((p) => Math.abs(p[0])))).toBeCloseTo(T / 2 + H * Math.tan(60 * DEG), 9);
    }
  });

  it('the parallax at 1 AU moves the summer line about 1 µm toward the nodus foot at the meridian (the Sun seen at a lower declination)', () => {
    const far = siteDateLine({ ...base, distanceAu: 1e12, hemisphere: 'north' });
    const near = siteDateLine({ ...base, distanceAu: 1, hemisphere: 'north' });
    // At the meridian: the Sun's declination seen from 47° N is lower by about π·sin(φ − δ), π = 8.794″ the Sun's horizontal parallax at 1 AU (common practice; ≈ 3.5″ here); y = −h·tan δ.
    const dy = near.east[0][1] - far.east[0][1];
    const expected = (H * 8.794 * Math.sin((47 - 23.44) * DEG) * (DEG / 3600)) / Math.cos(base.declinationRad) ** 2;
    console.log(`meridian shift ${dy.toExponential(3)} mm, expected ${expected.toExponential(3)} mm`);
    expect(dy).toBeGreaterThan(0);
    expect(Math.abs(dy - expected)).toBeLessThan(0.02 * expected);
  });

  it('refuses a bad input naming the field', () => {
    expect(() => siteDateLine({ ...base, distanceAu: 0, hemisphere: 'north' })).toThrow(/distanceAu/);
    expect(() => siteDateLine({ ...base, distanceAu: 1, maxHourAngleRad: 1.6, hemisphere: 'north' })).toThrow(/maxHourAngleRad/);
  });
});
