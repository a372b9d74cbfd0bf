import type { Mesh, Vec3 } from '../parts/mesh.ts';

/** A straight edge of a solid, two points in the face frame, mm. */
export type Edge3 = readonly [Vec3, Vec3];

/** The style edges of a gnomon mesh, by side of the fin in face-drawing x. */
export interface StyleEdges {
  /** edges on the side face at the smallest x (x = −t/2) */
  readonly minusX: readonly Edge3[];
  /** edges on the side face at the largest x (x = +t/2) */
  readonly plusX: readonly Edge3[];
  /** x of each side face, mm */
  readonly sideX: readonly [number, number];
}

const EPS_MM = 1e-9;

/**
 * Find the style edges of a gnomon fin from its mesh alone: the edges lying
 * in one of the two side faces (the planes of smallest and largest x) that
 * border a triangle facing upward (normal z > 0) above the face (z > 0).
 * For a plain fin these are the two top edges at z = height; a nodus notch
 * adds its sloping flanks. The mesh must be closed and outward-wound
 * (validateMesh), as gnomonSolid makes it. With `fromRoot` (the fin of a
 * face whose style rises from a root, planarGnomonSolid) an edge may end on
 * the face (z = 0).
 *
 * @example styleEdges(gnomonSolid().mesh).plusX // [[[1.5, −60, 20], [1.5, 60, 20]]]
 */
export function styleEdges(mesh: Mesh, options: { readonly fromRoot?: boolean } = {}): StyleEdges {
  const P = mesh.positions;
  let xMin = Infinity;
  let xMax = -Infinity;
  for (const p of P) {
    xMin = Math.min(xMin, p[0]);
    xMax = Math.max(xMax, p[0]);
  }
  const normalZ = mesh.triangles.map(([a, b, c]) => {
    const u = [P[b][0] - P[a][0], P[b][1] - P[a][1], P[b][2] - P[a][2]];
    const v = [P[c][0] - P[a][0], P[c][1] - P[a][1], P[c][2] - P[a][2]];
    const nx = u[1] * v[2] - u[2] * v[1];
    const ny = u[2] * v[0] - u[0] * v[2];
    const nz = u[0] * v[1] - u[1] * v[0];
    return nz / (Math.hypot(nx, ny, nz) || 1);
  });
  const found = { minusX: [] as Edge3[], plusX: [] as Edge3[] };
  const seen = new Set<string>();
  mesh.triangles.forEach((tri, k) => {
    if (!(normalZ[k] > 1e-9)) return;
    for (let i = 0; i < 3; i++) {
      const a = tri[i];
      const b = tri[(i + 1) % 3];
      const pa = P[a];
      const pb = P[b];
      // A style rising from a root on the face (ψ > 0, `fromRoot`) has one end at z = 0.
      if (options.fromRoot ? !(Math.max(pa[2], pb[2]) > EPS_MM && Math.min(pa[2], pb[2]) > -EPS_MM) : !(pa[2] > EPS_MM && pb[2] > EPS_MM)) continue;
      const side = Math.abs(pa[0] - xMin) < EPS_MM && Math.abs(pb[0] - xMin) < EPS_MM ? 'minusX' : Math.abs(pa[0] - xMax) < EPS_MM && Math.abs(pb[0] - xMax) < EPS_MM ? 'plusX' : null;
      if (!side) continue;
      const key = a < b ? `${a},${b}` : `${b},${a}`;
      if (seen.has(key)) continue;
      seen.add(key);
      // Keep edges ordered by increasing y so writers and tests see a stable order.
      found[side].push(pa[1] <= pb[1] ? [pa, pb] : [pb, pa]);
    }
  });
  const byY = (e: Edge3, f: Edge3) => e[0][1] - f[0][1];
  return { minusX: found.minusX.sort(byY), plusX: found.plusX.sort(byY), sideX: [xMin, xMax] };
}
