import { MakeTime, Refraction, SiderealTime } from 'astronomy-engine';
import { SpecError } from '../errors.ts';
import { DEG, assertRange } from '../guards.ts';
import type { Vec3 } from '../parts/mesh.ts';
import { MS_PER_DAY, formatIsoDate } from './localDate.ts';
import { sunEquatorOfDate } from './sunEquatorOfDate.ts';
import { observerMeridianAu, topocentricSun } from './topocentricSun.ts';
import { assertZone, zoneYearOffsets } from './zoneOffsets.ts';

/**
 * Rate of Greenwich mean sidereal time, degrees per day of UT:
 * GMST = 280.46061837° + 360.98564736629° · (JD − 2451545.0) + …
 * (J. Meeus, "Astronomical Algorithms", 2nd ed. 1998, eq. 12.4). Only the
 * linear rate is used here: the remainder (the 12.4 quadratic terms and the
 * equation of the equinoxes) is read from astronomy-engine at the nodes.
 */
const SIDEREAL_DEG_PER_DAY = 360.98564736629;


export type RefractionModel = 'none' | 'normal';

/** Options of `sunTrack`. */
export interface SunTrackOptions {
  /** geodetic latitude, degrees, north positive */
  readonly latitudeDeg: number;
  /** longitude, degrees, east positive */
  readonly longitudeDeg: number;
  /** height above the ellipsoid, m (default 0; 1 km moves the Sun by < 0.002″) */
  readonly heightM?: number;
  /** IANA zone: the days are the site's local calendar days, from local standard 00:00 */
  readonly timezone: string;
  readonly year: number;
  /** simulate every n-th day of the year (default 1: every day) */
  readonly everyDays?: number;
  /**
   * only these local dates ('YYYY-MM-DD', all in `year`), for a caller that
   * needs the Sun on a few days (a picture, one moment on the page) rather
   * than the whole year; `everyDays` is then ignored
   */
  readonly dates?: readonly string[];
  /**
   * 'none' (default): the geometric (airless) direction; 'normal':
   * astronomy-engine's `Refraction('normal', altitude)` lifts the Sun as the
   * atmosphere does (about 0.57° at the horizon, 1′ at 45°).
   */
  readonly refraction?: RefractionModel;
}

/** One local day of the track: ephemeris values at local standard 00:00, 12:00 and 24:00. */
export interface SunDay {
  /** local calendar date 'YYYY-MM-DD' */
  readonly date: string;
  /** 0-based day of the year */
  readonly dayOfYear: number;
  /** UTC milliseconds of local standard 00:00 */
  readonly startMs: number;
  /** geocentric apparent right ascension of date at the three nodes, radians, unwrapped */
  readonly raRad: readonly [number, number, number];
  /** geocentric apparent declination of date at the nodes, radians */
  readonly decRad: readonly [number, number, number];
  /** geocentric distance at the nodes, AU */
  readonly distAu: readonly [number, number, number];
  /** Greenwich apparent sidereal angle minus its mean linear rate since startMs, radians, unwrapped */
  readonly siderealRad: readonly [number, number, number];
}

/** A year of the Sun at one site, precomputed for fast sampling (plain data). */
export interface SunTrack {
  readonly latitudeDeg: number;
  readonly longitudeDeg: number;
  readonly heightM: number;
  /** IANA zone of the site (the days are its local days) */
  readonly timezone: string;
  readonly standardOffsetHours: number;
  readonly refraction: RefractionModel;
  /** the observer's geocentric position in the meridian plane: [distance from the axis, height above the equator], AU */
  readonly observerAu: readonly [number, number];
  readonly days: readonly SunDay[];
  /** astronomy-engine calls made to build the track (Equator + SiderealTime pairs) */
  readonly ephemerisCalls: number;
}

/** The Sun at one instant as seen from the site. */
export interface SunSample {
  readonly utcMs: number;
  /** topocentric local hour angle, radians in (−π, π], 0 at apparent noon, negative in the morning */
  readonly hourAngleRad: number;
  /** topocentric declination of date, radians */
  readonly declinationRad: number;
  /** geometric (unrefracted) altitude of the Sun's centre, radians */
  readonly altitudeRad: number;
  /** unit vector toward the Sun in the horizon frame (x east, y north, z up), refraction applied if asked */
  readonly enu: Vec3;
  /** geocentric distance, AU */
  readonly distanceAu: number;
  /** equation of time (apparent − mean solar time), minutes */
  readonly equationOfTimeMin: number;
}

/**
 * Precompute a year of the Sun at a site, fast to sample at any instant.
 *
 * Method: for each local day, astronomy-engine gives the geocentric apparent
 * right ascension, declination and distance of date (`sunEquatorOfDate`) and
 * the Greenwich apparent sidereal time (`SiderealTime`) at local standard
 * 00:00, 12:00 and 24:00 (shared with the neighbouring days, so about two
 * ephemeris calls per day). `sunOnDay` interpolates these quadratically,
 * rebuilds the local hour angle H = GAST + λ − α, removes the diurnal
 * parallax with the observer's position on astronomy-engine's ellipsoid
 * (its `terra()` formula), and turns (H, δ) into the horizon frame with the
 * same spherical rotation as astronomy-engine's `Horizon` (NOVAS equ2hor).
 * Its agreement with `Horizon(t, observer, Equator(Sun, t, observer, true,
 * true))` is measured in sunTrack.test.ts.
 *
 * @example sunOnDay(track, track.days[79], track.days[79].startMs + 12 * 3.6e6).hourAngleRad
 */
export function sunTrack(options: SunTrackOptions): SunTrack {
  const lat = assertRange('site.latitude', options.latitudeDeg, -90, 90, '°');
  const lon = assertRange('site.longitude', options.longitudeDeg, -180, 180, '°');
  const heightM = assertRange('site.height', options.heightM ?? 0, -500, 10000, ' m');
  const zone = assertZone(options.timezone);
  const year = options.year;
  if (!Number.isInteger(year) || year < 1900 || year > 2200) throw new SpecError('calendar.year', year, 'allowed: a whole year from 1900 to 2200');
  const every = options.everyDays ?? 1;
  if (!Number.isInteger(every) || every < 1 || every > 60) throw new SpecError('check.sampling.everyDays', every, 'allowed: a whole number of days from 1 to 60');
  const refraction = options.refraction ?? 'none';
  if (refraction !== 'none' && refraction !== 'normal') throw new SpecError('check.refraction', refraction, 'allowed: "none" or "normal"');

  const std = zoneYearOffsets(zone, year).standardOffsetHours;
  const cache = new Map<number, { ra: number; dec: number; dist: number; gastDeg: number }>();
  const node = (ms: number) => {
    let v = cache.get(ms);
    if (!v) {
      const d = new Date(ms);
      const eq = sunEquatorOfDate(d);
      v = { ra: eq.rightAscensionRad, dec: eq.declinationRad, dist: eq.distanceAu, gastDeg: SiderealTime(MakeTime(d)) * 15 };
      cache.set(ms, v);
    }
    return v;
  };
  const days: SunDay[] = [];
  const first = Date.UTC(year, 0, 1);
  const count = Math.round((Date.UTC(year + 1, 0, 1) - first) / MS_PER_DAY);
  const wanted = options.dates === undefined ? null : new Set(options.dates);
  if (wanted) {
    for (const date of wanted) {
      const k = Math.round((Date.parse(`${date}T00:00:00Z`) - first) / MS_PER_DAY);
      if (!(k >= 0 && k < count && formatIsoDate(first + k * MS_PER_DAY) === date)) throw new SpecError('date', date, `allowed: a date YYYY-MM-DD in ${year}`);
    }
  }
  for (let i = 0; i < count; i += wanted ? 1 : every) {
    const label = first + i * MS_PER_DAY;
    if (wanted && !wanted.has(formatIsoDate(label))) continue;
    const startMs = label - std * 3_600_000;
    const n = [0, 0.5, 1].map((f) => node(startMs + f * MS_PER_DAY));
    const ra0 = n[0].ra;
    const raRad = n.map((v) => ra0 + wrapPi(v.ra - ra0)) as unknown as [number, number, number];
    const sid = n.map((v, k) => (v.gastDeg - SIDEREAL_DEG_PER_DAY * k * 0.5) * DEG);
    const s0 = sid[0];
    const siderealRad = sid.map((s) => s0 + wrapPi(s - s0)) as unknown as [number, number, number];
    days.push({
      date: formatIsoDate(label),
      dayOfYear: i,
      startMs,
      raRad,
      decRad: [n[0].dec, n[1].dec, n[2].dec],
      distAu: [n[0].dist, n[1].dist, n[2].dist],
      siderealRad,
    });
  }

  const observerAu = observerMeridianAu(lat, heightM);

  return { latitudeDeg: lat, longitudeDeg: lon, heightM, timezone: zone, standardOffsetHours: std, refraction, observerAu, days, ephemerisCalls: cache.size };
}

/**
 * The Sun at `utcMs` from one day of the track (best within that local day;
 * a few hours either side still interpolate to well under an arcsecond).
 */
export function sunOnDay(track: SunTrack, day: SunDay, utcMs: number): SunSample {
  const tau = (utcMs - day.startMs) / MS_PER_DAY;
  // Lagrange weights for nodes at τ = 0, ½, 1.
  const w0 = 2 * (tau - 0.5) * (tau - 1);
  const w1 = -4 * tau * (tau - 1);
  const w2 = 2 * tau * (tau - 0.5);
  // (Written out, not as a closure: this runs a quarter of a million times per check.)
  const R = day.raRad;
  const D = day.decRad;
  const A = day.distAu;
  const S = day.siderealRad;
  const ra = w0 * R[0] + w1 * R[1] + w2 * R[2];
  const dec = w0 * D[0] + w1 * D[1] + w2 * D[2];
  const dist = w0 * A[0] + w1 * A[1] + w2 * A[2];
  const gast = w0 * S[0] + w1 * S[1] + w2 * S[2] + SIDEREAL_DEG_PER_DAY * DEG * tau;
  const hGeo = gast + track.longitudeDeg * DEG - ra;

  const topo = topocentricSun(hGeo, dec, dist, track.latitudeDeg * DEG, track.observerAu);
  let [e, n, u] = topo.enu;
  const alt = Math.asin(Math.max(-1, Math.min(1, u)));
  if (track.refraction === 'normal') {
    const lifted = alt + Refraction('normal', alt / DEG) * DEG;
    const k = Math.cos(lifted) / Math.cos(alt);
    e *= k;
    n *= k;
    u = Math.sin(lifted);
  }
  const utHours = ((((utcMs % MS_PER_DAY) + MS_PER_DAY) % MS_PER_DAY) / 3_600_000);
  // E = GHA(true Sun) + 12 h − UT (see sun/equationOfTimeMin.ts).
  const eDeg = wrapPi(gast - ra + Math.PI - utHours * 15 * DEG) / DEG;
  return {
    utcMs,
    hourAngleRad: topo.hourAngleRad,
    declinationRad: topo.declinationRad,
    altitudeRad: alt,
    enu: [e, n, u],
    distanceAu: dist,
    equationOfTimeMin: eDeg * 4,
  };
}

/**
 * The instant on `day` when the Sun's topocentric hour angle equals
 * `hourAngleRad` (Newton's method on the track; the hour angle grows by
 * about 2π per day), UTC ms. Converges to < 1 µs in three or four steps.
 */
export function instantAtHourAngle(track: SunTrack, day: SunDay, hourAngleRad: number, guessMs?: number): number {
  const rate = (2 * Math.PI) / MS_PER_DAY;
  let t = guessMs ?? day.startMs + MS_PER_DAY / 2 + (hourAngleRad - track.longitudeDeg * DEG + track.standardOffsetHours * 15 * DEG) / rate;
  for (let i = 0; i < 8; i++) {
    const dH = wrapPi(sunOnDay(track, day, t).hourAngleRad - hourAngleRad);
    t -= dH / rate;
    if (Math.abs(dH) < 1e-13) break;
  }
  return t;
}

/** Reduce an angle to (−π, π]. */
export function wrapPi(a: number): number {
  let r = a % (2 * Math.PI);
  if (r > Math.PI) r -= 2 * Math.PI;
  if (r <= -Math.PI) r += 2 * Math.PI;
  return r;
}
