import { describe, expect, it } from 'vitest';
import { offsetRingMiter } from './offsetRingMiter.ts';

describe('offsetRingMiter (mitred outward offset of a CCW ring)', () => {
  it('grows a rectangle by d on every side (kerf compensation, common practice)', () => {
    expect(offsetRingMiter([[0, 0], [10, 0], [10, 5], [0, 5]], 0.5)).toEqual([[-0.5, -0.5], [10.5, -0.5], [10.5, 5.5], [-0.5, 5.5]]);
  });

  it('moves an inside corner inward: a tab keeps its length, the fin gains d at each end', () => {
    // fin 0..20 × 0..4 with a tab 5..10 hanging to −2
    const ring: [number, number][] = [[0, 0], [5, 0], [5, -2], [10, -2], [10, 0], [20, 0], [20, 4], [0, 4]];
    const out = offsetRingMiter(ring, 0.1);
    expect(out[1][0]).toBeCloseTo(4.9, 12);
    expect(out[1][1]).toBeCloseTo(-0.1, 12);
    expect(out[2][0]).toBeCloseTo(4.9, 12);
    expect(out[2][1]).toBeCloseTo(-2.1, 12);
    expect(out[4][0]).toBeCloseTo(10.1, 12);
    expect(out[4][1]).toBeCloseTo(-0.1, 12);
  });

  it('keeps a 90° V-notch parallel, d off each flank', () => {
    const ring: [number, number][] = [[0, 0], [10, 0], [10, 5], [6, 5], [5, 4], [4, 5], [0, 5]];
    const out = offsetRingMiter(ring, 0.2);
    // The apex moves straight up by d·√2 (both flanks at 45°).
    expect(out[4][0]).toBeCloseTo(5, 12);
    expect(out[4][1]).toBeCloseTo(4 + 0.2 * Math.SQRT2, 12);
  });

  it('rejects a repeated corner', () => {
    expect(() => offsetRingMiter([[0, 0], [0, 0], [1, 1]], 0.1)).toThrow(/repeated corner/);
  });
});
