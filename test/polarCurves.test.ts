import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { calendarLines, layoutDial, markField, meanTimeLines, nodusFootY, type DialLayout } from '@umbrafab/geometry';
import { readSpecFile } from '@umbrafab/cli';
import { Body, Equator, MakeTime, Observer, SiderealTime } from './checkAstronomy.ts';

// The polar date lines and mean-time curves against the nodus shadow of the Sun
// seen from the site, straight from astronomy-engine (reference library):
// `Equator(Body.Sun, t, Observer(φ, λ, 0), ofdate, aberration)` gives the
// topocentric RA/Dec, the hour angle is GAST + λ − α; the shadow then follows
// the polar face's formulas of docs/design.md §2 (x = ±(t/2 + h|tan H|),
// y = −h·tan δp / cos H, east on the right in the north).

const ROOT = join(import.meta.dirname, '..');
/** Every polar fixture with a nodus (gnomon.nodus: date lines; page-nodus and waterjet-nodus-60n also draw mean-time curves). */
const NODUS_FIXTURES = ['page-nodus', 'time-nodus', 'waterjet-nodus-60n', 'engrave-laser-south'];
/** The drawn curve against the site-based shadow, mm: the 0.001 mm the shadow-check tests hold every mark and curve to. */
const TOLERANCE_MM = 0.001;

type Vec2 = readonly [number, number];

/** The nodus shadow on the polar face (face coordinates, y from the face origin) of a Sun at topocentric hour angle H and declination δ. */
function shadowAt(layout: DialLayout, H: number, dec: number): Vec2 {
  const h = layout.gnomon.heightMm;
  const half = layout.gnomon.thicknessMm / 2;
  const north = layout.hemisphere === 'north';
  const dp = north ? dec : -dec;
  const xEast = Math.sign(H || 1) * (half + h * Math.abs(Math.tan(H)));
  return [north ? xEast : -xEast, (-h * Math.tan(dp)) / Math.cos(H) + nodusFootY(layout)];
}

/** The real Sun from the site at an instant: topocentric hour angle and declination, and the geocentric ones. */
function siteSun(layout: DialLayout, utcMs: number) {
  const { latitude, longitude } = layout.spec.site;
  const t = MakeTime(new Date(utcMs));
  const topo = Equator(Body.Sun, t, new Observer(latitude, longitude, 0), true, true);
  // A "site" at the Earth's centre (height −equatorial radius on the equator): astronomy-engine's terra() gives the zero vector.
  const geo = Equator(Body.Sun, t, new Observer(0, 0, -6378136.6), true, true);
  const ha = (ra: number) => ((((SiderealTime(t) * 15 + longitude - ra * 15 + 540) % 360) - 180) * Math.PI) / 180;
  return { H: ha(topo.ra), dec: (topo.dec * Math.PI) / 180, Hgeo: ha(geo.ra), decGeo: (geo.dec * Math.PI) / 180 };
}

/** Distance of X from the nearest drawn polyline; null outside the mark field or beyond a drawn end. */
function distanceToDrawn(layout: DialLayout, X: Vec2, polylines: readonly (readonly Vec2[])[]): number | null {
  const f = markField(layout);
  const inset = 0.5;
  if (!(X[0] > f.xMinMm + inset && X[0] < f.xMaxMm - inset && X[1] > f.yMinMm + inset && X[1] < f.yMaxMm - inset)) return null;
  let best = Infinity;
  let beyond = false;
  for (const p of polylines) {
    for (let i = 0; i + 1 < p.length; i++) {
      const dx = p[i + 1][0] - p[i][0];
      const dy = p[i + 1][1] - p[i][1];
      const raw = ((X[0] - p[i][0]) * dx + (X[1] - p[i][1]) * dy) / (dx * dx + dy * dy || 1);
      const u = Math.max(0, Math.min(1, raw));
      const d = Math.hypot(X[0] - p[i][0] - u * dx, X[1] - p[i][1] - u * dy);
      if (d < best) {
        best = d;
        beyond = (i === 0 && raw < 0) || (i + 2 === p.length && raw > 1);
      }
    }
  }
  return beyond ? null : best;
}

interface Worst {
  readonly label: string;
  readonly samples: number;
  readonly worstMm: number;
}

/** Each mean-time curve against the real Sun at its clock time on every day of the year. */
function meanTimeErrors(layout: DialLayout): Worst[] {
  const year = layout.spec.calendar.year;
  const offsetH = layout.time.standardMeridianDeg / 15;
  return meanTimeLines(layout).map((c) => {
    const [hh, mm] = c.clockTime.split(':').map(Number);
    let worstMm = 0;
    let samples = 0;
    for (let d = 0; d <= 365; d++) {
      const s = siteSun(layout, Date.UTC(year, 0, 1 + d, hh, mm) - offsetH * 3_600_000);
      const dist = distanceToDrawn(layout, shadowAt(layout, s.H, s.dec), c.polylines);
      if (dist === null) continue;
      samples++;
      worstMm = Math.max(worstMm, dist);
    }
    return { label: `${c.clockTime} mean time`, samples, worstMm };
  });
}

/**
 * Each date line against the nodus shadow at the line's declination as the
 * site sees it: through the line's date, every 2 minutes, the real Sun's
 * parallax (topocentric minus geocentric hour angle and declination) applied
 * to the line's geocentric declination.
 */
function dateLineErrors(layout: DialLayout): Worst[] {
  const ny = nodusFootY(layout);
  return calendarLines(layout).map((l) => {
    const drawn = l.branches.map((b) => b.map(([x, y]): Vec2 => [x, y + ny]));
    const dec = (l.declinationDeg * Math.PI) / 180;
    const day = Date.parse(`${l.dates[0]}T00:00:00Z`) - layout.spec.site.longitude * 240_000;
    let worstMm = 0;
    let samples = 0;
    for (let ms = day - 6 * 3_600_000; ms < day + 30 * 3_600_000; ms += 120_000) {
      const s = siteSun(layout, ms);
      if (Math.abs(s.H) > (80 * Math.PI) / 180) continue;
      const dist = distanceToDrawn(layout, shadowAt(layout, s.H, dec + (s.dec - s.decGeo)), drawn);
      if (dist === null) continue;
      samples++;
      worstMm = Math.max(worstMm, dist);
    }
    return { label: `date line ${l.label}`, samples, worstMm };
  });
}

describe.each(NODUS_FIXTURES)('polar curves of fixtures/specs/%s.yaml against the site-based Sun (astronomy-engine)', (name) => {
  const layout = layoutDial(readSpecFile(join(ROOT, 'fixtures/specs', `${name}.yaml`)));

  it(`date lines within ${TOLERANCE_MM} mm of the nodus shadow at their declination`, () => {
    const rows = dateLineErrors(layout);
    for (const r of rows) console.log(`${name}: ${r.label}: worst ${r.worstMm.toExponential(2)} mm over ${r.samples} Sun positions`);
    expect(rows.length).toBeGreaterThan(0);
    for (const r of rows) {
      expect(r.samples, r.label).toBeGreaterThan(100);
      expect(r.worstMm, r.label).toBeLessThan(TOLERANCE_MM);
    }
  });

  it(`mean-time curves within ${TOLERANCE_MM} mm of the real shadow at their clock time on every day`, () => {
    const rows = meanTimeErrors(layout);
    for (const r of rows) console.log(`${name}: ${r.label}: worst ${r.worstMm.toExponential(2)} mm over ${r.samples} days`);
    expect(rows.length > 0).toBe(layout.spec.dial.meanTimeCurves);
    for (const r of rows) {
      // An early or late hour's curve reaches the field only part of the year (page-nodus 08:00: 75 days).
      expect(r.samples, r.label).toBeGreaterThan(50);
      expect(r.worstMm, r.label).toBeLessThan(TOLERANCE_MM);
    }
  });
});
