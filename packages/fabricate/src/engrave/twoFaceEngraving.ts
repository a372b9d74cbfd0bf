import type { PlateDrawing } from '@umbrafab/geometry';
import { formatMm } from '../cut/partCutFiles.ts';
import type { EngraveFace } from './engraveFromSpec.ts';

/** The two engraving jobs of a plate engraved on both faces. */
export interface TwoFaceEngraving {
  /** the first side: the plate's own drawing (its upper face), header naming the turn that follows */
  readonly upper: EngraveFace;
  /** the second side: file names with `-lower`, header naming the turn before it */
  readonly lower: EngraveFace;
  /** the lower face's job as a plate drawing: the same outline and holes, its lines and text (turned-plate coordinates) */
  readonly lowerDrawing: PlateDrawing;
}

/**
 * The two sides' programs of an equatorial plate engraved on both faces
 * (`drawing.lowerFace`): side 1 engraves the upper face as plate.dxf draws
 * it; the plate is then turned over about the flip axis (the vertical line
 * x = flipAxisX through the rod hole, left edge to right) and side 2
 * engraves the lower face from the `_LOWER` layers' drawing, with the same
 * work origin at the plate's lower-left corner: the outline and holes are
 * symmetric about the axis, so they register the second side. Null for a
 * plate with one engraved face.
 *
 * @example twoFaceEngraving(planarPlateDrawing(layoutPlanar(spec)))?.lower.fileSuffix // '-lower'
 */
export function twoFaceEngraving(drawing: PlateDrawing): TwoFaceEngraving | null {
  const lower = drawing.lowerFace;
  if (!lower) return null;
  const turn = [
    `FLIP: turn the plate over about the flip axis x = ${formatMm(lower.flipAxisX)} mm, its vertical centre line through the rod hole, left edge to right`,
    'REGISTER: set the work origin again at the lower-left corner of the turned plate; its outline and holes lie where they lay before the turn',
  ];
  return {
    upper: { fileSuffix: '', headerLines: ['SIDE 1 of 2: UPPER FACE, the LINE_SCORE and TEXT_ENGRAVE layers of plate.dxf', 'then side 2 [the files ending -lower] after the flip:', ...turn] },
    lower: { fileSuffix: '-lower', headerLines: ['SIDE 2 of 2: LOWER FACE as seen from below, the LINE_SCORE_LOWER and TEXT_ENGRAVE_LOWER layers of plate.dxf', 'run side 1 first, then before this program:', ...turn] },
    lowerDrawing: { ...drawing, lines: lower.lines, text: lower.text, lowerFace: undefined },
  };
}
