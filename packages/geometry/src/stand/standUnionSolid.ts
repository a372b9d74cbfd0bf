import { manifoldScope } from '../parts/manifoldScope.ts';
import { meshFromManifold } from '../parts/manifoldMesh.ts';
import type { Mesh } from '../parts/mesh.ts';
import { validateMesh } from '../parts/validateMesh.ts';
import { sheetPartRings } from './sheetPartMesh.ts';
import type { FlatStand } from './standTypes.ts';

/** How much each part of a printed stand is thickened on each side, mm, so that parts drawn touching overlap and fuse into one solid. */
export const PRINT_FUSE_MM = 0.01;
/** Largest move of a surface when the fused solid drops the slivers the overlaps leave, mm (far below a printer's resolution). */
export const PRINT_SIMPLIFY_MM = 0.001;

/**
 * A stand printed in one piece: every placed part (drawn with a slot
 * clearance of −PRINT_FUSE_MM, so each tab overlaps its slot's walls) extruded through its thickness +
 * 2 · PRINT_FUSE_MM about its mid-plane, moved to its placement and united
 * by manifold-3d (E. Lalish et al., https://github.com/elalish/manifold):
 * parts that touch in the drawing overlap by PRINT_FUSE_MM and fuse, so
 * the result is one closed solid (the holes for screws and rod kept),
 * simplified by PRINT_SIMPLIFY_MM so that no sliver triangle collapses
 * when its corners are written as float32.
 *
 * @example (await standUnionSolid(equatorialStand(layout, { clearanceMm: -PRINT_FUSE_MM, reliefToolRadiusMm: 0 }))).triangles.length
 */
export async function standUnionSolid(stand: Pick<FlatStand, 'parts' | 'instances'>): Promise<Mesh> {
  return manifoldScope(({ CrossSection, Manifold }, keep) => {
    const byName = new Map(stand.parts.map((p) => [p.name, p]));
    const solids = stand.instances.map((inst) => {
      const part = byName.get(inst.part);
      if (!part) throw new Error(`standUnionSolid: instance ${inst.id} names no part ${inst.part}`);
      const { outer, holes } = sheetPartRings(part);
      const section = keep(new CrossSection([outer, ...holes].map((r) => r.map(([x, y]): [number, number] => [x, y])), 'Positive'));
      const { origin: o, e1, e2, normal: nn } = inst.placement;
      const slab = keep(section.extrude(part.thicknessMm + 2 * PRINT_FUSE_MM, 0, 0, [1, 1], true));
      // manifold-3d's Mat4 is column-major: the columns e1, e2, normal, origin.
      return keep(slab.transform([e1[0], e1[1], e1[2], 0, e2[0], e2[1], e2[2], 0, nn[0], nn[1], nn[2], 0, o[0], o[1], o[2], 1]));
    });
    return validateMesh(meshFromManifold(keep(keep(Manifold.union(solids)).simplify(PRINT_SIMPLIFY_MM))));
  });
}
