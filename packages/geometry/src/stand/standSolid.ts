import { manifoldEngine } from '../parts/manifoldEngine.ts';
import { meshFromManifold } from '../parts/manifoldMesh.ts';
import type { Mesh, Triangle, Vec3 } from '../parts/mesh.ts';
import { placePoint } from './placeStandPart.ts';
import { validateMesh } from '../parts/validateMesh.ts';
import { sheetPartRings } from './sheetPartMesh.ts';
import type { FlatStand } from './standTypes.ts';

/**
 * The assembled stand as one mesh of closed solids, one per part (stand
 * frame, ground z = 0): each part's section (outer profile, holes and slots)
 * extruded through its thickness about its mid-plane by manifold-3d
 * (E. Lalish et al., https://github.com/elalish/manifold) and moved to its
 * placement. The parts are kept apart as separate watertight shells, as
 * they are made: where two touch (a cheek standing on a foot, a rail on a
 * cheek) they share a plane but no edge, so each shell stays 2-manifold and
 * a slicer or viewer reads the file as the parts of one assembly.
 *
 * @example (await standSolid(flatStand(layout))).triangles.length
 */
export async function standSolid(stand: Pick<FlatStand, 'parts' | 'instances'>): Promise<Mesh> {
  const wasm = await manifoldEngine();
  const { CrossSection } = wasm;
  const live: { delete(): void }[] = [];
  const keep = <X extends { delete(): void }>(x: X): X => {
    live.push(x);
    return x;
  };
  try {
    const byName = new Map(stand.parts.map((p) => [p.name, p]));
    const positions: Vec3[] = [];
    const triangles: Triangle[] = [];
    for (const inst of stand.instances) {
      const part = byName.get(inst.part);
      if (!part) throw new Error(`standSolid: instance ${inst.id} names no part ${inst.part}`);
      const { outer, holes } = sheetPartRings(part);
      const section = keep(new CrossSection([outer, ...holes].map((r) => r.map(([x, y]): [number, number] => [x, y])), 'Positive'));
      const shell = meshFromManifold(keep(section.extrude(part.thicknessMm, 0, 0, [1, 1], true)));
      const base = positions.length;
      for (const p of shell.positions) positions.push(placePoint(inst.placement, p));
      for (const [a, b, c] of shell.triangles) triangles.push([a + base, b + base, c + base]);
    }
    return validateMesh({ positions, triangles });
  } finally {
    for (const x of live) x.delete();
  }
}
