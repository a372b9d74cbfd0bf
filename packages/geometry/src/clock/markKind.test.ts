import { describe, expect, it } from 'vitest';
import { markKindAt } from './markKind.ts';

describe('markKindAt', () => {
  it('gives whole hours, half hours and the rest their own length', () => {
    expect(markKindAt(0)).toBe('hour');
    expect(markKindAt(12 * 60)).toBe('hour');
    expect(markKindAt(9 * 60 + 30)).toBe('half');
    expect(markKindAt(9 * 60 + 15)).toBe('quarter');
    expect(markKindAt(9 * 60 + 45)).toBe('quarter');
    expect(markKindAt(9 * 60 + 20)).toBe('quarter');
  });
});
