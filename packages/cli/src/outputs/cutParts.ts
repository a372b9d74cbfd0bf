import { drawingStrokes, sheetParts, slotReliefs, reliefToolRadius, strokeOutlines, type SheetPart, type StrokeOutlines } from '@umbrafab/geometry';
import { assertToolFits, partCutFiles, resolveStrokeMode, type PartCutReport } from '@umbrafab/fabricate';
import { utf8, type BuildContext } from './outputTypes.ts';
import type { OutputFile } from '../writeFilesAtomic.ts';

/**
 * The job's flat parts for the cut-file producers (plate.dxf, gnomon.dxf,
 * sheet.dxf): first the tool-fit check on the nominal parts (exit 1 naming
 * a hole, slot or gap narrower than the tool, never a silently shrunk
 * feature), then the parts with their inside-corner relief.
 */
export function cutParts(ctx: BuildContext): SheetPart[] {
  const { spec, layout, drawing } = ctx;
  if (spec.process.method !== 'print') assertToolFits(sheetParts(layout, drawing, { reliefToolRadiusMm: 0 }), spec.process.kerf);
  return sheetParts(layout, drawing);
}

/** Stroke unions already computed in this process, by the part's line list (the plate's is shared by plate.dxf and sheet.dxf). */
const outlineCache = new WeakMap<object, { text: unknown; tol: number; outlines: Promise<StrokeOutlines> }>();

/** The union of a part's engraved strokes (strokeOutlines), computed once per line list and tolerance. */
export function partOutlines(part: SheetPart, chordToleranceMm: number): Promise<StrokeOutlines> {
  const key = part.lines ?? part;
  const hit = outlineCache.get(key);
  if (hit && hit.text === part.text && hit.tol === chordToleranceMm) return hit.outlines;
  const outlines = strokeOutlines(drawingStrokes(part.lines ?? [], part.text ?? []), chordToleranceMm);
  outlineCache.set(key, { text: part.text, tol: chordToleranceMm, outlines });
  return outlines;
}

/** The union of a plate's lower-face strokes (face.side both), or undefined without a lower face. */
export function lowerFaceOutlines(part: SheetPart, chordToleranceMm: number): Promise<StrokeOutlines> | undefined {
  return part.lowerFace ? partOutlines({ ...part, lines: part.lowerFace.lines, text: part.lowerFace.text }, chordToleranceMm) : undefined;
}

/** How one part's cutting drawing was drawn, in report.json. */
export interface CutFileSection extends PartCutReport {
  /** radius of the round tool the inside corners are relieved for, mm (0: no relief) */
  readonly reliefToolRadiusMm: number;
  /** the etched strokes' union, when they are drawn as outlines */
  readonly etch?: {
    /** closed outlines (outer rings and holes): the pierces a waterjet makes to etch them */
    readonly pierces: number;
    /** connected regions */
    readonly regions: number;
    readonly areaMm2: number;
    /** largest gap between a round join or cap and its chords, mm */
    readonly chordToleranceMm: number;
  };
  /** plate: the relief of each gnomon slot (none, dogbone, round-ends) */
  readonly slotRelief?: readonly string[];
}

/** One part's cutting files (DXF, and the R12 / SVG copies the spec asks for) and its report section. */
export async function cutPartFiles(ctx: Pick<BuildContext, 'spec' | 'drawing'>, part: SheetPart): Promise<{ files: OutputFile[]; report: CutFileSection }> {
  const { spec } = ctx;
  const c = spec.cutFiles;
  const strokes = resolveStrokeMode(c.strokes, spec.process.method);
  const hasStrokes = (part.lines?.length ?? 0) + (part.text?.length ?? 0) > 0;
  const outlines = strokes !== 'centre-lines' && hasStrokes ? await partOutlines(part, c.chordTolerance) : undefined;
  const lowerOutlines = strokes !== 'centre-lines' ? await lowerFaceOutlines(part, c.chordTolerance) : undefined;
  const r = await partCutFiles(part, {
    lowerOutlines,
    method: spec.process.method,
    kerfMm: spec.process.kerf,
    precompensate: c.precompensate,
    strokes: hasStrokes ? strokes : 'centre-lines',
    outlines,
    chordToleranceMm: c.chordTolerance,
    r12: c.r12,
    svg: c.svg,
  });
  const report: CutFileSection = {
    ...r.report,
    reliefToolRadiusMm: reliefToolRadius(spec),
    ...(outlines ? { etch: { pierces: outlines.rings, regions: outlines.regions.length, areaMm2: Math.round(outlines.areaMm2 * 1e4) / 1e4, chordToleranceMm: outlines.chordToleranceMm } } : {}),
    ...(part.name === 'plate' ? { slotRelief: slotReliefs(ctx.drawing, reliefToolRadius(spec)) } : {}),
  };
  return { files: r.files.map((f) => ({ name: f.name, bytes: utf8(f.text) })), report };
}

