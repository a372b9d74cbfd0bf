import { describe, expect, it } from 'vitest';
import { equationOfTimeMin, equationOfTimeTable, offsetHoursAt, parseSpec } from '@umbrafab/geometry';
import { buildFiles } from '@umbrafab/cli';
import { Body, Observer, SearchHourAngle } from 'astronomy-engine';

type Row = { date: string; clock: string; daylightSaving: boolean; utcOffsetHours: number };

const sites = [
  { name: 'zone with daylight saving (Europe/London)', site: { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' }, date: '2027-03-20', dst: [false, true] },
  { name: 'zone without daylight saving (Asia/Kolkata)', site: { latitude: 22.57, longitude: 88.36, timezone: 'Asia/Kolkata' }, date: '2027-10-20', dst: [false] },
  { name: 'southern site with daylight saving (Australia/Hobart)', site: { latitude: -42.88, longitude: 147.33, timezone: 'Australia/Hobart' }, date: '2027-03-25', dst: [true, false] },
];

describe.each(sites)('install noon table: $name', ({ site, date, dst }) => {
  it('matches astronomy-engine SearchHourAngle within 1 s, with the clock offset in force', async () => {
    const built = await buildFiles(parseSpec({ site, calendar: { year: 2027 }, install: { date, weeks: 3 } }));
    const rows = built.report.install.noon;
    expect(rows.length).toBe(21);
    expect(rows[0].date).toBe(date);
    let worst = 0;
    for (const r of rows) {
      // astronomy-engine SearchHourAngle (a general-purpose ephemeris): the Sun's transit, topocentric.
      const guess = Date.parse(`${r.date}T12:00:00Z`) - (site.longitude / 15) * 3_600_000;
      const ev = SearchHourAngle(Body.Sun, new Observer(site.latitude, site.longitude, 0), 0, new Date(guess - 12 * 3_600_000), +1);
      const utc = ev.time.date.getTime();
      const off = offsetHoursAt(site.timezone, utc); // the runtime's IANA database (Intl)
      const [hh, mm, ss] = r.clock.split(':').map(Number);
      const clockS = hh * 3600 + mm * 60 + ss;
      const refS = ((((utc / 1000 + off * 3600) % 86_400) + 86_400) % 86_400);
      worst = Math.max(worst, Math.abs(clockS - refS));
      expect(r.utcOffsetHours).toBe(off);
    }
    console.log(`${site.timezone}: noon table vs SearchHourAngle, worst ${worst.toFixed(3)} s over ${rows.length} days (clock rounded to 1 s)`);
    expect(worst).toBeLessThanOrEqual(1);
    expect([...new Set(rows.map((r) => r.daylightSaving))]).toEqual(dst);
  });
});

describe('report.json time.equationOfTime', () => {
  it('lists E at 12:00 UT at least weekly through calendar.year, equal to the sun module', async () => {
    const built = await buildFiles(parseSpec({ site: sites[0].site, calendar: { year: 2027 } }));
    const table = built.report.time.equationOfTime;
    expect(table[0].date).toBe('2027-01-01');
    expect(table[table.length - 1].date >= '2027-12-25').toBe(true);
    let worst = 0;
    for (let i = 0; i < table.length; i++) {
      if (i > 0) expect((Date.parse(table[i].date) - Date.parse(table[i - 1].date)) / 86_400_000).toBeLessThanOrEqual(7);
      worst = Math.max(worst, Math.abs(table[i].minutes - equationOfTimeMin(new Date(`${table[i].date}T12:00:00Z`))));
    }
    console.log(`report EoT vs sun module: worst ${(worst * 60).toFixed(4)} s over ${table.length} rows`);
    expect(worst).toBeLessThanOrEqual(0.0005 + 1e-9);
  });

  it('has its yearly extremes near +16.4 min in early November and −14.2 min in mid-February', () => {
    // Common practice (almanacs): E peaks at about +16.4 min around Nov 3 and bottoms at about −14.2 min around Feb 11.
    const daily = equationOfTimeTable(2027, 1);
    const max = daily.reduce((a, b) => (b.minutes > a.minutes ? b : a));
    const min = daily.reduce((a, b) => (b.minutes < a.minutes ? b : a));
    console.log(`2027 extremes: max ${max.minutes} min on ${max.date}, min ${min.minutes} min on ${min.date}`);
    expect(max.minutes).toBeGreaterThan(16.2);
    expect(max.minutes).toBeLessThan(16.6);
    expect(max.date >= '2027-10-30' && max.date <= '2027-11-08').toBe(true);
    expect(min.minutes).toBeGreaterThan(-14.5);
    expect(min.minutes).toBeLessThan(-14.0);
    expect(min.date >= '2027-02-05' && min.date <= '2027-02-18').toBe(true);
  });
});
