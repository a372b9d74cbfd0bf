import Drawing from 'dxf-writer';
import Handle from 'dxf-writer/src/Handle.js';
import type { PlateDrawing, ProcessMethod, Vec2 } from '@umbrafab/geometry';
import { kerfCompensate } from '../process/kerfCompensate.ts';
import { rectVertices, segmentOutline, type BulgeVertex } from '../process/rectVertices.ts';
import { roundTo } from '../process/roundTo.ts';

/**
 * Layer names of plate.dxf, one per operation (docs/design.md §5). Colours are ACI
 * numbers (AutoCAD Color Index: 1 red, 3 green, 5 blue, 8 grey).
 */
export const DXF_LAYERS = {
  cut: { name: 'CUT_PROFILE', color: 1 },
  score: { name: 'LINE_SCORE', color: 5 },
  etch: { name: 'LINE_ETCH_OUTLINE', color: 6 },
  text: { name: 'TEXT_ENGRAVE', color: 3 },
  reference: { name: 'REFERENCE_NO_CUT', color: 8 },
} as const;

export interface DxfOptions {
  readonly method: ProcessMethod;
  /** Cut width, mm; the cut profile is compensated by kerf/2. */
  readonly kerfMm: number;
  /** Decimal places written for coordinates (default 6, i.e. 1 nm). */
  readonly decimals?: number;
}

/** One entity of the drawing before serialisation. */
type DxfRecord =
  | { readonly kind: 'polyline'; readonly layer: string; readonly vertices: readonly BulgeVertex[]; readonly closed: boolean }
  | { readonly kind: 'circle'; readonly layer: string; readonly cx: number; readonly cy: number; readonly r: number };

/**
 * plate.dxf: an ASCII DXF (AutoCAD 2007 / AC1021 text format, as written by
 * dxf-writer) in millimetres ($INSUNITS = 4), origin at the plate's lower-left
 * corner, every entity at z = 0.
 *
 * - CUT_PROFILE: the outer profile as a closed LWPOLYLINE (rounded corners as
 *   bulges), the gnomon slots as closed LWPOLYLINEs and the mounting holes as
 *   CIRCLEs, all kerf-compensated (outer grown, inner shrunk by kerf/2).
 * - LINE_SCORE (laser, router, print): each mark as one centre-line vector.
 *   LINE_ETCH_OUTLINE (waterjet, which cannot score): each mark as a closed
 *   outline of its wanted width.
 * - TEXT_ENGRAVE: numerals and title as single-stroke open LWPOLYLINEs.
 * - REFERENCE_NO_CUT: substyle, gnomon footprint, 45° check; not for cutting.
 *
 * Group codes per the AutoCAD DXF Reference (LWPOLYLINE 10/20 vertices,
 * 42 bulge, 70 flag 1 = closed; CIRCLE 10/20/40).
 */
export function toDxf(drawing: PlateDrawing, options: DxfOptions): string {
  const records = dxfRecords(drawing, options);
  return serialise(records, options.decimals ?? 6);
}

/** The record list of plate.dxf (exposed for tests and for the other writers). */
export function dxfRecords(drawing: PlateDrawing, options: DxfOptions): DxfRecord[] {
  const cut = kerfCompensate(drawing, options.kerfMm);
  const L = DXF_LAYERS;
  const poly = (layer: string, pts: readonly Vec2[], closed: boolean): DxfRecord => ({
    kind: 'polyline',
    layer,
    closed,
    vertices: pts.map(([x, y]): BulgeVertex => [x, y, 0]),
  });
  const out: DxfRecord[] = [];
  out.push({ kind: 'polyline', layer: L.cut.name, closed: true, vertices: rectVertices(cut.outline) });
  for (const s of cut.slots) out.push({ kind: 'polyline', layer: L.cut.name, closed: true, vertices: rectVertices(s) });
  for (const c of cut.holes) out.push({ kind: 'circle', layer: L.cut.name, cx: c.cx, cy: c.cy, r: c.radiusMm });
  const etch = options.method === 'waterjet';
  for (const line of drawing.lines) {
    const pts = line.path.points;
    if (etch) {
      for (let i = 0; i + 1 < pts.length; i++) out.push(poly(L.etch.name, segmentOutline(pts[i], pts[i + 1], line.widthMm), true));
    } else {
      out.push(poly(L.score.name, pts, line.path.closed));
    }
  }
  for (const block of drawing.text) for (const s of block.strokes) out.push(poly(L.text.name, s.points, s.closed));
  for (const ref of drawing.reference) out.push(poly(L.reference.name, ref.path.points, ref.path.closed));
  return out;
}

function serialise(records: readonly DxfRecord[], decimals: number): string {
  // dxf-writer numbers entities from a module-wide counter; restart it so the
  // same drawing always gets the same handles (byte-identical files).
  Handle.seed = 0;
  const d = new Drawing();
  d.setUnits('Millimeters');
  for (const layer of Object.values(DXF_LAYERS)) d.addLayer(layer.name, layer.color, 'CONTINUOUS');
  const r = (v: number) => roundTo(v, decimals);
  for (const rec of records) {
    d.setActiveLayer(rec.layer);
    switch (rec.kind) {
      case 'polyline':
        d.drawPolyline(
          rec.vertices.map(([x, y, b]) => (b === 0 ? [r(x), r(y)] : [r(x), r(y), r(b)])) as unknown as [number, number][],
          rec.closed,
        );
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
