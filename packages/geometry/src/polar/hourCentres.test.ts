import { describe, expect, it } from 'vitest';
import type { Mark } from '../types.ts';
import { hourCentres } from './hourCentres.ts';

const mark = (label: string, kind: Mark['kind'], xMm: number) => ({ label, kind, xMm }) as unknown as Mark;

describe('hourCentres', () => {
  it('averages the hour marks of each label (both style edges at noon), skips half and quarter marks, keeps first-seen order', () => {
    const marks = [mark('14:00', 'hour', 40), mark('12:00', 'hour', -2), mark('12:30', 'half', 10), mark('12:00', 'hour', 2), mark('10:00', 'hour', -40)];
    expect(hourCentres(marks)).toEqual([
      { label: '14:00', xMm: 40 },
      { label: '12:00', xMm: 0 },
      { label: '10:00', xMm: -40 },
    ]);
  });
});
