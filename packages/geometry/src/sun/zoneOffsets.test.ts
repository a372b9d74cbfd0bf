import { describe, expect, test } from 'vitest';
import { isValidTimeZone, standardMeridianDeg, zoneOffsets, zoneYearOffsets } from './zoneOffsets.ts';

// Offsets from the IANA time zone database (tzdata 2025, via the runtime's Intl): common practice.
describe('zoneOffsets', () => {
  test('zone with daylight saving (Europe/Lisbon)', () => {
    expect(zoneOffsets('Europe/Lisbon', new Date('2025-01-15T12:00Z'))).toEqual({
      standardOffsetHours: 0, actualOffsetHours: 0, isDaylightSaving: false, daylightShiftHours: 1,
    });
    expect(zoneOffsets('Europe/Lisbon', new Date('2025-07-15T12:00Z'))).toEqual({
      standardOffsetHours: 0, actualOffsetHours: 1, isDaylightSaving: true, daylightShiftHours: 1,
    });
  });

  test('zones without daylight saving (Asia/Kolkata, America/Phoenix)', () => {
    const k = zoneOffsets('Asia/Kolkata', new Date('2025-07-15T12:00Z'));
    expect(k).toEqual({ standardOffsetHours: 5.5, actualOffsetHours: 5.5, isDaylightSaving: false, daylightShiftHours: 0 });
    expect(zoneOffsets('America/Phoenix', new Date('2025-07-15T12:00Z')).standardOffsetHours).toBe(-7);
  });

  test('southern zone: summer in January (Australia/Hobart)', () => {
    expect(zoneOffsets('Australia/Hobart', new Date('2025-01-15T12:00Z'))).toEqual({
      standardOffsetHours: 10, actualOffsetHours: 11, isDaylightSaving: true, daylightShiftHours: 1,
    });
    expect(zoneOffsets('Australia/Hobart', new Date('2025-07-15T12:00Z')).isDaylightSaving).toBe(false);
  });

  test('half-hour offsets and shifts', () => {
    expect(zoneYearOffsets('America/St_Johns', 2025)).toEqual({ standardOffsetHours: -3.5, daylightShiftHours: 1 });
    expect(zoneYearOffsets('Australia/Lord_Howe', 2025)).toEqual({ standardOffsetHours: 10.5, daylightShiftHours: 0.5 });
    expect(zoneOffsets('UTC', new Date('2025-07-15T12:00Z')).actualOffsetHours).toBe(0);
  });

  test('standardMeridianDeg = 15° × standard offset', () => {
    expect(standardMeridianDeg('Europe/Lisbon', 2025)).toBe(0);
    expect(standardMeridianDeg('Asia/Kolkata', 2025)).toBe(82.5);
    expect(standardMeridianDeg('America/Phoenix', 2025)).toBe(-105);
    expect(standardMeridianDeg('Australia/Hobart', 2025)).toBe(150);
    expect(standardMeridianDeg('Europe/Paris', 2025)).toBe(15);
  });

  test('isValidTimeZone', () => {
    expect(isValidTimeZone('Europe/Paris')).toBe(true);
    expect(isValidTimeZone('Mars/Olympus_Mons')).toBe(false);
    expect(isValidTimeZone('')).toBe(false);
    expect(isValidTimeZone(42)).toBe(false);
  });

  test('unknown zone: error names site.timezone, the value and an example', () => {
    expect(() => zoneOffsets('Mars/Olympus_Mons', new Date('2025-01-01'))).toThrow(
      /site\.timezone.*"Mars\/Olympus_Mons".*IANA.*"Europe\/Paris"/,
    );
    expect(() => standardMeridianDeg('Nowhere', 2025)).toThrow(/site\.timezone/);
  });
});
