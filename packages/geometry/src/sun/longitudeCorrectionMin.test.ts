import { describe, expect, test } from 'vitest';
import { longitudeCorrectionMin } from './longitudeCorrectionMin.ts';

describe('longitudeCorrectionMin', () => {
  // 4 min per degree: the Earth turns 360° in 24 h of mean time (common practice).
  test('positive west of the meridian, negative east of it', () => {
    expect(longitudeCorrectionMin(-9.14, 0)).toBeCloseTo(36.56, 10);
    expect(longitudeCorrectionMin(2.35, 15)).toBeCloseTo(50.6, 10); // Paris on the CET meridian
    expect(longitudeCorrectionMin(88.36, 82.5)).toBeCloseTo(-23.44, 10); // Kolkata east of IST
    expect(longitudeCorrectionMin(15, 15)).toBe(0);
    expect(longitudeCorrectionMin(-157.4, 210)).toBeCloseTo(29.6, 10); // Kiritimati, UTC+14: the short way round
  });

  test('rejects a longitude out of range, naming the field', () => {
    expect(() => longitudeCorrectionMin(200, 0)).toThrow(/site\.longitude/);
  });
});
