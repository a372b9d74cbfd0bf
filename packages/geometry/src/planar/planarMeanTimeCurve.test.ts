import { Body, Equator, MakeTime, Observer, SiderealTime } from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { DEG } from '../guards.ts';
import type { Vec2 } from '../types.ts';
import { nodusShadowOf } from './planarDateLine.ts';
import { planarFace } from './planarFace.ts';
import { planarMeanTimeCurve } from './planarMeanTimeCurve.ts';
import { sunDirectionEnu } from './sunDirectionEnu.ts';

// A wall 24.5° west of south at 47.4° N, 8.5° E, clock on the 15° E meridian (the wall-declining fixture's site).
const LAT = 47.4;
const LON = 8.5;
const face = planarFace({ type: 'vertical', latitudeRad: LAT * DEG, declinationRad: 24.5 * DEG });
const gnomon = { thicknessMm: 0, heightMm: 90 };
const observer = new Observer(LAT, LON, 0);

/**
 * The nodus shadow at one instant with the Sun straight from astronomy-engine
 * (reference library): `Equator(Body.Sun, t, observer, ofdate, aberration)`,
 * topocentric, its hour angle GAST + λ − α, as a horizon-frame direction.
 */
function referenceShadow(utcMs: number): Vec2 | null {
  const t = MakeTime(new Date(utcMs));
  const eq = Equator(Body.Sun, t, observer, true, true);
  const H = (SiderealTime(t) * 15 + LON - eq.ra * 15) * DEG;
  return nodusShadowOf(face, gnomon, { sun: sunDirectionEnu(LAT * DEG, H, eq.dec * DEG), hourAngleRad: H })?.point ?? null;
}

function distanceToRuns(X: Vec2, runs: readonly { readonly points: readonly Vec2[] }[]): number {
  let best = Infinity;
  for (const { points: p } of runs) {
    for (let i = 0; i + 1 < p.length; i++) {
      const dx = p[i + 1][0] - p[i][0];
      const dy = p[i + 1][1] - p[i][1];
      const u = Math.max(0, Math.min(1, ((X[0] - p[i][0]) * dx + (X[1] - p[i][1]) * dy) / (dx * dx + dy * dy)));
      best = Math.min(best, Math.hypot(X[0] - p[i][0] - u * dx, X[1] - p[i][1] - u * dy));
    }
  }
  return best;
}

describe('planarMeanTimeCurve', () => {
  it('the real shadow at the clock time lies within the chord tolerance of the drawn curve on every day (astronomy-engine topocentric Sun)', () => {
    for (const clockMinutes of [600, 720, 900]) {
      const runs = planarMeanTimeCurve(face, gnomon, { clockMinutes, year: 2027, shiftDeg: LON - 15, standardMeridianDeg: 15 });
      let worst = 0;
      let n = 0;
      for (let d = 0; d < 365; d++) {
        const X = referenceShadow(Date.UTC(2027, 0, 1 + d) + clockMinutes * 60_000 - 3_600_000);
        if (!X) continue;
        worst = Math.max(worst, distanceToRuns(X, runs));
        n++;
      }
      console.log(`${clockMinutes / 60}:00 on the declining wall: ${runs.reduce((k, r) => k + r.points.length, 0)} points, worst ${worst.toExponential(2)} mm over ${n} days`);
      expect(n).toBeGreaterThan(300);
      // The default chord tolerance (0.0005 mm) plus astronomy-engine vs our topocentric step (< 0.01″, a few nm here).
      expect(worst).toBeLessThan(0.00051);
    }
  });

  it('closes the year: the first point is 1 January at the clock time, the last 1 January of the next year', () => {
    const runs = planarMeanTimeCurve(face, gnomon, { clockMinutes: 720, year: 2027, shiftDeg: LON - 15, standardMeridianDeg: 15 });
    expect(runs.length).toBe(1);
    const p = runs[0].points;
    const first = referenceShadow(Date.UTC(2027, 0, 1, 11)) as Vec2;
    const last = referenceShadow(Date.UTC(2028, 0, 1, 11)) as Vec2;
    expect(Math.hypot(p[0][0] - first[0], p[0][1] - first[1])).toBeLessThan(1e-5);
    expect(Math.hypot(p[p.length - 1][0] - last[0], p[p.length - 1][1] - last[1])).toBeLessThan(1e-5);
    // The two Januaries differ by the year's quarter-day drift of the Sun: a gap of well under a millimetre, not a missing day (about 0.1 mm/day here).
    expect(Math.hypot(p[0][0] - p[p.length - 1][0], p[0][1] - p[p.length - 1][1])).toBeLessThan(0.2);
  });

  it('refines only where the curve bends: a looser chord tolerance draws fewer points, each within its own tolerance', () => {
    const opts = { clockMinutes: 720, year: 2027, shiftDeg: LON - 15, standardMeridianDeg: 15 };
    const count = (tol: number) => planarMeanTimeCurve(face, gnomon, { ...opts, chordToleranceMm: tol }).reduce((k, r) => k + r.points.length, 0);
    const fine = count(0.0005);
    const coarse = count(0.01);
    expect(coarse).toBeGreaterThanOrEqual(184);
    expect(fine).toBeGreaterThan(coarse);
    const loose = planarMeanTimeCurve(face, gnomon, { ...opts, chordToleranceMm: 0.01 });
    let worst = 0;
    for (let d = 0; d < 365; d++) {
      const X = referenceShadow(Date.UTC(2027, 0, 1 + d, 11));
      if (X) worst = Math.max(worst, distanceToRuns(X, loose));
    }
    expect(worst).toBeLessThan(0.0101);
  });
});
