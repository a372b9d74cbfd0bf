import { SpecError } from '../errors.ts';
import { CLOCK_PATTERN } from './textFields.ts';

/** "HH:MM" (or "H:MM") → minutes after midnight. Throws a SpecError naming `field` on a bad value. */
export function parseClock(field: string, value: string): number {
  const m = CLOCK_PATTERN.exec(value);
  if (!m) throw new SpecError(field, value, 'allowed: a time "HH:MM" (or "H:MM"), e.g. "07:00"');
  return Number(m[1]) * 60 + Number(m[2]);
}

/** Minutes after midnight → "HH:MM" (wraps at 24 h). */
export function formatClock(minutes: number): string {
  const m = ((Math.round(minutes) % 1440) + 1440) % 1440;
  return `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
}
