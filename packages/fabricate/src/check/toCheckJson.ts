import type { CheckSummary } from '@umbrafab/geometry';
import { roundDeep } from '../report/toReportJson.ts';

/** Decimal places per quantity in check.json (mm to 0.1 µm, seconds to 1 ms, minutes to 0.001 min). */
const DECIMALS = 6;

/**
 * check.json of either check: the whole result of `umbrafab check` (plain
 * data from geometry's `checkDial`, or `checkPlanar` with an equatorial
 * plate's `lowerFace` beside it), with every number rounded to 6 places
 * (`roundDeep`, as report.json) for a byte-stable file, keys in the result's
 * order, two-space indent and a trailing newline. Per-day errors of a polar
 * check (`marks[].errorsMm`) are null on days the mark is unlit or not
 * reached by the style's shadow.
 *
 * @example toCheckJson(checkDial(layout))
 */
export function toCheckJson(result: CheckSummary): string {
  return JSON.stringify(roundDeep(result, DECIMALS, 'check.json', 'result'), null, 2) + '\n';
}
