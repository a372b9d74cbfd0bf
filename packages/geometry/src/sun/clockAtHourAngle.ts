import { SpecError } from '../errors.ts';
import { assertFinite, assertRange } from '../guards.ts';
import { equationOfTimeMin } from './equationOfTimeMin.ts';
import { longitudeDifferenceDeg } from './longitudeCorrectionMin.ts';
import { dateToUtcMidnightMs, formatClockHms, parseLocalDate } from './localDate.ts';
import { assertZone, offsetHoursAt, zoneYearOffsets } from './zoneOffsets.ts';

/** Options of `clockAtHourAngle`. */
export interface ClockAtHourAngleOptions {
  /** local calendar date 'YYYY-MM-DD' in the site's zone */
  readonly date: string;
  /** hour angle of the real Sun, radians, 0 at apparent noon, negative in the morning; |H| < π */
  readonly hourAngleRad: number;
  /** site longitude, degrees east positive */
  readonly longitudeDeg: number;
  /** IANA time zone of the site, e.g. "Europe/Lisbon" */
  readonly timezone: string;
  /**
   * true: give summer (daylight-saving) clock time; false: standard time;
   * 'auto' (default): whatever offset the zone has in force at that instant.
   */
  readonly useDaylightSaving?: boolean | 'auto';
}

/** A clock reading at the site. */
export interface ClockReading {
  /** the instant, UTC */
  readonly utc: Date;
  /** local clock time, minutes after local midnight */
  readonly clockMinutes: number;
  /** the same, 'HH:MM:SS' rounded to the nearest second */
  readonly clock: string;
  /** whether the clock reading includes a daylight-saving shift */
  readonly daylightSaving: boolean;
  /** UTC offset of the clock reading, hours */
  readonly utcOffsetHours: number;
  /** equation of time at the instant, minutes */
  readonly equationOfTimeMin: number;
}

/** Defaults of `clockAtHourAngle`. */
export const CLOCK_AT_HOUR_ANGLE_DEFAULTS = { useDaylightSaving: 'auto' } as const;

/**
 * Local clock time at which the real Sun reaches hour angle H at the site on
 * a local date (docs/design.md §3):
 *
 *     standard time T = 12 h + H/15° − E + (λs − λ)/15°   (hours)
 *
 * with E the equation of time of that very instant (solved by fixed-point
 * iteration, which converges at once because E changes by at most
 * about 1.3 s per hour (30 s per day near the December solstice)), λ the
 * site longitude and λs the zone's standard meridian. The daylight-saving
 * shift, if used, is added to T. A zone without daylight saving that year
 * gets +1 h when `useDaylightSaving` is true.
 *
 * @throws SpecError when the moment falls outside the local date
 * @example clockAtHourAngle({date: '2025-06-21', hourAngleRad: 0, longitudeDeg: -9.14, timezone: 'Europe/Lisbon'}).clock
 *   // '13:38:…' (apparent noon in Lisbon, summer time)
 */
export function clockAtHourAngle(options: ClockAtHourAngleOptions): ClockReading {
  const o = { ...CLOCK_AT_HOUR_ANGLE_DEFAULTS, ...options };
  const day = parseLocalDate(o.date, 'date');
  const hDeg = (assertFinite('hourAngleRad', o.hourAngleRad) * 180) / Math.PI;
  if (!(Math.abs(hDeg) < 180)) throw new SpecError('hourAngleRad', o.hourAngleRad, 'allowed: -π < hour angle < π');
  const lon = assertRange('site.longitude', o.longitudeDeg, -180, 180, '°');
  const zone = assertZone(o.timezone);
  if (!(o.useDaylightSaving === true || o.useDaylightSaving === false || o.useDaylightSaving === 'auto')) {
    throw new SpecError('useDaylightSaving', o.useDaylightSaving, "allowed: true, false or 'auto'");
  }
  const { standardOffsetHours: std, daylightShiftHours } = zoneYearOffsets(zone, day.year);
  const midnight = dateToUtcMidnightMs(day);
  const lonStd = 15 * std;

  // Fixed point on the standard clock time (minutes after local standard midnight).
  const base = 720 + (hDeg - longitudeDifferenceDeg(lon, lonStd)) * 4;
  let tStd = base;
  let e = 0;
  for (let i = 0; i < 12; i++) {
    e = equationOfTimeMin(new Date(instantMs(midnight, tStd, std)));
    const next = base - e;
    const done = Math.abs(next - tStd) < 1e-7;
    tStd = next;
    if (done) break;
  }
  const utcMs = instantMs(midnight, tStd, std);
  const offset =
    o.useDaylightSaving === 'auto'
      ? offsetHoursAt(zone, utcMs)
      : o.useDaylightSaving
        ? std + (daylightShiftHours > 0 ? daylightShiftHours : 1)
        : std;
  const clockMinutes = tStd + (offset - std) * 60;
  if (clockMinutes < 0 || clockMinutes >= 1440) {
    throw new SpecError('hourAngleRad', o.hourAngleRad, `allowed: an hour angle the Sun reaches on ${o.date} by the local clock`, `got ${o.hourAngleRad}, which the Sun reaches at ${formatClockHms(clockMinutes)}, outside that date`);
  }
  return {
    utc: new Date(Math.round(utcMs)),
    clockMinutes,
    clock: formatClockHms(clockMinutes),
    daylightSaving: offset > std,
    utcOffsetHours: offset,
    equationOfTimeMin: e,
  };
}

/** UTC milliseconds of `clockMinutes` after local midnight at UTC offset `offsetHours`. */
export function instantMs(utcMidnightMs: number, clockMinutes: number, offsetHours: number): number {
  return utcMidnightMs + clockMinutes * 60_000 - offsetHours * 3_600_000;
}
