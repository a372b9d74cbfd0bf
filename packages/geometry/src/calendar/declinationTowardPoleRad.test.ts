import { describe, expect, test } from 'vitest';
import { declinationTowardPoleRad } from './declinationTowardPoleRad.ts';

describe('declinationTowardPoleRad', () => {
  test('δ in the north, −δ in the south', () => {
    expect(declinationTowardPoleRad(0.4, 'north')).toBe(0.4);
    expect(declinationTowardPoleRad(0.4, 'south')).toBe(-0.4);
    expect(declinationTowardPoleRad(-0.2, 'south')).toBe(0.2);
  });

  test('rejects a bad hemisphere or declination', () => {
    expect(() => declinationTowardPoleRad(0.1, 'east' as 'north')).toThrow(/hemisphere.*"east"/);
    expect(() => declinationTowardPoleRad(2, 'north')).toThrow(/declinationRad/);
  });
});
