/**
 * The one way umbrafab finds the Sun at a moment: a `sunTrack` of the site
 * (the year, or just the days needed), then either the instant the Sun
 * reaches an hour angle (`sunAtHourAngle`: a dial reading) or a clock
 * reading (`sunAtClock`), and the Sun's direction from the track at that
 * instant. `umbrafab check`, the assembly picture and the page's time control
 * all go through the track, so a shadow drawn anywhere is the one the check
 * measures.
 */
import { SpecError } from '../errors.ts';
import { DEG } from '../guards.ts';
import { formatClockHms } from './localDate.ts';
import { instantAtHourAngle, sunOnDay, type SunDay, type SunSample, type SunTrack } from './sunTrack.ts';
import { offsetHoursAt } from './zoneOffsets.ts';

/** The Sun at one moment of a local day, with the clock reading of that moment. */
export interface SunMoment {
  readonly day: SunDay;
  readonly utcMs: number;
  /** local clock time, minutes after local midnight, daylight saving included when in force */
  readonly clockMinutes: number;
  /** the same, 'HH:MM:SS' */
  readonly clock: string;
  readonly daylightSaving: boolean;
  /** local apparent solar time, 'HH:MM:SS' (12 h + hour angle / 15°) */
  readonly apparent: string;
  /** the Sun then, from the track (topocentric, as `umbrafab check` sees it) */
  readonly sun: SunSample;
  /** azimuth from true north toward the east, degrees 0..360 */
  readonly azimuthDeg: number;
}

/** The day `date` of a track. @throws SpecError naming `date` when the track does not hold it */
export function dayOfTrack(track: SunTrack, date: string): SunDay {
  const d = track.days.find((x) => x.date === date);
  if (!d) throw new SpecError('date', date, 'allowed: a date YYYY-MM-DD of the year simulated');
  return d;
}

/**
 * The Sun at the instant its hour angle equals `hourAngleRad` on the local
 * `date` (Newton's method on the track, `instantAtHourAngle`).
 * @example sunAtHourAngle(sunTrack({latitudeDeg: 50, longitudeDeg: -3, timezone: 'Europe/London', year: 2027, dates: ['2027-06-21']}), '2027-06-21', 0).clock
 */
export function sunAtHourAngle(track: SunTrack, date: string, hourAngleRad: number): SunMoment {
  const day = dayOfTrack(track, date);
  return moment(track, day, instantAtHourAngle(track, day, hourAngleRad));
}

/**
 * The Sun when the site's clock reads `clockMinutes` (after local midnight,
 * daylight saving as in force then) on the local `date`.
 */
export function sunAtClock(track: SunTrack, date: string, clockMinutes: number): SunMoment {
  const day = dayOfTrack(track, date);
  const guess = day.startMs + clockMinutes * 60_000;
  const summerShiftH = offsetHoursAt(track.timezone, guess) - track.standardOffsetHours;
  return moment(track, day, guess - summerShiftH * 3_600_000);
}

function moment(track: SunTrack, day: SunDay, utcMs: number): SunMoment {
  const sun = sunOnDay(track, day, utcMs);
  const offsetH = offsetHoursAt(track.timezone, utcMs);
  const clockMinutes = (utcMs - day.startMs) / 60_000 + (offsetH - track.standardOffsetHours) * 60;
  const az = Math.atan2(sun.enu[0], sun.enu[1]) / DEG;
  return {
    day,
    utcMs,
    clockMinutes,
    clock: formatClockHms(clockMinutes),
    daylightSaving: offsetH > track.standardOffsetHours,
    apparent: formatClockHms(720 + (sun.hourAngleRad / DEG) * 4),
    sun,
    azimuthDeg: az < 0 ? az + 360 : az,
  };
}
