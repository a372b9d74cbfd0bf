import type { DialSpec } from '../spec/schema.ts';

const ROMAN: readonly string[] = ['XII', 'I', 'II', 'III', 'IV', 'V', 'VI', 'VII', 'VIII', 'IX', 'X', 'XI'];

/**
 * The numeral engraved for a whole clock hour (0–23) in the chosen style:
 * `arabic` 12-hour (7 … 12, 1 … 5), `arabic24` 24-hour (7 … 17), `roman`
 * 12-hour with the usual IV (common practice on dials varies between IV and IIII).
 */
export function numeralText(hour: number, style: DialSpec['dial']['numerals']): string {
  const h12 = ((hour + 11) % 12) + 1;
  switch (style) {
    case 'arabic':
      return String(h12);
    case 'arabic24':
      return String(hour);
    case 'roman':
      return ROMAN[h12 % 12];
  }
}
