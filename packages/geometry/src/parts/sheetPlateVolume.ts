import type { PlateDrawing } from '../plate/plateDrawing.ts';
import { roundedRectArea } from '../outline/roundedRect.ts';

/**
 * Volume of a plate cut from sheet, mm³: the nominal outline (true arcs)
 * less the mounting holes and the gnomon slots, times the thickness. The
 * engraving takes a few hundredths of a percent and is left out.
 *
 * @example sheetPlateVolumeMm3(drawing, 3)
 */
export function sheetPlateVolumeMm3(drawing: PlateDrawing, thicknessMm: number): number {
  const holes = drawing.holes.reduce((s, h) => s + Math.PI * h.radiusMm ** 2, 0);
  const slots = drawing.slots.reduce((s, r) => s + roundedRectArea(r), 0);
  return (roundedRectArea(drawing.outline) - holes - slots) * thicknessMm;
}
