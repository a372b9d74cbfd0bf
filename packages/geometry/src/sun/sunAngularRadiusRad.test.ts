import { KM_PER_AU } from 'astronomy-engine';
import { describe, expect, test } from 'vitest';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import { SUN_REFERENCE } from './referenceValues.testdata.ts';
import { SUN_RADIUS_KM, sunAngularRadiusRad } from './sunAngularRadiusRad.ts';

const RAD_TO_ARCMIN = (180 / Math.PI) * 60;

describe('sunAngularRadiusRad', () => {
  // docs/design.md §7 (memory): 15.72′ at aphelion, 16.26′ at perihelion, 15.99′ at 1 AU; tolerance 0.01′.
  test('range over 2025 and the value at 1 AU', () => {
    const ref = SUN_REFERENCE.sun_angular_radius_arcmin;
    let lo = Infinity;
    let hi = -Infinity;
    for (let day = 0; day < 365; day++) {
      const a = sunAngularRadiusRad(new Date(Date.UTC(2025, 0, 1 + day, 12))) * RAD_TO_ARCMIN;
      lo = Math.min(lo, a);
      hi = Math.max(hi, a);
    }
    const at1Au = Math.asin(SUN_RADIUS_KM / KM_PER_AU) * RAD_TO_ARCMIN;
    console.log(`Sun angular radius 2025: ${lo.toFixed(4)}′ … ${hi.toFixed(4)}′, at 1 AU ${at1Au.toFixed(4)}′`);
    expectClose(lo, ref.aphelion, 0.01, 'aphelion radius', '′');
    expectClose(hi, ref.perihelion, 0.01, 'perihelion radius', '′');
    expectClose(at1Au, ref.at1Au, 0.01, 'radius at 1 AU', '′');
  });

  test('largest in early January, smallest in early July', () => {
    expect(sunAngularRadiusRad(new Date('2025-01-04T00:00Z'))).toBeGreaterThan(sunAngularRadiusRad(new Date('2025-07-04T00:00Z')));
  });
});
