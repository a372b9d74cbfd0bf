import { SpecError } from '../errors.ts';
import { assertDate } from './sunEquatorOfDate.ts';

/** Offsets of an IANA time zone at one instant. */
export interface ZoneOffsets {
  /** the zone's standard (winter, no daylight saving) UTC offset in that year, hours */
  readonly standardOffsetHours: number;
  /** the UTC offset in force at the instant, hours */
  readonly actualOffsetHours: number;
  /** true when the offset in force is larger than the standard one */
  readonly isDaylightSaving: boolean;
  /** the zone's daylight-saving shift in that year, hours (0 if it keeps one offset) */
  readonly daylightShiftHours: number;
}

const ZONE_ALLOWED = 'allowed: an IANA time zone name such as "Europe/Paris"';
const formatters = new Map<string, Intl.DateTimeFormat>();
const yearRanges = new Map<string, { readonly min: number; readonly max: number }>();

/**
 * Is `name` a time zone the runtime's `Intl` knows (an IANA name such as
 * "Europe/Paris", or "UTC")?
 * @example isValidTimeZone('Asia/Kolkata') // true
 */
export function isValidTimeZone(name: unknown): boolean {
  if (typeof name !== 'string' || name.trim() === '') return false;
  try {
    formatterFor(name);
    return true;
  } catch {
    return false;
  }
}

/**
 * UTC offsets of `timezone` at `dateUtc`, from the runtime's IANA database via
 * `Intl.DateTimeFormat(…, {timeZoneName: 'longOffset'})`.
 *
 * The standard offset is the smallest offset in force during the calendar
 * year (UTC) of `dateUtc`, sampled at 12:00 UTC on the 1st and 15th of every
 * month: the winter offset in either hemisphere. (Zones whose legal
 * "standard" time is the summer one, e.g. Europe/Dublin, still give the
 * winter offset, which is what a sundial needs.)
 *
 * @throws SpecError naming `site.timezone` for an unknown zone
 * @example zoneOffsets('Europe/Lisbon', new Date('2025-07-01T12:00Z'))
 *   // {standardOffsetHours: 0, actualOffsetHours: 1, isDaylightSaving: true, daylightShiftHours: 1}
 */
export function zoneOffsets(timezone: string, dateUtc: Date): ZoneOffsets {
  assertZone(timezone);
  assertDate('dateUtc', dateUtc);
  const { min, max } = yearRange(timezone, dateUtc.getUTCFullYear());
  const actual = offsetHoursAt(timezone, dateUtc.getTime());
  return {
    standardOffsetHours: min,
    actualOffsetHours: actual,
    isDaylightSaving: actual > min,
    daylightShiftHours: max - min,
  };
}

/**
 * Standard meridian of a zone, degrees east positive: 15° × its standard UTC
 * offset in `year` (docs/design.md §3).
 * @example standardMeridianDeg('Asia/Kolkata', 2025) // 82.5
 */
export function standardMeridianDeg(timezone: string, year: number): number {
  assertZone(timezone);
  if (!Number.isInteger(year)) throw new SpecError('year', year, 'allowed: an integer year');
  return 15 * yearRange(timezone, year).min;
}

/** UTC offset in force in `timezone` at `utcMs`, hours. */
export function offsetHoursAt(timezone: string, utcMs: number): number {
  const parts = formatterFor(timezone).formatToParts(new Date(utcMs));
  const name = parts.find((p) => p.type === 'timeZoneName')?.value ?? '';
  return parseLongOffset(name, timezone);
}

/** Throw a SpecError naming `site.timezone` unless `timezone` is a known zone. */
export function assertZone(timezone: unknown): string {
  if (!isValidTimeZone(timezone)) {
    throw new SpecError('site.timezone', timezone, ZONE_ALLOWED, `unknown time zone ${JSON.stringify(timezone)}`);
  }
  return timezone as string;
}

/**
 * Standard offset and daylight-saving shift of `timezone` over the calendar
 * `year`, hours (see `zoneOffsets` for the sampling rule).
 * @example zoneYearOffsets('Australia/Hobart', 2025) // {standardOffsetHours: 10, daylightShiftHours: 1}
 */
export function zoneYearOffsets(timezone: string, year: number): { readonly standardOffsetHours: number; readonly daylightShiftHours: number } {
  assertZone(timezone);
  if (!Number.isInteger(year)) throw new SpecError('year', year, 'allowed: an integer year');
  const { min, max } = yearRange(timezone, year);
  return { standardOffsetHours: min, daylightShiftHours: max - min };
}

function yearRange(timezone: string, year: number): { readonly min: number; readonly max: number } {
  const key = `${timezone}|${year}`;
  const cached = yearRanges.get(key);
  if (cached) return cached;
  let min = Infinity;
  let max = -Infinity;
  for (let month = 0; month < 12; month++) {
    for (const day of [1, 15]) {
      const off = offsetHoursAt(timezone, Date.UTC(year, month, day, 12));
      min = Math.min(min, off);
      max = Math.max(max, off);
    }
  }
  const range = { min, max };
  yearRanges.set(key, range);
  return range;
}

function formatterFor(timezone: string): Intl.DateTimeFormat {
  const cached = formatters.get(timezone);
  if (cached) return cached;
  // Throws RangeError for an unknown zone.
  const f = new Intl.DateTimeFormat('en-US', { timeZone: timezone, timeZoneName: 'longOffset' });
  formatters.set(timezone, f);
  return f;
}

/** 'GMT', 'GMT+05:30', 'GMT-03:30' (and 'UTC…' variants) → hours. */
function parseLongOffset(name: string, timezone: string): number {
  if (name === 'GMT' || name === 'UTC') return 0;
  const m = /^(?:GMT|UTC)([+-\u2212])(\d{1,2})(?::?(\d{2}))?(?::?(\d{2}))?$/.exec(name);
  if (!m) throw new SpecError('site.timezone', timezone, ZONE_ALLOWED, `the runtime gave an unreadable offset "${name}"`);
  const sign = m[1] === '+' ? 1 : -1;
  return sign * (Number(m[2]) + Number(m[3] ?? 0) / 60 + Number(m[4] ?? 0) / 3600);
}
