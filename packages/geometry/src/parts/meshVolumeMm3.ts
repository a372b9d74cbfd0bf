import type { Mesh } from './mesh.ts';

/**
 * Enclosed volume of a closed, outward-wound mesh in mm³.
 *
 * Sum of the signed volumes of the tetrahedra (origin, a, b, c), i.e.
 * V = (1/6) Σ a · (b × c) — the divergence theorem applied to a
 * polyhedron (common practice; e.g. C. Zhang & T. Chen, "Efficient feature
 * extraction for 2D/3D objects in mesh representation", ICIP 2001).
 * Positive for outward winding, negative if every triangle is reversed.
 *
 * @example meshVolumeMm3(gnomonSolid().mesh) // ≈ t · profile area
 */
export function meshVolumeMm3(mesh: Mesh): number {
  let sixV = 0;
  for (const [i, j, k] of mesh.triangles) {
    const a = mesh.positions[i];
    const b = mesh.positions[j];
    const c = mesh.positions[k];
    sixV +=
      a[0] * (b[1] * c[2] - b[2] * c[1]) +
      a[1] * (b[2] * c[0] - b[0] * c[2]) +
      a[2] * (b[0] * c[1] - b[1] * c[0]);
  }
  return sixV / 6;
}
