import { describe, expect, it } from 'vitest';
import { isValidTimeZone, standardMeridianDeg, zoneYearOffsets } from './zoneOffsets.ts';

// Source: the IANA time zone database as shipped in Node's ICU (a general-purpose reference library).
describe('standard offsets without daylight saving', () => {
  it.each([
    ['Europe/London', 0],
    ['Europe/Paris', 60],
    ['America/New_York', -300],
    ['Asia/Kolkata', 330],
    ['Australia/Adelaide', 570],
    ['Pacific/Chatham', 765],
  ])('%s → %i min', (tz, off) => {
    expect(Math.round(zoneYearOffsets(tz, 2027).standardOffsetHours * 60)).toBe(off);
    expect(standardMeridianDeg(tz, 2027)).toBeCloseTo(off / 4, 12);
  });
  it('rejects unknown zones', () => {
    expect(isValidTimeZone('Mars/Olympus')).toBe(false);
    expect(() => standardMeridianDeg('Mars/Olympus', 2027)).toThrow(/site\.timezone/);
  });
});
