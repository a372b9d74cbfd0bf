import { describe, expect, it } from 'vitest';
import { nearestPairs } from './nearestPairs.ts';

describe('nearestPairs', () => {
  it('takes the nearest pairs first, each mark and each line once', () => {
    const { chosen, usedLines } = nearestPairs([
      { i: 0, j: 0, d: 0.3 },
      { i: 1, j: 0, d: 0.1 },
      { i: 0, j: 1, d: 0.4 },
      { i: 1, j: 1, d: 0.2 },
    ]);
    expect(chosen.get(1)?.j).toBe(0);
    expect(chosen.get(0)?.j).toBe(1);
    expect([...usedLines].sort()).toEqual([0, 1]);
  });

  it('leaves a mark unmatched when its only line is taken, and breaks ties by mark then line', () => {
    const { chosen } = nearestPairs([
      { i: 1, j: 0, d: 0.5 },
      { i: 0, j: 0, d: 0.5 },
    ]);
    expect(chosen.get(0)?.j).toBe(0);
    expect(chosen.has(1)).toBe(false);
  });

  it('keeps the extra fields of the pair it chose', () => {
    const { chosen } = nearestPairs([{ i: 0, j: 2, d: 1, flip: true }]);
    expect(chosen.get(0)?.flip).toBe(true);
  });
});
