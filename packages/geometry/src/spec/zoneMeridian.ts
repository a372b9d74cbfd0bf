import { SpecError } from '../errors.ts';

/** True when the runtime's Intl knows this IANA zone name. */
export function knowsTimeZone(name: string): boolean {
  try {
    new Intl.DateTimeFormat('en-US', { timeZone: name });
    return true;
  } catch {
    return false;
  }
}

/** UTC offset in minutes of `timezone` at the instant `utcMs`, read from Intl ("GMT+05:30"). */
export function utcOffsetMinAt(timezone: string, utcMs: number): number {
  const part = new Intl.DateTimeFormat('en-US', { timeZone: timezone, timeZoneName: 'longOffset' })
    .formatToParts(new Date(utcMs))
    .find((p) => p.type === 'timeZoneName')?.value ?? 'GMT';
  const m = /^GMT(?:([+-])(\d{2}):(\d{2}))?$/.exec(part);
  if (!m) throw new Error(`unexpected Intl offset text ${JSON.stringify(part)} for ${timezone}`);
  if (!m[1]) return 0;
  const v = Number(m[2]) * 60 + Number(m[3]);
  return m[1] === '-' ? -v : v;
}

/**
 * The zone's standard (non-daylight-saving) UTC offset in minutes for `year`:
 * the smallest offset found on the 1st and 15th of each month at 12:00 UT
 * (daylight saving always adds time, so the standard offset is the minimum).
 * Throws a SpecError on an unknown zone.
 */
export function standardOffsetMin(timezone: string, year: number): number {
  if (!knowsTimeZone(timezone)) {
    throw new SpecError('site.timezone', timezone, 'allowed: an IANA time zone name such as "Europe/Lisbon" or "America/Denver"');
  }
  let min = Infinity;
  for (let month = 0; month < 12; month++) {
    for (const day of [1, 15]) min = Math.min(min, utcOffsetMinAt(timezone, Date.UTC(year, month, day, 12)));
  }
  return min;
}

/** Longitude of the zone's standard meridian, degrees east: 15° per hour of standard offset (DESIGN §3). */
export function standardMeridianDeg(timezone: string, year: number): number {
  return standardOffsetMin(timezone, year) / 4;
}
