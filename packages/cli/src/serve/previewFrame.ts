import type { Vec2 } from '@umbrafab/geometry';

/**
 * How preview.svg places the plate: its viewBox size and the paint margin
 * around the plate, mm, read from the SVG text itself (toSvg puts plate
 * x at x + pad and plate y at length − y + pad: y runs up on the plate and
 * down in SVG). The page overlays the shadow in these user units and maps
 * the same SVG onto the 3D plate.
 */
export interface PreviewFrame {
  readonly viewWidthMm: number;
  readonly viewHeightMm: number;
  readonly padMm: number;
  readonly plateWidthMm: number;
  readonly plateLengthMm: number;
}

/** Read the frame of a preview.svg drawn for a plate of the given size. */
export function previewFrame(svg: string, plateWidthMm: number, plateLengthMm: number): PreviewFrame {
  const m = /viewBox="0 0 ([\d.]+) ([\d.]+)"/.exec(svg);
  if (!m) throw new Error('preview.svg: no viewBox "0 0 W H" found');
  const viewWidthMm = Number(m[1]);
  const viewHeightMm = Number(m[2]);
  return { viewWidthMm, viewHeightMm, padMm: (viewWidthMm - plateWidthMm) / 2, plateWidthMm, plateLengthMm };
}

/** A point in plate coordinates (origin lower-left, y up) to preview.svg user units (y down). */
export function plateToPreview(frame: PreviewFrame, p: Vec2): Vec2 {
  return [p[0] + frame.padMm, frame.plateLengthMm - p[1] + frame.padMm];
}
