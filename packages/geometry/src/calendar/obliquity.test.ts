import { AstroTime, e_tilt } from 'astronomy-engine';
import { describe, test } from 'vitest';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import { SUN_REFERENCE } from '../sun/referenceValues.testdata.ts';
import { OBLIQUITY_J2000_RAD } from './obliquity.ts';

const RAD_TO_ARCSEC = (180 / Math.PI) * 3600;

describe('OBLIQUITY_J2000_RAD', () => {
  // astronomy-engine (general-purpose ephemeris): mean obliquity e_tilt(t).mobl at J2000.0 TT.
  test("equals astronomy-engine's mean obliquity at J2000 within 1e-6″", () => {
    const mobl = e_tilt(AstroTime.FromTerrestrialTime(0)).mobl * 3600;
    console.log(`obliquity: ours ${(OBLIQUITY_J2000_RAD * RAD_TO_ARCSEC).toFixed(6)}″, astronomy-engine ${mobl.toFixed(6)}″`);
    expectClose(OBLIQUITY_J2000_RAD * RAD_TO_ARCSEC, mobl, 1e-6, 'obliquity', '″');
  });

  // IAU 2006: 84381.406″ (memory) = 23.4393° (docs/design.md §2).
  test('is 84381.406″ = 23.4393°', () => {
    expectClose(OBLIQUITY_J2000_RAD * RAD_TO_ARCSEC, SUN_REFERENCE.obliquity_j2000_arcsec.value, 1e-9, 'obliquity', '″');
    expectClose((OBLIQUITY_J2000_RAD * 180) / Math.PI, 23.4393, 0.00005, 'obliquity', '°');
  });
});
