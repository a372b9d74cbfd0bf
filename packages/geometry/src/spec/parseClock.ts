import { SpecError } from '../errors.ts';
import { CLOCK_PATTERN } from './textFields.ts';

/** A clock reading with seconds: "H:MM", "HH:MM" or "HH:MM:SS" (the seconds may carry a fraction). */
const CLOCK_WITH_SECONDS = /^([01]?\d|2[0-3]):([0-5]\d)(?::([0-5]\d(?:\.\d+)?))?$/;

/**
 * The one reader of clock times: "HH:MM" (or "H:MM") → minutes after
 * midnight; with `seconds`, "HH:MM:SS" too (fractional minutes). Spec fields
 * take whole minutes; the page's time control and measured readings may
 * give seconds.
 * @throws SpecError naming `field` on a bad value
 * @example parseClock('hours.from', '7:00') // 420
 * @example parseClock('time', '13:30:30', { seconds: true }) // 810.5
 */
export function parseClock(field: string, value: unknown, options: { readonly seconds?: boolean } = {}): number {
  const m = typeof value === 'string' ? (options.seconds ? CLOCK_WITH_SECONDS : CLOCK_PATTERN).exec(value) : null;
  if (!m) {
    throw new SpecError(field, value, options.seconds ? 'allowed: a time "HH:MM" or "HH:MM:SS" (or "H:MM"), 00:00 to 23:59:59, e.g. "13:30"' : 'allowed: a time "HH:MM" (or "H:MM"), e.g. "07:00"');
  }
  return Number(m[1]) * 60 + Number(m[2]) + (m[3] === undefined ? 0 : Number(m[3]) / 60);
}

/** Minutes after midnight → "HH:MM" (wraps at 24 h). */
export function formatClock(minutes: number): string {
  const m = ((Math.round(minutes) % 1440) + 1440) % 1440;
  return `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
}
