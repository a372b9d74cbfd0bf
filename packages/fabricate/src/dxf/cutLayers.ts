import { CUT_LAYER_NAMES, type CutLayerKey } from '@umbrafab/geometry';

/** A layer of the cutting drawings: its name, colour and whether it plots. */
export interface CutLayer {
  readonly name: string;
  /** AutoCAD Color Index (1 red, 3 green, 5 blue, 6 magenta, 8 grey); written negative when the layer is off. */
  readonly color: number;
  /** false: the layer is off and non-plotting (reference only, never cut). */
  readonly plots: boolean;
  /** What a shop does with it. */
  readonly operation: string;
}

/**
 * The layers of plate.dxf, gnomon.dxf and sheet.dxf, one per operation
 * (docs/design.md §5), in drawing order. Layer off = negative colour
 * (LAYER group 62), non-plotting = LAYER group 290 = 0 (AutoCAD DXF
 * Reference, LAYER table); R12 has no group 290, so there the layer is off.
 */
export const DXF_LAYERS: Readonly<Record<CutLayerKey, CutLayer>> = {
  cut: { name: CUT_LAYER_NAMES.cut, color: 1, plots: true, operation: 'cut through' },
  score: { name: CUT_LAYER_NAMES.score, color: 5, plots: true, operation: 'score or engrave along the centre-line' },
  etch: { name: CUT_LAYER_NAMES.etch, color: 6, plots: true, operation: 'etch or fill inside the closed outlines' },
  text: { name: CUT_LAYER_NAMES.text, color: 3, plots: true, operation: 'engrave single-stroke text along the centre-line' },
  reference: { name: CUT_LAYER_NAMES.reference, color: 8, plots: false, operation: 'reference, notes and part names: do not cut' },
  markCentres: { name: CUT_LAYER_NAMES.markCentres, color: 8, plots: false, operation: "the marks' centre-lines, read back by umbrafab check: do not cut" },
  scoreLower: { name: CUT_LAYER_NAMES.scoreLower, color: 4, plots: true, operation: 'lower face, plate turned over about its flip axis: score or engrave along the centre-line' },
  etchLower: { name: CUT_LAYER_NAMES.etchLower, color: 200, plots: true, operation: 'lower face, plate turned over about its flip axis: etch or fill inside the closed outlines' },
  textLower: { name: CUT_LAYER_NAMES.textLower, color: 2, plots: true, operation: 'lower face, plate turned over about its flip axis: engrave single-stroke text along the centre-line' },
  markCentresLower: { name: CUT_LAYER_NAMES.markCentresLower, color: 8, plots: false, operation: "the lower face's marks' centre-lines, read back by umbrafab check: do not cut" },
};

/** The layer keys in drawing order. */
export const LAYER_ORDER: readonly CutLayerKey[] = ['cut', 'score', 'etch', 'text', 'scoreLower', 'etchLower', 'textLower', 'reference', 'markCentres', 'markCentresLower'];
