import type { Mesh, Vec3 } from './mesh.ts';

/** Axis-aligned bounding box of a mesh, mm. */
export interface MeshBounds {
  readonly min: Vec3;
  readonly max: Vec3;
}

/**
 * Smallest axis-aligned box holding every position of the mesh.
 * Throws if the mesh has no positions.
 *
 * @example meshBounds(gnomonSolid().mesh).max[2] // the style height
 */
export function meshBounds(mesh: Mesh): MeshBounds {
  if (mesh.positions.length === 0) throw new Error('meshBounds: mesh.positions is empty; a mesh needs at least one point');
  const min = [Infinity, Infinity, Infinity];
  const max = [-Infinity, -Infinity, -Infinity];
  for (const p of mesh.positions) {
    for (let k = 0; k < 3; k++) {
      if (p[k] < min[k]) min[k] = p[k];
      if (p[k] > max[k]) max[k] = p[k];
    }
  }
  return { min: [min[0], min[1], min[2]], max: [max[0], max[1], max[2]] };
}
