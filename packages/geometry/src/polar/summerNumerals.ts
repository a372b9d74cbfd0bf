import { SpecError } from '../errors.ts';
import type { DialSpec } from '../spec/schema.ts';
import { zoneYearOffsets } from '../sun/zoneOffsets.ts';
import { numeralBlock, numeralStrokeMm } from '../text/numeralBlock.ts';
import { hourCentres } from './hourCentres.ts';
import type { Mark, TextBlock } from '../types.ts';
import { numeralText } from '../text/numeralText.ts';

/** Summer numerals' height as a fraction of the main numerals'. */
export const SUMMER_NUMERAL_SCALE = 0.65;
/** Gap between the two numeral rows as a fraction of the main numerals' height. */
const ROW_GAP_FRACTION = 0.35;

/** The summer-time numeral row and the face y of its baseline (the lowest engraving of the numeral band). */
export interface SummerNumerals {
  readonly blocks: readonly TextBlock[];
  /** face y of the lowest numeral baseline, mm (the main row's baseline when there is no summer row) */
  readonly bottomY: number;
}

/**
 * Dual numerals for daylight saving (docs/design.md §3: daylight saving adds the
 * zone's shift to the numerals): under each whole-hour numeral a smaller one
 * reading hour + shift (the zone's daylight-saving shift in `calendar.year`,
 * from the IANA database via `Intl`). Off unless `dial.summerNumerals`.
 *
 * @param numeralBaseY face y of the main numerals' baseline, mm
 * @throws SpecError naming `dial.summerNumerals` for a zone without a whole-hour daylight-saving shift
 * @example summerNumerals(spec, marks, 8, -52).blocks[0].text // '8' under the 7 (Europe/London)
 */
export function summerNumerals(spec: DialSpec, marks: readonly Mark[], numeralHeightMm: number, numeralBaseY: number): SummerNumerals {
  if (!spec.dial.summerNumerals) return { blocks: [], bottomY: numeralBaseY };
  const shift = zoneYearOffsets(spec.site.timezone, spec.calendar.year).daylightShiftHours;
  if (!(shift > 0) || !Number.isInteger(shift)) {
    throw new SpecError(
      'dial.summerNumerals',
      true,
      `allowed: false for ${spec.site.timezone}, which keeps ${shift === 0 ? 'one offset all year' : `a ${shift} h summer shift`} in ${spec.calendar.year}`,
    );
  }
  const heightMm = Math.round(numeralHeightMm * SUMMER_NUMERAL_SCALE * 10) / 10;
  const baseY = numeralBaseY - ROW_GAP_FRACTION * numeralHeightMm - heightMm;
  const stroke = numeralStrokeMm(spec.marks.half.width, heightMm);
  const blocks = hourCentres(marks).map(({ label, xMm }): TextBlock => numeralBlock(numeralText((Number(label.slice(0, 2)) + shift) % 24, spec.dial.numerals), heightMm, stroke, [xMm, baseY]));
  return { blocks, bottomY: baseY };
}
