import type { TextBlock, Vec2 } from '../types.ts';
import { strokeText } from './strokeText.ts';

/**
 * The stroke width of a numeral `heightMm` tall: a twelfth of its height,
 * at least 0.2 mm, never wider than the marks it names (`markWidthMm`).
 * @example numeralStrokeMm(1, 8) // 0.6666…
 */
export function numeralStrokeMm(markWidthMm: number, heightMm: number): number {
  return Math.min(markWidthMm, Math.max(0.2, heightMm / 12));
}

/**
 * A numeral as engraved, the polar and the planar faces alike: `text` in
 * single strokes `heightMm` tall, its baseline centred on `at` (face
 * coordinates, mm), to be cut `strokeWidthMm` wide.
 * @example numeralBlock('XII', 8, numeralStrokeMm(1, 8), [0, -50]).role // 'numeral'
 */
export function numeralBlock(text: string, heightMm: number, strokeWidthMm: number, at: Vec2): TextBlock {
  return { role: 'numeral', text, heightMm, strokeWidthMm, strokes: strokeText(text, { heightMm, at, align: 'center' }) };
}
