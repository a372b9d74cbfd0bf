import { SpecError } from '../errors.ts';
import type { Vec3 } from '../parts/mesh.ts';
import type { FaceOrientation } from './planarTypes.ts';
import { poleAxisEnu } from './sunDirectionEnu.ts';

/**
 * The outward unit normal of a dial face in the horizon frame (x east,
 * y north, z up), from docs/design.md §8 (the standard face orientations of the
 * dialling handbooks: A. E. Waugh, "Sundials: Their Theory and
 * Construction", Dover 1973; R. R. J. Rohr, "Sundials: History, Theory and
 * Practice", Dover 1996 — memory):
 * - horizontal: (0, 0, 1);
 * - vertical, declination D (positive toward the west) and reclination R:
 *   (−e sin D cos R, −e cos D cos R, sin R), e = +1 in the northern
 *   hemisphere (D = 0 faces south), −1 in the southern (D = 0 faces north);
 *   the sign of "west" is kept in both, so D > 0 always turns the wall west;
 * - meridian: (+1, 0, 0) facing east, (−1, 0, 0) facing west;
 * - polar: (0, −sin φ, cos φ) (tilted by |φ|, rising toward the elevated pole);
 * - equatorial: ±e·p, p = (0, cos φ, sin φ): the upper face looks at the
 *   elevated pole, the lower face away from it.
 *
 * @example faceNormalEnu({ type: 'vertical', latitudeRad: 0.9, declinationRad: Math.PI / 4 }) // south-west wall: [−0.707, −0.707, 0]
 */
export function faceNormalEnu(o: FaceOrientation): Vec3 {
  const phi = o.latitudeRad;
  const e = phi >= 0 ? 1 : -1;
  switch (o.type) {
    case 'horizontal':
      return [0, 0, 1];
    case 'polar':
      return [0, -Math.sin(phi), Math.cos(phi)];
    case 'meridian':
      if (o.facing !== 'east' && o.facing !== 'west') throw new SpecError('dial.facing', o.facing, 'allowed: "east" or "west" for a meridian dial');
      return [o.facing === 'east' ? 1 : -1, 0, 0];
    case 'equatorial': {
      const side = o.side ?? 'upper';
      const p = poleAxisEnu(phi);
      const k = side === 'upper' ? e : -e;
      return [0, k * p[1], k * p[2]];
    }
    case 'vertical': {
      const D = o.declinationRad ?? 0;
      const R = o.reclinationRad ?? 0;
      const cR = Math.cos(R);
      // West is −x in both hemispheres: the south-facing (north: e = 1) or
      // north-facing (south: e = −1) normal turned toward the west by D.
      return [-Math.sin(D) * cR, -e * Math.cos(D) * cR, Math.sin(R)];
    }
    default: {
      const never: never = o.type;
      throw new SpecError('dial.type', never, 'allowed: polar, horizontal, vertical, meridian, equatorial');
    }
  }
}
