import { describe, expect, it } from 'vitest';
import { shoelaceArea } from '../parts/ring2d.ts';
import { crossMemberOutline } from './crossMember.ts';

describe('crossMemberOutline', () => {
  it('without relief: a body between the cheeks (x = T to 2·xc) and one sheet-long end tab over the middle half of its height each side', () => {
    const [xc, T, h] = [60, 6, 40];
    const { outline, tabVertex } = crossMemberOutline(xc, T, h, 0, 0.01);
    expect(outline.length).toBe(12);
    const xs = outline.map((p) => p[0]);
    expect([Math.min(...xs), Math.max(...xs)]).toEqual([0, 2 * xc + T]);
    // body (2·xc − T) × h plus two tabs T × h/2
    expect(shoelaceArea(outline)).toBeCloseTo((2 * xc - T) * h + 2 * T * (h / 2), 9);
    expect(outline[tabVertex[0]]).toEqual([T, (3 * h) / 4]);
    expect(outline[tabVertex[1]]).toEqual([2 * xc, h / 4]);
  });

  it('with a round tool: the tabs keep their root corners and the outline gains the relief', () => {
    const plain = crossMemberOutline(60, 6, 40, 0, 0.01);
    const relieved = crossMemberOutline(60, 6, 40, 1.5, 0.01);
    expect(relieved.outline.length).toBeGreaterThan(plain.outline.length);
    expect(relieved.outline[relieved.tabVertex[0]]).toEqual([6, 30]);
    expect(relieved.outline[relieved.tabVertex[1]]).toEqual([120, 10]);
  });
});
