import { describe, expect, test } from 'vitest';
import { formatClockHms, formatIsoDate, parseClockMinutes, parseLocalDate } from './localDate.ts';

describe('localDate helpers', () => {
  test('parseLocalDate', () => {
    expect(parseLocalDate('2024-02-29')).toEqual({ year: 2024, month: 2, day: 29 });
    expect(() => parseLocalDate('2025-02-29', 'site.date')).toThrow(/site\.date.*"2025-02-29"/);
    expect(() => parseLocalDate('21/06/2025')).toThrow(/YYYY-MM-DD/);
  });

  test('parseClockMinutes', () => {
    expect(parseClockMinutes('13:30')).toBe(810);
    expect(parseClockMinutes('00:00:30')).toBe(0.5);
    expect(() => parseClockMinutes('24:00')).toThrow(/clock/);
    expect(() => parseClockMinutes('9:30')).toThrow(/HH:MM/);
  });

  test('formatClockHms rounds to the second', () => {
    expect(formatClockHms(810.5)).toBe('13:30:30');
    expect(formatClockHms(59.9999)).toBe('01:00:00');
    expect(formatClockHms(-10)).toBe('-00:10:00');
    expect(formatIsoDate(Date.UTC(2025, 11, 31))).toBe('2025-12-31');
  });
});
