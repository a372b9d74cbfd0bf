import type { Circle } from '../types.ts';

/**
 * The mounting holes of a plate `widthMm` × `lengthMm` (plate coordinates,
 * nominal size): none, two at mid-length or four in the corners, each
 * `inset` from the edges it is nearest.
 * @param holes the spec's `holes` section (count 0, 2 or 4; diameter and inset, mm)
 * @example cornerHoles({ count: 4, diameter: 6, inset: 10 }, 100, 200)[3] // { kind: 'circle', cx: 90, cy: 190, radiusMm: 3 }
 */
export function cornerHoles(holes: { readonly count: number; readonly diameter: number; readonly inset: number }, widthMm: number, lengthMm: number): Circle[] {
  const { count, diameter, inset } = holes;
  if (count === 0) return [];
  const xs = [inset, widthMm - inset];
  const ys = count === 4 ? [inset, lengthMm - inset] : [lengthMm / 2];
  return ys.flatMap((cy) => xs.map((cx) => ({ kind: 'circle' as const, cx, cy, radiusMm: diameter / 2 })));
}
