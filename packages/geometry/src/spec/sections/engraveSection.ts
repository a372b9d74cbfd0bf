import { z } from 'zod';
import { boundedNumber } from '../boundedNumber.ts';

/**
 * The `engrave:` section of the dial spec: which engraving programs
 * `umbrafab build` writes, the router's tools and every feed, speed, height
 * and laser setting of the engraving writers (packages/fabricate/src/engrave).
 * Every field has a default and a describe() text with its unit.
 *
 * Field names are those of the writers' settings (`feedMmPerMin`,
 * `vbitAngleDeg`, …), so the spec, report.json and the program headers use
 * the same words. Material-dependent settings (spindle speed, feeds,
 * step-down, laser power and speed) default to the engraving preset of
 * `plate.material`; leave them out to use the preset.
 *
 * `programs`:
 * - `auto` (default): by `process.method`: router → engrave.ngc, laser →
 *   engrave-laser.gcode, waterjet → engrave.ngc (the jet cannot score, so the
 *   lines are engraved by a router or mill as a second step), print → none;
 * - `ngc`, `laser`, `both`: those programs whatever the method;
 * - `none`: no engraving program.
 */

export const ENGRAVE_PROGRAM_CHOICES = ['auto', 'ngc', 'laser', 'both', 'none'] as const;
export type EngraveProgramChoice = (typeof ENGRAVE_PROGRAM_CHOICES)[number];

export const LASER_FILL_CHOICES = ['fill', 'score'] as const;

export const COOLANT_CHOICES = ['off', 'mist', 'flood'] as const;

/** A number field with bounds and unit (see boundedNumber). */
const num = boundedNumber;

const PRESET = 'default: the engraving preset of plate.material';

const toolSection = z
  .strictObject({
    vbitAngleDeg: num({ min: 0, max: 180, unit: 'degrees', exclusiveMin: true, exclusiveMax: true })
      .default(90)
      .describe('included angle of the V-bit (tool T1), degrees; sets the depth d = w / (2 tan(angle/2)) of a line of width w'),
    vbitTipMm: num({ min: 0, max: 10, unit: 'mm' }).default(0).describe('width of the V-bit flat tip, mm (0 = sharp point)'),
    vbitMaxWidthMm: num({ min: 0, max: 50, unit: 'mm', exclusiveMin: true })
      .default(3.175)
      .describe('widest groove the V-bit cuts (its cutting diameter), mm; every line must be no wider (1/8 inch bit: 3.175)'),
    flatEndMillMm: num({ min: 0, max: 25, unit: 'mm', exclusiveMin: true })
      .optional()
      .describe('diameter of a flat end mill (tool T2) for wide marks, mm (default: none, everything with the V-bit)'),
    flatMinWidthMm: num({ min: 0, max: 50, unit: 'mm', exclusiveMin: true })
      .optional()
      .describe('marks at least this wide go to the flat end mill, mm (default: the mill diameter)'),
    flatDepthMm: num({ min: 0, max: 50, unit: 'mm', exclusiveMin: true }).default(0.3).describe('depth of flat-mill grooves, mm'),
    flatStepoverFraction: num({ min: 0, max: 1, unit: '', exclusiveMin: true })
      .default(0.5)
      .describe('largest step across between flat-mill passes, as a fraction of the mill diameter (0 to 1)'),
  })
  .superRefine((t, ctx) => {
    if (!(t.vbitMaxWidthMm > t.vbitTipMm)) {
      ctx.addIssue({ code: 'custom', path: ['vbitTipMm'], input: t.vbitTipMm, message: `allowed: a tip narrower than engrave.tool.vbitMaxWidthMm (${t.vbitMaxWidthMm} mm)` });
    }
    if (t.flatEndMillMm !== undefined && t.flatMinWidthMm !== undefined && t.flatMinWidthMm < t.flatEndMillMm) {
      ctx.addIssue({
        code: 'custom',
        path: ['flatMinWidthMm'],
        input: t.flatMinWidthMm,
        message: `allowed: at least engrave.tool.flatEndMillMm (${t.flatEndMillMm} mm): a mill cannot cut a groove narrower than itself`,
      });
    }
  })
  .prefault({});

export const MILLING_DIRECTIONS = ['climb', 'conventional'] as const;

const CUT_PRESET = 'default: the cutting preset of plate.material';

/** `engrave.cut`: the router cutting program cut.ngc (holes, slots, outer profiles). */
const cutSection = z
  .strictObject({
    write: z
      .boolean({ error: 'allowed: true or false' })
      .default(true)
      .describe('write cut.ngc when process.method is router: holes, slots, then the outer profiles of the plate and the gnomon, cut through with the process.kerf end mill'),
    spindleRpm: num({ min: 0, max: 100000, unit: 'rev/min', exclusiveMin: true }).optional().describe(`spindle speed for cutting, rev/min (${CUT_PRESET}, e.g. aluminium 18000)`),
    feedMmPerMin: num({ min: 0, max: 100000, unit: 'mm/min', exclusiveMin: true }).optional().describe(`cutting feed, mm/min (${CUT_PRESET}, e.g. aluminium 600)`),
    plungeMmPerMin: num({ min: 0, max: 100000, unit: 'mm/min', exclusiveMin: true }).optional().describe(`plunge feed, and the most a ramp descends per minute, mm/min (${CUT_PRESET}, e.g. aluminium 150)`),
    stepDownMm: num({ min: 0, max: 50, unit: 'mm', exclusiveMin: true }).optional().describe(`deepest single pass, mm (${CUT_PRESET}, e.g. aluminium 0.5)`),
    breakthroughMm: num({ min: 0, max: 5, unit: 'mm' }).default(0.3).describe('how far the last pass goes below the stock into a sacrificial spoilboard, mm'),
    tabs: num({ min: 0, max: 12, unit: '', int: true }).default(4).describe('holding tabs per outer profile (0 = none), at the middles of its longest straight edges'),
    tabWidthMm: num({ min: 0, max: 50, unit: 'mm', exclusiveMin: true }).default(4).describe('width of the bridge each tab leaves, along the profile, mm'),
    tabHeightMm: num({ min: 0, max: 50, unit: 'mm', exclusiveMin: true }).default(0.8).describe('height of each tab above the bottom of the stock, mm (less than plate.thickness)'),
    leadInMm: num({ min: 0, max: 20, unit: 'mm' }).optional().describe('straight lead-in from the waste side and lead-out, mm (default: the tool radius; shortened to fit inside a slot)'),
    direction: z
      .enum(MILLING_DIRECTIONS, { error: `allowed: ${MILLING_DIRECTIONS.map((v) => JSON.stringify(v)).join(', ')}` })
      .default('climb')
      .describe('climb (with M3: outer profiles counter-clockwise, cut-outs clockwise; the better finish on a rigid machine) or conventional'),
  })
  .prefault({});

export const engraveSection = z
  .strictObject({
    programs: z
      .enum(ENGRAVE_PROGRAM_CHOICES, { error: `allowed: ${ENGRAVE_PROGRAM_CHOICES.map((v) => JSON.stringify(v)).join(', ')}` })
      .default('auto')
      .describe('engraving programs to write: auto (router/waterjet: engrave.ngc, laser: engrave-laser.gcode, print: none), ngc, laser, both or none'),
    tool: toolSection,
    cut: cutSection,
    spindleRpm: num({ min: 0, max: 100000, unit: 'rev/min', exclusiveMin: true }).optional().describe(`spindle speed, rev/min (${PRESET}, e.g. aluminium 16000)`),
    feedMmPerMin: num({ min: 0, max: 100000, unit: 'mm/min', exclusiveMin: true }).optional().describe(`cutting feed along the lines, mm/min (${PRESET}, e.g. aluminium 400)`),
    plungeMmPerMin: num({ min: 0, max: 100000, unit: 'mm/min', exclusiveMin: true }).optional().describe(`plunge feed into the stock, mm/min (${PRESET}, e.g. aluminium 100)`),
    stepDownMm: num({ min: 0, max: 50, unit: 'mm', exclusiveMin: true }).optional().describe(`deepest single pass, mm (${PRESET}, e.g. aluminium 0.15)`),
    safeZMm: num({ min: 0, max: 200, unit: 'mm', exclusiveMin: true }).default(10).describe('safe height above the stock top for the first and last moves, the park move and tool changes, mm'),
    clearanceZMm: num({ min: 0, max: 200, unit: 'mm', exclusiveMin: true }).default(1).describe('height above the stock top for rapids between lines, mm (at most safeZMm)'),
    entryZMm: num({ min: 0, max: 200, unit: 'mm' })
      .default(0.2)
      .describe('height above the stock top the tool rapids down to before it feeds onto the stock at the cutting feed and ramps in, mm (at most clearanceZMm; 0 = rapid to the top of a faced plate)'),
    rampAngleDeg: num({ min: 0, max: 90, unit: 'degrees', exclusiveMin: true })
      .optional()
      .describe('angle of the ramp into the cut, degrees from the horizontal (default: the steepest whose descent rate is the plunge feed, asin(plunge / feed), at most 45); the ramp feed is lowered so the descent never exceeds the plunge feed'),
    spindleDwellS: num({ min: 0, max: 60, unit: 's' }).default(3).describe('dwell (G4) after every spindle start so the spindle reaches speed before it cuts, seconds'),
    toolWords: z.boolean().default(false).describe('write T1 M6 (T2 M6, T3 M6) tool words at the start, for a machine with a tool changer or a tool table; false = load the tool by hand'),
    coolant: z
      .enum(COOLANT_CHOICES, { error: `allowed: ${COOLANT_CHOICES.map((v) => JSON.stringify(v)).join(', ')}` })
      .default('off')
      .describe('coolant during milling: off, mist (M7) or flood (M8); M9 switches it off at the end'),
    parkXMm: num({ min: -10000, max: 10000, unit: 'mm' }).optional().describe('X of the park move at the end, at safe height, mm in work coordinates (default 0)'),
    parkYMm: num({ min: -10000, max: 10000, unit: 'mm' }).optional().describe('Y of the park move at the end, mm in work coordinates (default: the far edge of the stock, so the part is free to lift out)'),
    rapidMmPerMin: num({ min: 0, max: 200000, unit: 'mm/min', exclusiveMin: true }).default(3000).describe('rapid (G0) rate of the machine, mm/min, for the time estimate only'),
    laserPowerPct: num({ min: 0, max: 100, unit: '%', exclusiveMin: true }).optional().describe(`laser power while scoring, percent of the machine maximum (${PRESET}, e.g. acrylic 30)`),
    laserSpeedMmPerMin: num({ min: 0, max: 200000, unit: 'mm/min', exclusiveMin: true }).optional().describe(`laser scoring speed, mm/min (${PRESET}, e.g. acrylic 3000)`),
    laserFill: z
      .enum(LASER_FILL_CHOICES, { error: `allowed: ${LASER_FILL_CHOICES.map((v) => JSON.stringify(v)).join(', ')}` })
      .default('fill')
      .describe('fill: lines wider than the beam are burned as wide as drawn (concentric passes inside the union of the lines, overlaps burned once); score: every line traced once along its centre'),
    laserBeamMm: num({ min: 0, max: 5, unit: 'mm', exclusiveMin: true })
      .default(0.15)
      .describe('width of the line one laser pass burns, mm (about 0.1-0.2 for a focused CO2 or diode laser; measure a scored line on scrap); lines no wider are scored along their centre'),
    laserFillIntervalMm: num({ min: 0, max: 5, unit: 'mm', exclusiveMin: true })
      .optional()
      .describe('distance between concentric fill passes, mm (default: the beam width, so the passes just meet; at most laserBeamMm)'),
    laserMaxS: num({ min: 0, max: 100000, unit: '', exclusiveMin: true }).default(1000).describe('the S word for 100 % laser power (GRBL $30; default 1000)'),
  })
  .superRefine((e, ctx) => {
    if (e.clearanceZMm > e.safeZMm) {
      ctx.addIssue({ code: 'custom', path: ['clearanceZMm'], input: e.clearanceZMm, message: `allowed: at most engrave.safeZMm (${e.safeZMm} mm)` });
    }
    if (e.laserFillIntervalMm !== undefined && e.laserFillIntervalMm > e.laserBeamMm) {
      ctx.addIssue({ code: 'custom', path: ['laserFillIntervalMm'], input: e.laserFillIntervalMm, message: `allowed: at most engrave.laserBeamMm (${e.laserBeamMm} mm), so the passes meet` });
    }
    if (e.entryZMm > e.clearanceZMm) {
      ctx.addIssue({ code: 'custom', path: ['entryZMm'], input: e.entryZMm, message: `allowed: at most engrave.clearanceZMm (${e.clearanceZMm} mm)` });
    }
  })
  .prefault({});
