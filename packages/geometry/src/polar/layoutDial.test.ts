import { describe, expect, it } from 'vitest';
import { parseSpec } from '../spec/parseSpec.ts';
import { layoutDial } from './layoutDial.ts';

const DEG = Math.PI / 180;

function spec(over: Record<string, unknown> = {}, site: Record<string, unknown> = {}) {
  return parseSpec({ site: { latitude: 40, longitude: 0, timezone: 'UTC', ...site }, ...over });
}

describe('layoutDial: the tan law with a thick gnomon', () => {
  // Source: the polar-dial tan law x = h·tan H (docs/design.md §2; A. E. Waugh, "Sundials:
  // Their Theory and Construction", Dover 1973 — memory), with the two style
  // edges of a gnomon of thickness t at ±t/2 (docs/design.md §2).
  it('puts every mark at |x| = t/2 + h·|tan H| over latitudes, heights and thicknesses, both hemispheres', () => {
    let worst = 0;
    let cases = 0;
    for (const latitude of [-89, -66.5, -35, -5, 0.5, 12, 40, 51.5, 70, 89]) {
      for (const height of [25, 50, 123.4]) {
        for (const thickness of [0.5, 3, 12]) {
          const l = layoutDial(spec({ gnomon: { height, thickness }, holes: { count: 0 } }, { latitude }));
          for (const m of l.marks) {
            const H = m.hourAngleDeg * DEG;
            const expected = thickness / 2 + height * Math.abs(Math.tan(H));
            worst = Math.max(worst, Math.abs(Math.abs(m.xMm) - expected));
            cases++;
            // Mornings are cast by the west style, afternoons by the east style.
            if (m.hourAngleDeg < 0) expect(m.style).toBe('west');
            if (m.hourAngleDeg > 0) expect(m.style).toBe('east');
            // Seen face-on, pole-ward end up: mornings on the left in the north, on the right in the south.
            const westSide = latitude >= 0 ? -1 : 1;
            if (m.style === 'west') expect(Math.sign(m.xMm)).toBe(westSide);
            else expect(Math.sign(m.xMm)).toBe(-westSide);
          }
        }
      }
    }
    expect(cases).toBeGreaterThan(3000);
    expect(worst).toBeLessThan(1e-9);
  });

  it('draws the noon band of a solar dial as two lines at ±t/2', () => {
    const l = layoutDial(spec({ gnomon: { height: 60, thickness: 4 } }));
    const noon = l.marks.filter((m) => m.label === '12:00');
    expect(noon.map((m) => [m.style, m.xMm])).toEqual([
      ['west', -2],
      ['east', 2],
    ]);
  });

  // Common practice (the 45° triangle check): at 09:00 and 15:00 apparent time
  // (|H| = 45°) the line lies exactly one gnomon height from its style edge.
  it('passes the 45° check for a solar-time dial', () => {
    for (const [h, t] of [[50, 3], [80, 6], [33.3, 1.2]]) {
      const l = layoutDial(spec({ gnomon: { height: h, thickness: t } }));
      const nine = l.marks.find((m) => m.label === '09:00')!;
      const three = l.marks.find((m) => m.label === '15:00')!;
      expect(Math.abs(Math.abs(nine.xMm) - t / 2 - h)).toBeLessThan(1e-9);
      expect(Math.abs(Math.abs(three.xMm) - t / 2 - h)).toBeLessThan(1e-9);
    }
  });
});

describe('layoutDial: longitude correction', () => {
  // Common practice: 4 minutes of time per degree of longitude between the site
  // and its zone's standard meridian; a site west of the meridian sees noon later.
  const cases = [
    { tz: 'Europe/London', lon: -3.41, meridian: 0 }, // zone with daylight saving (BST)
    { tz: 'Europe/Berlin', lon: 13.4, meridian: 15 }, // daylight saving, site west of 15°E
    { tz: 'Asia/Kolkata', lon: 88.36, meridian: 82.5 }, // no daylight saving, UTC+05:30, site east
    { tz: 'America/Phoenix', lon: -112.07, meridian: -105 }, // no daylight saving
    { tz: 'America/Denver', lon: -104.99, meridian: -105 }, // daylight saving, site a hair east
    { tz: 'Australia/Sydney', lon: 151.21, meridian: 150 }, // southern zone with daylight saving
  ];
  for (const c of cases) {
    it(`${c.tz}: meridian ${c.meridian}°, correction 4·(λs − λ) min`, () => {
      const l = layoutDial(spec({ dial: { reads: 'standard' }, hours: { from: '08:00', to: '16:00' } }, { longitude: c.lon, timezone: c.tz, latitude: c.tz.startsWith('Australia') ? -33.9 : 40 }));
      expect(l.time.standardMeridianDeg).toBe(c.meridian);
      expect(Math.abs(l.time.longitudeCorrectionMin - 4 * (c.meridian - c.lon))).toBeLessThan(1e-9);
      // Every line shifts by (λ − λs) degrees of hour angle: H = 15°(T − 12 h) + (λ − λs).
      for (const m of l.marks) {
        const T = Number(m.label.slice(0, 2)) + Number(m.label.slice(3)) / 60;
        expect(Math.abs(m.hourAngleDeg - (15 * (T - 12) + (c.lon - c.meridian)))).toBeLessThan(1e-8);
      }
      // West of the meridian the 12:00 line lies on the morning (west) side.
      const noon = l.marks.find((m) => m.label === '12:00')!;
      expect(noon.style).toBe(c.lon < c.meridian ? 'west' : 'east');
    });
  }

  it('leaves a solar-time dial unshifted but still reports the correction', () => {
    const l = layoutDial(spec({}, { longitude: -8.61, timezone: 'Europe/Lisbon' }));
    expect(l.time.hourAngleShiftDeg).toBe(0);
    expect(l.time.longitudeCorrectionMin).toBeCloseTo(34.44, 9);
  });
});

describe('layoutDial: limits and plate', () => {
  it('refuses 06:00 (|H| = 90°) naming the hour and the widest range', () => {
    expect(() => layoutDial(spec({ hours: { from: '06:00' } }))).toThrow(/hours\.from.*06:00 \(hour angle -90\.0°\).*07:00–17:00/);
  });

  it('refuses a fixed plate too narrow for the hours, with the range that fits', () => {
    expect(() => layoutDial(spec({ plate: { width: 200 } }))).toThrow(/plate\.width.*fall off a 200 mm plate.*narrow hours to \d\d:\d\d–\d\d:\d\d/);
  });

  it('sizes an auto plate around every mark, numeral and hole', () => {
    const l = layoutDial(spec());
    const half = l.plate.widthMm / 2;
    for (const m of l.marks) expect(Math.abs(m.xMm) + m.widthMm / 2 + l.spec.plate.margin).toBeLessThanOrEqual(half + 1e-9);
    for (const n of l.numerals) for (const s of n.strokes) for (const [x, y] of s.points) {
      expect(Math.abs(x)).toBeLessThan(half);
      expect(y + l.plate.faceOriginY).toBeGreaterThan(l.spec.plate.margin - 1e-9);
    }
    expect(l.plate.substyleX).toBe(half);
  });

  it('makes each slot the tab plus the fit clearance on every side', () => {
    const l = layoutDial(spec({ process: { method: 'laser', clearance: 0.15 }, gnomon: { thickness: 4, tabLength: 12 } }));
    for (const s of l.plate.slots) {
      expect(s.widthMm).toBeCloseTo(4 + 0.3, 12);
      expect(s.heightMm).toBeCloseTo(12 + 0.3, 12);
    }
  });

  it('is deterministic', () => {
    expect(JSON.stringify(layoutDial(spec()))).toBe(JSON.stringify(layoutDial(spec())));
  });
});
