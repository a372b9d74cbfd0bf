import { z } from 'zod';

/**
 * Clock times and calendar dates as the spec writes them, shared by every
 * section (hours, pictures, install) so they are read and explained alike.
 */

/** "H:MM" or "HH:MM", hours 0-23, minutes 00-59. */
export const CLOCK_PATTERN = /^([01]?\d|2[0-3]):([0-5]\d)$/;

/** "7:00" → "07:00" (other text unchanged), so "7:00" and "07:00" give the same dial. */
export function padClock(text: string): string {
  return /^\d:\d\d$/.test(text) ? `0${text}` : text;
}

/**
 * A clock-time field: "HH:MM" or "H:MM", normalised to "HH:MM".
 * @example clockField('10:00').default('10:00')
 */
export function clockField(example: string) {
  const allowed = `allowed: a time "HH:MM" (or "H:MM") in quotes with hours 0-23 and minutes 00-59, e.g. "${example}"`;
  return z.string({ error: allowed }).regex(CLOCK_PATTERN, { error: allowed }).overwrite(padClock);
}

const DATE_PATTERN = /^\d{4}-(0[1-9]|1[0-2])-(0[1-9]|[12]\d|3[01])$/;

/**
 * A calendar-date field "YYYY-MM-DD". A value written another common way
 * (1/4/2027, 2027/04/01, 2027-4-1) is answered with the forms it could mean.
 * @example dateField('2027-04-01').optional()
 */
export function dateField(example: string) {
  const allowed = (input: unknown) => `allowed: a date "YYYY-MM-DD" in quotes (year, month 01-12, day 01-31), e.g. "${example}"${dateHint(input)}`;
  return z.string({ error: (iss) => allowed(iss.input) }).regex(DATE_PATTERN, { error: (iss) => allowed(iss.input) });
}

/** "; for 01/04/2027 write "2027-04-01" (day first) or "2027-01-04" (month first)", or "" when the text gives no clue. */
export function dateHint(input: unknown): string {
  if (typeof input !== 'string') return '';
  const two = (n: string) => n.padStart(2, '0');
  const ymd = /^(\d{4})[-/.](\d{1,2})[-/.](\d{1,2})$/.exec(input.trim());
  if (ymd) return `; for ${JSON.stringify(input)} write "${ymd[1]}-${two(ymd[2])}-${two(ymd[3])}"`;
  const dmy = /^(\d{1,2})[-/.](\d{1,2})[-/.](\d{4})$/.exec(input.trim());
  if (!dmy) return '';
  const dayFirst = `${dmy[3]}-${two(dmy[2])}-${two(dmy[1])}`;
  const monthFirst = `${dmy[3]}-${two(dmy[1])}-${two(dmy[2])}`;
  if (Number(dmy[1]) > 12) return `; for ${JSON.stringify(input)} write "${dayFirst}"`;
  if (Number(dmy[2]) > 12 || dayFirst === monthFirst) return `; for ${JSON.stringify(input)} write "${monthFirst}"`;
  return `; for ${JSON.stringify(input)} write "${dayFirst}" (day first) or "${monthFirst}" (month first)`;
}
