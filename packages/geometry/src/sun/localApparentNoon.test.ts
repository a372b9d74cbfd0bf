import { Body, Observer, SearchHourAngle } from 'astronomy-engine';
import { describe, expect, test } from 'vitest';
import { localApparentNoon, type Site } from './localApparentNoon.ts';

const LISBON: Site = { latitudeDeg: 38.7223, longitudeDeg: -9.1393, timezone: 'Europe/Lisbon' };
const KOLKATA: Site = { latitudeDeg: 22.5726, longitudeDeg: 88.3639, timezone: 'Asia/Kolkata' };
const PHOENIX: Site = { latitudeDeg: 33.4484, longitudeDeg: -112.074, timezone: 'America/Phoenix' };
const HOBART: Site = { latitudeDeg: -42.8821, longitudeDeg: 147.3272, timezone: 'Australia/Hobart' };
const DATES = ['2025-01-15', '2025-02-11', '2025-03-30', '2025-06-21', '2025-09-01', '2025-10-26', '2025-11-03', '2025-12-21'];

describe('localApparentNoon', () => {
  // astronomy-engine SearchHourAngle(Body.Sun, observer, 0, …) (general-purpose ephemeris,
  // topocentric, searched to 0.1 s): agreement within 1 s.
  test('matches astronomy-engine SearchHourAngle within 1 s', () => {
    let worst = 0;
    for (const site of [LISBON, KOLKATA, PHOENIX, HOBART]) {
      for (const date of DATES) {
        const noon = localApparentNoon(site, date);
        const observer = new Observer(site.latitudeDeg, site.longitudeDeg, 0);
        // Start the search 12 h before our answer so it finds the same transit.
        const ev = SearchHourAngle(Body.Sun, observer, 0, new Date(noon.utc.getTime() - 12 * 3_600_000), +1);
        const errS = Math.abs(noon.utc.getTime() - ev.time.date.getTime()) / 1000;
        worst = Math.max(worst, errS);
      }
    }
    console.log(`noon vs SearchHourAngle: largest difference ${worst.toFixed(3)} s (32 cases)`);
    expect(worst).toBeLessThan(1);
  });

  test('clock includes daylight saving when in force (Lisbon)', () => {
    const summer = localApparentNoon(LISBON, '2025-06-21');
    const winter = localApparentNoon(LISBON, '2025-01-15');
    expect(summer.daylightSaving).toBe(true);
    expect(winter.daylightSaving).toBe(false);
    expect(summer.clock.startsWith('13:3')).toBe(true); // 12:00 + 36.6 min longitude + 1.9 min E + 1 h
    expect(winter.clock.startsWith('12:4')).toBe(true);
    // clock = UTC + offset
    expect(summer.clockMinutes).toBeCloseTo((summer.utc.getTime() % 86_400_000) / 60_000 + 60, 3);
  });

  test('zone without daylight saving (Kolkata, Phoenix)', () => {
    for (const date of DATES) {
      expect(localApparentNoon(KOLKATA, date).daylightSaving).toBe(false);
      expect(localApparentNoon(PHOENIX, date).daylightSaving).toBe(false);
    }
    // Kolkata lies 5.86° east of the IST meridian 82.5°E: noon about 11:37 − E.
    const k = localApparentNoon(KOLKATA, '2025-06-21').clockMinutes;
    expect(k).toBeGreaterThan(11 * 60 + 30);
    expect(k).toBeLessThan(11 * 60 + 45);
  });

  test('southern site: daylight saving in January, not in July (Hobart)', () => {
    expect(localApparentNoon(HOBART, '2025-01-15').daylightSaving).toBe(true);
    expect(localApparentNoon(HOBART, '2025-07-15').daylightSaving).toBe(false);
    // Hobart lies 2.67° west of 150°E: standard noon about 12:10.7 − E (E ≈ −6 min in mid-July).
    const july = localApparentNoon(HOBART, '2025-07-15');
    expect(july.clock.startsWith('12:1')).toBe(true);
  });

  test('rejects bad input, naming the field', () => {
    expect(() => localApparentNoon({ ...LISBON, latitudeDeg: 95 }, '2025-06-21')).toThrow(/site\.latitude/);
    expect(() => localApparentNoon({ ...LISBON, timezone: 'Lisboa' }, '2025-06-21')).toThrow(/site\.timezone/);
    expect(() => localApparentNoon(LISBON, '2025-02-30')).toThrow(/date.*"2025-02-30"/);
  });
});
