import { SpecError } from '../errors.ts';
import type { PlateDrawing } from '../plate/plateDrawing.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import { groovedPlate } from './groovedPlate.ts';
import { manifoldScope } from './manifoldScope.ts';
import { meshFromManifold } from './manifoldMesh.ts';
import type { Mesh } from './mesh.ts';
import { meshVolumeMm3 } from './meshVolumeMm3.ts';
import { validateMesh } from './validateMesh.ts';

/** The printed dial plate as plain data. */
export interface PlatePart {
  readonly kind: 'plate';
  /** closed mesh in plate coordinates: origin at the lower-left corner, underside on z = 0, face up */
  readonly mesh: Mesh;
  readonly grooveDepthMm: number;
  /** areas of the 2D sections, mm²: outline minus holes and slots; the grooves */
  readonly areasMm2: { readonly plate: number; readonly grooves: number };
  readonly volumeMm3: number;
}

/**
 * The dial plate for printing (plate.stl): the plate of body.stl without
 * the fused fin — outline with rounded corners, mounting holes, the gnomon
 * slots (tab + fit clearance per side, as in plate.dxf), and every line,
 * numeral and text grooved `grooveDepth` deep into the face (groovedPlate).
 * Printed face up as modelled: the grooves open upward and every wall is
 * vertical, so it needs no support. The gnomon (gnomon.stl) goes into the
 * slots; the plate is screwed to the wedge's seat through its holes.
 *
 * Closed-form check: volume = T · area(plate) − depth · area(grooves).
 *
 * @example (await plateSolid(layout, drawing, 0.6)).volumeMm3
 */
export async function plateSolid(layout: DialLayout, drawing: PlateDrawing, grooveDepthMm: number): Promise<PlatePart> {
  const T = layout.plate.thicknessMm;
  const d = grooveDepthMm;
  if (!(d <= T / 2)) {
    throw new SpecError('parts.grooveDepth', d, `allowed: at most half the plate thickness (${T / 2} mm) so the plate keeps its strength`);
  }
  return manifoldScope(async (wasm, keep) => {
    const { plateSection, grooveSection, grooved } = groovedPlate(wasm, keep, drawing, T, d, true);
    const status = grooved.status();
    if (status !== 'NoError') throw new Error(`plateSolid: manifold-3d reports ${status}`);
    const mesh = validateMesh(meshFromManifold(grooved));
    return { kind: 'plate', mesh, grooveDepthMm: d, areasMm2: { plate: plateSection.area(), grooves: grooveSection.area() }, volumeMm3: meshVolumeMm3(mesh) };
  });
}
