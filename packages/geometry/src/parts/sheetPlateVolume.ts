import type { PlateDrawing } from '../plate/plateDrawing.ts';
import type { RoundedRect } from '../types.ts';

/** Area of a rounded rectangle, mm²: w·h − (4 − π)·r² (each corner loses a square less a quarter disc). */
function roundedRectArea(r: RoundedRect): number {
  const c = Math.min(r.cornerRadiusMm, r.widthMm / 2, r.heightMm / 2);
  return r.widthMm * r.heightMm - (4 - Math.PI) * c * c;
}

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
