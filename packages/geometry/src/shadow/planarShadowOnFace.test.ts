import { describe, expect, test } from 'vitest';
import { layoutPlanar } from '../planar/layoutPlanar.ts';
import { sunDirectionEnu } from '../planar/sunDirectionEnu.ts';
import { parseSpec } from '../spec/parseSpec.ts';
import type { Vec2 } from '../types.ts';
import { planarFaceVector, planarShadowOnFace } from './planarShadowOnFace.ts';

const DEG = Math.PI / 180;
const site = (latitude: number) => ({ latitude, longitude: 8.5, timezone: 'Europe/Zurich' });
const FACES = {
  horizontal: parseSpec({ site: site(52.2), face: { type: 'horizontal' }, gnomon: { height: 80, thickness: 3 }, hours: { from: '06:00', to: '18:00' }, dial: { reads: 'solar' } }),
  declining: parseSpec({ site: site(47.4), face: { type: 'vertical', wallDeclination: 24.5 }, gnomon: { height: 90, thickness: 4 }, hours: { from: '08:00', to: '17:00' }, dial: { reads: 'solar' } }),
  reclining: parseSpec({ site: site(-33.9), face: { type: 'vertical', wallDeclination: -20, reclination: 30 }, gnomon: { height: 70, thickness: 3 }, hours: { from: '08:00', to: '16:00' }, dial: { reads: 'solar' } }),
  meridian: parseSpec({ site: site(44.8), face: { type: 'meridian', facing: 'east' }, gnomon: { height: 40, thickness: 3 }, hours: { from: '06:00', to: '10:00' }, dial: { reads: 'solar' } }),
};

/** Signed distance of p from the line through a and b, mm (+: left of a→b). */
const offset = (p: Vec2, a: Vec2, b: Vec2) => {
  const d = [b[0] - a[0], b[1] - a[1]];
  const len = Math.hypot(d[0], d[1]);
  return ((p[1] - a[1]) * d[0] - (p[0] - a[0]) * d[1]) / len;
};
const along = (p: Vec2, a: Vec2, b: Vec2) => {
  const d = [b[0] - a[0], b[1] - a[1]];
  return ((p[0] - a[0]) * d[0] + (p[1] - a[1]) * d[1]) / Math.hypot(d[0], d[1]);
};

describe('planarShadowOnFace', () => {
  // Reference: each mark is its style edge's hour line (hourLine, held to Waugh 1973's formulae in hourLine.test.ts and to
  // astronomy-engine's Sun in checkPlanar); at the mark's hour angle the fin's shadow must run along it, beyond the root.
  test.each(Object.entries(FACES))('a %s fin casts its shadow along each hour line at that hour (equinox)', (_, spec) => {
    const layout = layoutPlanar(spec);
    let worst = 0;
    let checked = 0;
    for (const m of layout.marks.filter((k) => !k.underGnomon)) {
      const sun = planarFaceVector(layout, sunDirectionEnu(spec.site.latitude * DEG, m.hourAngleDeg * DEG, 0));
      if (!(sun[2] > 0.05)) continue;
      const shadow = planarShadowOnFace(layout, sun);
      expect(shadow.length, m.label).toBeGreaterThan(0);
      // The shadow's corners that lie on the line's side of the fin, away from its root: the nearest is on the line.
      const far = shadow.flatMap((p) => p.points).filter((p) => along(p, m.a, m.b) > 1);
      const nearest = Math.min(...far.map((p) => Math.abs(offset(p, m.a, m.b))));
      worst = Math.max(worst, nearest);
      checked++;
    }
    console.log(`planarShadowOnFace ${layout.faceType}: ${checked} lines, worst corner-to-line ${worst.toExponential(2)} mm`);
    expect(checked).toBeGreaterThan(3);
    expect(worst).toBeLessThan(1e-9);
  });

  test('an equatorial rod casts a band centred on the hour line (June, upper face)', () => {
    const spec = parseSpec({ site: site(40.6), face: { type: 'equatorial', side: 'upper' }, gnomon: { height: 50, thickness: 6 }, hours: { from: '06:00', to: '18:00' }, dial: { reads: 'solar' } });
    const layout = layoutPlanar(spec);
    let worst = 0;
    for (const m of layout.marks) {
      const sun = planarFaceVector(layout, sunDirectionEnu(40.6 * DEG, m.hourAngleDeg * DEG, 20 * DEG));
      const [band] = planarShadowOnFace(layout, sun);
      const offs = band.points.map((p) => offset(p, m.a, m.b));
      // Half the band on each side: its two extremes are ± the rod's radius about the line.
      worst = Math.max(worst, Math.abs(Math.max(...offs) + Math.min(...offs)));
      expect(Math.max(...offs)).toBeGreaterThan(2.9);
    }
    expect(worst).toBeLessThan(1e-9);
  });

  test('no shadow when the Sun is behind the face', () => {
    const layout = layoutPlanar(FACES.declining);
    expect(planarShadowOnFace(layout, [0.3, 0.2, -0.5])).toEqual([]);
    expect(planarShadowOnFace(layout, [0, 0, 0])).toEqual([]);
  });
});
