import type { Mesh, Triangle, Vec2, Vec3 } from './mesh.ts';
import { triangulatePolygon } from './triangulatePolygon.ts';
import { cross3, dot3, normalize3 } from './vec3.ts';

/**
 * Working buffers for building one mesh inside a part builder. Local to the
 * builder that creates it (never shared or returned); `finishMesh` freezes
 * the result into a plain `Mesh`.
 */
export interface MeshDraft {
  readonly positions: Vec3[];
  readonly triangles: Triangle[];
}

export function newDraft(): MeshDraft {
  return { positions: [], triangles: [] };
}

/** Append a position and return its index. */
export function addPoint(draft: MeshDraft, p: Vec3): number {
  draft.positions.push(p);
  return draft.positions.length - 1;
}

/**
 * Add one planar face bounded by `outer` (indices) with optional `holes`
 * (index rings), triangulated by ear clipping with no extra vertex, wound
 * so that its normal points along `outward`.
 */
export function addPlanarFace(draft: MeshDraft, outward: Vec3, outer: readonly number[], holes: readonly (readonly number[])[] = []): void {
  const n = normalize3(outward);
  // Basis (e1, e2) of the face plane with e1 × e2 = n, so CCW in (e1, e2) is CCW seen from outside.
  const helper: Vec3 = Math.abs(n[0]) < 0.9 ? [1, 0, 0] : [0, 1, 0];
  const e1 = normalize3(cross3(helper, n));
  const e2 = cross3(n, e1);
  const flat = (i: number): Vec2 => {
    const p = draft.positions[i];
    return [dot3(p, e1), dot3(p, e2)];
  };
  const all = [...outer, ...holes.flat()];
  const tris = triangulatePolygon(outer.map(flat), holes.map((h) => h.map(flat)));
  for (const [a, b, c] of tris) draft.triangles.push([all[a], all[b], all[c]]);
}

/** Freeze a draft into a plain mesh (copies, so the draft cannot leak changes). */
export function finishMesh(draft: MeshDraft): Mesh {
  return {
    positions: draft.positions.map((p) => [p[0], p[1], p[2]] as Vec3),
    triangles: draft.triangles.map((t) => [t[0], t[1], t[2]] as Triangle),
  };
}
