import type { PlacedPiece, SheetPart, Vec2 } from '@umbrafab/geometry';
import { LAYER_ORDER } from '../dxf/cutLayers.ts';
import { cutDrawing, nominalProfiles, type CutDrawing, type CutEntity } from './cutDrawing.ts';

/**
 * One cutting drawing of several flat parts (stand.dxf): each piece the
 * part's own nominal cutting drawing (`cutDrawing`: CUT_PROFILE profiles,
 * its reference lines) moved by the piece's offset, with a note under it on
 * REFERENCE_NO_CUT naming the part, the copy, the stock and its size. The
 * drawing's head notes say it is drawn at true size (`drawPart` draws a
 * part otherwise: sheet.dxf passes the build's stroke mode and offset). Serialise it with
 * `toDxf`, like every other cutting drawing.
 *
 * @example toDxf(piecesDrawing(stand.parts, pieceRows(stand.parts), new Map(), ['stand: true size']))
 */
export function piecesDrawing(
  parts: readonly SheetPart[],
  pieces: readonly PlacedPiece[],
  labels: ReadonlyMap<string, string>,
  notes: readonly string[],
  noteHeightMm = 3.5,
  drawPart: (part: SheetPart) => CutDrawing = (part) => cutDrawing(part, { profiles: nominalProfiles(part), strokes: 'centre-lines', notes: [] }),
): CutDrawing {
  const byName = new Map(parts.map((p) => [p.name, p]));
  const entities: CutEntity[] = [];
  for (const piece of pieces) {
    const part = byName.get(piece.part);
    if (!part) throw new Error(`piecesDrawing: a piece names no part ${piece.part}`);
    const [dx, dy] = piece.offsetMm;
    const move = (pts: readonly Vec2[]): Vec2[] => pts.map(([x, y]) => [x + dx, y + dy]);
    for (const e of drawPart(part).entities) {
      if (e.kind === 'polyline') entities.push({ ...e, points: move(e.points) });
      else if (e.kind === 'circle') entities.push({ ...e, cx: e.cx + dx, cy: e.cy + dy });
      else entities.push({ ...e, x: e.x + dx, y: e.y + dy });
    }
    const label = labels.get(piece.part) ?? part.name;
    entities.push({ kind: 'note', layer: 'reference', x: piece.labelAtMm[0], y: piece.labelAtMm[1], heightMm: noteHeightMm, text: `${label} ${piece.copy}/${part.quantity ?? 1}  ${part.material} ${part.thicknessMm} mm` });
  }
  const used = new Set(entities.map((e) => e.layer));
  used.add('cut');
  used.add('reference');
  return { entities, notes, layers: LAYER_ORDER.filter((k) => used.has(k)) };
}
