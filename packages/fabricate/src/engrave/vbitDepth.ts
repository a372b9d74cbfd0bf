import { SpecError, assertNonNegative, assertPositive, assertRange } from '@umbrafab/geometry';

/**
 * Depth at which a V-bit cuts a groove of the given width on the face.
 *
 * A V-bit of included angle θ with a flat tip of width `tip` cuts, at depth d,
 * a groove of width w = tip + 2·d·tan(θ/2); so
 *
 *     d = (w − tip) / (2·tan(θ/2))
 *
 * which for a sharp bit (tip = 0) is docs/design.md §5's d = w / (2·tan(θ/2))
 * (plain trigonometry of the bit's cone; common practice in engraving
 * feed-and-depth charts: a 90° bit cuts as wide as twice its depth).
 *
 * @param widthMm wanted groove width, mm (> tipMm)
 * @param angleDeg included angle of the bit, degrees, in (0, 180)
 * @param tipMm flat tip width, mm, default 0
 * @returns depth below the stock top, mm (positive)
 * @example vbitDepthMm(0.5, 90) // 0.25
 */
export function vbitDepthMm(widthMm: number, angleDeg: number, tipMm = 0): number {
  assertPositive('widthMm', widthMm);
  assertRange('vbitAngleDeg', angleDeg, 0, 180, '°', 'both');
  assertNonNegative('vbitTipMm', tipMm);
  if (!(widthMm > tipMm)) {
    throw new SpecError('widthMm', widthMm, `allowed: more than vbitTipMm (${tipMm}): a flat-tipped V-bit cuts at least its tip width`);
  }
  const halfAngleRad = (angleDeg * Math.PI) / 360;
  return (widthMm - tipMm) / (2 * Math.tan(halfAngleRad));
}
