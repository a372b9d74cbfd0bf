import { Seasons, SunPosition } from 'astronomy-engine';
import { describe, expect, test } from 'vitest';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import { declinationOnDate } from './declinationOnDate.ts';
import { OBLIQUITY_J2000_RAD } from './obliquity.ts';
import { standardDateLines } from './standardDateLines.ts';

const DEG = Math.PI / 180;

describe('standardDateLines', () => {
  const lines = standardDateLines(2025);

  test('twelve entries in date order, with plain labels', () => {
    expect(lines.length).toBe(12);
    expect(lines.map((l) => l.label)).toEqual([
      'Sun enters Aquarius', 'Sun enters Pisces', 'March equinox', 'Sun enters Taurus', 'Sun enters Gemini', 'June solstice',
      'Sun enters Leo', 'Sun enters Virgo', 'September equinox', 'Sun enters Scorpio', 'Sun enters Sagittarius', 'December solstice',
    ]);
    for (const l of lines) expect(l.dateUtc.getUTCFullYear()).toBe(2025);
    expect(lines.filter((l) => l.kind === 'solstice').length).toBe(2);
    expect(lines.find((l) => l.label === 'June solstice')?.sign).toBe('Cancer');
  });

  // astronomy-engine Seasons(year) (general-purpose ephemeris): solstices and equinoxes within 1 min.
  test('cardinal moments match astronomy-engine Seasons within 1 min', () => {
    const s = Seasons(2025);
    const pairs: [string, Date][] = [
      ['March equinox', s.mar_equinox.date], ['June solstice', s.jun_solstice.date],
      ['September equinox', s.sep_equinox.date], ['December solstice', s.dec_solstice.date],
    ];
    let worst = 0;
    for (const [label, date] of pairs) {
      const ours = lines.find((l) => l.label === label)!;
      worst = Math.max(worst, Math.abs(ours.dateUtc.getTime() - date.getTime()) / 1000);
    }
    console.log(`cardinal moments vs Seasons: largest difference ${worst.toFixed(2)} s`);
    expect(worst).toBeLessThan(60);
  });

  test('each moment has the Sun at its multiple of 30° (astronomy-engine SunPosition) within 0.1″', () => {
    let worst = 0;
    for (const l of lines) {
      let d = SunPosition(l.dateUtc).elon - l.eclipticLongitudeDeg;
      d = ((d + 540) % 360) - 180;
      worst = Math.max(worst, Math.abs(d) * 3600);
    }
    console.log(`sign entries: largest longitude error ${worst.toFixed(3)}″`);
    expect(worst).toBeLessThan(0.1 + 0.05); // the Date keeps whole milliseconds (0.04″ of solar motion per s)
  });

  // Solstice declinations ≈ ±ε (23.44°; the obliquity of date differs from ε(J2000) by 0.003°
  // plus nutation up to 0.003°): within 0.01°. Equinox declination within 0.001° of 0.
  test('declinations: solstices ±23.44°, equinoxes 0°, signs ±11.47° and ±20.15°', () => {
    const byLabel = (label: string): number => lines.find((l) => l.label === label)!.declinationRad / DEG;
    const eps = OBLIQUITY_J2000_RAD / DEG;
    console.log(`solstice declinations 2025: ${byLabel('June solstice').toFixed(5)}°, ${byLabel('December solstice').toFixed(5)}°`);
    expectClose(byLabel('June solstice'), eps, 0.01, 'June solstice δ', '°');
    expectClose(byLabel('December solstice'), -eps, 0.01, 'December solstice δ', '°');
    expectClose(byLabel('March equinox'), 0, 0.001, 'March equinox δ', '°');
    expectClose(byLabel('September equinox'), 0, 0.001, 'September equinox δ', '°');
    // δ = asin(sin ε · sin λ) for λ = 30°, 60° (spherical astronomy, common practice)
    expectClose(byLabel('Sun enters Taurus'), Math.asin(Math.sin(eps * DEG) * 0.5) / DEG, 0.01, 'Taurus δ', '°');
    expectClose(byLabel('Sun enters Gemini'), Math.asin(Math.sin(eps * DEG) * Math.sin(60 * DEG)) / DEG, 0.01, 'Gemini δ', '°');
  });

  test('rejects a bad year', () => {
    expect(() => standardDateLines(2025.5)).toThrow(/year/);
  });
});

describe('declinationOnDate', () => {
  test('June 21 near +23.44°, local mean noon changes it slightly', () => {
    expect(declinationOnDate('2025-06-21') / DEG).toBeCloseTo(23.44, 1);
    const east = declinationOnDate('2025-03-20', 150);
    const west = declinationOnDate('2025-03-20', -150);
    expect(west).toBeGreaterThan(east); // March: δ increasing, west site's noon is later
  });

  test('rejects a bad date', () => {
    expect(() => declinationOnDate('2025-13-01')).toThrow(/dateLocal/);
  });
});
