import { SpecError } from '../errors.ts';
import { assertRange } from '../guards.ts';
import type { Hemisphere } from './types.ts';

/**
 * Declination measured toward the elevated pole (docs/design.md §2): δ itself in the
 * northern hemisphere, −δ in the southern one. Every face formula here takes
 * this pole-ward declination, so "local summer" is positive in both
 * hemispheres and its date line lies toward the equator-ward end of the
 * plate (y < 0).
 *
 * @param declinationRad geocentric declination, north positive
 * @example declinationTowardPoleRad(0.409, 'south') // -0.409 (June: winter in the south)
 */
export function declinationTowardPoleRad(declinationRad: number, hemisphere: Hemisphere): number {
  const d = assertRange('declinationRad', declinationRad, -Math.PI / 2, Math.PI / 2);
  return assertHemisphere(hemisphere) === 'north' ? d : -d;
}

/** Throw a SpecError unless `value` is 'north' or 'south'. */
export function assertHemisphere(value: unknown): Hemisphere {
  if (value !== 'north' && value !== 'south') {
    throw new SpecError('hemisphere', value, "allowed: 'north' or 'south'");
  }
  return value;
}
