import { describe, expect, test } from 'vitest';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import { equationOfTimeMin } from './equationOfTimeMin.ts';
import { equationOfTimeTable, roundMilli } from './equationOfTimeTable.ts';
import { SUN_REFERENCE } from './referenceValues.testdata.ts';

describe('equationOfTimeTable', () => {
  test('defaults: weekly from January 1', () => {
    const rows = equationOfTimeTable(2025);
    expect(rows.length).toBe(53);
    expect(rows[0].date).toBe('2025-01-01');
    expect(rows[1].date).toBe('2025-01-08');
    expect(rows[52].date).toBe('2025-12-31');
  });

  test('stepDays = 1 lists every day (365 and 366)', () => {
    expect(equationOfTimeTable(2025, 1).length).toBe(365);
    const leap = equationOfTimeTable(2024, 1);
    expect(leap.length).toBe(366);
    expect(leap[59].date).toBe('2024-02-29');
  });

  test('values are E at 12:00 UT rounded to 0.001 min', () => {
    const rows = equationOfTimeTable(2025, 30);
    for (const r of rows) {
      const exact = equationOfTimeMin(new Date(`${r.date}T12:00:00Z`));
      expect(r.minutes).toBe(roundMilli(exact));
      expect(Math.abs(r.minutes - exact)).toBeLessThanOrEqual(0.0005 + 1e-12);
    }
    expect(Object.is(roundMilli(-0.0001), 0)).toBe(true);
  });

  // Common practice (almanac summaries): yearly max about +16.4 min in early November,
  // min about −14.2 min in mid-February; tolerance 0.3 min.
  test('yearly extremes of 2025 (common practice)', () => {
    const ref = SUN_REFERENCE.equation_of_time_extremes;
    const rows = equationOfTimeTable(2025, 1);
    const max = rows.reduce((a, b) => (b.minutes > a.minutes ? b : a));
    const min = rows.reduce((a, b) => (b.minutes < a.minutes ? b : a));
    console.log(`E extremes 2025: max ${max.minutes} min on ${max.date} (err ${(max.minutes - ref.max.minutes).toFixed(3)}), min ${min.minutes} min on ${min.date} (err ${(min.minutes - ref.min.minutes).toFixed(3)})`);
    expect(Number(max.date.slice(5, 7))).toBe(ref.max.month);
    expect(Number(min.date.slice(5, 7))).toBe(ref.min.month);
    expectClose(max.minutes, ref.max.minutes, 0.3, 'max E', ' min');
    expectClose(min.minutes, ref.min.minutes, 0.3, 'min E', ' min');
  });

  test('rejects bad input, naming the field', () => {
    expect(() => equationOfTimeTable(2025.5)).toThrow(/year/);
    expect(() => equationOfTimeTable(2025, 0)).toThrow(/stepDays/);
  });
});
