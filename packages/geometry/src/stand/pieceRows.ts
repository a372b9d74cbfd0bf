import type { SheetPart } from '../sheet/sheetPart.ts';
import type { Vec2 } from '../types.ts';

/** One piece to cut: a copy of a part, moved by `offsetMm` in the drawing. */
export interface PlacedPiece {
  readonly part: string;
  /** 1-based copy number, up to the part's quantity */
  readonly copy: number;
  readonly offsetMm: Vec2;
  /** where its label's baseline starts, below the piece */
  readonly labelAtMm: Vec2;
}

/** Options of `pieceRows`. */
export interface PieceRowsOptions {
  /** free space between pieces, mm (default 10) */
  readonly gapMm: number;
  /** height of the label under each piece, mm (default 4) */
  readonly labelMm: number;
  /** longest row before a new one starts, mm (default 600) */
  readonly rowMm: number;
}

export const PIECE_ROWS_DEFAULTS: PieceRowsOptions = { gapMm: 10, labelMm: 4, rowMm: 600 };

/**
 * Every piece of a parts list (each part as many times as its quantity)
 * laid out for one drawing in shelves: left to right in list order, a new
 * row above when the row would pass `rowMm`, `gapMm` between pieces and room
 * for a label under each. Not a nesting for stock use: a clear drawing to
 * cut from, or to nest in the shop's own CAM.
 *
 * @example pieceRows(flatStand(layout).parts).length // 7 for the demo
 */
export function pieceRows(parts: readonly SheetPart[], options: Partial<PieceRowsOptions> = {}): PlacedPiece[] {
  const o = { ...PIECE_ROWS_DEFAULTS, ...options };
  const out: PlacedPiece[] = [];
  let x = 0;
  let y = o.labelMm + o.gapMm / 2;
  let rowHeight = 0;
  for (const part of parts) {
    const xs = part.outer.points.map((p) => p[0]);
    const ys = part.outer.points.map((p) => p[1]);
    const x0 = Math.min(...xs);
    const y0 = Math.min(...ys);
    const w = Math.max(...xs) - x0;
    const h = Math.max(...ys) - y0;
    for (let copy = 1; copy <= (part.quantity ?? 1); copy++) {
      if (x > 0 && x + w > o.rowMm) {
        x = 0;
        y += rowHeight + o.gapMm + o.labelMm + o.gapMm / 2;
        rowHeight = 0;
      }
      out.push({ part: part.name, copy, offsetMm: [x - x0, y - y0], labelAtMm: [x, y - o.labelMm - o.gapMm / 4] });
      x += w + o.gapMm;
      rowHeight = Math.max(rowHeight, h);
    }
  }
  return out;
}
