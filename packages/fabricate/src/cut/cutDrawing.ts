import type { Circle, CutLayerKey, DrawnLine, DrawnText, Path, SheetPart, StrokeOutlines, Vec2 } from '@umbrafab/geometry';
import { LAYER_ORDER } from '../dxf/cutLayers.ts';

/** One entity of a cutting drawing, on a layer, mm. */
export type CutEntity =
  | { readonly kind: 'polyline'; readonly layer: CutLayerKey; readonly points: readonly Vec2[]; readonly closed: boolean }
  | { readonly kind: 'circle'; readonly layer: CutLayerKey; readonly cx: number; readonly cy: number; readonly r: number }
  | { readonly kind: 'note'; readonly layer: CutLayerKey; readonly x: number; readonly y: number; readonly heightMm: number; readonly text: string };

/**
 * A cutting drawing before serialisation: what plate.dxf, gnomon.dxf,
 * sheet.dxf and their R12 and SVG copies all write (the one intermediate
 * record list of every cut-file writer).
 */
export interface CutDrawing {
  readonly entities: readonly CutEntity[];
  /** Plain-text lines that also go at the head of the file (DXF 999 comments, SVG comments). */
  readonly notes: readonly string[];
  /** Layers present, in drawing order. */
  readonly layers: readonly CutLayerKey[];
}

/** How a part's engraved strokes are drawn. */
export type StrokeMode = 'centre-lines' | 'outlines' | 'both';

/** The cut profiles to draw for a part: nominal, or offset for the cutter. */
export interface CutProfiles {
  /** closed rings of the outer profile (one for a nominal part; an offset may in principle split one) */
  readonly outer: readonly (readonly Vec2[])[];
  readonly inner: readonly (Path | Circle)[];
  /** how far the profiles were moved off the nominal edge, mm (0 = nominal) */
  readonly offsetMm: number;
}

export interface CutDrawingOptions {
  readonly profiles: CutProfiles;
  readonly strokes: StrokeMode;
  /** the union of the part's strokes, needed for 'outlines' and 'both' */
  readonly outlines?: StrokeOutlines;
  /** the same for the part's lower face (`part.lowerFace`), when it has one */
  readonly lowerOutlines?: StrokeOutlines;
  /** note lines, written on the reference layer below the part and at the head of the file */
  readonly notes: readonly string[];
  /** text height of the notes, mm (default 2.5) */
  readonly noteHeightMm?: number;
}

/**
 * The cutting drawing of one flat part, in the part's frame (mm):
 * - CUT_PROFILE: the profiles (options.profiles, nominal or offset);
 * - centre-lines: LINE_SCORE (lines) and TEXT_ENGRAVE (text strokes);
 * - outlines: LINE_ETCH_OUTLINE (every ring of the stroke union) and, for
 *   `umbrafab check --plate`, the centre-lines of the marks, date lines and
 *   mean-time curves (`readBack`) on MARK_CENTRE_NO_CUT;
 * - a plate's lower face (`part.lowerFace`, face.side both) the same way on
 *   the `_LOWER` layers, drawn as seen from below once the part is turned
 *   over about its flip axis;
 * - REFERENCE_NO_CUT: the part's reference lines and the notes.
 * @example cutDrawing(part, { profiles: nominalProfiles(part), strokes: 'centre-lines', notes: [] })
 */
export function cutDrawing(part: SheetPart, options: CutDrawingOptions): CutDrawing {
  const out: CutEntity[] = [];
  const { profiles } = options;
  for (const ring of profiles.outer) out.push({ kind: 'polyline', layer: 'cut', points: ring, closed: true });
  for (const f of profiles.inner) {
    out.push(f.kind === 'circle' ? { kind: 'circle', layer: 'cut', cx: f.cx, cy: f.cy, r: f.radiusMm } : { kind: 'polyline', layer: 'cut', points: f.points, closed: true });
  }
  const upper = { score: 'score', etch: 'etch', text: 'text', markCentres: 'markCentres' } as const;
  out.push(...faceStrokes(part.lines ?? [], part.text ?? [], options.strokes, options.outlines, upper));
  if (part.lowerFace) {
    const lower = { score: 'scoreLower', etch: 'etchLower', text: 'textLower', markCentres: 'markCentresLower' } as const;
    out.push(...faceStrokes(part.lowerFace.lines, part.lowerFace.text, options.strokes, options.lowerOutlines, lower));
  }
  for (const ref of part.reference ?? []) out.push({ kind: 'polyline', layer: 'reference', points: ref.path.points, closed: ref.path.closed });
  const h = options.noteHeightMm ?? 2.5;
  const minY = Math.min(...profiles.outer.flat().map((p) => p[1]), 0);
  const minX = Math.min(...profiles.outer.flat().map((p) => p[0]), 0);
  options.notes.forEach((text, i) => out.push({ kind: 'note', layer: 'reference', x: minX, y: minY - (i + 2) * 1.6 * h, heightMm: h, text }));
  const used = new Set(out.map((e) => e.layer));
  used.add('cut');
  used.add('reference');
  return { entities: out, notes: options.notes, layers: LAYER_ORDER.filter((k) => used.has(k)) };
}

/** One face's engraving on its layers: centre-lines, outlines, or both. */
function faceStrokes(
  lines: readonly DrawnLine[],
  text: readonly DrawnText[],
  strokes: StrokeMode,
  outlines: StrokeOutlines | undefined,
  layer: { readonly score: CutLayerKey; readonly etch: CutLayerKey; readonly text: CutLayerKey; readonly markCentres: CutLayerKey },
): CutEntity[] {
  const out: CutEntity[] = [];
  if (strokes !== 'outlines') {
    for (const l of lines) out.push({ kind: 'polyline', layer: layer.score, points: l.path.points, closed: l.path.closed });
    for (const b of text) for (const s of b.strokes) out.push({ kind: 'polyline', layer: layer.text, points: s.points, closed: s.closed });
  }
  if (strokes !== 'centre-lines') {
    if (!outlines) throw new Error('cutDrawing: strokes "outlines" needs the stroke outlines');
    for (const r of outlines.regions) for (const ring of [r.outer, ...r.holes]) out.push({ kind: 'polyline', layer: layer.etch, points: ring, closed: true });
    if (strokes === 'outlines') {
      for (const l of lines) if (l.kind !== 'curve' || l.readBack) out.push({ kind: 'polyline', layer: layer.markCentres, points: l.path.points, closed: l.path.closed });
    }
  }
  return out;
}

/** A part's own (nominal) profiles: no offset. */
export function nominalProfiles(part: SheetPart): CutProfiles {
  return { outer: [part.outer.points], inner: part.inner, offsetMm: 0 };
}

/** Bounds of a drawing's geometry (polylines, circles, note anchors), mm: [minX, minY, maxX, maxY]. */
export function drawingBounds(entities: readonly CutEntity[]): [number, number, number, number] {
  let x0 = Infinity;
  let y0 = Infinity;
  let x1 = -Infinity;
  let y1 = -Infinity;
  const add = (x: number, y: number) => {
    x0 = Math.min(x0, x);
    y0 = Math.min(y0, y);
    x1 = Math.max(x1, x);
    y1 = Math.max(y1, y);
  };
  for (const e of entities) {
    if (e.kind === 'polyline') for (const [x, y] of e.points) add(x, y);
    else if (e.kind === 'circle') {
      add(e.cx - e.r, e.cy - e.r);
      add(e.cx + e.r, e.cy + e.r);
    } else add(e.x, e.y);
  }
  if (!Number.isFinite(x0)) return [0, 0, 0, 0];
  return [x0, y0, x1, y1];
}
