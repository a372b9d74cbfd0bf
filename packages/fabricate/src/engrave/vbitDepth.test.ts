import { describe, expect, it } from 'vitest';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import { vbitDepthMm } from './vbitDepth.ts';

describe('vbitDepthMm', () => {
  it('matches hand values', () => {
    // Common practice: a 90° V-bit cuts a groove twice as wide as it is deep.
    expectClose(vbitDepthMm(0.5, 90), 0.25, 1e-12, '90° w=0.5', ' mm');
    expectClose(vbitDepthMm(3.175, 90), 1.5875, 1e-12, '90° w=3.175', ' mm');
    // 60° bit: d = w / (2·tan 30°) = w·√3/2 (plain trigonometry): w = 1 → 0.8660 mm.
    expectClose(vbitDepthMm(1, 60), Math.sqrt(3) / 2, 1e-12, '60° w=1', ' mm');
    // 30° bit: d = w / (2·tan 15°) = w / (2·(2 − √3)) → w = 0.5: 0.9330 mm.
    expectClose(vbitDepthMm(0.5, 30), 0.5 / (2 * (2 - Math.sqrt(3))), 1e-12, '30° w=0.5', ' mm');
  });

  it('subtracts a flat tip', () => {
    // 90°, tip 0.1: the cone adds 2·d to the tip, so w = 0.5 needs d = 0.2.
    expectClose(vbitDepthMm(0.5, 90, 0.1), 0.2, 1e-12, '90° tip 0.1 w=0.5', ' mm');
  });

  it('rejects bad input, naming the field', () => {
    expect(() => vbitDepthMm(0.1, 90, 0.2)).toThrow('widthMm: got 0.1; allowed: more than vbitTipMm (0.2)');
    expect(() => vbitDepthMm(0.5, 180)).toThrow('vbitAngleDeg: got 180; allowed: more than 0° and less than 180°');
    expect(() => vbitDepthMm(0, 90)).toThrow('widthMm: got 0; a number greater than 0 is required');
    expect(() => vbitDepthMm(Number.NaN, 90)).toThrow('widthMm: got NaN (not a number); a finite number is required');
  });
});
