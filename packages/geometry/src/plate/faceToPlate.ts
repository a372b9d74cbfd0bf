import type { Path, TextBlock, Vec2 } from '../types.ts';
import type { DrawnText } from './plateDrawing.ts';

/** What a face-to-plate move needs: the plate position of the face origin, mm. */
export interface FaceOrigin {
  readonly substyleX: number;
  readonly faceOriginY: number;
}

/**
 * Moves from face coordinates to plate coordinates, (x + substyleX, y + faceOriginY),
 * shared by the polar and the planar plate drawings.
 * @example faceToPlate(layout.plate).path([[0, 0], [0, 10]]).points[1]
 */
export function faceToPlate(origin: FaceOrigin) {
  const dx = origin.substyleX;
  const dy = origin.faceOriginY;
  const move = (p: Vec2): Vec2 => [p[0] + dx, p[1] + dy];
  const path = (points: readonly Vec2[], closed = false): Path => ({ kind: 'path', points: points.map(move), closed });
  /** Numerals and title as drawn text in plate coordinates. */
  const text = (blocks: readonly TextBlock[]): DrawnText[] =>
    blocks.map((b) => ({ role: b.role, text: b.text, strokeWidthMm: b.strokeWidthMm, strokes: b.strokes.map((s) => path(s.points, s.closed)) }));
  /** The gnomon's footprint on the face: a closed rectangle t wide from y0 to y1 (a reference line). */
  const footprint = (thicknessMm: number, y0Mm: number, y1Mm: number): Path => {
    const t2 = thicknessMm / 2;
    return path([[-t2, y0Mm], [t2, y0Mm], [t2, y1Mm], [-t2, y1Mm]], true);
  };
  return { dx, dy, move, path, text, footprint };
}
