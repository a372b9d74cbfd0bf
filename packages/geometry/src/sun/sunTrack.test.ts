import { Body, Equator, Horizon, MakeTime, Observer, SiderealTime } from 'astronomy-engine';
import { describe, expect, test } from 'vitest';
import { equationOfTimeMin } from './equationOfTimeMin.ts';
import { instantAtHourAngle, sunOnDay, sunTrack, wrapPi } from './sunTrack.ts';

const DEG = Math.PI / 180;
const ARCSEC = DEG / 3600;

/** Unit vector (east, north, up) from astronomy-engine Horizon azimuth/altitude, degrees. */
function enuFromHorizon(azDeg: number, altDeg: number): [number, number, number] {
  const a = azDeg * DEG;
  const h = altDeg * DEG;
  return [Math.cos(h) * Math.sin(a), Math.cos(h) * Math.cos(a), Math.sin(h)];
}

const angle = (u: readonly number[], v: readonly number[]) => {
  const c = u[0] * v[0] + u[1] * v[1] + u[2] * v[2];
  const s = Math.hypot(u[1] * v[2] - u[2] * v[1], u[2] * v[0] - u[0] * v[2], u[0] * v[1] - u[1] * v[0]);
  return Math.atan2(s, c);
};

const sites = [
  { name: 'Devon (demo site)', latitudeDeg: 50.62, longitudeDeg: -3.41, timezone: 'Europe/London' },
  { name: 'Cape Town', latitudeDeg: -33.9, longitudeDeg: 18.4, timezone: 'Africa/Johannesburg' },
  { name: 'Reykjavik', latitudeDeg: 64.1, longitudeDeg: -21.9, timezone: 'Atlantic/Reykjavik' },
];

describe.each(sites)('sunTrack against direct astronomy-engine calls: $name', (site) => {
  for (const refraction of ['none', 'normal'] as const) {
    test(`direction within 0.05″ of Horizon(Equator(Sun, observer, ofdate, aberration)), refraction ${refraction}`, () => {
      // Source: astronomy-engine 2.1.19 (a general-purpose ephemeris, docs/design.md §7),
      // called per instant: topocentric apparent RA/Dec of date, then Horizon().
      const track = sunTrack({ ...site, year: 2027, refraction });
      const observer = new Observer(site.latitudeDeg, site.longitudeDeg, 0);
      let worst = 0;
      let worstH = 0;
      let n = 0;
      for (let d = 0; d < track.days.length; d += 7) {
        const day = track.days[d];
        for (let minute = 0; minute < 1440; minute += 37) {
          const ms = day.startMs + minute * 60_000;
          const s = sunOnDay(track, day, ms);
          const t = MakeTime(new Date(ms));
          const eq = Equator(Body.Sun, t, observer, true, true);
          const hor = Horizon(t, observer, eq.ra, eq.dec, refraction === 'none' ? undefined : 'normal');
          if (refraction === 'normal' && hor.altitude < -1) continue; // astronomy-engine refracts only near and above the horizon the same way
          worst = Math.max(worst, angle(s.enu, enuFromHorizon(hor.azimuth, hor.altitude)));
          n++;
        }
        // Hour angle at local noon-ish, from astronomy-engine's own hour angle of the topocentric Sun.
        const ms = day.startMs + 12 * 3_600_000;
        const t = MakeTime(new Date(ms));
        const eq = Equator(Body.Sun, t, observer, true, true);
        const hDirect = wrapPi(((siderealHours(ms) + site.longitudeDeg / 15 - eq.ra) * 15) * DEG);
        worstH = Math.max(worstH, Math.abs(wrapPi(sunOnDay(track, day, ms).hourAngleRad - hDirect)));
      }
      console.log(`${site.name}, refraction ${refraction}: worst direction difference ${(worst / ARCSEC).toFixed(3)}″ over ${n} instants; worst hour-angle difference ${(worstH / ARCSEC).toFixed(3)}″; ${track.ephemerisCalls} ephemeris calls for the year`);
      expect(worst).toBeLessThan(0.05 * ARCSEC);
      expect(worstH).toBeLessThan(0.05 * ARCSEC);
    });
  }

  test('equation of time within 0.05 s of sun/equationOfTimeMin (direct ephemeris)', () => {
    const track = sunTrack({ ...site, year: 2027 });
    let worst = 0;
    for (let d = 0; d < track.days.length; d += 5) {
      const day = track.days[d];
      const ms = day.startMs + 9.3 * 3_600_000;
      worst = Math.max(worst, Math.abs(sunOnDay(track, day, ms).equationOfTimeMin - equationOfTimeMin(new Date(ms))) * 60);
    }
    console.log(`${site.name}: worst equation-of-time difference ${worst.toFixed(4)} s`);
    expect(worst).toBeLessThan(0.05);
  });
});

test('instantAtHourAngle lands on the asked hour angle to 1e-9 rad', () => {
  const track = sunTrack({ latitudeDeg: 50.62, longitudeDeg: -3.41, timezone: 'Europe/London', year: 2027 });
  for (const day of [track.days[0], track.days[170], track.days[300]]) {
    for (const hDeg of [-75, -45, 0, 30, 60]) {
      const t = instantAtHourAngle(track, day, hDeg * DEG);
      expect(Math.abs(wrapPi(sunOnDay(track, day, t).hourAngleRad - hDeg * DEG))).toBeLessThan(1e-9);
    }
  }
});

test('bad input names the field', () => {
  expect(() => sunTrack({ latitudeDeg: 95, longitudeDeg: 0, timezone: 'UTC', year: 2027 })).toThrow(/site\.latitude/);
  expect(() => sunTrack({ latitudeDeg: 0, longitudeDeg: 0, timezone: 'UTC', year: 2027, everyDays: 0 })).toThrow(/check\.sampling\.everyDays/);
  expect(() => sunTrack({ latitudeDeg: 0, longitudeDeg: 0, timezone: 'Mars/Olympus', year: 2027 })).toThrow(/site\.timezone/);
});

/** Greenwich apparent sidereal time, hours (astronomy-engine). */
function siderealHours(ms: number): number {
  return SiderealTime(MakeTime(new Date(ms)));
}
