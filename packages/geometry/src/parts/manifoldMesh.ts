import type { Manifold, ManifoldToplevel } from 'manifold-3d';
import type { Mesh, Triangle, Vec3 } from './mesh.ts';

/**
 * Turn a manifold-3d solid into a plain Mesh: positions from
 * `getMesh().vertProperties` (float32, the first three properties), index
 * triples from `triVerts`, with exact duplicate positions welded into one
 * index so shared corners are shared (as validateMesh and STL readers
 * expect). A sliver whose two corners weld into one (they round to the same
 * float32 point) is dropped: it has no area, and its two remaining edges,
 * the same edge both ways, leave every other edge's pairing as it was, so
 * the mesh stays closed (validateMesh checks). A triangle whose three
 * corners weld into one point is dropped the same way.
 */
export function meshFromManifold(solid: Manifold): Mesh {
  const m = solid.getMesh();
  const np = m.numProp;
  const index = new Map<string, number>();
  const positions: Vec3[] = [];
  const remap: number[] = [];
  for (let v = 0; v < m.vertProperties.length / np; v++) {
    const p: Vec3 = [m.vertProperties[v * np], m.vertProperties[v * np + 1], m.vertProperties[v * np + 2]];
    const key = `${p[0]},${p[1]},${p[2]}`;
    let i = index.get(key);
    if (i === undefined) {
      i = positions.length;
      positions.push(p);
      index.set(key, i);
    }
    remap.push(i);
  }
  const triangles: Triangle[] = [];
  for (let t = 0; t < m.triVerts.length; t += 3) {
    const tri: Triangle = [remap[m.triVerts[t]], remap[m.triVerts[t + 1]], remap[m.triVerts[t + 2]]];
    if (tri[0] === tri[1] || tri[1] === tri[2] || tri[2] === tri[0]) continue;
    triangles.push(tri);
  }
  return { positions, triangles };
}

/** A plain closed Mesh as a manifold-3d solid (float32 corners; throws if it is not 2-manifold). */
export function manifoldFromMesh(wasm: ManifoldToplevel, mesh: Mesh): Manifold {
  const vertProperties = new Float32Array(mesh.positions.length * 3);
  mesh.positions.forEach((p, i) => vertProperties.set(p, 3 * i));
  const triVerts = new Uint32Array(mesh.triangles.length * 3);
  mesh.triangles.forEach((t, i) => triVerts.set(t, 3 * i));
  const solid = new wasm.Manifold(new wasm.Mesh({ numProp: 3, vertProperties, triVerts }));
  const status = solid.status();
  if (status !== 'NoError') throw new Error(`manifoldFromMesh: manifold-3d rejected the mesh (${status})`);
  return solid;
}
