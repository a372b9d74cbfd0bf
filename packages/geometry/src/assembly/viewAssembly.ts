import type { Vec3 } from '../parts/mesh.ts';
import type { PlateDrawing } from '../plate/plateDrawing.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import type { Vec2 } from '../types.ts';
import { gnomonShadowOnFace, type FaceShadow } from './gnomonShadowOnFace.ts';
import { placeAssembly, worldToFaceDirection, type Assembly } from './placeAssembly.ts';
import type { PictureSun } from './sunForPicture.ts';
import { ASSEMBLY_VIEW_DEFAULTS, viewScene, type AssemblyViewOptions, type Backdrop, type ScenePicture } from './viewScene.ts';

export { ASSEMBLY_VIEW_DEFAULTS, projectToPicture, type AssemblyViewOptions } from './viewScene.ts';

/** The polar assembly seen at an angle: everything to paint, in order, in picture mm (x right, y down). */
export interface AssemblyPicture extends ScenePicture {
  readonly assembly: Assembly;
  readonly sun: PictureSun;
  /** the sun in face coordinates (unit vector) */
  readonly sunFace: Vec3;
  readonly shadow: FaceShadow;
}

/**
 * The polar assembly picture (`viewScene`): the placed dial (`placeAssembly`)
 * seen from above the ground on the face's side — the equator-ward
 * direction turned by the view azimuth toward the east — on the ground
 * around its footprint, with the gnomon's shadow on the face from
 * `gnomonShadowOnFace`.
 *
 * @example viewAssembly(layout, plateDrawing(layout), sunForPicture(layout, '2027-06-21', '10:00')).items.length
 */
export function viewAssembly(layout: DialLayout, drawing: PlateDrawing, sun: PictureSun, options: Partial<AssemblyViewOptions> = {}): AssemblyPicture {
  const o = { ...ASSEMBLY_VIEW_DEFAULTS, ...options };
  const assembly = placeAssembly(layout);
  const north = assembly.hemisphere === 'north';
  const sunFace = worldToFaceDirection(assembly.face, sun.direction);
  const shadow = gnomonShadowOnFace(layout, sunFace, assembly.faceOutline);
  const scene = {
    parts: assembly.parts,
    face: assembly.face,
    faceOutline: assembly.faceOutline,
    frontAzimuthDeg: north ? 180 : 0,
    azimuthSense: north ? 1 : -1,
    backdrop: groundBackdrop(groundRect(assembly, o.groundMm)),
  } as const;
  return { ...viewScene(scene, drawing, sun.direction, shadow.polygons, o), assembly, sun, sunFace, shadow };
}

/** The ground (Z = 0) as a backdrop, drawn over `outline` (X, Y, CCW seen from above). */
export function groundBackdrop(outline: readonly Vec2[]): Backdrop {
  return { kind: 'ground', origin: [0, 0, 0], uAxis: [1, 0, 0], vAxis: [0, 1, 0], normal: [0, 0, 1], outline };
}

/** The ground: the wedge's footprint grown by groundMm (world, Z = 0), CCW seen from above. */
function groundRect(assembly: Assembly, groundMm: number): Vec2[] {
  const fp = assembly.footprint;
  const g = groundMm;
  const sign = assembly.hemisphere === 'north' ? 1 : -1;
  return (
    [
      [fp.xMinMm - g, fp.yMinMm - g],
      [fp.xMaxMm + g, fp.yMinMm - g],
      [fp.xMaxMm + g, fp.yMaxMm + g],
      [fp.xMinMm - g, fp.yMaxMm + g],
    ] as Vec2[]
  ).map(([x, y]) => [sign * x, sign * y]);
}
