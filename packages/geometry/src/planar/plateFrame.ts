import { cross3, dot3 } from '../parts/vec3.ts';
import type { Vec3 } from '../parts/mesh.ts';
import type { PlanarFace } from './planarTypes.ts';

/**
 * The face re-drawn in the plate's frame: `up` along the substyle (in the
 * sense that points up the face, or toward the elevated pole on a level
 * face), `right = up × n`. The fin's footprint then runs along the plate's
 * y axis, so the gnomon's slots are plain rectangles, as on the polar plate
 * (whose frame this is). On a declining wall the plate's edges then stand
 * at the substyle's angle from the plumb line (`substyleFromVerticalRad`).
 */
export function plateFrame(face: PlanarFace): PlanarFace {
  const s = face.substyle;
  const sense = dot3(s, face.up) >= -1e-12 ? 1 : -1;
  const up: Vec3 = [sense * s[0], sense * s[1], sense * s[2]];
  return { ...face, up, right: cross3(up, face.normal) };
}

/**
 * The angle from the face's line of steepest ascent (the plumb line on a
 * wall, drawn up) to the plate's y axis, radians, positive clockwise as seen
 * from in front of the face (the plate's top turned to the viewer's right).
 */
export function substyleFromVerticalRad(face: PlanarFace, plate: PlanarFace): number {
  return Math.atan2(dot3(plate.up, face.right), dot3(plate.up, face.up));
}
