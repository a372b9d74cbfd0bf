import { SpecError } from '../errors.ts';
import { equationOfTimeMin } from './equationOfTimeMin.ts';
import { formatIsoDate, MS_PER_DAY } from './localDate.ts';

/** One row of the equation-of-time table. */
export interface EquationOfTimeRow {
  /** 'YYYY-MM-DD' */
  readonly date: string;
  /** E = apparent − mean solar time at 12:00 UT of that date, minutes, rounded to 0.001 */
  readonly minutes: number;
}

/**
 * Equation of time over a calendar year: January 1, then every `stepDays`
 * days while still in the year (stepDays = 1 lists all 365 or 366 days).
 * Each value is E at 12:00 UT of the date (E changes by at most about
 * 30 s per day, so the reader's zone moves a value by ≤ 15 s), rounded half away from
 * zero to 0.001 min (0.06 s) so that tables are byte-stable; −0 is written 0.
 *
 * @param year integer calendar year (1700–2300 keeps astronomy-engine's ΔT sane)
 * @param stepDays default 7
 * @example equationOfTimeTable(2025, 7)[0] // {date: '2025-01-01', minutes: -3.3…}
 */
export function equationOfTimeTable(year: number, stepDays = 7): readonly EquationOfTimeRow[] {
  if (!Number.isInteger(year) || year < 1700 || year > 2300) {
    throw new SpecError('year', year, 'allowed: an integer year from 1700 to 2300');
  }
  if (!Number.isInteger(stepDays) || stepDays < 1 || stepDays > 366) {
    throw new SpecError('stepDays', stepDays, 'allowed: an integer from 1 to 366');
  }
  const start = Date.UTC(year, 0, 1);
  const end = Date.UTC(year + 1, 0, 1);
  const rows: EquationOfTimeRow[] = [];
  for (let ms = start; ms < end; ms += stepDays * MS_PER_DAY) {
    rows.push({ date: formatIsoDate(ms), minutes: roundMilli(equationOfTimeMin(new Date(ms + MS_PER_DAY / 2))) });
  }
  return rows;
}

/** Round to 0.001, half away from zero, without −0. */
export function roundMilli(x: number): number {
  const r = (Math.sign(x) * Math.round(Math.abs(x) * 1000)) / 1000;
  return r === 0 ? 0 : r;
}
