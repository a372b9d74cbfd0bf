import type { Vec3 } from '../parts/mesh.ts';
import type { PlanarLayout } from '../planar/layoutPlanar.ts';
import type { PlateDrawing } from '../plate/plateDrawing.ts';
import { planarShadowOnFace } from '../shadow/planarShadowOnFace.ts';
import type { Vec2 } from '../types.ts';
import { clipPolygonConvex } from './clipPolygon.ts';
import { worldToFaceDirection } from './placeAssembly.ts';
import { placePlanarAssembly, type PlanarAssembly } from './placePlanarAssembly.ts';
import type { PictureSun } from './sunForPicture.ts';
import { ASSEMBLY_VIEW_DEFAULTS, viewScene, type AssemblyViewOptions, type ScenePicture } from './viewScene.ts';

/** A planar face's assembly picture: the scene seen at an angle, and what it shows. */
export interface PlanarAssemblyPicture extends ScenePicture {
  readonly assembly: PlanarAssembly;
  readonly sun: PictureSun;
  /** the sun in face coordinates (unit vector) */
  readonly sunFace: Vec3;
  /** the gnomon's shadow on the plate, face coordinates (clipped to its outline), CCW */
  readonly faceShadow: readonly (readonly Vec2[])[];
}

/**
 * The assembly picture of a horizontal, wall, meridian or equatorial face
 * (`viewScene`, the polar picture's steps): the face as it stands
 * (`placePlanarAssembly`), the gnomon's shadow on the face cast from the
 * solid the check casts (`planarShadowOnFace`) and clipped to the plate,
 * the dial's shadow on the ground or the wall. Null when the face has no
 * placement (an equatorial face beyond its stand's latitudes).
 *
 * @example viewPlanarAssembly(layout, planarPlateDrawing(layout), sunForPicture(layout, '2027-06-21', '10:00', layout.face.normal))?.items.length
 */
export function viewPlanarAssembly(layout: PlanarLayout, drawing: PlateDrawing, sun: PictureSun, options: Partial<AssemblyViewOptions> = {}): PlanarAssemblyPicture | null {
  const o = { ...ASSEMBLY_VIEW_DEFAULTS, ...options };
  const assembly = placePlanarAssembly(layout, o.groundMm);
  if (!assembly) return null;
  const sunFace = worldToFaceDirection(assembly.face, sun.direction);
  const faceShadow = planarShadowOnFace(layout, sunFace)
    .map((p) => clipPolygonConvex(p.points, assembly.faceOutline))
    .filter((p) => p.length >= 3);
  const scene = { ...assembly, azimuthSense: viewSense(assembly, sun.direction, o.viewAzimuthDeg, o.viewElevationDeg) };
  return { ...viewScene(scene, drawing, sun.direction, faceShadow, o), assembly: scene, sun, sunFace, faceShadow };
}

/** Least angle between the line of sight and the gnomon's plane for the view to count as showing the fin, radians (15°). */
const EDGE_ON_RAD = (15 * Math.PI) / 180;

/**
 * Which way the view azimuth turns from the face's front: away from the
 * sun's side, so that the shadow falls toward the viewer instead of
 * hiding behind the gnomon, unless the fin would then be seen within
 * EDGE_ON_RAD of edge-on (its plane holds the face's y axis and normal: a
 * meridian fin from the north-east); then toward the sun's side.
 */
function viewSense(scene: PlanarAssembly, sun: Vec3, viewAzimuthDeg: number, viewElevationDeg: number): 1 | -1 {
  const front = (scene.frontAzimuthDeg * Math.PI) / 180;
  const sunAz = Math.atan2(sun[0], sun[1]);
  const d = Math.atan2(Math.sin(sunAz - front), Math.cos(sunAz - front));
  const away: 1 | -1 = d >= 0 ? 1 : -1;
  const el = (viewElevationDeg * Math.PI) / 180;
  const toViewer = (sense: number): Vec3 => {
    const az = front - sense * ((viewAzimuthDeg * Math.PI) / 180);
    return [Math.sin(az) * Math.cos(el), Math.cos(az) * Math.cos(el), Math.sin(el)];
  };
  const x = scene.face.xAxis;
  const v = toViewer(away);
  const edgeOn = Math.abs(v[0] * x[0] + v[1] * x[1] + v[2] * x[2]) < Math.sin(EDGE_ON_RAD);
  return edgeOn ? (-away as 1 | -1) : away;
}
