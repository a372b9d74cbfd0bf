import { Body, Equator, MakeTime, Observer, SiderealTime } from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { distanceToPaths } from '../shadow/curveCheck.ts';
import { DEG } from '../guards.ts';
import { nodusShadowOf, planarSiteDateLine, shadowRuns, type NodusTrace } from './planarDateLine.ts';
import type { PlanarFace } from './planarTypes.ts';
import type { PlanarGnomon } from './styleEdgeAnchor.ts';
import { sunDirectionEnu } from './sunDirectionEnu.ts';
import { observerMeridianAu, topocentricSun } from '../sun/topocentricSun.ts';
import { planarFace } from './planarFace.ts';
import { planarMeanTimeCurve } from './planarMeanTimeCurve.ts';

/**
 * The textbook date line, the reference of these tests (no longer drawn: the layouts use the site-based
 * `planarSiteDateLine`): the nodus shadow X = N − s (n · (N − O))/(n · s) (docs/design.md §8) with the Sun
 * seen from the Earth's centre at a fixed declination δ, over the given hour angles, split into runs.
 */
function geocentricDateLine(face: PlanarFace, gnomon: PlanarGnomon, declinationRad: number, hourAngles: readonly number[]): readonly NodusTrace[] {
  const phi = face.orientation.latitudeRad;
  return shadowRuns(hourAngles.map((H) => nodusShadowOf(face, gnomon, { sun: sunDirectionEnu(phi, H, declinationRad), hourAngleRad: H })));
}

const hours = Array.from({ length: 141 }, (_, i) => (-70 + i) * DEG);

describe('date lines of a nodus on any face', () => {
  it('polar face: y = −tan δ · √(h² + (|x| − t/2)²) (docs/design.md §2, the handbook formula)', () => {
    const face = planarFace({ type: 'polar', latitudeRad: 48 * DEG });
    const g = { thicknessMm: 3, heightMm: 50 };
    let worst = 0;
    for (const d of [-23.44, -11.5, 11.5, 23.44]) {
      for (const run of geocentricDateLine(face, g, d * DEG, hours)) {
        for (const [x, y] of run.points) worst = Math.max(worst, Math.abs(y + Math.tan(d * DEG) * Math.hypot(50, Math.abs(x) - 1.5)));
      }
    }
    expect(worst).toBeLessThan(1e-9);
  });

  it('horizontal and declining faces: the equinox line is straight (the equinoctial line, common practice)', () => {
    for (const face of [planarFace({ type: 'horizontal', latitudeRad: 52 * DEG }), planarFace({ type: 'vertical', latitudeRad: 40 * DEG, declinationRad: 30 * DEG, reclinationRad: 10 * DEG })]) {
      const runs = geocentricDateLine(face, { thicknessMm: 0, heightMm: 60 }, 0, hours);
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
    const yAtNoon = (d: number) => geocentricDateLine(face, g, d * DEG, [0, 1e-6]).flatMap((r) => r.points)[0][1];
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

  it('seen from the site: within 0.0005 mm of the nodus shadow of astronomy-engine\'s site-based Sun at the line\'s declination (a declining wall and a horizontal face)', () => {
    // Reference (astronomy-engine): through 21 June 2027 every 2 minutes, the real Sun's parallax (topocentric
    // Equator from Observer(47.4° N, 8.5° E) minus geocentric) applied to the line's declination, then the nodus shadow.
    const LAT = 47.4;
    const LON = 8.5;
    const site = new Observer(LAT, LON, 0);
    const centre = new Observer(0, 0, -6378136.6);
    const g = { thicknessMm: 4, heightMm: 90 };
    const dec = 23.4 * DEG;
    for (const face of [planarFace({ type: 'vertical', latitudeRad: LAT * DEG, declinationRad: 24.5 * DEG }), planarFace({ type: 'horizontal', latitudeRad: LAT * DEG })]) {
      const runs = planarSiteDateLine(face, g, { declinationRad: dec, distanceAu: 1.016, hourAngles: hours.filter((_, i) => i % 5 === 0) });
      // As drawn before: the geocentric Sun every 0.25° of hour angle.
      const geo = geocentricDateLine(face, g, dec, Array.from({ length: 561 }, (_, i) => (-70 + i / 4) * DEG));
      let worst = 0;
      let worstGeo = 0;
      let n = 0;
      for (let ms = Date.UTC(2027, 5, 21, 3); ms < Date.UTC(2027, 5, 21, 19); ms += 120_000) {
        const t = MakeTime(new Date(ms));
        const topo = Equator(Body.Sun, t, site, true, true);
        const gc = Equator(Body.Sun, t, centre, true, true);
        const H = ((((SiderealTime(t) * 15 + LON - topo.ra * 15 + 540) % 360) - 180) * DEG);
        if (Math.abs(H) > 68 * DEG) continue;
        const X = nodusShadowOf(face, g, { sun: sunDirectionEnu(LAT * DEG, H, dec + (topo.dec - gc.dec) * DEG), hourAngleRad: H });
        if (!X || Math.hypot(X.point[0], X.point[1]) > 400) continue;
        const d = distanceToPaths(X.point, runs.map((r) => r.points));
        const dGeo = distanceToPaths(X.point, geo.map((r) => r.points));
        if (d === null || dGeo === null) continue;
        worst = Math.max(worst, d);
        worstGeo = Math.max(worstGeo, dGeo);
        n++;
      }
      console.log(`${face.orientation.type}: site-based ${worst.toExponential(2)} mm, geocentric every 0.25° ${worstGeo.toExponential(2)} mm, over ${n} Sun positions`);
      expect(n).toBeGreaterThan(100);
      expect(worst).toBeLessThan(0.00051);
    }
  });

  it('runs to sunset: the line ends within 0.0005 mm of the nodus shadow at the sunset hour angle of Meeus eq. 15.1 (a declining wall, an equatorial lower face)', () => {
    // Reference: J. Meeus, Astronomical Algorithms (2nd ed.), ch. 15, eq. 15.1, cos H₀ = (sin h₀ − sin φ sin δ)/(cos φ cos δ),
    // with h₀ = +π, the Sun's horizontal parallax 8.794″/r (ch. 40): the face counts the Sun's centre on the
    // geometric horizon as seen from the site (no refraction), i.e. the geocentric Sun π above it. Before the
    // end was bisected the lines stopped at the last 0.25° sample before sunset, 0.2 to 1.8 mm short on this grid.
    const PARALLAX_RAD = (8.794 / 3600) * DEG;
    const grid = Array.from({ length: 721 }, (_, i) => (-90 + i / 4) * DEG);
    const cases = [
      { face: planarFace({ type: 'vertical', latitudeRad: 47.4 * DEG, declinationRad: 24.5 * DEG }), g: { thicknessMm: 4, heightMm: 90 }, decDeg: -23.44, r: 0.9833, signs: [1] },
      { face: planarFace({ type: 'vertical', latitudeRad: 47.4 * DEG, declinationRad: 24.5 * DEG }), g: { thicknessMm: 4, heightMm: 90 }, decDeg: 0, r: 0.996, signs: [1] },
      { face: planarFace({ type: 'equatorial', latitudeRad: 40.6 * DEG, side: 'lower' }), g: { thicknessMm: 6, heightMm: 50 }, decDeg: -23.44, r: 0.9833, signs: [-1, 1] },
    ];
    let worst = 0;
    for (const { face, g, decDeg, r, signs } of cases) {
      const phi = face.orientation.latitudeRad;
      const dec = decDeg * DEG;
      const h0 = PARALLAX_RAD / r;
      const H0 = Math.acos((Math.sin(h0) - Math.sin(phi) * Math.sin(dec)) / (Math.cos(phi) * Math.cos(dec)));
      const runs = planarSiteDateLine(face, g, { declinationRad: dec, distanceAu: r, hourAngles: grid });
      const ends = runs.flatMap((run) => [run.points[0], run.points[run.points.length - 1]]);
      for (const sign of signs) {
        // The shadow a hair (1e-7 rad, under 1e-4 mm here) inside the lit side of the reference sunset.
        const H = sign * (H0 - 1e-7);
        const seen = topocentricSun(H, dec, r, phi, observerMeridianAu(phi / DEG, 0));
        const X = nodusShadowOf(face, g, { sun: seen.enu, hourAngleRad: seen.hourAngleRad });
        expect(X).not.toBeNull();
        const gap = Math.min(...ends.map((p) => Math.hypot(p[0] - X!.point[0], p[1] - X!.point[1])));
        console.log(`${face.orientation.type} δ ${decDeg}°: sunset H₀ ${((sign * H0) / DEG).toFixed(5)}°, drawn end ${gap.toExponential(2)} mm from its shadow`);
        worst = Math.max(worst, gap);
      }
    }
    expect(worst).toBeLessThan(0.0005);
  });
});
