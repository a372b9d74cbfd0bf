import { SpecError } from '../errors.ts';
import { assertRange } from '../guards.ts';
import { clockAtHourAngle } from './clockAtHourAngle.ts';

/** A site on the Earth. */
export interface Site {
  /** degrees, north positive */
  readonly latitudeDeg: number;
  /** degrees, east positive */
  readonly longitudeDeg: number;
  /** IANA time zone, e.g. "Europe/Lisbon" */
  readonly timezone: string;
}

/** Local apparent noon on one date. */
export interface ApparentNoon {
  /** the instant, UTC */
  readonly utc: Date;
  /** local clock time (daylight saving included when in force), minutes after midnight */
  readonly clockMinutes: number;
  /** the same, 'HH:MM:SS' */
  readonly clock: string;
  /** whether daylight saving is in force at that instant */
  readonly daylightSaving: boolean;
  /** equation of time at that instant, minutes */
  readonly equationOfTimeMin: number;
}

/**
 * Local apparent noon: the clock time (with the zone's daylight saving when in
 * force) at which the Sun's centre crosses the site's meridian, i.e. the
 * geocentric apparent hour angle is 0 (docs/design.md §4: align the style on the
 * shadow of a plumb line at this moment).
 *
 * Latitude is checked but does not enter: the geocentric hour angle does not
 * depend on it; the topocentric one (parallax, up to 8.8″) differs by under
 * 0.6 s (docs/design.md §7), which the test against astronomy-engine's
 * SearchHourAngle confirms.
 *
 * @example localApparentNoon({latitudeDeg: 38.7, longitudeDeg: -9.14, timezone: 'Europe/Lisbon'}, '2025-06-21').clock
 */
export function localApparentNoon(site: Site, dateLocal: string): ApparentNoon {
  if (typeof site !== 'object' || site === null) {
    throw new SpecError('site', site, 'allowed: an object {latitudeDeg, longitudeDeg, timezone}');
  }
  assertRange('site.latitude', site.latitudeDeg, -90, 90, '°');
  const r = clockAtHourAngle({
    date: dateLocal,
    hourAngleRad: 0,
    longitudeDeg: site.longitudeDeg,
    timezone: site.timezone,
    useDaylightSaving: 'auto',
  });
  return {
    utc: r.utc,
    clockMinutes: r.clockMinutes,
    clock: r.clock,
    daylightSaving: r.daylightSaving,
    equationOfTimeMin: r.equationOfTimeMin,
  };
}
