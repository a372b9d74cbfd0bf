import { SpecError } from '../errors.ts';
import type { DialLayout } from './layoutDial.ts';

/**
 * The hour-mark field of a face: the rectangle, in face coordinates (mm),
 * from the leftmost to the rightmost mark and from the equator-ward end of
 * the marks to the pole-ward end of the longest ones. Face curves (date lines,
 * mean-time curves) are clipped to it, so they never run into the numerals,
 * the title or the mounting holes (which the layout keeps clear of the marks).
 */
export interface MarkField {
  readonly xMinMm: number;
  readonly xMaxMm: number;
  readonly yMinMm: number;
  readonly yMaxMm: number;
}

/** @example markField(layoutDial(spec)).yMaxMm // 40 for 80 mm hour marks */
export function markField(layout: DialLayout): MarkField {
  const m = layout.marks;
  return {
    xMinMm: Math.min(...m.map((k) => k.xMm)),
    xMaxMm: Math.max(...m.map((k) => k.xMm)),
    yMinMm: Math.min(...m.map((k) => k.y0Mm)),
    yMaxMm: Math.max(...m.map((k) => k.y1Mm)),
  };
}

/**
 * Face y of the nodus foot (`gnomon.nodusY`), checked to lie inside the mark
 * field: a nodus whose noon shadow misses the marks reads nothing.
 */
export function nodusFootY(layout: DialLayout): number {
  const f = markField(layout);
  const y = layout.spec.gnomon.nodusY;
  if (!(y > f.yMinMm && y < f.yMaxMm)) {
    throw new SpecError('gnomon.nodusY', y, `allowed: a face y strictly between ${f.yMinMm} and ${f.yMaxMm} mm (the span of the hour marks; 0 = mid-length)`);
  }
  return y;
}
