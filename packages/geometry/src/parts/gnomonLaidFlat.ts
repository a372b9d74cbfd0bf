import { mapMesh } from './dialParts.ts';
import type { Mesh } from './mesh.ts';

/**
 * The gnomon fin turned to lie flat on a print bed (no support): style along +x, the fin's
 * thickness up +z, every coordinate ≥ 0. (x, y, z) → (y, z, x) is a rotation (cyclic
 * permutation), so the winding stays outward; then a shift by the half length, the tab depth
 * and the half thickness (mm) puts the part's lowest corner at the origin.
 * @example gnomonLaidFlat(gnomonSolid({ heightMm: 13.4, thicknessMm: 3 }).mesh, 50, 4, 3)
 */
export function gnomonLaidFlat(mesh: Mesh, halfLengthMm: number, tabDepthMm: number, thicknessMm: number): Mesh {
  const t2 = thicknessMm / 2;
  return mapMesh(mesh, ([x, y, z]) => [y + halfLengthMm, z + tabDepthMm, x + t2]);
}
