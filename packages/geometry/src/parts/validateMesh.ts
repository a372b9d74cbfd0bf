import type { Mesh } from './mesh.ts';
import { cross3, length3, sub3 } from './vec3.ts';

/**
 * Check that a mesh is a clean closed 2-manifold surface, throwing an Error
 * that names the first problem found:
 * - every coordinate is a finite number and every index is an integer in range;
 * - no triangle repeats a corner or has zero area (|(b−a)×(c−a)| must exceed
 *   1e-12 of its longest edge squared);
 * - no two positions are identical (shared corners must be shared indices);
 * - every directed edge a→b occurs exactly once and its twin b→a exactly
 *   once, i.e. each edge is used by exactly two triangles with opposite
 *   orientations (watertight, consistently wound, no T-junctions).
 * It does not test for self-intersection; the part builders avoid it by
 * construction.
 *
 * @example validateMesh(wedgeSolid().mesh) // returns the mesh or throws
 */
export function validateMesh(mesh: Mesh): Mesh {
  const n = mesh.positions.length;
  const seen = new Map<string, number>();
  mesh.positions.forEach((p, i) => {
    if (p.length !== 3 || !p.every((c) => Number.isFinite(c))) {
      throw new Error(`validateMesh: positions[${i}] = [${p.join(', ')}] is not three finite numbers`);
    }
    const key = `${p[0]},${p[1]},${p[2]}`;
    const prior = seen.get(key);
    if (prior !== undefined) {
      throw new Error(`validateMesh: positions[${i}] duplicates positions[${prior}] at [${key}]; shared corners must use one index`);
    }
    seen.set(key, i);
  });
  // Directed edges u→v by the number u·n + v (exact: n² stays far below 2⁵³ for any mesh that fits in memory).
  const directed = new Map<number, number>();
  mesh.triangles.forEach((t, ti) => {
    if (t.length !== 3 || !t.every((i) => Number.isInteger(i) && i >= 0 && i < n)) {
      throw new Error(`validateMesh: triangles[${ti}] = [${t.join(', ')}] needs three integer indices in 0..${n - 1}`);
    }
    const [i, j, k] = t;
    if (i === j || j === k || k === i) {
      throw new Error(`validateMesh: triangles[${ti}] = [${t.join(', ')}] repeats a corner (degenerate)`);
    }
    const a = mesh.positions[i];
    const b = mesh.positions[j];
    const c = mesh.positions[k];
    const e2 = Math.max(length3(sub3(b, a)), length3(sub3(c, b)), length3(sub3(a, c))) ** 2;
    const area2 = length3(cross3(sub3(b, a), sub3(c, a)));
    if (!(area2 > 1e-12 * e2)) {
      throw new Error(`validateMesh: triangles[${ti}] = [${t.join(', ')}] has zero area (degenerate)`);
    }
    for (const [u, v] of [[i, j], [j, k], [k, i]] as const) {
      const key = u * n + v;
      const prior = directed.get(key);
      if (prior !== undefined) {
        throw new Error(`validateMesh: edge ${u}→${v} is used in the same direction by triangles[${prior}] and triangles[${ti}] (inconsistent winding or non-manifold edge)`);
      }
      directed.set(key, ti);
    }
  });
  for (const [key, ti] of directed) {
    const u = Math.floor(key / n);
    const v = key - u * n;
    if (!directed.has(v * n + u)) {
      throw new Error(`validateMesh: edge ${u}→${v} of triangles[${ti}] has no opposite twin ${v}→${u} (open boundary or T-junction)`);
    }
  }
  if (mesh.triangles.length === 0) throw new Error('validateMesh: mesh.triangles is empty');
  return mesh;
}
