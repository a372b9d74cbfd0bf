import { describe, expect, test } from 'vitest';
import { parseClock } from '../spec/parseClock.ts';
import { formatClockHms, formatIsoDate, parseLocalDate } from './localDate.ts';

describe('localDate helpers', () => {
  test('parseLocalDate', () => {
    expect(parseLocalDate('2024-02-29')).toEqual({ year: 2024, month: 2, day: 29 });
    expect(() => parseLocalDate('2025-02-29', 'site.date')).toThrow(/site\.date.*"2025-02-29"/);
    expect(() => parseLocalDate('21/06/2025')).toThrow(/YYYY-MM-DD/);
  });

  test('parseClock with seconds', () => {
    expect(parseClock('clock', '13:30', { seconds: true })).toBe(810);
    expect(parseClock('clock', '00:00:30', { seconds: true })).toBe(0.5);
    expect(parseClock('clock', '9:30', { seconds: true })).toBe(570);
    expect(() => parseClock('clock', '24:00', { seconds: true })).toThrow(/clock: .*HH:MM:SS/);
    expect(() => parseClock('hours.from', '09:30:15')).toThrow(/hours\.from: .*"HH:MM"/);
  });

  test('formatClockHms rounds to the second', () => {
    expect(formatClockHms(810.5)).toBe('13:30:30');
    expect(formatClockHms(59.9999)).toBe('01:00:00');
    expect(formatClockHms(-10)).toBe('-00:10:00');
    expect(formatIsoDate(Date.UTC(2025, 11, 31))).toBe('2025-12-31');
  });
});
