import { Body, Equator, Horizon, MakeTime, Observer } from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { layoutDial } from '../polar/layoutDial.ts';
import { parseSpec } from '../spec/parseSpec.ts';
import { sunForPicture } from './sunForPicture.ts';
import { placeAssembly, worldToFaceDirection } from './placeAssembly.ts';

const site = (latitude: number, longitude: number, timezone: string) => parseSpec({ site: { latitude, longitude, timezone } });

describe('sunForPicture', () => {
  for (const [lat, lon, tz, date, time] of [
    [50.62, -3.41, 'Europe/London', '2027-06-21', '10:00'],
    [-33.9, 18.4, 'Africa/Johannesburg', '2027-12-21', '15:00'],
    [41.15, -8.61, 'Europe/Lisbon', '2027-03-20', '12:00'],
  ] as const) {
    it(`points where astronomy-engine's Horizon puts the sun (within 0.01°): ${lat}°, ${date} ${time}`, () => {
      // Reference: astronomy-engine 2.1.19 Equator (topocentric, of date) + Horizon without refraction,
      // a general-purpose ephemeris (docs/design.md §7); the 0.01° allows for the geocentric/topocentric parallax (< 9″).
      const layout = layoutDial(site(lat, lon, tz));
      const sun = sunForPicture(layout, date, time);
      const t = MakeTime(new Date(sun.utc));
      const obs = new Observer(lat, lon, 0);
      const eq = Equator(Body.Sun, t, obs, true, true);
      const hor = Horizon(t, obs, eq.ra, eq.dec);
      expect(Math.abs(sun.altitudeDeg - hor.altitude)).toBeLessThan(0.01);
      expect(Math.abs(((sun.azimuthDeg - hor.azimuth + 540) % 360) - 180)).toBeLessThan(0.01);
      // The instant was chosen so the real sun's hour angle is the line's (clockAtHourAngle).
      expect(Math.abs(sun.hourAngleDeg - sun.lineHourAngleDeg)).toBeLessThan(1e-4);
    });

    it(`gives the face-frame sun of docs/design.md §2, s = (−cos δ sin H, sin δ, cos δ cos H) east-positive: ${lat}°`, () => {
      const layout = layoutDial(site(lat, lon, tz));
      const sun = sunForPicture(layout, date, time);
      const s = worldToFaceDirection(placeAssembly(layout).face, sun.direction);
      const H = (sun.hourAngleDeg * Math.PI) / 180;
      const dPole = ((lat >= 0 ? 1 : -1) * sun.declinationDeg * Math.PI) / 180;
      const east = lat >= 0 ? 1 : -1;
      const want = [east * -Math.cos(dPole) * Math.sin(H), Math.sin(dPole), Math.cos(dPole) * Math.cos(H)];
      s.forEach((c, i) => expect(Math.abs(c - want[i])).toBeLessThan(1e-9));
    });
  }

  it('refuses a reading when the sun is below the horizon', () => {
    const layout = layoutDial(site(50.62, -3.41, 'Europe/London'));
    expect(() => sunForPicture(layout, '2027-12-21', '07:00')).toThrow(/pictures\.time.*below the horizon/);
  });

  it('refuses a reading six hours or more from noon', () => {
    const layout = layoutDial(site(50.62, -3.41, 'Europe/London'));
    expect(() => sunForPicture(layout, '2027-06-21', '18:00')).toThrow(/pictures\.time/);
  });
});
