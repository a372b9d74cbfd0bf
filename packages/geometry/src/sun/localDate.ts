import { SpecError } from '../errors.ts';

/** A calendar date as plain numbers (proleptic Gregorian). */
export interface CalendarDate {
  readonly year: number;
  readonly month: number; // 1..12
  readonly day: number; // 1..31
}

const DATE_RE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** Milliseconds in one day. */
export const MS_PER_DAY = 86_400_000;

/**
 * Parse a local calendar date 'YYYY-MM-DD'.
 * @param field the spec field named in the error
 * @throws SpecError when the text is not a real date
 * @example parseLocalDate('2025-06-21') // {year: 2025, month: 6, day: 21}
 */
export function parseLocalDate(text: unknown, field = 'date'): CalendarDate {
  const m = typeof text === 'string' ? DATE_RE.exec(text) : null;
  if (!m) throw new SpecError(field, text, 'allowed: a date written YYYY-MM-DD, e.g. "2025-06-21"');
  const year = Number(m[1]);
  const month = Number(m[2]);
  const day = Number(m[3]);
  const probe = new Date(Date.UTC(year, month - 1, day));
  if (probe.getUTCFullYear() !== year || probe.getUTCMonth() !== month - 1 || probe.getUTCDate() !== day) {
    throw new SpecError(field, text, 'allowed: a real calendar date written YYYY-MM-DD');
  }
  return { year, month, day };
}

/**
 * Format minutes after midnight as 'HH:MM:SS', rounded to the nearest second.
 * Values outside one day keep counting hours ('24:00:05', '-00:10:00').
 * @example formatClockHms(810.5) // '13:30:30'
 */
export function formatClockHms(minutes: number): string {
  const total = Math.round(minutes * 60);
  const sign = total < 0 ? '-' : '';
  const a = Math.abs(total);
  const h = Math.floor(a / 3600);
  const m = Math.floor((a % 3600) / 60);
  const s = a % 60;
  return `${sign}${pad2(h)}:${pad2(m)}:${pad2(s)}`;
}

/** 'YYYY-MM-DD' of a UTC day number (ms at 00:00 UTC of that date). */
export function formatIsoDate(utcMidnightMs: number): string {
  const d = new Date(utcMidnightMs);
  return `${String(d.getUTCFullYear()).padStart(4, '0')}-${pad2(d.getUTCMonth() + 1)}-${pad2(d.getUTCDate())}`;
}

/** Milliseconds of 00:00 UTC on the given calendar date (used as a day label, not a zone). */
export function dateToUtcMidnightMs(date: CalendarDate): number {
  return Date.UTC(date.year, date.month - 1, date.day);
}

function pad2(n: number): string {
  return String(n).padStart(2, '0');
}
