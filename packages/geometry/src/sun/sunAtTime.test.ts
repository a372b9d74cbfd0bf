import { Body, HourAngle, Observer } from 'astronomy-engine';
import { describe, expect, test } from 'vitest';
import { sunAtClock, sunAtHourAngle } from './sunAtTime.ts';
import { sunTrack } from './sunTrack.ts';

/** The local date and clock of a UTC instant in an IANA zone, read by the runtime's own Intl (the IANA time zone database). */
function intlLocal(timezone: string, utcMs: number): { date: string; clock: string } {
  const parts = new Intl.DateTimeFormat('en-GB', {
    timeZone: timezone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    second: '2-digit',
    hourCycle: 'h23',
  }).formatToParts(new Date(utcMs));
  const get = (type: string) => parts.find((p) => p.type === type)!.value;
  return { date: `${get('year')}-${get('month')}-${get('day')}`, clock: `${get('hour')}:${get('minute')}:${get('second')}` };
}

const cases = [
  // winter and summer days, both hemispheres, a zone with a half-hour offset, a zone without daylight saving,
  // and the days the clocks change (times clear of the missing or repeated hour)
  { timezone: 'Europe/London', latitudeDeg: 50.62, longitudeDeg: -3.41, dates: ['2027-01-15', '2027-03-28', '2027-07-01', '2027-10-31'] },
  { timezone: 'Australia/Adelaide', latitudeDeg: -34.93, longitudeDeg: 138.6, dates: ['2027-01-15', '2027-04-04', '2027-07-01', '2027-10-03'] },
  { timezone: 'America/New_York', latitudeDeg: 40.7, longitudeDeg: -74.0, dates: ['2027-03-14', '2027-08-20', '2027-11-07'] },
  { timezone: 'Asia/Kolkata', latitudeDeg: 22.57, longitudeDeg: 88.36, dates: ['2027-06-21'] },
];
const CLOCKS_MIN = [4 * 60, 7 * 60 + 30, 12 * 60, 15 * 60 + 45, 21 * 60 + 10];
const hms = (m: number) => `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}:00`;

describe.each(cases)('sunAtClock: clock time to UTC in $timezone', (site) => {
  const track = sunTrack({ ...site, year: 2027, dates: site.dates });

  test('the instant it finds reads the asked date and clock in the IANA zone (runtime Intl)', () => {
    for (const date of site.dates) {
      for (const minutes of CLOCKS_MIN) {
        const m = sunAtClock(track, date, minutes);
        expect(intlLocal(site.timezone, m.utcMs), `${date} ${hms(minutes)}`).toEqual({ date, clock: hms(minutes) });
        expect(m.clock).toBe(hms(minutes));
        expect(Number.isInteger(m.utcMs / 1000)).toBe(true);
      }
    }
  });

  test('its daylight-saving flag is the zone offset in force being above the year\'s smallest (runtime Intl)', () => {
    for (const date of site.dates) {
      const m = sunAtClock(track, date, 12 * 60);
      const offsetMin = Math.round((Date.parse(`${date}T12:00:00Z`) - m.utcMs) / 60_000);
      expect(m.daylightSaving).toBe(offsetMin > track.standardOffsetHours * 60);
    }
  });
});

describe('sunAtHourAngle', () => {
  test('finds the instant of an hour angle as astronomy-engine HourAngle reads it (within 1 s of time)', () => {
    // Source: astronomy-engine 2.1.19 HourAngle (topocentric, a general-purpose ephemeris).
    const site = { latitudeDeg: 50.62, longitudeDeg: -3.41, timezone: 'Europe/London' };
    const track = sunTrack({ ...site, year: 2027, dates: ['2027-02-11', '2027-11-03'] });
    const observer = new Observer(site.latitudeDeg, site.longitudeDeg, 0);
    let worstS = 0;
    for (const date of ['2027-02-11', '2027-11-03']) {
      for (const hDeg of [-45, 0, 30]) {
        const m = sunAtHourAngle(track, date, (hDeg * Math.PI) / 180);
        const h = HourAngle(Body.Sun, new Date(m.utcMs), observer); // sidereal hours, 0..24
        const wrapped = ((h * 15 - hDeg + 540) % 360) - 180;
        worstS = Math.max(worstS, Math.abs(wrapped) * 240);
      }
    }
    console.log(`sunAtHourAngle vs astronomy-engine HourAngle: largest difference ${worstS.toFixed(3)} s of time`);
    expect(worstS).toBeLessThan(1);
  });
});
