import { AstroTime, Body, EquatorFromVector, GeoVector, Rotation_EQJ_EQD, RotateVector } from 'astronomy-engine';
import { describe, expect, test } from 'vitest';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import { SUN_REFERENCE } from './referenceValues.testdata.ts';
import { sunDeclinationRad } from './sunDeclinationRad.ts';
import { sunEquatorOfDate } from './sunEquatorOfDate.ts';

const RAD_TO_ARCSEC = (180 / Math.PI) * 3600;

describe('sunEquatorOfDate', () => {
  // Meeus, Astronomical Algorithms 2nd ed., Example 25.b: the Sun on 1992 Oct 13.0 TD,
  // apparent RA 13h13m30.749s, Dec −7°47′01.74″ (memory; fixtures/reference/sun).
  test('Meeus Example 25.b within 1″ (TD instant converted to UT by astronomy-engine)', () => {
    const ref = SUN_REFERENCE.meeus_25b_sun_1992_10_13;
    const ut = AstroTime.FromTerrestrialTime(ref.jde - 2451545.0).date; // TD → UT via ΔT ≈ 59 s
    const sun = sunEquatorOfDate(ut);
    const ra = ref.apparentRightAscension;
    const raExpectedArcsec = (ra.h * 3600 + ra.m * 60 + ra.s) * 15;
    const dc = ref.apparentDeclination;
    const decExpectedArcsec = dc.sign * (dc.d * 3600 + dc.m * 60 + dc.s);
    const raErr = sun.rightAscensionRad * RAD_TO_ARCSEC - raExpectedArcsec;
    const decErr = sun.declinationRad * RAD_TO_ARCSEC - decExpectedArcsec;
    console.log(`Meeus 25.b: RA error ${raErr.toFixed(3)}″ (${(raErr / 15).toFixed(4)} s), Dec error ${decErr.toFixed(3)}″`);
    expectClose(sun.rightAscensionRad * RAD_TO_ARCSEC, raExpectedArcsec, 1, 'apparent RA', '″');
    expectClose(sun.declinationRad * RAD_TO_ARCSEC, decExpectedArcsec, 1, 'apparent Dec', '″');
    expect(sunDeclinationRad(ut)).toBe(sun.declinationRad);
  });

  // astronomy-engine (general-purpose ephemeris): GeoVector with aberration rotated to the
  // equator of date must equal Equator(…) seen from our geocentre observer.
  test('geocentre observer equals GeoVector rotated to the equator of date', () => {
    let worst = 0;
    for (let k = 0; k < 24; k++) {
      const d = new Date(Date.UTC(2025, 0, 1) + k * 15.3 * 86_400_000);
      const v = RotateVector(Rotation_EQJ_EQD(d), GeoVector(Body.Sun, d, true));
      const eq = EquatorFromVector(v);
      const ours = sunEquatorOfDate(d);
      const dRa = Math.abs(((eq.ra * 15 * Math.PI) / 180) % (2 * Math.PI) - ours.rightAscensionRad) * RAD_TO_ARCSEC;
      const dDec = Math.abs((eq.dec * Math.PI) / 180 - ours.declinationRad) * RAD_TO_ARCSEC;
      worst = Math.max(worst, dRa, dDec);
      expectClose(ours.distanceAu, eq.dist, 1e-12, 'distance', ' AU');
    }
    console.log(`geocentre vs GeoVector: largest difference ${worst.toExponential(2)}″`);
    expect(worst).toBeLessThan(1e-6);
  });

  test('rejects an invalid Date, naming the field', () => {
    expect(() => sunEquatorOfDate(new Date('nope'))).toThrow(/dateUtc/);
  });
});
