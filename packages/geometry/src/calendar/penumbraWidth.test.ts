import { describe, expect, test } from 'vitest';
import { penumbraWidthFactor, penumbraWidthMm } from './penumbraWidth.ts';

const DEG = Math.PI / 180;
const ALPHA = 0.267 * DEG; // mean solar angular radius (docs/design.md §3, memory)

describe('penumbraWidthMm', () => {
  // docs/design.md §3: under 2 mm at 09:00 on a 100 mm gnomon, far wider near 07:00.
  test('under 2 mm at 09:00 (H = −45°) on a 100 mm gnomon', () => {
    const w9 = penumbraWidthMm({ heightMm: 100, hourAngleRad: -45 * DEG, declinationRad: 0, sunRadiusRad: ALPHA });
    const w7 = penumbraWidthMm({ heightMm: 100, hourAngleRad: -75 * DEG, declinationRad: 0, sunRadiusRad: ALPHA });
    expect(w9).toBeCloseTo((2 * 100 * ALPHA) / 0.5, 12);
    expect(w9).toBeLessThan(2);
    expect(w7).toBeGreaterThan(6 * w9);
  });

  // docs/design.md §3: in time the blur is constant, about ±1.1 min at the equinox.
  test('constant in time: width / (dx/dT) = 2α/cosδ ≈ 2.1 min', () => {
    for (const hDeg of [-70, -30, 0, 45, 60]) {
      const w = penumbraWidthMm({ heightMm: 80, hourAngleRad: hDeg * DEG, declinationRad: 0, sunRadiusRad: ALPHA });
      const dxPerMin = (80 * (0.25 * DEG)) / Math.cos(hDeg * DEG) ** 2; // x = h·tanH, 0.25° per minute
      expect(w / dxPerMin / 2).toBeCloseTo(1.068, 3);
    }
  });

  test('grows with 1/cosδ', () => {
    const w0 = penumbraWidthMm({ heightMm: 50, hourAngleRad: 0, declinationRad: 0, sunRadiusRad: ALPHA });
    const w1 = penumbraWidthMm({ heightMm: 50, hourAngleRad: 0, declinationRad: -23.44 * DEG, sunRadiusRad: ALPHA });
    expect(w1 / w0).toBeCloseTo(1 / Math.cos(23.44 * DEG), 12);
  });

  test('penumbraWidthFactor = 1/cos²H', () => {
    expect(penumbraWidthFactor(0)).toBe(1);
    expect(penumbraWidthFactor(Math.PI / 4)).toBeCloseTo(2, 12);
    expect(penumbraWidthFactor(-Math.PI / 3)).toBeCloseTo(4, 12);
    expect(() => penumbraWidthFactor(Math.PI / 2)).toThrow(/hourAngleRad/);
  });

  test('rejects bad input, naming the field', () => {
    expect(() => penumbraWidthMm({ heightMm: -1, hourAngleRad: 0, declinationRad: 0, sunRadiusRad: ALPHA })).toThrow(/heightMm/);
    expect(() => penumbraWidthMm({ heightMm: 1, hourAngleRad: 0, declinationRad: 0, sunRadiusRad: 0 })).toThrow(/sunRadiusRad/);
  });
});
