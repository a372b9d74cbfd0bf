import type { CrossSection, Manifold, ManifoldToplevel } from 'manifold-3d';
import type { PlateDrawing } from '../plate/plateDrawing.ts';
import type { Vec2 } from '../types.ts';
import { circlePolygon, widenPolyline } from './widenPolyline.ts';
import { roundedRectPolygon } from '../outline/roundedRect.ts';
import type { Keep } from './manifoldScope.ts';

/** Sides of each mounting-hole polygon (circumscribing the nominal circle). */
const HOLE_SEGMENTS = 32;
/** How far the groove cutters reach above the face, mm (so no coplanar cut). */
const CUTTER_OVERSHOOT_MM = 1;
/** Outline simplification tolerance for the groove section, mm (5 µm, far below print resolution). */
const SIMPLIFY_MM = 0.005;

/** Polygons in the mutable tuple form manifold-3d's CrossSection takes. */
export function contours(polys: readonly (readonly Vec2[])[]): [number, number][][] {
  return polys.map((poly) => poly.map(([x, y]): [number, number] => [x, y]));
}

/** The grooved plate and the 2D sections it was made from (all owned by the caller's `keep`). */
export interface GroovedPlate {
  /** plate outline minus mounting holes (and slots, when asked) */
  readonly plateSection: CrossSection;
  /** union of all line grooves, numerals and text, inside the outline */
  readonly grooveSection: CrossSection;
  /** the plate solid, underside on z = 0, grooves cut `depth` into the top */
  readonly grooved: Manifold;
}

/**
 * The printed plate as a manifold-3d solid, in plate coordinates (origin at
 * the plate's lower-left corner, underside on z = 0):
 * - the outline (rounded corners) minus the mounting holes and, with
 *   `withSlots`, the gnomon slots (nominal: tab + fit clearance per side),
 *   extruded to the plate thickness;
 * - every engraved line cut in as a groove of its own width with square
 *   ends, numerals and text as strokes widened with round joins and caps;
 *   all `depthMm` deep with a flat floor, kept inside the outline.
 * Every object made is handed to `keep`, whose owner deletes them.
 */
export function groovedPlate(
  wasm: ManifoldToplevel,
  keep: Keep,
  drawing: PlateDrawing,
  thicknessMm: number,
  depthMm: number,
  withSlots: boolean,
): GroovedPlate {
  const { CrossSection, Manifold } = wasm;
  const outline = roundedRectPolygon(drawing.outline);
  const holes = drawing.holes.map((c) => circlePolygon([c.cx, c.cy], c.radiusMm, HOLE_SEGMENTS).reverse());
  const slots = withSlots ? drawing.slots.map((r) => roundedRectPolygon(r).reverse()) : [];
  const plateSection = keep(new CrossSection(contours([outline, ...holes, ...slots]), 'Positive'));

  const groovePolys: Vec2[][] = [];
  for (const line of drawing.lines) {
    const pts = line.path.closed ? [...line.path.points, line.path.points[0]] : line.path.points;
    groovePolys.push(...widenPolyline(pts, line.widthMm, false));
  }
  for (const block of drawing.text) {
    for (const s of block.strokes) {
      const pts = s.closed ? [...s.points, s.points[0]] : s.points;
      groovePolys.push(...widenPolyline(pts, block.strokeWidthMm, true));
    }
  }
  // Grooves stay inside the plate outline (never cut through its edge).
  // Simplified by SIMPLIFY_MM: the union of overlapping stroke polygons leaves
  // corners microns apart, whose slivers float32 corners cannot describe.
  const grooveSection = keep(keep(CrossSection.intersection(keep(new CrossSection(contours(groovePolys), 'Positive')), plateSection)).simplify(SIMPLIFY_MM));
  const plate = keep(plateSection.extrude(thicknessMm));
  const cutters = keep(keep(grooveSection.extrude(depthMm + CUTTER_OVERSHOOT_MM)).translate([0, 0, thicknessMm - depthMm]));
  const grooved = keep(Manifold.difference(plate, cutters));
  return { plateSection, grooveSection, grooved };
}
