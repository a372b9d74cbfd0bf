import { MakeTime, SiderealTime } from 'astronomy-engine';
import { SpecError } from '../errors.ts';
import { DEG } from '../guards.ts';
import type { Vec3 } from '../parts/mesh.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import { parseClock } from '../spec/parseClock.ts';
import { clockAtHourAngle } from '../sun/clockAtHourAngle.ts';
import { parseLocalDate } from '../sun/localDate.ts';
import { sunEquatorOfDate } from '../sun/sunEquatorOfDate.ts';

/** The sun for the assembly picture: when, where, and its direction in the world frame. */
export interface PictureSun {
  /** local date 'YYYY-MM-DD' */
  readonly date: string;
  /** the dial reading shown, 'HH:MM' (pictures.time) */
  readonly dialTime: string;
  /** hour angle of the line for that reading, degrees (the layout's H = 15°·(T − 12 h) + shift) */
  readonly lineHourAngleDeg: number;
  /** the instant the real sun reaches that hour angle */
  readonly utc: string;
  /** local clock time then, 'HH:MM:SS' (with daylight saving when in force) */
  readonly clock: string;
  readonly daylightSaving: boolean;
  /** the sun's hour angle at that instant from sidereal time and right ascension, degrees */
  readonly hourAngleDeg: number;
  readonly declinationDeg: number;
  readonly altitudeDeg: number;
  /** azimuth from true north toward the east, degrees 0..360 */
  readonly azimuthDeg: number;
  /** unit vector toward the sun, world frame (X east, Y north, Z up) */
  readonly direction: Vec3;
}

/** The default picture date: the local summer solstice (June 21 north, December 21 south). */
export function defaultPictureDate(layout: DialLayout): string {
  return `${layout.spec.calendar.year}-${layout.hemisphere === 'north' ? '06' : '12'}-21`;
}

/**
 * Where the sun is when the dial reads `time` on `date`: the instant the real
 * sun's hour angle equals the hour angle of that reading's line (so the
 * shadow lies on it), found with `clockAtHourAngle` (equation of time of that
 * instant). At that instant the hour angle is recomputed independently as
 * H = GAST + λ − α (astronomy-engine `SiderealTime`, `sunEquatorOfDate`), and
 * the direction toward the sun follows from H, δ and the latitude φ by the
 * equatorial-to-horizontal rotation (J. Meeus, Astronomical Algorithms, 2nd
 * ed. 1998, eq. 13.5–13.6), in east, north, up components:
 *
 *     E = −cos δ sin H,   N = cos φ sin δ − sin φ cos δ cos H,   U = sin φ sin δ + cos φ cos δ cos H
 *
 * Geocentric, no refraction (the layout's geometry; parallax is 9″ at most).
 *
 * @throws SpecError (pictures.time / pictures.date) when the sun is down or behind the face then
 * @example sunForPicture(layout, '2027-06-21', '10:00').altitudeDeg
 */
export function sunForPicture(layout: DialLayout, date: string, time: string): PictureSun {
  parseLocalDate(date, 'pictures.date');
  const minutes = parseClock('pictures.time', time);
  const { site } = layout.spec;
  const lineH = 15 * (minutes / 60 - 12) + layout.time.hourAngleShiftDeg;
  if (!(Math.abs(lineH) < 90)) {
    throw new SpecError('pictures.time', time, 'allowed: a reading within 6 hours of noon (hour angle under 90°)', `the line for ${time} would have hour angle ${lineH.toFixed(1)}°, where the sun is behind a polar face`);
  }
  let reading: ReturnType<typeof clockAtHourAngle>;
  try {
    reading = clockAtHourAngle({ date, hourAngleRad: lineH * DEG, longitudeDeg: site.longitude, timezone: site.timezone });
  } catch (e) {
    // Name the spec's fields, not the solver's argument.
    if (!(e instanceof SpecError) || e.field !== 'hourAngleRad') throw e;
    throw new SpecError('pictures.time', time, `allowed: a reading the sun shows on ${date} by ${site.timezone} clocks (or another pictures.date; check that site.timezone is the site's zone)`, `the sun reaches the ${time} line outside ${date} by ${site.timezone} clocks`);
  }
  const eq = sunEquatorOfDate(reading.utc);
  const gastDeg = SiderealTime(MakeTime(reading.utc)) * 15;
  const H = wrapDeg(gastDeg + site.longitude - eq.rightAscensionRad / DEG) * DEG;
  const d = eq.declinationRad;
  const phi = site.latitude * DEG;
  const direction: Vec3 = [
    -Math.cos(d) * Math.sin(H),
    Math.cos(phi) * Math.sin(d) - Math.sin(phi) * Math.cos(d) * Math.cos(H),
    Math.sin(phi) * Math.sin(d) + Math.cos(phi) * Math.cos(d) * Math.cos(H),
  ];
  const altitudeDeg = Math.asin(direction[2]) / DEG;
  if (!(altitudeDeg > 0)) {
    throw new SpecError('pictures.time', time, `allowed: a reading at which the sun is up on ${date} at the site (or another pictures.date)`, `on ${date} the dial would read ${time} at ${reading.clock.slice(0, 5)} local time, when the sun is ${(-altitudeDeg).toFixed(1)}° below the horizon`);
  }
  const az = Math.atan2(direction[0], direction[1]) / DEG;
  return {
    date,
    dialTime: time,
    lineHourAngleDeg: lineH,
    utc: reading.utc.toISOString(),
    clock: reading.clock,
    daylightSaving: reading.daylightSaving,
    hourAngleDeg: H / DEG,
    declinationDeg: d / DEG,
    altitudeDeg,
    azimuthDeg: az < 0 ? az + 360 : az,
    direction,
  };
}

function wrapDeg(x: number): number {
  let r = x % 360;
  if (r > 180) r -= 360;
  if (r <= -180) r += 360;
  return r;
}
