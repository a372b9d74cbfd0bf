import { Body, Equator, Horizon, HourAngle, MakeTime, Observer } from 'astronomy-engine';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { DEG } from '../guards.ts';
import { eastToFaceX, markOffsetEastMm } from '../polar/markOffset.ts';
import { layoutDial } from '../polar/layoutDial.ts';
import { parseSpec } from '../spec/parseSpec.ts';
import type { Vec3 } from '../parts/mesh.ts';
import { faceSeesSun, litDeclinations } from './faceSeesSun.ts';
import { hourLine } from './hourLine.ts';
import { nodusShadow } from './nodusShadow.ts';
import { planarFace } from './planarFace.ts';
import type { FaceOrientation } from './planarTypes.ts';
import { styleEdgeAnchor } from './styleEdgeAnchor.ts';

const RAD = 180 / Math.PI;
const hours = Array.from({ length: 21 }, (_, i) => (i - 10) * 8.5 * DEG); // −85°…+85°

/** Angle of an hour line from the substyle, degrees, positive toward the drawing's right of the substyle's sense. */
function angleFromSubstyleDeg(dir: readonly [number, number], sub: readonly [number, number]): number {
  return Math.atan2(sub[0] * dir[1] - sub[1] * dir[0], sub[0] * dir[0] + sub[1] * dir[1]) * -RAD;
}

describe('hour lines by the general method against the handbook closed forms', () => {
  // Source: the standard results, A. E. Waugh, "Sundials: Their Theory and Construction", Dover 1973 (memory):
  // horizontal tan θ = sin φ · tan H; vertical south tan θ = cos φ · tan H.
  for (const latDeg of [-52, -33.9, 12.5, 38.7, 51.5, 64]) {
    it(`horizontal at ${latDeg}°: tan θ = sin φ tan H to 1e-6°`, () => {
      const face = planarFace({ type: 'horizontal', latitudeRad: latDeg * DEG });
      let worst = 0;
      for (const H of hours) {
        const set = hourLine(face, { thicknessMm: 0, heightMm: 80 }, H);
        const d = set!.lines[0].line.direction;
        const sub = [face.substyle[0] * face.right[0] + face.substyle[1] * face.right[1], face.substyle[0] * face.up[0] + face.substyle[1] * face.up[1]] as const;
        const theta = angleFromSubstyleDeg(d, sub) * (latDeg >= 0 ? 1 : -1);
        // East of the noon line is the drawing's right in the north, left in the south.
        const expected = Math.atan(Math.sin(Math.abs(latDeg) * DEG) * Math.tan(H)) * RAD;
        worst = Math.max(worst, Math.abs(theta - expected));
      }
      console.log(`horizontal ${latDeg}°: worst |θ − atan(sin φ tan H)| = ${worst.toExponential(2)}°`);
      expect(worst).toBeLessThan(1e-6);
    });
    it(`vertical equator-facing at ${latDeg}°: tan θ = cos φ tan H to 1e-6°`, () => {
      const face = planarFace({ type: 'vertical', latitudeRad: latDeg * DEG, declinationRad: 0 });
      let worst = 0;
      for (const H of hours) {
        const d = hourLine(face, { thicknessMm: 0, heightMm: 80 }, H)!.lines[0].line.direction;
        // The substyle points straight down; the afternoon shadow falls east, the right side seen from the front in the north.
        const theta = Math.atan2(d[0], -d[1]) * RAD * (latDeg >= 0 ? 1 : -1);
        const expected = Math.atan(Math.cos(latDeg * DEG) * Math.tan(H)) * RAD;
        worst = Math.max(worst, Math.abs(theta - expected));
      }
      console.log(`vertical ${latDeg}°: worst |θ − atan(cos φ tan H)| = ${worst.toExponential(2)}°`);
      expect(worst).toBeLessThan(1e-6);
    });
  }

  it('vertical declining: sin ψ = cos φ cos D and tan H₀ = tan D / sin φ (Waugh 1973, memory)', () => {
    for (const latDeg of [35, 51.5]) {
      for (const D of [-70, -35, 20, 55]) {
        const face = planarFace({ type: 'vertical', latitudeRad: latDeg * DEG, declinationRad: D * DEG });
        expect(Math.abs(Math.sin(face.styleHeightRad) - Math.cos(latDeg * DEG) * Math.cos(D * DEG))).toBeLessThan(1e-12);
        expect(Math.abs(face.substyleHourAngleRad - Math.atan(Math.tan(D * DEG) / Math.sin(latDeg * DEG)))).toBeLessThan(1e-12);
        // The hour line of H₀ lies on the substyle (both edges: the noon band).
        const set = hourLine(face, { thicknessMm: 3, heightMm: 80 }, face.substyleHourAngleRad)!;
        expect(set.lines.length).toBe(2);
      }
    }
  });

  it('style heights: horizontal ψ = |φ|, polar and meridian ψ = 0, equatorial ψ = 90° (docs/design.md §8)', () => {
    const phi = 47.3 * DEG;
    expect(planarFace({ type: 'horizontal', latitudeRad: phi }).styleHeightRad).toBeCloseTo(phi, 12);
    expect(planarFace({ type: 'polar', latitudeRad: phi }).styleHeightRad).toBeLessThan(1e-12);
    expect(planarFace({ type: 'meridian', latitudeRad: phi, facing: 'east' }).styleHeightRad).toBeLessThan(1e-12);
    expect(planarFace({ type: 'meridian', latitudeRad: phi, facing: 'east' }).substyleHourAngleRad).toBeCloseTo(-Math.PI / 2, 12);
    expect(planarFace({ type: 'meridian', latitudeRad: phi, facing: 'west' }).substyleHourAngleRad).toBeCloseTo(Math.PI / 2, 12);
    expect(planarFace({ type: 'equatorial', latitudeRad: phi, side: 'upper' }).styleHeightRad).toBeCloseTo(Math.PI / 2, 9);
  });

  it('meridian dial: offsets h · tan(H − H₀) from the substyle (Waugh 1973, memory)', () => {
    const face = planarFace({ type: 'meridian', latitudeRad: 44 * DEG, facing: 'west' });
    const h = 60;
    for (const Hdeg of [20, 45, 90, 120, 150]) {
      const line = hourLine(face, { thicknessMm: 0, heightMm: h }, Hdeg * DEG)!.lines[0].line;
      const sub = [0, 0] as const;
      // distance from the substyle (through the origin) across it
      const dist = (line.point[0] - sub[0]) * line.direction[1] - (line.point[1] - sub[1]) * line.direction[0];
      expect(Math.abs(Math.abs(dist) - h * Math.abs(Math.tan((Hdeg - 90) * DEG)))).toBeLessThan(1e-9);
    }
  });
});

describe('the polar case of the general method reproduces the polar layout', () => {
  it('every mark of the demo and a southern spec: same x, to 1e-9 mm', () => {
    for (const file of ['../../../../fixtures/demo.yaml', '../../../../fixtures/golden-specs/south-waterjet.yaml']) {
      const spec = parseSpec(parse(readFileSync(new URL(file, import.meta.url), 'utf8')));
      const layout = layoutDial(spec);
      const face = planarFace({ type: 'polar', latitudeRad: spec.site.latitude * DEG });
      const gnomon = { thicknessMm: spec.gnomon.thickness, heightMm: spec.gnomon.height };
      let worst = 0;
      for (const m of layout.marks) {
        const set = hourLine(face, gnomon, m.hourAngleDeg * DEG)!;
        const x = set.lines.map((l) => l.line.point[0]);
        const match = Math.min(...x.map((v) => Math.abs(v - m.xMm)));
        worst = Math.max(worst, match);
        for (const l of set.lines) expect(Math.abs(l.line.direction[0])).toBeLessThan(1e-12);
      }
      expect(worst).toBeLessThan(1e-9);
      // and the closed form the polar layout uses, per hour angle
      const H = 37 * DEG;
      const west = hourLine(face, gnomon, -H)!.lines[0].line.point[0];
      expect(Math.abs(west - eastToFaceX(markOffsetEastMm(-H, gnomon.heightMm, gnomon.thicknessMm, 'west'), layout.hemisphere))).toBeLessThan(1e-9);
    }
  });
});

/**
 * The Sun's direction in the horizon frame (x east, y north, z up) from
 * astronomy-engine: topocentric apparent equator of date, then Horizon
 * without refraction; and its topocentric hour angle and declination.
 */
function sunFromAstronomyEngine(date: Date, latDeg: number, lonDeg: number) {
  const obs = new Observer(latDeg, lonDeg, 0);
  const time = MakeTime(date);
  const eq = Equator(Body.Sun, time, obs, true, true);
  const hor = Horizon(time, obs, eq.ra, eq.dec);
  const az = hor.azimuth * DEG;
  const alt = hor.altitude * DEG;
  const enu: Vec3 = [Math.sin(az) * Math.cos(alt), Math.cos(az) * Math.cos(alt), Math.sin(alt)];
  let H = HourAngle(Body.Sun, time, obs) * 15;
  if (H > 180) H -= 360;
  return { enu, hourAngleRad: H * DEG, declinationRad: eq.dec * DEG };
}

describe('declining and reclining faces: the style shadow (astronomy-engine Sun) lies on the line for that time', () => {
  const cases: { name: string; o: FaceOrientation; lat: number; lon: number }[] = [
    { name: 'vertical declining 38° west at 51.5°N', o: { type: 'vertical', latitudeRad: 51.5 * DEG, declinationRad: 38 * DEG }, lat: 51.5, lon: -2.6 },
    { name: 'vertical declining 62° east at 40.4°N', o: { type: 'vertical', latitudeRad: 40.4 * DEG, declinationRad: -62 * DEG }, lat: 40.4, lon: -3.7 },
    { name: 'declining 25° west, reclining 30° at 47°N', o: { type: 'vertical', latitudeRad: 47 * DEG, declinationRad: 25 * DEG, reclinationRad: 30 * DEG }, lat: 47, lon: 8.5 },
    { name: 'declining 40° east, inclining 15° at 33.9°S', o: { type: 'vertical', latitudeRad: -33.9 * DEG, declinationRad: -40 * DEG, reclinationRad: -15 * DEG }, lat: -33.9, lon: 18.4 },
    { name: 'horizontal at 60°N', o: { type: 'horizontal', latitudeRad: 60 * DEG }, lat: 60, lon: 10.7 },
    { name: 'meridian east at 45°N', o: { type: 'meridian', latitudeRad: 45 * DEG, facing: 'east' }, lat: 45, lon: 7.7 },
    { name: 'equatorial upper at 52°N', o: { type: 'equatorial', latitudeRad: 52 * DEG, side: 'upper' }, lat: 52, lon: 13.4 },
  ];
  for (const c of cases) {
    it(`${c.name}: within 0.001 mm`, () => {
      const face = planarFace(c.o);
      const gnomon = { thicknessMm: 4, heightMm: 90 };
      let worst = 0;
      let n = 0;
      // Instants every 47 minutes over 2026 at a 13-day stride: a spread of hours and declinations.
      for (let day = 0; day < 365; day += 13) {
        for (let min = 0; min < 1440; min += 47) {
          const date = new Date(Date.UTC(2026, 0, 1 + day) + min * 60_000);
          const sun = sunFromAstronomyEngine(date, c.lat, c.lon);
          if (!faceSeesSun(face, sun.enu)) continue;
          const set = hourLine(face, gnomon, sun.hourAngleRad);
          if (!set) continue;
          for (const { edge, line } of set.lines) {
            const A = styleEdgeAnchor(face, gnomon, edge);
            // Two points of the style edge, 40 and 120 mm along the style from its anchor.
            for (const L of [40, 120]) {
              const P: Vec3 = [A[0] + L * face.style[0], A[1] + L * face.style[1], A[2] + L * face.style[2]];
              const X = nodusShadow(face, P, sun.enu)!;
              const dist = Math.abs((X[0] - line.point[0]) * line.direction[1] - (X[1] - line.point[1]) * line.direction[0]);
              // Keep to shadows within 2 m of the root, as a real face would.
              if (Math.hypot(X[0], X[1]) > 2000) continue;
              worst = Math.max(worst, dist);
              n++;
            }
          }
        }
      }
      console.log(`${c.name}: ${n} shadow points, worst distance from the line ${worst.toExponential(2)} mm`);
      expect(n).toBeGreaterThan(100);
      expect(worst).toBeLessThan(0.001);
    });
  }
});

describe('the hours a face can show over the year', () => {
  it('an equator-facing wall never sees the Sun at 6 h solar; a polar face sees it at noon all year (docs/design.md §8)', () => {
    const wall = planarFace({ type: 'vertical', latitudeRad: 50 * DEG, declinationRad: 0 });
    expect(litDeclinations(wall, -90 * DEG)).toBeNull();
    expect(litDeclinations(wall, 90 * DEG)).toBeNull();
    const noon = litDeclinations(wall, 0)!;
    expect(noon.minRad).toBeLessThan(-23 * DEG);
    expect(noon.maxRad).toBeGreaterThan(23 * DEG);
  });
  it('a wall declining 60° west at 50°N sees no sun at 9 h solar but does at 17 h', () => {
    const wall = planarFace({ type: 'vertical', latitudeRad: 50 * DEG, declinationRad: 60 * DEG });
    expect(litDeclinations(wall, -45 * DEG)).toBeNull();
    expect(litDeclinations(wall, 75 * DEG)).not.toBeNull();
  });
});
