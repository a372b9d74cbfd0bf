import { SpecError } from '../errors.ts';
import { CUT_LAYER_NAMES } from '../plate/cutLayerNames.ts';
import type { Vec2 } from '../types.ts';

/** A polyline read from a plate drawing (DXF), plate coordinates (origin at the plate's lower-left corner), mm. */
export interface PlateLine {
  readonly layer: string;
  readonly points: readonly Vec2[];
  readonly closed: boolean;
}

/**
 * Layers that carry the marks in plate.dxf: score centre-lines, the
 * centre-lines kept beside etch outlines, or (drawings of earlier versions)
 * one closed 4-corner etch outline per mark.
 */
export const MARK_LAYERS = { score: CUT_LAYER_NAMES.score, centres: CUT_LAYER_NAMES.markCentres, etch: CUT_LAYER_NAMES.etch } as const;

/** The same layers of an equatorial plate's lower face (face.side both), drawn as seen from below. */
export const LOWER_MARK_LAYERS = { score: CUT_LAYER_NAMES.scoreLower, centres: CUT_LAYER_NAMES.markCentresLower, etch: CUT_LAYER_NAMES.etchLower } as const;

/**
 * The lower face's lines of a plate drawing, each on the mark layer it
 * stands for (LINE_SCORE_LOWER as LINE_SCORE, …), so the lower face is read
 * back as any face is; the upper face's lines are left out.
 * @example planarMarksFromPlate(layout.lowerFace, lowerFacePlateLines(readPlateDxf('plate.dxf').lines))
 */
export function lowerFacePlateLines(lines: readonly PlateLine[]): PlateLine[] {
  const as = new Map<string, string>([
    [LOWER_MARK_LAYERS.score, MARK_LAYERS.score],
    [LOWER_MARK_LAYERS.centres, MARK_LAYERS.centres],
    [LOWER_MARK_LAYERS.etch, MARK_LAYERS.etch],
  ]);
  return lines.filter((l) => as.has(l.layer)).map((l) => ({ ...l, layer: as.get(l.layer)! }));
}

/** Farthest a drawn line may sit from its mark's layout position and still be taken for it, mm. */
export const MATCH_RADIUS_MM = 5;

/**
 * The refusal when a mark of the layout has no line in the drawing: `--plate`,
 * the mark's name, what a drawing must hold, and where the mark was looked for.
 * @example throw noLineFor('10:00 west', 'mark 10:00 west (face x 12.000 mm) has no line in the drawing')
 */
export function noLineFor(markName: string, why: string): SpecError {
  return new SpecError(
    '--plate',
    markName,
    `allowed: a drawing with a line on ${MARK_LAYERS.score}, ${MARK_LAYERS.centres} or ${MARK_LAYERS.etch} within ${MATCH_RADIUS_MM} mm of every mark of this spec`,
    why,
  );
}
