import { SpecError } from '../errors.ts';
import { assertFinite, assertPositive } from '../guards.ts';

/** Options of `penumbraWidthMm` (lengths mm, angles radians). */
export interface PenumbraOptions {
  /** nodus / style height, mm */
  readonly heightMm: number;
  /** hour angle, radians, |H| < π/2 */
  readonly hourAngleRad: number;
  /** declination (either sign convention: only cos δ enters), radians */
  readonly declinationRad: number;
  /** angular radius of the Sun's disc α, radians (see `sunAngularRadiusRad`; ≈ 0.00466) */
  readonly sunRadiusRad: number;
}

/**
 * Width of the penumbra across an hour line, mm (docs/design.md §3):
 *
 *     w = 2·h·α / (cos δ · cos² H)
 *
 * The shadow edge sits at x = h·tan H, so dx/dH = h / cos² H; the Sun's disc
 * spans 2α on the sky, i.e. 2α / cos δ in hour angle.
 *
 * @example penumbraWidthMm({heightMm: 100, hourAngleRad: -Math.PI / 4, declinationRad: 0, sunRadiusRad: 0.00466}) // ≈ 1.86
 */
export function penumbraWidthMm(options: PenumbraOptions): number {
  const h = assertPositive('heightMm', options.heightMm);
  const factor = penumbraWidthFactor(options.hourAngleRad);
  const d = assertFinite('declinationRad', options.declinationRad);
  if (!(Math.abs(d) < Math.PI / 2)) throw new SpecError('declinationRad', d, 'allowed: |declination| < π/2');
  const a = assertPositive('sunRadiusRad', options.sunRadiusRad);
  return (2 * h * a * factor) / Math.cos(d);
}

/**
 * 1 / cos² H: how a width that covers a fixed span of time grows with the
 * hour angle on a polar face (docs/design.md §3), so line widths can follow the blur.
 * @example penumbraWidthFactor(Math.PI / 4) // 2
 */
export function penumbraWidthFactor(hourAngleRad: number): number {
  const hA = assertFinite('hourAngleRad', hourAngleRad);
  if (!(Math.abs(hA) < Math.PI / 2)) throw new SpecError('hourAngleRad', hA, 'allowed: |hour angle| < π/2 (the face is lit only then)');
  const c = Math.cos(hA);
  return 1 / (c * c);
}
