import { SpecError } from '../errors.ts';
import type { PlacedPiece } from '../stand/pieceRows.ts';
import type { SheetPart } from './sheetPart.ts';
import { shoelaceArea } from '../parts/ring2d.ts';

/** Options of `nestSheet` (mm). */
export interface NestSheetOptions {
  /** clear space between two parts' nominal outlines: the kerf plus a margin */
  readonly gapMm: number;
  /** clear space between a part's nominal outline and the sheet's edge */
  readonly edgeMm: number;
  /** stock sheet width (along x), or 'auto' */
  readonly widthMm: number | 'auto';
  /** stock sheet length (along y), or 'auto' */
  readonly lengthMm: number | 'auto';
}

/** Where every piece lies on the stock sheet. */
export interface SheetNest {
  readonly widthMm: number;
  readonly lengthMm: number;
  readonly pieces: readonly PlacedPiece[];
  /** the parts' nominal outline area over the sheet's area */
  readonly utilisation: number;
}

/**
 * Lay every piece of a parts list (each part as many times as its quantity,
 * all of one stock) on one stock sheet, unrotated (the grain and the
 * drawing's orientation are kept), in shelves: tallest pieces first, left
 * to right, a new shelf above when the next piece would pass the sheet's
 * usable width. Pieces stand `gapMm` apart (bounding boxes, so outlines
 * never overlap and the kerfs never meet) and `edgeMm` from the sheet edge.
 * With a width or length of 'auto' the sheet is the smallest of the shelf
 * layouts tried (every row break of the sorted pieces): least area, then the
 * shorter length. Each piece's label sits at its lower-left corner.
 *
 * @throws SpecError (cutFiles.sheetWidth / cutFiles.sheetLength) when the parts cannot fit the named sheet
 * @example nestSheet(parts, { gapMm: 5.15, edgeMm: 5.075, widthMm: 'auto', lengthMm: 'auto' }).widthMm
 */
export function nestSheet(parts: readonly SheetPart[], options: NestSheetOptions): SheetNest {
  const { gapMm: gap, edgeMm: edge } = options;
  const items: { part: string; copy: number; x0: number; y0: number; w: number; h: number; order: number }[] = [];
  for (const part of parts) {
    const xs = part.outer.points.map((p) => p[0]);
    const ys = part.outer.points.map((p) => p[1]);
    const x0 = Math.min(...xs);
    const y0 = Math.min(...ys);
    for (let copy = 1; copy <= (part.quantity ?? 1); copy++) items.push({ part: part.name, copy, x0, y0, w: Math.max(...xs) - x0, h: Math.max(...ys) - y0, order: items.length });
  }
  if (items.length === 0) return { widthMm: 0, lengthMm: 0, pieces: [], utilisation: 0 };
  items.sort((a, b) => b.h - a.h || a.order - b.order);
  const widest = Math.max(...items.map((i) => i.w));
  const shelves = (usable: number) => {
    const placed: { item: (typeof items)[number]; x: number; y: number }[] = [];
    let x = 0;
    let y = 0;
    let row = 0;
    let maxX = 0;
    for (const item of items) {
      if (x > 0 && x + item.w > usable + 1e-9) {
        y += row + gap;
        x = 0;
        row = 0;
      }
      placed.push({ item, x, y });
      maxX = Math.max(maxX, x + item.w);
      x += item.w + gap;
      row = Math.max(row, item.h);
    }
    return { placed, usedW: maxX, usedL: y + row };
  };
  const given = (v: number | 'auto') => (v === 'auto' ? null : v);
  const W = given(options.widthMm);
  const L = given(options.lengthMm);
  if (W !== null && widest + 2 * edge > W + 1e-9) {
    throw new SpecError('cutFiles.sheetWidth', W, `allowed: at least ${(widest + 2 * edge).toFixed(1)} mm (the widest part plus the edge margin on both sides), or "auto"`);
  }
  const candidates: number[] = [];
  if (W !== null) candidates.push(W - 2 * edge);
  else {
    let sum = -gap;
    for (const item of items) {
      sum += item.w + gap;
      if (sum >= widest - 1e-9) candidates.push(sum);
    }
    candidates.push(widest);
  }
  let best: { placed: ReturnType<typeof shelves>['placed']; widthMm: number; lengthMm: number } | null = null;
  let shortest = Infinity;
  for (const usable of candidates) {
    const s = shelves(usable);
    const widthMm = W ?? s.usedW + 2 * edge;
    const lengthMm = s.usedL + 2 * edge;
    shortest = Math.min(shortest, lengthMm);
    if (L !== null && lengthMm > L + 1e-9) continue;
    const area = widthMm * (L ?? lengthMm);
    const bestArea = best ? best.widthMm * best.lengthMm : Infinity;
    if (!best || area < bestArea - 1e-9 || (Math.abs(area - bestArea) <= 1e-9 && lengthMm < best.lengthMm)) best = { placed: s.placed, widthMm, lengthMm: L ?? lengthMm };
  }
  if (!best) {
    throw new SpecError('cutFiles.sheetLength', L, `allowed: at least ${shortest.toFixed(1)} mm for these parts on a ${W === null ? 'sheet of any width' : `${W} mm wide sheet`}, or "auto"`);
  }
  const pieces: PlacedPiece[] = best.placed
    .sort((a, b) => a.item.order - b.item.order)
    .map(({ item, x, y }) => ({ part: item.part, copy: item.copy, offsetMm: [edge + x - item.x0, edge + y - item.y0], labelAtMm: [edge + x + 1, edge + y + 1] }));
  const area = parts.reduce((s, p) => s + (p.quantity ?? 1) * Math.abs(shoelaceArea(p.outer.points)), 0);
  return { widthMm: best.widthMm, lengthMm: best.lengthMm, pieces, utilisation: area / (best.widthMm * best.lengthMm) };
}
