import { describe, expect, test } from 'vitest';
import { describeDeclination } from './describeDeclination.ts';

describe('describeDeclination', () => {
  // Convention (NOAA NCEI, common practice): declination is positive east, i.e. the compass
  // needle points east of true north; true north then lies west of magnetic north.
  test('west declination: turn east of the compass', () => {
    expect(describeDeclination(-9.8)).toBe(
      "magnetic north lies 9.8° west of true north: turn the dial 9.8° east of the compass's north to face true north",
    );
  });

  test('east declination: turn west of the compass', () => {
    expect(describeDeclination(12.44)).toBe(
      "magnetic north lies 12.4° east of true north: turn the dial 12.4° west of the compass's north to face true north",
    );
  });

  test('near zero', () => {
    expect(describeDeclination(0.04)).toMatch(/coincide/);
    expect(describeDeclination(-0.04)).toMatch(/coincide/);
    expect(describeDeclination(0.05)).toMatch(/0\.1° east/);
  });

  test('rejects a non-number', () => {
    expect(() => describeDeclination(Number.NaN)).toThrow(/declinationDeg/);
  });
});
