import type { Vec3 } from '../parts/mesh.ts';
import type { Vec2 } from '../types.ts';
import type { PlanarFace } from './planarTypes.ts';

/** A point or direction of the face plane (horizon frame, relative to the face origin) in drawing coordinates [right, up], mm. */
export function toFaceXY(face: PlanarFace, v: Vec3): Vec2 {
  const { right: r, up: u } = face;
  return [r[0] * v[0] + r[1] * v[1] + r[2] * v[2], u[0] * v[0] + u[1] * v[1] + u[2] * v[2]];
}

/** Drawing coordinates [right, up] back to the horizon frame (a point of the face plane relative to the origin). */
export function fromFaceXY(face: PlanarFace, xy: Vec2): Vec3 {
  const { right: r, up: u } = face;
  return [r[0] * xy[0] + u[0] * xy[1], r[1] * xy[0] + u[1] * xy[1], r[2] * xy[0] + u[2] * xy[1]];
}
