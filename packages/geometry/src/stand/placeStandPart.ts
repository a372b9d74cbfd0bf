import type { Vec3 } from '../parts/mesh.ts';
import type { PartPlacement } from './standTypes.ts';

/**
 * A point of a flat part's own frame (drawing x, y; depth w across the
 * thickness from the mid-plane) in the frame its placement is given in.
 * @example placePoint(instance.placement, [0, 0, 0]) // instance.placement.origin
 */
export function placePoint(pl: PartPlacement, [x, y, w]: Vec3): Vec3 {
  return [0, 1, 2].map((i) => pl.origin[i] + x * pl.e1[i] + y * pl.e2[i] + w * pl.normal[i]) as unknown as Vec3;
}
