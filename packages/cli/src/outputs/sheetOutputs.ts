import { nestSheet, type DialSpec, type SheetPart } from '@umbrafab/geometry';
import {
  cutDrawing,
  cutFileBase,
  formatMm,
  lowerFaceNote,
  nominalProfiles,
  offsetProfiles,
  piecesDrawing,
  resolveStrokeMode,
  toCutSvg,
  toDxf,
  toDxfR12,
  type CutDrawing,
  type CutProfiles,
} from '@umbrafab/fabricate';
import { cutParts, lowerFaceOutlines, partOutlines } from './cutParts.ts';
import { utf8, type Producer } from './outputTypes.ts';
import type { OutputFile } from '../writeFilesAtomic.ts';

/** report.json's `sheet` section: the stock sheet of sheet.dxf and where each piece lies on it. */
export interface SheetSections {
  readonly sheet?: {
    readonly file: string;
    readonly drawn: 'nominal' | 'precompensated';
    readonly offsetMm: number;
    /** stock material and thickness of every part on the sheet (the plate's) */
    readonly stock: { readonly material: string; readonly thicknessMm: number };
    readonly widthMm: number;
    readonly lengthMm: number;
    /** clear space between parts (kerf + cutFiles.sheetMargin) and to the sheet edge, mm */
    readonly gapMm: number;
    readonly edgeMm: number;
    /** the parts' area over the sheet's */
    readonly utilisation: number;
    /** every piece: the part, its copy number and the offset of the part's own origin on the sheet, mm */
    readonly pieces: readonly { readonly part: string; readonly copy: number; readonly xMm: number; readonly yMm: number }[];
    /** parts of other stock, not on this sheet */
    readonly otherStock: readonly string[];
  };
}

/**
 * sheet.dxf (laser, waterjet, router): every flat part cut from the plate's
 * stock (the plate, a sheet gnomon, the stand's parts) laid on one stock
 * sheet (cutFiles.sheetWidth / sheetLength, default the smallest that fits),
 * kerf plus cutFiles.sheetMargin apart and from the edge, unrotated, never
 * overlapping; each part drawn as in its own file (true size, or offset by
 * kerf/2 with cutFiles.precompensate: then sheet-offset-K mm.dxf), the
 * sheet's outline and the part names on REFERENCE_NO_CUT. R12 and SVG copies
 * with cutFiles.r12 / svg.
 */
export const sheetOutputs: Producer<SheetSections> = async (ctx) => {
  const { spec, layout } = ctx;
  if (spec.process.method === 'print') return { files: [], report: {} };
  return sheetFiles(spec, layout.plate.thicknessMm, cutParts(ctx));
};

/**
 * sheet.dxf from a job's flat parts (any face type): the parts of the
 * plate's stock (spec.plate.material at `plateThicknessMm`) nested on one
 * sheet as `sheetOutputs` describes, the others listed as other stock.
 */
export async function sheetFiles(spec: DialSpec, plateThicknessMm: number, all: readonly SheetPart[]): Promise<{ files: OutputFile[]; report: SheetSections }> {
  const c = spec.cutFiles;
  const stock = { material: spec.plate.material, thicknessMm: plateThicknessMm };
  const same = (p: SheetPart) => p.material === stock.material && Math.abs(p.thicknessMm - stock.thicknessMm) < 1e-9;
  const parts = all.filter(same);
  const kerf = spec.process.kerf;
  const gapMm = kerf + c.sheetMargin;
  const edgeMm = kerf / 2 + c.sheetMargin;
  const nest = nestSheet(parts, { gapMm, edgeMm, widthMm: c.sheetWidth, lengthMm: c.sheetLength });
  const pre = c.precompensate && kerf > 0;
  const strokes = resolveStrokeMode(c.strokes, spec.process.method);
  const drawn = new Map<string, CutDrawing>();
  for (const part of parts) {
    const profiles: CutProfiles = pre ? await offsetProfiles(part, kerf, c.chordTolerance) : nominalProfiles(part);
    const hasStrokes = (part.lines?.length ?? 0) + (part.text?.length ?? 0) > 0;
    const mode = hasStrokes ? strokes : 'centre-lines';
    const outlines = mode !== 'centre-lines' ? await partOutlines(part, c.chordTolerance) : undefined;
    const lowerOutlines = mode !== 'centre-lines' ? await lowerFaceOutlines(part, c.chordTolerance) : undefined;
    drawn.set(part.name, cutDrawing(part, { profiles, strokes: mode, outlines, lowerOutlines, notes: [] }));
  }
  const notes = [
    `sheet: ${formatMm(nest.widthMm)} x ${formatMm(nest.lengthMm)} mm of ${stock.material} ${formatMm(stock.thicknessMm)} mm, ${nest.pieces.length} pieces, ${formatMm(gapMm)} mm apart (kerf ${formatMm(kerf)} + margin ${formatMm(c.sheetMargin)} mm).`,
    pre
      ? `PRE-COMPENSATED cut profiles, offset ${formatMm(kerf / 2)} mm = kerf / 2. Do NOT apply a kerf or tool offset in the machine.`
      : `TRUE SIZE (nominal) cut profiles. Apply the machine's own kerf or tool offset (${spec.process.method}, kerf ${formatMm(kerf)} mm).`,
    ...parts.filter((p) => p.lowerFace).map((p) => `${p.name}: ${lowerFaceNote(p.lowerFace!.flipAxisX)} (x in the ${p.name}'s own frame)`),
  ];
  const labels = new Map(parts.map((p) => [p.name, p.name]));
  const pieces = piecesDrawing(parts, nest.pieces, labels, notes, 3, (part) => drawn.get(part.name)!);
  const outline = { kind: 'polyline' as const, layer: 'reference' as const, closed: true, points: [[0, 0], [nest.widthMm, 0], [nest.widthMm, nest.lengthMm], [0, nest.lengthMm]] as const };
  const headNotes = notes.map((text, i) => ({ kind: 'note' as const, layer: 'reference' as const, x: 0, y: -(i + 2) * 4.8, heightMm: 3, text }));
  const drawing: CutDrawing = { ...pieces, entities: [outline, ...pieces.entities, ...headNotes] };
  const base = cutFileBase({ ...parts[0], name: 'sheet' }, kerf, c.precompensate);
  const files: OutputFile[] = [{ name: `${base}.dxf`, bytes: utf8(toDxf(drawing)) }];
  if (c.r12) files.push({ name: `${base}-r12.dxf`, bytes: utf8(toDxfR12(drawing)) });
  if (c.svg) files.push({ name: `${base}-cut.svg`, bytes: utf8(toCutSvg(drawing)) });
  return {
    files,
    report: {
      sheet: {
        file: `${base}.dxf`,
        drawn: pre ? 'precompensated' : 'nominal',
        offsetMm: pre ? kerf / 2 : 0,
        stock,
        widthMm: nest.widthMm,
        lengthMm: nest.lengthMm,
        gapMm,
        edgeMm,
        utilisation: Math.round(nest.utilisation * 1e4) / 1e4,
        pieces: nest.pieces.map((p) => ({ part: p.part, copy: p.copy, xMm: p.offsetMm[0], yMm: p.offsetMm[1] })),
        otherStock: all.filter((p) => !same(p)).map((p) => p.name),
      },
    },
  };
}
