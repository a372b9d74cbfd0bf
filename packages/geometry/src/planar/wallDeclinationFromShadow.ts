import { Body, Equator, Horizon, MakeTime, Observer } from 'astronomy-engine';
import { SpecError } from '../errors.ts';
import { assertRange } from '../guards.ts';
import { parseClock } from '../spec/parseClock.ts';
import { dateToUtcMidnightMs, parseLocalDate } from '../sun/localDate.ts';
import { assertZone, offsetHoursAt } from '../sun/zoneOffsets.ts';

/**
 * One reading on a level board held against the wall (docs/design.md §8, common
 * practice): the local clock time (as a watch shows it, daylight saving
 * included when in force) and the angle θ on the board between the wall,
 * running to your RIGHT as you face the wall, and the plumb line's shadow
 * traced from the wall out toward the Sun. θ = 90° when the Sun stands
 * square in front of the wall, under 90° when it stands toward your right.
 */
export interface ShadowReading {
  /** local date 'YYYY-MM-DD' */
  readonly date: string;
  /** local clock time 'HH:MM:SS' (or 'HH:MM') */
  readonly time: string;
  /** θ, degrees, 0 < θ < 180 */
  readonly angleDeg: number;
}

export interface WallSite {
  readonly latitudeDeg: number;
  readonly longitudeDeg: number;
  readonly timezone: string;
}

export interface ReadingResult {
  readonly reading: ShadowReading;
  readonly utc: string;
  /** the Sun's azimuth from astronomy-engine, degrees clockwise from true north */
  readonly sunAzimuthDeg: number;
  readonly sunAltitudeDeg: number;
  /** the wall's declination from this reading, degrees (our sign: + toward west) */
  readonly wallDeclinationDeg: number;
}

export interface WallDeclination {
  /** mean of the readings (circular), degrees, + toward west of the equator-ward horizon */
  readonly wallDeclinationDeg: number;
  /** compass azimuth of the wall's outward normal, degrees from true north, clockwise */
  readonly normalAzimuthDeg: number;
  readonly readings: readonly ReadingResult[];
  /** largest minus smallest reading, degrees (0 for one reading) */
  readonly spreadDeg: number;
  /** sample standard deviation of the readings, degrees (0 for one reading) */
  readonly standardDeviationDeg: number;
}

const DEGREES = 180 / Math.PI;

/** Wrap to (−180, 180]. */
function wrap180(a: number): number {
  const r = ((((a + 180) % 360) + 360) % 360) - 180;
  return r === -180 ? 180 : r;
}

/**
 * The wall's declination from plumb-line shadow readings. For each reading,
 * the Sun's azimuth A at that instant (astronomy-engine: topocentric apparent
 * equator of date, then `Horizon`; azimuth is unchanged by refraction); the
 * shadow line toward the Sun runs at azimuth A, and it leaves the wall θ
 * from the wall's right-hand direction (azimuth N − 90°, N the outward
 * normal's azimuth), so N = A + 90° − θ. The declination (0 facing the
 * equator, + toward the west) is then N − 180° in the northern hemisphere
 * and −N in the southern (the convention of `faceNormalEnu`). Several
 * readings are averaged on the circle; their spread is reported.
 *
 * @throws SpecError naming the reading when the Sun is below the horizon or behind the wall
 * @example wallDeclinationFromShadow({ latitudeDeg: 47.4, longitudeDeg: 8.5, timezone: 'Europe/Zurich' }, [{ date: '2027-04-12', time: '10:31:05', angleDeg: 62.5 }])
 */
export function wallDeclinationFromShadow(site: WallSite, readings: readonly ShadowReading[]): WallDeclination {
  const lat = assertRange('site.latitude', site.latitudeDeg, -90, 90, '°');
  const lon = assertRange('site.longitude', site.longitudeDeg, -180, 180, '°');
  const zone = assertZone(site.timezone);
  if (readings.length === 0) throw new SpecError('readings', [], 'allowed: at least one reading "YYYY-MM-DD HH:MM:SS angle"');
  const observer = new Observer(lat, lon, 0);
  const results = readings.map((r, i): ReadingResult => {
    const field = `readings.${i}`;
    const day = dateToUtcMidnightMs(parseLocalDate(r.date, `${field}.date`));
    const clock = parseClock(`${field}.time`, r.time, { seconds: true });
    const theta = r.angleDeg;
    if (typeof theta !== 'number' || !Number.isFinite(theta) || !(theta > 0 && theta < 180)) {
      throw new SpecError(`${field}.angle`, theta, 'allowed: an angle greater than 0° and less than 180° (the shadow leaves the wall toward the Sun)');
    }
    // Local clock → UTC: the zone's offset at that instant (two passes settle a daylight-saving change).
    let utcMs = day + clock * 60_000 - offsetHoursAt(zone, day + clock * 60_000) * 3_600_000;
    utcMs = day + clock * 60_000 - offsetHoursAt(zone, utcMs) * 3_600_000;
    const time = MakeTime(new Date(utcMs));
    const eq = Equator(Body.Sun, time, observer, true, true);
    const hor = Horizon(time, observer, eq.ra, eq.dec);
    if (!(hor.altitude > 0)) {
      throw new SpecError(`${field}.time`, r.time, 'allowed: a time when the Sun is up', `the Sun is ${(-hor.altitude).toFixed(1)}° below the horizon at ${r.date} ${r.time} (${zone})`);
    }
    const normal = hor.azimuth + 90 - theta;
    const D = wrap180(lat >= 0 ? normal - 180 : -normal);
    return { reading: r, utc: new Date(utcMs).toISOString(), sunAzimuthDeg: hor.azimuth, sunAltitudeDeg: hor.altitude, wallDeclinationDeg: D };
  });
  // Circular mean, so readings either side of ±180° average correctly.
  const s = results.reduce((acc, r) => acc + Math.sin(r.wallDeclinationDeg / DEGREES), 0);
  const c = results.reduce((acc, r) => acc + Math.cos(r.wallDeclinationDeg / DEGREES), 0);
  const mean = wrap180(Math.atan2(s, c) * DEGREES);
  const dev = results.map((r) => wrap180(r.wallDeclinationDeg - mean));
  const spreadDeg = Math.max(...dev) - Math.min(...dev);
  const standardDeviationDeg = dev.length > 1 ? Math.sqrt(dev.reduce((a, d) => a + d * d, 0) / (dev.length - 1)) : 0;
  const normalAzimuthDeg = ((lat >= 0 ? 180 + mean : -mean) % 360 + 360) % 360;
  return { wallDeclinationDeg: mean, normalAzimuthDeg, readings: results, spreadDeg, standardDeviationDeg };
}
