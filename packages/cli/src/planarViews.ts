import { layoutPlanar, planarPlateDrawing, type DialSpec, type PlanarLayout, type PlateDrawing } from '@umbrafab/geometry';
import type { SvgOptions } from '@umbrafab/fabricate';

/** The geometry of a horizontal, wall, meridian or equatorial face that its writers and the page read. */
export interface PlanarContext {
  readonly spec: DialSpec;
  readonly layout: PlanarLayout;
  readonly drawing: PlateDrawing;
}

/**
 * A planar face's layout and plate drawing, as `buildPlanarFiles` lays
 * them out (the local page draws its views from them before the full build).
 * @example planarContext(readSpecFile('fixtures/planar/garden-horizontal.yaml')).layout.faceType // 'horizontal'
 */
export function planarContext(spec: DialSpec): PlanarContext {
  const layout = layoutPlanar(spec);
  return { spec, layout, drawing: planarPlateDrawing(layout) };
}

/**
 * How a planar face's preview.svg is drawn (its caption); with `previewFrame` the page finds the plate in it.
 * `lower`: the caption of preview-lower.svg, the lower face of a plate engraved on both faces, seen from below.
 */
export function planarPreviewSvgOptions({ spec, layout }: Pick<PlanarContext, 'spec' | 'layout'>, lower = false): SvgOptions {
  return { caption: `${spec.name} - ${layout.faceType} face, ${lower ? 'LOWER FACE seen from below, ' : ''}preview at 1:1, plate ${layout.plate.widthMm} x ${layout.plate.lengthMm} mm` };
}
