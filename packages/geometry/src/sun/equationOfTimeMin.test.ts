import { AstroTime, Body, HourAngle, Observer } from 'astronomy-engine';
import { describe, expect, test } from 'vitest';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import { equationOfTimeMin } from './equationOfTimeMin.ts';
import { SUN_REFERENCE } from './referenceValues.testdata.ts';

describe('equationOfTimeMin', () => {
  // Meeus, Astronomical Algorithms 2nd ed., Example 28.a: E = +13m42.6s at 1992 Oct 13.0 TD (memory).
  // Definitions of the mean sun differ by about 0.2 s (docs/design.md §7): tolerance 0.5 s.
  test('Meeus Example 28.a within 0.5 s', () => {
    const ref = SUN_REFERENCE.meeus_28a_equation_of_time_1992_10_13;
    const ut = AstroTime.FromTerrestrialTime(ref.jde - 2451545.0).date;
    const expectedS = ref.equationOfTime.sign * (ref.equationOfTime.m * 60 + ref.equationOfTime.s);
    const gotS = equationOfTimeMin(ut) * 60;
    console.log(`Meeus 28.a: E computed ${gotS.toFixed(3)} s, expected ${expectedS} s, error ${(gotS - expectedS).toFixed(3)} s`);
    expectClose(gotS, expectedS, 0.5, 'equation of time', ' s');
  });

  // astronomy-engine HourAngle (general-purpose ephemeris, topocentric at 0°N 0°E):
  // apparent time at Greenwich = HA + 12 h, so E = HA + 12 h − UT. Topocentric parallax
  // shifts it by under 0.6 s (docs/design.md §7): tolerance 1 s.
  test('agrees with astronomy-engine HourAngle at Greenwich within 1 s over a year', () => {
    const greenwich = new Observer(0, 0, 0);
    let worst = 0;
    for (let day = 0; day < 365; day += 3) {
      for (const hour of [0, 6.5, 12, 18.25]) {
        const d = new Date(Date.UTC(2025, 0, 1 + day) + hour * 3_600_000);
        let e = HourAngle(Body.Sun, d, greenwich) + 12 - hour;
        e = ((((e + 12) % 24) + 24) % 24) - 12;
        const diffS = Math.abs(equationOfTimeMin(d) * 60 - e * 3600);
        worst = Math.max(worst, diffS);
      }
    }
    console.log(`E vs astronomy-engine HourAngle: largest difference ${worst.toFixed(3)} s`);
    expect(worst).toBeLessThan(1);
  });

  test('is continuous across 0h UT (no wrap glitch)', () => {
    const before = equationOfTimeMin(new Date('2025-11-03T23:59:59Z'));
    const after = equationOfTimeMin(new Date('2025-11-04T00:00:01Z'));
    expect(Math.abs(before - after)).toBeLessThan(0.01);
    expect(before).toBeGreaterThan(16);
  });
});
