import { describe, expect, it } from 'vitest';
import { stepDownPasses } from './stepDownPasses.ts';

describe('stepDownPasses', () => {
  it('splits into equal passes no deeper than the step, ending exactly at the depth', () => {
    const p = stepDownPasses(0.25, 0.1);
    expect(p.length).toBe(3);
    expect(p[2]).toBe(0.25);
    p.forEach((d, i) => expect(d - (i === 0 ? 0 : p[i - 1])).toBeLessThanOrEqual(0.1 + 1e-12));
    p.forEach((d, i) => expect(d).toBeCloseTo((0.25 * (i + 1)) / 3, 12));
  });

  it('uses one pass when the step is deep enough, and no extra pass for an exact multiple', () => {
    expect(stepDownPasses(0.15, 0.15)).toEqual([0.15]);
    expect(stepDownPasses(0.1, 1)).toEqual([0.1]);
    expect(stepDownPasses(0.3, 0.1).length).toBe(3); // 0.3/0.1 = 3.0000000000000004 in binary
  });

  it('rejects a zero step', () => {
    expect(() => stepDownPasses(0.2, 0)).toThrow('stepDownMm: got 0; a number greater than 0 is required');
  });
});
