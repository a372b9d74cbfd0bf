import { z } from 'zod';
import { boundedNumber } from './boundedNumber.ts';
import { clockField } from './textFields.ts';
import { freeText } from './freeText.ts';
import { checkSection } from './sections/checkSection.ts';
import { cutFilesSection } from './sections/cutFilesSection.ts';
import { engraveSection } from './sections/engraveSection.ts';
import { installSection } from './sections/installSection.ts';
import { partsSection } from './sections/partsSection.ts';
import { templateSection } from './sections/templateSection.ts';
import { picturesSection } from './sections/picturesSection.ts';
import { standSection } from './sections/standSection.ts';
import { MATERIALS } from './materials.ts';
import { faceSection } from './sections/faceSection.ts';

/**
 * The dial spec schema: one source for validation, defaults and the field
 * documentation (the CLI's starter spec and, later, the local page's form read
 * the `describe()` texts from here).
 *
 * Lengths are millimetres, angles degrees, times "HH:MM" local (solar or
 * standard, per `dial.reads`). Field names under `site`, `dial.reads`,
 * `gnomon.height|thickness`, `hours.from|to` and `process.method|kerf` are
 * fixed: other tools read them.
 */

/** A number field with bounds and unit; the error names what is allowed. */
const num = boundedNumber;

function oneOf<const T extends readonly [string, ...string[]]>(values: T) {
  return z.enum(values, { error: `allowed: ${values.map((v) => JSON.stringify(v)).join(', ')}` });
}

const clock = clockField('07:00');

/** A length or the word auto (sized from the layout). */
const autoLength = z.union([z.literal('auto'), num({ min: 20, max: 3000, unit: 'mm' })], {
  error: 'allowed: "auto" or a number from 20 to 3000 mm',
});

export const METHODS = ['laser', 'waterjet', 'router', 'print'] as const;
export type ProcessMethod = (typeof METHODS)[number];

export { MATERIALS } from './materials.ts';

export const NUMERAL_STYLES = ['arabic', 'arabic24', 'roman'] as const;

/** Sets of date lines a nodus dial can carry (calendar.lines). */
export const DATE_LINE_SETS = ['solstices', 'equinox', 'zodiac'] as const;

/** A custom date line: "MM-DD" in calendar.year and a short engraved label. */
const calendarDate = z.strictObject({
  date: z.string({ error: 'allowed: a date "MM-DD" in quotes, e.g. "06-14"' }).regex(/^(0[1-9]|1[0-2])-(0[1-9]|[12]\d|3[01])$/, { error: 'allowed: a date "MM-DD" with month 01-12 and day 01-31, e.g. "06-14"' }).describe('month and day "MM-DD" in calendar.year'),
  label: freeText({ minLength: 1, maxLength: 24 }).describe('engraved beside the line'),
});

const markSchema = (length: number, width: number) =>
  z
    .strictObject({
      length: num({ min: 1, max: 2000, unit: 'mm' }).default(length).describe('mark length along the style, mm'),
      width: num({ min: 0.05, max: 20, unit: 'mm' }).default(width).describe('line width, mm'),
    })
    .prefault({});

export const specSchema = z.strictObject({
  name: freeText({ minLength: 1, maxLength: 60 }).default('Polar dial').describe('dial name, engraved in the title block'),
  site: z.strictObject({
    latitude: num({ min: -90, max: 90, unit: '°' }).describe('site latitude, degrees, north positive'),
    longitude: num({ min: -180, max: 180, unit: '°' }).describe('site longitude, degrees, east positive'),
    timezone: z.string({ error: 'allowed: an IANA time zone name in quotes, e.g. "Europe/Lisbon"' }).describe('IANA time zone name, e.g. "Europe/Lisbon"'),
    place: freeText({ maxLength: 60 }).optional().describe('place name for the title block (optional)'),
  }),
  face: faceSection,
  dial: z
    .strictObject({
      reads: oneOf(['solar', 'standard']).default('solar').describe('solar: apparent solar time; standard: lines shifted to the zone standard meridian'),
      numerals: oneOf(NUMERAL_STYLES).default('arabic').describe('arabic (7..12..5), arabic24 (7..17) or roman (VII..XII..V)'),
      numeralHeight: num({ min: 2, max: 100, unit: 'mm' }).default(8).describe('numeral cap height, mm'),
      textHeight: num({ min: 1.5, max: 50, unit: 'mm' }).default(3.5).describe('title block text height, mm'),
      meanTimeCurves: z.boolean({ error: 'allowed: true or false' }).default(false).describe('figure-of-eight curves of standard clock time for each whole hour (needs gnomon.nodus: true)'),
      summerNumerals: z.boolean({ error: 'allowed: true or false' }).default(false).describe('a second, smaller row of numerals in summer (daylight-saving) time'),
    })
    .prefault({}),
  gnomon: z
    .strictObject({
      height: num({ min: 0, max: 1000, unit: 'mm', exclusiveMin: true }).default(50).describe('style height above the dial face, mm'),
      thickness: num({ min: 0, max: 100, unit: 'mm', exclusiveMin: true }).default(3).describe('gnomon (fin) thickness, mm'),
      overhang: num({ min: 0, max: 500, unit: 'mm' }).default(5).describe('style length beyond the hour marks at each end, mm'),
      tabs: num({ min: 1, max: 8, unit: '', int: true }).default(2).describe('number of tabs through the plate'),
      tabLength: num({ min: 2, max: 500, unit: 'mm' }).default(15).describe('length of each tab along the style, mm'),
      nodus: z.boolean({ error: 'allowed: true or false' }).default(false).describe('a nodus (notch or bead) on the style: its shadow point reads the date lines'),
      nodusY: num({ min: -1000, max: 1000, unit: 'mm' }).default(0).describe('nodus position along the style, face y in mm (0 = mid-length of the hour marks)'),
    })
    .prefault({}),
  hours: z
    .strictObject({
      from: clock.default('07:00').describe('first mark, "HH:MM" (or "H:MM")'),
      to: clock.default('17:00').describe('last mark, "HH:MM" (or "H:MM")'),
      step: z.union([z.literal(60), z.literal(30), z.literal(15)], { error: 'allowed: 60, 30 or 15 (minutes)' }).default(15).describe('finest mark spacing in minutes: 60, 30 or 15'),
      maxHourAngle: num({ min: 30, max: 85, unit: '°' }).default(75).describe('widest hour angle a mark may have, degrees (75° puts 07:00 at 3.73 gnomon heights)'),
    })
    .prefault({}),
  marks: z
    .strictObject({
      hour: markSchema(80, 0.8),
      half: markSchema(55, 0.6),
      quarter: markSchema(30, 0.4),
      followPenumbra: z.boolean({ error: 'allowed: true or false' }).default(false).describe('widen marks away from noon as 1/cos² of the hour angle, like the shadow blur, so each spans the same time'),
    })
    .prefault({}),
  plate: z
    .strictObject({
      width: autoLength.default('auto').describe('plate width across the style, mm, or auto'),
      length: autoLength.default('auto').describe('plate length along the style, mm, or auto'),
      margin: num({ min: 0, max: 200, unit: 'mm' }).default(12).describe('clear border around the engraving, mm'),
      thickness: num({ min: 0, max: 100, unit: 'mm', exclusiveMin: true }).default(3).describe('sheet thickness, mm'),
      material: oneOf(MATERIALS).default('aluminium').describe('sheet material'),
      cornerRadius: num({ min: 0, max: 100, unit: 'mm' }).default(4).describe('outer corner radius, mm'),
    })
    .prefault({}),
  holes: z
    .strictObject({
      count: z.union([z.literal(0), z.literal(2), z.literal(4)], { error: 'allowed: 0, 2 or 4' }).default(4).describe('mounting holes: 0, 2 (one each side at mid-length) or 4 (one in each corner)'),
      diameter: num({ min: 1, max: 50, unit: 'mm' }).default(5.5).describe('hole diameter, mm (5.5 clears an M5 screw)'),
      inset: num({ min: 1, max: 200, unit: 'mm' }).default(10).describe('hole centre distance from the plate edges, mm'),
    })
    .prefault({}),
  calendar: z
    .strictObject({
      year: num({ min: 1900, max: 2200, unit: '', int: true }).default(2027).describe('year for the time tables and the zone offsets (outputs never depend on today)'),
      lines: z.array(oneOf(DATE_LINE_SETS), { error: `allowed: a list of ${DATE_LINE_SETS.map((v) => JSON.stringify(v)).join(', ')}` }).default(['solstices', 'equinox']).describe('date lines drawn when gnomon.nodus is true: solstices, equinox, zodiac (the twelve sign entries)'),
      dates: z.array(calendarDate).max(12, { error: 'allowed: at most 12 custom dates' }).default([]).describe('extra date lines (needs gnomon.nodus: true), e.g. [{date: "06-14", label: "WEDDING"}]'),
      table: oneOf(['none', 'table', 'graph']).default('none').describe('engrave the equation of time on the plate: none, a table (1st and 15th of each month) or a graph'),
    })
    .prefault({}),
  parts: partsSection,
  stand: standSection,
  engrave: engraveSection,
  install: installSection,
  check: checkSection,
  template: templateSection,
  pictures: picturesSection,
  cutFiles: cutFilesSection,
  process: z
    .strictObject({
      method: oneOf(METHODS).default('laser').describe('laser, waterjet, router or print'),
      kerf: num({ min: 0, max: 25, unit: 'mm' }).optional().describe('cut width, mm (default by method: laser 0.15, waterjet 0.9, router = tool 3.175, print 0)'),
      clearance: num({ min: 0, max: 2, unit: 'mm' }).optional().describe('fit clearance per side for tabs in slots, mm (default by method: print 0.2, others 0.1)'),
    })
    .prefault({}),
});

/** The spec as written by a user (before defaults). */
export type DialSpecInput = z.input<typeof specSchema>;

/** The spec after validation and defaults, with the per-method allowances filled in. */
export type DialSpec = Omit<z.output<typeof specSchema>, 'process'> & {
  readonly process: { readonly method: ProcessMethod; readonly kerf: number; readonly clearance: number };
};

/**
 * Per-method allowances (docs/design.md §5, typical values, common practice):
 * laser kerf 0.1–0.25 mm, waterjet 0.8–1.0 mm, router kerf = tool diameter
 * (1/8" = 3.175 mm end mill), print none; fit clearance 0.2 mm per side for
 * prints, 0.1 mm for cut parts.
 */
export const METHOD_DEFAULTS: Readonly<Record<ProcessMethod, { readonly kerf: number; readonly clearance: number }>> = {
  laser: { kerf: 0.15, clearance: 0.1 },
  waterjet: { kerf: 0.9, clearance: 0.1 },
  router: { kerf: 3.175, clearance: 0.1 },
  print: { kerf: 0, clearance: 0.2 },
};
