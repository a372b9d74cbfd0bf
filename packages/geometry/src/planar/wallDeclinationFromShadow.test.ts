import { Body, Equator, Horizon, MakeTime, Observer } from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { wallDeclinationFromShadow } from './wallDeclinationFromShadow.ts';

/**
 * A synthetic reading made at a wall of known declination: the Sun's
 * azimuth straight from astronomy-engine (Equator + Horizon) at the UTC
 * instant, θ = A − N + 90° with N the wall normal's azimuth (180° + D in the
 * north, −D in the south), the clock time written in the zone's local time.
 */
function syntheticReading(latDeg: number, lonDeg: number, utc: Date, localClock: string, normalAzDeg: number, noiseDeg = 0) {
  const obs = new Observer(latDeg, lonDeg, 0);
  const t = MakeTime(utc);
  const eq = Equator(Body.Sun, t, obs, true, true);
  const az = Horizon(t, obs, eq.ra, eq.dec).azimuth;
  let theta = az - normalAzDeg + 90 + noiseDeg;
  theta = ((theta % 360) + 360) % 360;
  return { date: localClock.slice(0, 10), time: localClock.slice(11), angleDeg: theta };
}

describe('wall declination from plumb-line shadow readings (Sun azimuth: astronomy-engine)', () => {
  it('recovers a known north-hemisphere wall within 0.1° from one reading', () => {
    const D = 23.7;
    // 2027-04-12 10:31:05 CEST = 08:31:05 UTC (Europe/Zurich in summer time).
    const r = syntheticReading(47.4, 8.5, new Date(Date.UTC(2027, 3, 12, 8, 31, 5)), '2027-04-12 10:31:05', 180 + D);
    const got = wallDeclinationFromShadow({ latitudeDeg: 47.4, longitudeDeg: 8.5, timezone: 'Europe/Zurich' }, [r]);
    console.log(`one reading: recovered ${got.wallDeclinationDeg.toFixed(6)}° for ${D}° (error ${Math.abs(got.wallDeclinationDeg - D).toExponential(2)}°)`);
    expect(Math.abs(got.wallDeclinationDeg - D)).toBeLessThan(0.1);
    expect(got.spreadDeg).toBe(0);
  });

  it('averages several readings (noise ±0.3°) within 0.1° and reports their spread; a southern east-declining wall', () => {
    const D = -31.2;
    const noise = [0.3, -0.2, 0.1, -0.3, 0.1];
    // Africa/Johannesburg is UTC+2 all year.
    const readings = noise.map((n, i) => syntheticReading(-33.9, 18.4, new Date(Date.UTC(2027, 9, 5, 7 + i, 12, 40)), `2027-10-05 ${String(9 + i).padStart(2, '0')}:12:40`, -D, n));
    const got = wallDeclinationFromShadow({ latitudeDeg: -33.9, longitudeDeg: 18.4, timezone: 'Africa/Johannesburg' }, readings);
    console.log(`five readings: recovered ${got.wallDeclinationDeg.toFixed(4)}° for ${D}°, spread ${got.spreadDeg.toFixed(3)}°, s.d. ${got.standardDeviationDeg.toFixed(3)}°`);
    expect(Math.abs(got.wallDeclinationDeg - D)).toBeLessThan(0.1);
    // The noise enters θ with the opposite sign of D in the south (D = −N): spread 0.6°.
    expect(got.spreadDeg).toBeCloseTo(0.6, 6);
  });

  it('refuses a reading with the Sun down, an angle outside 0–180°', () => {
    const site = { latitudeDeg: 47.4, longitudeDeg: 8.5, timezone: 'Europe/Zurich' };
    expect(() => wallDeclinationFromShadow(site, [{ date: '2027-04-12', time: '02:00:00', angleDeg: 80 }])).toThrow(/readings\.0\.time/);
    expect(() => wallDeclinationFromShadow(site, [{ date: '2027-04-12', time: '12:00:00', angleDeg: 190 }])).toThrow(/readings\.0\.angle/);
  });
});
