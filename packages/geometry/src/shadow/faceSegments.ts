import type { Vec2 } from '../types.ts';
import { MARK_LAYERS, type PlateLine } from './plateLine.ts';

/** A mark line read from a drawing, face coordinates, mm: its two ends. */
export type FaceSegment = readonly [Vec2, Vec2];

/**
 * The mark lines of a plate drawing as segments in face coordinates, the
 * reading both plate checks share: every line on the score or mark-centre
 * layer, or (a drawing with neither) every closed etch outline; each turned
 * into its two ends by `endsOf` (null: not a mark line) and moved to face
 * coordinates (x − plate.substyleX, y − plate.faceOriginY).
 *
 * @param lines the drawing's polylines, plate coordinates
 * @param plate where the face origin sits on the plate, mm
 * @param endsOf a line's two ends in plate coordinates, or null to skip it
 * @example faceSegments(readPlateDxf('plate.dxf').lines, layout.plate, centreLine)
 */
export function faceSegments(
  lines: readonly PlateLine[],
  plate: { readonly substyleX: number; readonly faceOriginY: number },
  endsOf: (line: PlateLine) => FaceSegment | null,
): FaceSegment[] {
  const ox = plate.substyleX;
  const oy = plate.faceOriginY;
  // A drawing with centre-lines (scored, or kept beside its etch outlines) is read by its centre-lines alone.
  const hasCentres = lines.some((l) => l.layer === MARK_LAYERS.centres || l.layer === MARK_LAYERS.score);
  return lines
    .filter((l) => l.layer === MARK_LAYERS.score || l.layer === MARK_LAYERS.centres || (!hasCentres && l.layer === MARK_LAYERS.etch && l.closed))
    .map((l) => endsOf(l))
    .filter((s): s is FaceSegment => s !== null)
    .map(([a, b]) => [[a[0] - ox, a[1] - oy] as Vec2, [b[0] - ox, b[1] - oy] as Vec2] as const);
}
