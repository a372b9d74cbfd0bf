import { SpecError } from '../errors.ts';
import { DEG } from '../guards.ts';
import type { Vec3 } from '../parts/mesh.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import { parseClock } from '../spec/parseClock.ts';
import { parseLocalDate } from '../sun/localDate.ts';
import { sunAtHourAngle } from '../sun/sunAtTime.ts';
import { sunTrack } from '../sun/sunTrack.ts';

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
  /** the sun's (topocentric) hour angle at that instant, degrees */
  readonly hourAngleDeg: number;
  readonly declinationDeg: number;
  readonly altitudeDeg: number;
  /** azimuth from true north toward the east, degrees 0..360 */
  readonly azimuthDeg: number;
  /** unit vector toward the sun, world frame (X east, Y north, Z up) */
  readonly direction: Vec3;
}

/** The default picture date: the local summer solstice (June 21 north, December 21 south); the winter one for an equatorial dial's lower face. */
export function defaultPictureDate(layout: Pick<DialLayout, 'spec' | 'hemisphere'>): string {
  // The lower face of an equatorial dial sees the sun only in the other half of the year: its solstice is the winter one.
  const winter = layout.spec.face?.type === 'equatorial' && layout.spec.face.side === 'lower';
  return `${layout.spec.calendar.year}-${(layout.hemisphere === 'north') !== winter ? '06' : '12'}-21`;
}

/**
 * Where the sun is when the dial reads `time` on `date`: the instant the real
 * sun's hour angle equals the hour angle of that reading's line (so the
 * shadow lies on it), and the sun's direction then — both from the site's
 * `sunTrack` for that one day through `sunAtHourAngle`, the same path as
 * `umbrafab check` and the page (topocentric, no refraction).
 *
 * A planar face passes its outward normal (`faceNormalEnu`, horizon frame):
 * then any hour angle is allowed and the sun must be in front of that face;
 * the polar face (no normal) takes readings within 6 hours of noon.
 *
 * @throws SpecError (pictures.time / pictures.date) when the sun is down or behind the face then
 * @example sunForPicture(layout, '2027-06-21', '10:00').altitudeDeg
 */
export function sunForPicture(layout: Pick<DialLayout, 'spec' | 'time'>, date: string, time: string, faceNormalEnu?: Vec3): PictureSun {
  const day = parseLocalDate(date, 'pictures.date');
  const minutes = parseClock('pictures.time', time);
  const { site } = layout.spec;
  const lineH = 15 * (minutes / 60 - 12) + layout.time.hourAngleShiftDeg;
  if (!faceNormalEnu && !(Math.abs(lineH) < 90)) {
    throw new SpecError('pictures.time', time, 'allowed: a reading within 6 hours of noon (hour angle under 90°)', `the line for ${time} would have hour angle ${lineH.toFixed(1)}°, where the sun is behind a polar face`);
  }
  const track = sunTrack({ latitudeDeg: site.latitude, longitudeDeg: site.longitude, timezone: site.timezone, year: day.year, dates: [date] });
  const m = sunAtHourAngle(track, date, lineH * DEG);
  const altitudeDeg = m.sun.altitudeRad / DEG;
  if (!(altitudeDeg > 0)) {
    throw new SpecError('pictures.time', time, `allowed: a reading at which the sun is up on ${date} at the site (or another pictures.date)`, `on ${date} the dial would read ${time} at ${m.clock.slice(0, 5)} local time, when the sun is ${(-altitudeDeg).toFixed(1)}° below the horizon`);
  }
  const n = faceNormalEnu;
  if (n && !(n[0] * m.sun.enu[0] + n[1] * m.sun.enu[1] + n[2] * m.sun.enu[2] > 0)) {
    throw new SpecError('pictures.time', time, `allowed: a reading at which the sun is in front of the face on ${date} (or another pictures.date)`, `on ${date} the dial would read ${time} at ${m.clock.slice(0, 5)} local time, when the sun is behind the face`);
  }
  if (!(m.clockMinutes >= 0 && m.clockMinutes < 1440)) {
    throw new SpecError('pictures.time', time, `allowed: a reading the sun reaches on ${date} by the local clock`, `the sun reaches the line for ${time} at ${m.clock}, outside that date`);
  }
  return {
    date,
    dialTime: time,
    lineHourAngleDeg: lineH,
    utc: new Date(Math.round(m.utcMs)).toISOString(),
    clock: m.clock,
    daylightSaving: m.daylightSaving,
    hourAngleDeg: m.sun.hourAngleRad / DEG,
    declinationDeg: m.sun.declinationRad / DEG,
    altitudeDeg,
    azimuthDeg: m.azimuthDeg,
    direction: m.sun.enu,
  };
}
