import type { Hemisphere, StyleEdge } from '../types.ts';

/**
 * Distance of an hour line from the gnomon's centre plane, east-positive, mm.
 *
 * A polar face is parallel to the Earth's axis, so the shadow of a style at
 * height h falls at x = h·tan H (the tan law of the polar dial; A. E. Waugh,
 * "Sundials: Their Theory and Construction", Dover 1973 — memory). A gnomon of
 * thickness t has two styles at ±t/2: mornings (H < 0) are cast by the west
 * style, afternoons by the east style (docs/design.md §2):
 *   x = sign(H) · (t/2 + h·|tan H|).
 * At H = 0 the shadow is the gnomon itself: the noon band spans ±t/2.
 *
 * @param hourAngleRad sun's hour angle, radians (negative in the morning)
 * @param heightMm style height above the face, mm
 * @param thicknessMm gnomon thickness, mm
 * @param edge which style casts the shadow (needed at H = 0 only)
 */
export function markOffsetEastMm(hourAngleRad: number, heightMm: number, thicknessMm: number, edge: StyleEdge): number {
  const sign = edge === 'west' ? -1 : 1;
  return sign * (thicknessMm / 2 + heightMm * Math.abs(Math.tan(hourAngleRad)));
}

/** The style edge that casts the shadow at this hour angle (west in the morning). */
export function castingEdge(hourAngleRad: number): StyleEdge {
  return hourAngleRad < 0 ? 'west' : 'east';
}

/**
 * East-positive x to face-drawing x: seen face-on with the pole-ward end up,
 * east is on the right in the northern hemisphere and on the left in the
 * southern one (docs/design.md §2), so the southern face is the mirror image.
 */
export function eastToFaceX(xEastMm: number, hemisphere: Hemisphere): number {
  return hemisphere === 'north' ? xEastMm : -xEastMm;
}
