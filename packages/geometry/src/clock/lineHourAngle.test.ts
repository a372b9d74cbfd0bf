import { describe, expect, it } from 'vitest';
import { lineHourAngleDeg } from './lineHourAngle.ts';

// 15° of hour angle per hour from local noon (common practice; docs/design.md §3).
describe('lineHourAngleDeg', () => {
  it('is exactly 0 at noon on a solar dial', () => {
    expect(Object.is(lineHourAngleDeg(12 * 60, 0), 0)).toBe(true);
  });
  it('turns 15° an hour, negative in the morning', () => {
    expect(lineHourAngleDeg(15 * 60, 0)).toBe(45);
    expect(lineHourAngleDeg(9 * 60 + 30, 0)).toBe(-37.5);
  });
  it('moves every line by the standard-time shift', () => {
    expect(lineHourAngleDeg(12 * 60, -2.5)).toBe(-2.5);
    expect(lineHourAngleDeg(13 * 60, 2.5)).toBe(17.5);
  });
  it('rounds to 1e-9° so a shift that cancels gives exactly 0', () => {
    expect(Object.is(lineHourAngleDeg(11 * 60, 15 + 1e-12), 0)).toBe(true);
  });
});
