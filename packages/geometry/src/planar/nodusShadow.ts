import type { Vec3 } from '../parts/mesh.ts';
import { dot3 } from '../parts/vec3.ts';
import type { Vec2 } from '../types.ts';
import { toFaceXY } from './faceCoordinates.ts';
import type { PlanarFace } from './planarTypes.ts';

/**
 * The shadow of a point N (horizon frame, relative to the face origin O) on
 * the face along the Sun's direction s (docs/design.md §8):
 *
 *     X = N − s · (n · (N − O)) / (n · s)
 *
 * in drawing coordinates, or null when the Sun is not in front of the face
 * (n · s ≤ 0).
 */
export function nodusShadow(face: PlanarFace, nodus: Vec3, sun: Vec3): Vec2 | null {
  const ns = dot3(face.normal, sun);
  if (!(ns > 0)) return null;
  const k = dot3(face.normal, nodus) / ns;
  return toFaceXY(face, [nodus[0] - k * sun[0], nodus[1] - k * sun[1], nodus[2] - k * sun[2]]);
}
