import { z } from 'zod';
import { boundedNumber } from '../boundedNumber.ts';

/**
 * The `cutFiles:` section of the dial spec: how the cutting drawings
 * (plate.dxf, gnomon.dxf, sheet.dxf and their R12 / SVG copies) are drawn.
 * Every field has a default and a describe() text with its unit.
 */

/** How the engraved strokes are drawn in the cutting drawing. */
export const STROKE_DRAWINGS = ['auto', 'centre-lines', 'outlines', 'both'] as const;
export type StrokeDrawing = (typeof STROKE_DRAWINGS)[number];

/** Inside-corner relief of routed parts. */
export const CORNER_RELIEFS = ['auto', 'on', 'off'] as const;
export type CornerRelief = (typeof CORNER_RELIEFS)[number];

const flag = z.boolean({ error: 'allowed: true or false' });
const sheetSide = z.union([z.literal('auto'), boundedNumber({ min: 20, max: 6000, unit: 'mm' })], { error: 'allowed: "auto" or a number from 20 to 6000 mm' });

export const cutFilesSection = z
  .strictObject({
    precompensate: flag
      .default(false)
      .describe(
        'false: every cut profile at its true (nominal) size, for a machine or CAM that applies its own kerf or tool offset; true: profiles pre-offset by process.kerf / 2 (outer grown, holes and slots shrunk) for a machine with no offset of its own: the files are then named plate-offset-K mm.dxf (K = kerf/2) and carry a note saying so',
      ),
    strokes: z
      .enum(STROKE_DRAWINGS, { error: `allowed: ${STROKE_DRAWINGS.map((v) => JSON.stringify(v)).join(', ')}` })
      .default('auto')
      .describe('engraved marks, curves and text: "centre-lines" (LINE_SCORE, TEXT_ENGRAVE), "outlines" (their union at stroke width on LINE_ETCH_OUTLINE), "both", or "auto" (outlines for waterjet, centre-lines otherwise)'),
    chordTolerance: boundedNumber({ min: 0.0005, max: 0.01, unit: 'mm' }).default(0.005).describe('largest gap between a true arc and the polyline drawn for it (etch outlines, corner reliefs, round corners), mm'),
    relief: z
      .enum(CORNER_RELIEFS, { error: `allowed: ${CORNER_RELIEFS.map((v) => JSON.stringify(v)).join(', ')}` })
      .default('auto')
      .describe('dog-bone / T-bone relief at the inside corners a round tool cannot reach (slots, gnomon tab roots): "auto" (on for router), "on" or "off"'),
    r12: flag.default(false).describe('also write plate-r12.dxf and gnomon-r12.dxf: DXF R12 with LINE, ARC and POLYLINE only, for older controllers'),
    svg: flag.default(false).describe('also write plate-cut.svg and gnomon-cut.svg: true-scale SVG in mm, one group per operation, for hobby lasers'),
    sheetWidth: sheetSide.default('auto').describe('stock sheet width for sheet.dxf, mm, or "auto" (the smallest that fits every part)'),
    sheetLength: sheetSide.default('auto').describe('stock sheet length for sheet.dxf, mm, or "auto" (the smallest that fits every part)'),
    sheetMargin: boundedNumber({ min: 0, max: 100, unit: 'mm' }).default(5).describe('clear space in sheet.dxf between parts and around the sheet edge, added to process.kerf, mm'),
  })
  .prefault({});

export type CutFilesSpec = z.output<typeof cutFilesSection>;
