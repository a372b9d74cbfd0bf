import type { ProcessMethod, SheetPart, StrokeDrawing, StrokeOutlines } from '@umbrafab/geometry';
import { toDxf } from '../dxf/toDxf.ts';
import { toDxfR12 } from '../dxf/toDxfR12.ts';
import { DXF_LAYERS } from '../dxf/cutLayers.ts';
import { toCutSvg } from '../svg/toCutSvg.ts';
import { cutDrawing, nominalProfiles, type StrokeMode } from './cutDrawing.ts';
import { offsetProfiles } from './offsetProfiles.ts';

export interface PartCutOptions {
  readonly method: ProcessMethod;
  readonly kerfMm: number;
  /** draw the profiles offset by kerf/2 (spec cutFiles.precompensate) */
  readonly precompensate: boolean;
  readonly strokes: StrokeMode;
  /** the union of the part's strokes (strokeOutlines), needed unless strokes is 'centre-lines' */
  readonly outlines?: StrokeOutlines;
  /** the same for its lower face (`part.lowerFace`) */
  readonly lowerOutlines?: StrokeOutlines;
  readonly chordToleranceMm: number;
  /** also write the R12 copy and the SVG copy */
  readonly r12: boolean;
  readonly svg: boolean;
}

/** What partCutFiles wrote and how, for report.json. */
export interface PartCutReport {
  readonly file: string;
  readonly drawn: 'nominal' | 'precompensated';
  readonly kerfMm: number;
  readonly offsetMm: number;
  readonly strokes: StrokeMode;
  readonly layers: readonly string[];
  readonly notes: readonly string[];
  readonly copies: readonly string[];
}

/**
 * The engraved strokes' drawing a spec's `cutFiles.strokes` asks for:
 * "auto" is outlines for waterjet (it cannot score), centre-lines otherwise.
 */
export function resolveStrokeMode(strokes: StrokeDrawing, method: ProcessMethod): StrokeMode {
  if (strokes !== 'auto') return strokes;
  return method === 'waterjet' ? 'outlines' : 'centre-lines';
}

/** The base file name of a part's cutting drawing: the part's name, and the offset when pre-compensated. */
export function cutFileBase(part: SheetPart, kerfMm: number, precompensate: boolean): string {
  return precompensate && kerfMm > 0 ? `${part.name}-offset-${formatMm(kerfMm / 2)}mm` : part.name;
}

/**
 * The cutting drawing of one flat part as files: `NAME.dxf` (AC1021), and
 * with the options `NAME-r12.dxf` (R12) and `NAME-cut.svg` (true-scale
 * SVG). Nominal by default; pre-compensated on request, and then the file
 * name carries the offset (`plate-offset-0.075mm.dxf`) and a note on the
 * reference layer says so.
 * @example await partCutFiles(part, { method: 'laser', kerfMm: 0.15, precompensate: false, strokes: 'centre-lines', chordToleranceMm: 0.005, r12: false, svg: false })
 */
export async function partCutFiles(part: SheetPart, options: PartCutOptions): Promise<{ files: { name: string; text: string }[]; report: PartCutReport }> {
  const pre = options.precompensate && options.kerfMm > 0;
  const profiles = pre ? await offsetProfiles(part, options.kerfMm, options.chordToleranceMm) : nominalProfiles(part);
  const k = formatMm(profiles.offsetMm);
  const notes = [
    pre
      ? `${part.name}: PRE-COMPENSATED cut profiles, offset ${k} mm = kerf ${formatMm(options.kerfMm)} mm / 2 (outer profile grown, holes and slots shrunk). Do NOT apply a kerf or tool offset in the machine.`
      : `${part.name}: TRUE SIZE (nominal) cut profiles. Apply the machine's own kerf or tool offset (${options.method}, kerf ${formatMm(options.kerfMm)} mm).`,
    `stock: ${part.material} ${formatMm(part.thicknessMm)} mm. Only CUT_PROFILE, LINE_SCORE, LINE_ETCH_OUTLINE and TEXT_ENGRAVE${part.lowerFace ? ' and their _LOWER layers' : ''} plot; layers ending _NO_CUT are off and never cut.`,
    ...(part.lowerFace ? [lowerFaceNote(part.lowerFace.flipAxisX)] : []),
  ];
  const drawing = cutDrawing(part, { profiles, strokes: options.strokes, outlines: options.outlines, lowerOutlines: options.lowerOutlines, notes });
  const base = cutFileBase(part, options.kerfMm, options.precompensate);
  const files = [{ name: `${base}.dxf`, text: toDxf(drawing) }];
  if (options.r12) files.push({ name: `${base}-r12.dxf`, text: toDxfR12(drawing) });
  if (options.svg) files.push({ name: `${base}-cut.svg`, text: toCutSvg(drawing) });
  return {
    files,
    report: {
      file: `${base}.dxf`,
      drawn: pre ? 'precompensated' : 'nominal',
      kerfMm: options.kerfMm,
      offsetMm: profiles.offsetMm,
      strokes: options.strokes,
      layers: drawing.layers.map((key) => DXF_LAYERS[key].name),
      notes,
      copies: files.slice(1).map((f) => f.name),
    },
  };
}

/**
 * The note on a plate engraved on both faces: which layers are which face,
 * the flip axis and what registers the second side.
 */
export function lowerFaceNote(flipAxisX: number): string {
  return `TWO FACES: LINE_SCORE, LINE_ETCH_OUTLINE, TEXT_ENGRAVE = upper face; the _LOWER layers = lower face as seen from below. Cut and engrave the upper face, then turn the plate over about the flip axis x = ${formatMm(flipAxisX)} mm (its vertical centre line through the rod hole, left edge to right) and engrave the _LOWER layers: outline and holes fall where they were.`;
}

/** A length for a file name or note: up to 4 decimals, no trailing zeros. */
export function formatMm(v: number): string {
  return String(Math.round(v * 1e4) / 1e4);
}
