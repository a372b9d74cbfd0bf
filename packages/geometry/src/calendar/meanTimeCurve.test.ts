import { describe, expect, test } from 'vitest';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import { equationOfTimeTable } from '../sun/equationOfTimeTable.ts';
import { SUN_REFERENCE } from '../sun/referenceValues.testdata.ts';
import { meanTimeCurve } from './meanTimeCurve.ts';

const DEG = Math.PI / 180;
const H = 100;

describe('meanTimeCurve', () => {
  const noon = meanTimeCurve({ clockTime: '12:00', year: 2025, heightMm: H, longitudeDeg: 0, standardMeridianDeg: 0, hemisphere: 'north' });

  test('daily samples from Jan 1 to the next Jan 1 (closed loop), one polyline for a thin gnomon', () => {
    expect(noon.samples.length).toBe(366);
    expect(noon.samples[0].date).toBe('2025-01-01');
    expect(noon.samples[365].date).toBe('2026-01-01');
    expect(noon.polylines.length).toBe(1);
    expect(noon.polylines[0].length).toBe(366);
  });

  // Figure-eight span: at the standard meridian, 12:00 gives H = E/4 min·°, so x spans
  // h·tan(E_min/4°) … h·tan(E_max/4°) with E's extremes from the daily table (within 0.01 mm),
  // and those extremes are about −14.2 and +16.4 min (common practice; 0.3 min ≈ 0.13 mm here).
  test('figure-eight spans x = h·tan(E extremes / 4 min·°)', () => {
    const table = equationOfTimeTable(2025, 1).map((r) => r.minutes);
    const eMax = Math.max(...table);
    const eMin = Math.min(...table);
    const xs = noon.samples.map((s) => s.xMm);
    const xMax = Math.max(...xs);
    const xMin = Math.min(...xs);
    const errMax = Math.abs(xMax - H * Math.tan((eMax / 4) * DEG));
    const errMin = Math.abs(xMin - H * Math.tan((eMin / 4) * DEG));
    console.log(`figure-eight x span ${xMin.toFixed(3)} … ${xMax.toFixed(3)} mm; vs table extremes: ${errMin.toExponential(2)}, ${errMax.toExponential(2)} mm`);
    expectClose(xMax, H * Math.tan((eMax / 4) * DEG), 0.01, 'east end of the figure eight', ' mm');
    expectClose(xMin, H * Math.tan((eMin / 4) * DEG), 0.01, 'west end of the figure eight', ' mm');
    const ref = SUN_REFERENCE.equation_of_time_extremes;
    expectClose(xMax, H * Math.tan((ref.max.minutes / 4) * DEG), 0.15, 'east end vs common practice', ' mm');
    expectClose(xMin, H * Math.tan((ref.min.minutes / 4) * DEG), 0.15, 'west end vs common practice', ' mm');
    // y spans the solstice lines: −h·tan(±23.44°)/cos H
    const ys = noon.samples.map((s) => s.yMm);
    expect(Math.min(...ys)).toBeCloseTo(-H * Math.tan(23.44 * DEG), 0);
    expect(Math.max(...ys)).toBeCloseTo(H * Math.tan(23.44 * DEG), 0);
  });

  test('every sample obeys x = ±(t/2 + h|tanH|), y = −tanδp·√(h² + (|x| − t/2)²) (docs/design.md §2, §3)', () => {
    const t = 8;
    const c = meanTimeCurve({ clockTime: '09:00', year: 2025, heightMm: H, thicknessMm: t, longitudeDeg: -9.14, standardMeridianDeg: 0, hemisphere: 'north', stepDays: 10 });
    let worst = 0;
    for (const s of c.samples) {
      const hDeg = 15 * (9 - 12) + (-9.14 - 0) + s.equationOfTimeMin / 4;
      expect(s.hourAngleRad).toBeCloseTo(hDeg * DEG, 12);
      expect(s.style).toBe('west');
      const x = -(t / 2 + H * Math.abs(Math.tan(s.hourAngleRad)));
      const y = (-H * Math.tan(s.declinationRad)) / Math.cos(s.hourAngleRad);
      worst = Math.max(worst, Math.abs(s.xMm - x), Math.abs(s.yMm - y));
    }
    expect(worst).toBeLessThan(1e-9);
  });

  test('thick gnomon: the noon curve splits where the shadow jumps across the gnomon', () => {
    const t = 6;
    const c = meanTimeCurve({ clockTime: '12:00', year: 2025, heightMm: H, thicknessMm: t, longitudeDeg: 0, standardMeridianDeg: 0, hemisphere: 'north' });
    // E changes sign four times a year (mid-April, mid-June, early September, late December).
    expect(c.polylines.length).toBe(5);
    for (const s of c.samples) expect(Math.abs(s.xMm)).toBeGreaterThanOrEqual(t / 2);
    expect(c.polylines.reduce((n, p) => n + p.length, 0)).toBe(c.samples.length);
  });

  test('southern hemisphere mirrors x and flips the pole-ward declination', () => {
    const s = meanTimeCurve({ clockTime: '12:00', year: 2025, heightMm: H, longitudeDeg: 0, standardMeridianDeg: 0, hemisphere: 'south' });
    s.samples.forEach((p, i) => {
      expect(p.xMm).toBeCloseTo(-noon.samples[i].xMm, 12);
      expect(p.yMm).toBeCloseTo(-noon.samples[i].yMm, 12);
    });
  });

  test('with latitudeDeg and chordToleranceMm: the Sun seen from the site, refined between the 2-day samples, the loop closed on 1 January', () => {
    const opts = { clockTime: '10:00', year: 2025, heightMm: H, longitudeDeg: 8.5, standardMeridianDeg: 15, hemisphere: 'north', stepDays: 2 } as const;
    const geo = meanTimeCurve(opts);
    const site = meanTimeCurve({ ...opts, latitudeDeg: 47.4, chordToleranceMm: 0.0005 });
    expect(site.samples[0].date).toBe('2025-01-01');
    expect(site.samples[site.samples.length - 1].date).toBe('2026-01-01');
    expect(site.samples.length).toBeGreaterThan(geo.samples.length);
    // Every 2-day sample is still there, moved by the diurnal parallax only: under 9″ of hour angle and declination (8.8″ at most, docs/design.md §3).
    const byTime = new Map(site.samples.map((s) => [s.dateUtc.getTime(), s]));
    let worst = 0;
    for (const g of geo.samples) {
      const s = byTime.get(g.dateUtc.getTime())!;
      worst = Math.max(worst, Math.abs(s.hourAngleRad - g.hourAngleRad), Math.abs(s.declinationRad - g.declinationRad));
    }
    expect(worst).toBeGreaterThan(0);
    expect(worst).toBeLessThan((9 / 3600) * DEG);
  });

  test('refuses a clock time the face cannot show, naming clockTime', () => {
    expect(() => meanTimeCurve({ clockTime: '05:30', year: 2025, heightMm: H, longitudeDeg: 0, standardMeridianDeg: 0, hemisphere: 'north' })).toThrow(/clockTime.*"05:30"/);
    expect(() => meanTimeCurve({ clockTime: '12:00', year: 2025, heightMm: H, longitudeDeg: 0, standardMeridianDeg: 0, hemisphere: 'north', stepDays: 0 })).toThrow(/stepDays/);
  });
});
