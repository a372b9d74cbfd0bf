import { describe, expect, it } from 'vitest';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import { flatGroovePath } from './flatGroove.ts';
import { offsetPolyline } from './offsetPolyline.ts';

describe('offsetPolyline', () => {
  it('offsets a straight line to the left', () => {
    expect(offsetPolyline([[0, 0], [10, 0]], 1)).toEqual([[0, 1], [10, 1]]);
    expect(offsetPolyline([[0, 0], [0, 10]], 1)).toEqual([[-1, 0], [-1, 10]]);
  });

  it('mitres a right-angle corner', () => {
    const out = offsetPolyline([[0, 0], [10, 0], [10, 10]], 1);
    // The inner corner of an L offset by 1 to the left sits at (9, 1) (plain geometry).
    expectClose(out[1][0], 9, 1e-12, 'corner x', ' mm');
    expectClose(out[1][1], 1, 1e-12, 'corner y', ' mm');
    expect(out[2]).toEqual([9, 10]);
  });
});

describe('flatGroovePath', () => {
  it('spreads rows across the groove in a serpentine', () => {
    const p = flatGroovePath([[0, 0], [10, 0]], 2, 1, 0.5);
    // span w − D = 1 mm in steps ≤ 0.5 mm: rows at −0.5, 0, +0.5.
    expect(p).toEqual([[0, -0.5], [10, -0.5], [10, 0], [0, 0], [0, 0.5], [10, 0.5]]);
  });

  it('is a single centre pass for a groove no wider than the mill', () => {
    expect(flatGroovePath([[0, 0], [10, 0]], 1, 1, 0.5)).toEqual([[0, 0], [10, 0]]);
  });
});
