import type { Vec2 } from '@umbrafab/geometry';
import type { SvgOptions } from './toSvg.ts';

/** Paint margin around the plate in preview.svg, mm (SvgOptions.paddingMm). */
export const PREVIEW_PADDING_MM = 5;
/** Height of the caption strip under the plate, mm, when there is a caption. */
export const PREVIEW_CAPTION_MM = 8;

/**
 * How preview.svg places the plate (one user unit = 1 mm): its viewBox and
 * the margin around the plate. toSvg lays the picture out by this frame, and
 * the page overlays the shadow and maps the SVG onto its 3D plate with it.
 */
export interface PreviewFrame {
  readonly viewWidthMm: number;
  readonly viewHeightMm: number;
  readonly padMm: number;
  readonly plateWidthMm: number;
  readonly plateLengthMm: number;
}

/**
 * The frame of preview.svg for a plate of this size with these options.
 * @example previewFrame({widthMm: 300, lengthMm: 150}, {caption: 'x'}).viewHeightMm // 168
 */
export function previewFrame(plate: { readonly widthMm: number; readonly lengthMm: number }, options: SvgOptions = {}): PreviewFrame {
  const padMm = options.paddingMm ?? PREVIEW_PADDING_MM;
  return {
    viewWidthMm: plate.widthMm + 2 * padMm,
    viewHeightMm: plate.lengthMm + 2 * padMm + (options.caption ? PREVIEW_CAPTION_MM : 0),
    padMm,
    plateWidthMm: plate.widthMm,
    plateLengthMm: plate.lengthMm,
  };
}

/** A point in plate coordinates (origin lower-left, y up) to preview.svg user units (y down). */
export function plateToPreview(frame: PreviewFrame, p: Vec2): Vec2 {
  return [p[0] + frame.padMm, frame.plateLengthMm - p[1] + frame.padMm];
}
