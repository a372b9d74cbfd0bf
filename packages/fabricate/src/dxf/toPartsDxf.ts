import Drawing from 'dxf-writer';
import Handle from 'dxf-writer/src/Handle.js';
import { strokeText, type PlacedPiece, type SheetPart, type Vec2 } from '@umbrafab/geometry';
import { roundTo } from '../process/roundTo.ts';
import { DXF_LAYERS } from './toDxf.ts';

export interface PartsDxfOptions {
  /** label text height on the reference layer, mm (default 3.5) */
  readonly labelMm?: number;
  /** decimal places for coordinates (default 6) */
  readonly decimals?: number;
}

/** One entity of a parts drawing before serialisation. */
type PartsRecord =
  | { readonly kind: 'polyline'; readonly layer: string; readonly points: readonly Vec2[]; readonly closed: boolean }
  | { readonly kind: 'circle'; readonly layer: string; readonly cx: number; readonly cy: number; readonly r: number };

/**
 * The records of a drawing of flat parts at nominal size (each piece a
 * SheetPart moved by its offset): CUT_PROFILE the outer profile and every
 * slot as closed polylines and every hole as a circle, exactly as drawn (the
 * inside-corner relief is already in the parts; the cutter applies its own
 * kerf or tool offset); REFERENCE_NO_CUT each piece's label under it and the
 * part's own reference lines.
 */
export function partsDxfRecords(parts: readonly SheetPart[], pieces: readonly PlacedPiece[], labels: ReadonlyMap<string, string>, options: PartsDxfOptions = {}): PartsRecord[] {
  const byName = new Map(parts.map((p) => [p.name, p]));
  const out: PartsRecord[] = [];
  const L = DXF_LAYERS;
  for (const piece of pieces) {
    const part = byName.get(piece.part);
    if (!part) throw new Error(`partsDxfRecords: piece names no part ${piece.part}`);
    const [dx, dy] = piece.offsetMm;
    const move = (pts: readonly Vec2[]): Vec2[] => pts.map(([x, y]) => [x + dx, y + dy]);
    out.push({ kind: 'polyline', layer: L.cut.name, points: move(part.outer.points), closed: true });
    for (const f of part.inner) {
      if (f.kind === 'circle') out.push({ kind: 'circle', layer: L.cut.name, cx: f.cx + dx, cy: f.cy + dy, r: f.radiusMm });
      else out.push({ kind: 'polyline', layer: L.cut.name, points: move(f.points), closed: true });
    }
    for (const ref of part.reference ?? []) out.push({ kind: 'polyline', layer: L.reference.name, points: move(ref.path.points), closed: ref.path.closed });
    const label = labels.get(piece.part) ?? part.name;
    for (const s of strokeText(`${label} ${piece.copy}/${part.quantity ?? 1}  ${part.material} ${part.thicknessMm} mm`, { heightMm: options.labelMm ?? 3.5, at: piece.labelAtMm })) {
      out.push({ kind: 'polyline', layer: L.reference.name, points: s.points, closed: s.closed });
    }
  }
  return out;
}

/**
 * A drawing of flat parts (stand.dxf), same conventions as plate.dxf:
 * ASCII DXF (AC1021, as written by dxf-writer), millimetres ($INSUNITS 4),
 * every entity at z = 0, layers CUT_PROFILE and REFERENCE_NO_CUT, nominal
 * size; see partsDxfRecords. Group codes per the AutoCAD DXF Reference
 * (LWPOLYLINE 10/20, 70 = 1 closed; CIRCLE 10/20/40).
 *
 * @example toPartsDxf(stand.parts, pieceRows(stand.parts), new Map())
 */
export function toPartsDxf(parts: readonly SheetPart[], pieces: readonly PlacedPiece[], labels: ReadonlyMap<string, string>, options: PartsDxfOptions = {}): string {
  const records = partsDxfRecords(parts, pieces, labels, options);
  const r = (v: number) => roundTo(v, options.decimals ?? 6);
  // Restart dxf-writer's module-wide handle counter: byte-identical files.
  Handle.seed = 0;
  const d = new Drawing();
  d.setUnits('Millimeters');
  for (const layer of [DXF_LAYERS.cut, DXF_LAYERS.reference]) d.addLayer(layer.name, layer.color, 'CONTINUOUS');
  for (const rec of records) {
    d.setActiveLayer(rec.layer);
    switch (rec.kind) {
      case 'polyline':
        d.drawPolyline(rec.points.map(([x, y]) => [r(x), r(y)]) as [number, number][], rec.closed);
        break;
      case 'circle':
        d.drawCircle(r(rec.cx), r(rec.cy), r(rec.r));
        break;
      default: {
        const never: never = rec;
        throw new Error(`unknown DXF record ${JSON.stringify(never)}`);
      }
    }
  }
  return d.toDxfString();
}
