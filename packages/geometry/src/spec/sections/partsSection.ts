import { z } from 'zod';
import { boundedNumber } from '../boundedNumber.ts';
import { SpecError, formatValue } from '../../errors.ts';
import { FILAMENTS } from '../../parts/materials.ts';

/**
 * The `parts:` section of the dial spec: which 3D parts and gnomon outline
 * `umbrafab build` writes, and how they are made. Every field has a default
 * and a describe() text with its unit. Cross-field rules (tab depth against
 * the plate, clearance against the tab, the wedge's printability) are
 * checked by `partsPlan`, which knows the layout.
 */

/** File names a spec may list in `parts.write`. */
export const PART_FILES = ['gnomon.stl', 'gnomon.dxf', 'plate.stl', 'wedge.stl', 'stand.dxf', 'stand.stl', 'body.stl'] as const;
export type PartFile = (typeof PART_FILES)[number];

/** Where the gnomon comes from: cut from the plate's own sheet, or made separately (printed or other stock). */
export const GNOMON_SOURCES = ['sheet', 'separate'] as const;
export type GnomonSource = (typeof GNOMON_SOURCES)[number];

/** A bounded length in mm (see boundedNumber). */
const length = (min: number, max: number, opts: { exclusiveMin?: boolean; int?: boolean } = {}) => boundedNumber({ min, max, unit: 'mm', ...opts });

const flag = z.boolean({ error: 'allowed: true or false' });

const partFile = z.enum(PART_FILES, { error: `allowed: a list of ${PART_FILES.map((f) => JSON.stringify(f)).join(', ')} (or "auto")` });

export const partsSection = z
  .strictObject({
    write: z
      .union([z.literal('auto'), z.array(partFile)], { error: `allowed: "auto" or a list of ${PART_FILES.map((f) => JSON.stringify(f)).join(', ')}` })
      .refine((v) => v === 'auto' || new Set(v).size === v.length, { error: 'allowed: each file name at most once' })
      .default('auto')
      .describe(
        'part files to write: "auto" (print: gnomon.stl + plate.stl + wedge.stl; laser, waterjet, router: gnomon.dxf + the flat-pack stand, stand.dxf to cut and stand.stl as assembled; body.stl too with parts.body: true) or a list of gnomon.stl, gnomon.dxf, plate.stl, wedge.stl, stand.dxf, stand.stl, body.stl',
      ),
    body: flag.default(false).describe('with write "auto", also write body.stl: the whole dial printed in one piece'),
    gnomonFrom: z
      .enum(GNOMON_SOURCES, { error: 'allowed: "sheet" or "separate"' })
      .optional()
      .describe('sheet: the gnomon is cut from the plate stock, so gnomon.thickness = plate.thickness; separate: any thickness (default: sheet for laser, waterjet, router; separate for print)'),
    tabDepth: z
      .union([z.literal('through'), length(0, 100, { exclusiveMin: true })], { error: 'allowed: "through" or a number greater than 0 mm, at most plate.thickness' })
      .default('through')
      .describe('how far the gnomon tabs reach into their slots, mm; "through" = plate.thickness (tab bottoms flush with the underside)'),
    nodus: flag.default(false).describe('cut a 90° V-notch nodus into the style at gnomon.nodusY (0 = the middle of the hour marks); always on when gnomon.nodus is true'),
    nodusSize: length(0.5, 50).default(3).describe('opening of the nodus notch along the style, mm (its depth is half that)'),
    grooveDepth: length(0.1, 10).default(0.6).describe('body.stl: depth of the line grooves and recessed numerals and text, mm'),
    bodyWedge: flag.default(false).describe('body.stl: fuse the latitude wedge under the plate (one print: wedge, plate and gnomon)'),
    wedge: z
      .strictObject({
        base: length(0.8, 100).default(5).describe('least thickness of the wedge base (toe slab and thin end), mm'),
        lipHeight: length(0.8, 50).default(2).describe('height of the locating lip at the plate lower edge, above the seat, mm'),
        lipWidth: length(0.8, 50).default(3).describe('thickness of that lip along the slope, mm'),
        wall: length(0.8, 50).default(3).describe('least material around holes and arrow, and the stability margin, mm'),
        holes: z
          .union([z.literal(0), z.literal(2), z.literal(4), z.literal(6)], { error: 'allowed: 0, 2, 4 or 6' })
          .default(2)
          .describe('mounting holes through the toe (pairs either side of the meridian arrow)'),
        holeDiameter: length(1, 30).default(4.5).describe('mounting hole bore, mm (4.5 clears an M4 screw)'),
        countersink: length(0, 60).default(9).describe('countersink diameter at the top of each hole, 90° cone, mm; 0 for a plain hole'),
        arrow: flag.default(true).describe('recess a meridian arrow in the toe, pointing to the elevated pole (true north in the north, true south in the south)'),
      })
      .prefault({}),
    print: z
      .strictObject({
        bed: z
          .strictObject({
            width: length(50, 2000).default(220).describe('print bed width (x), mm'),
            depth: length(50, 2000).default(220).describe('print bed depth (y), mm'),
            height: length(20, 2000).default(250).describe('largest print height (z), mm'),
          })
          .prefault({})
          .describe('print bed W × D × H, mm: a printed part larger than this is split into pieces that fit, joined by dovetail keys'),
        wall: length(0, 50)
          .refine((v) => v === 0 || v >= 0.8, { error: 'allowed: 0 (a solid wedge) or a number from 0.8 mm to 50 mm (two 0.4 mm extrusion widths at least)' })
          .default(3)
          .describe('wall thickness of the hollow printed wedge (outer skin and inner ribs), mm; 0 prints it solid'),
        ribSpacing: length(10, 500).default(40).describe('largest gap between the inner ribs of the hollow wedge, mm (the seat skin bridges it)'),
        inserts: flag.default(true).describe('pockets for heat-set threaded inserts in the printed wedge seat, under the plate holes'),
        filament: z
          .enum(['auto', ...FILAMENTS], { error: `allowed: "auto", ${FILAMENTS.map((f) => JSON.stringify(f)).join(', ')}` })
          .default('auto')
          .describe('filament of the printed parts: auto (plate.material when it is pla or petg, else petg), pla, petg or asa'),
        filamentDiameter: length(1, 3.5).default(1.75).describe('filament diameter, mm (1.75 or 2.85), for the filament length in report.json'),
      })
      .prefault({}),
  })
  .prefault({});

export type PartsSpec = z.output<typeof partsSection>;

/** Cut processes, whose gnomon comes from the plate's sheet by default. */
const CUT_METHODS: readonly string[] = ['laser', 'waterjet', 'router'];

/**
 * Normalise the gnomon's stock (docs/design.md §2: "when the gnomon is cut from the
 * plate's own sheet stock, t is the material thickness"). Rule:
 * - `parts.gnomonFrom: sheet` (explicit): gnomon.thickness becomes
 *   plate.thickness; a gnomon.thickness written in the spec that differs is
 *   an error naming both fields; with process.method print it is an error
 *   (a printed plate has no sheet to cut the gnomon from).
 * - `parts.gnomonFrom: separate` (explicit): gnomon.thickness as given.
 * - not given: "sheet" for laser, waterjet and router, and "separate" for
 *   print; except that a cut-process spec which writes its own
 *   gnomon.thickness, different from plate.thickness, keeps it and gets
 *   "separate" (the gnomon comes from other stock; report.json says so).
 *
 * @param s the spec after zod (defaults filled in)
 * @param raw the spec as written, to tell an explicit gnomon.thickness from the default
 */
export function normaliseGnomonStock<
  S extends { readonly gnomon: { readonly thickness: number }; readonly plate: { readonly thickness: number }; readonly process: { readonly method: string }; readonly parts: PartsSpec },
>(s: S, raw: unknown): { gnomon: S['gnomon']; parts: PartsSpec & { readonly gnomonFrom: GnomonSource } } {
  const method = s.process.method;
  const given = (raw as { gnomon?: { thickness?: unknown } } | null)?.gnomon?.thickness;
  const sheet = s.plate.thickness;
  const contradicts = given !== undefined && given !== sheet;
  const from: GnomonSource = s.parts.gnomonFrom ?? (CUT_METHODS.includes(method) && !contradicts ? 'sheet' : 'separate');
  const parts = { ...s.parts, gnomonFrom: from };
  if (from === 'separate') return { gnomon: s.gnomon, parts };
  if (!CUT_METHODS.includes(method)) {
    throw new SpecError('parts.gnomonFrom', 'sheet', `allowed: "separate" with process.method ${JSON.stringify(method)} (only laser, waterjet and router cut the gnomon from the plate's sheet)`);
  }
  if (contradicts) {
    throw new SpecError(
      'gnomon.thickness',
      given,
      `allowed: ${sheet} mm (= plate.thickness) when the gnomon is cut from the sheet (parts.gnomonFrom "sheet"); or omit gnomon.thickness, or set parts.gnomonFrom: separate`,
      `gnomon.thickness ${formatValue(given)} mm contradicts plate.thickness ${sheet} mm`,
    );
  }
  return { gnomon: { ...s.gnomon, thickness: sheet }, parts };
}
