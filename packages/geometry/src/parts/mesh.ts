/**
 * Plain-data triangle meshes for the printable parts.
 *
 * A mesh is indexed: `positions` holds each corner once (shared by every
 * triangle that meets there) and `triangles` holds index triples. Triangles
 * wind counter-clockwise when seen from outside the solid, so the right-hand
 * normal of (a, b, c) points out of the part. Lengths are millimetres.
 */

/** A point in a plane, `[u, v]` in mm. */
export type { Vec2 } from '../types.ts';

/** A point or direction in space, `[x, y, z]` in mm. */
export type Vec3 = readonly [number, number, number];

/** Indices of one triangle's corners into `Mesh.positions`, outward CCW. */
export type Triangle = readonly [number, number, number];

/** Closed, indexed, outward-wound triangle mesh (mm). */
export interface Mesh {
  readonly positions: readonly Vec3[];
  readonly triangles: readonly Triangle[];
}
