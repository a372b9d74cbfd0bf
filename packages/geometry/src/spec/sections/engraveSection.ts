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

export const engraveSection = z
  .strictObject({
    programs: z
      .enum(ENGRAVE_PROGRAM_CHOICES, { error: `allowed: ${ENGRAVE_PROGRAM_CHOICES.map((v) => JSON.stringify(v)).join(', ')}` })
      .default('auto')
      .describe('engraving programs to write: auto (router/waterjet: engrave.ngc, laser: engrave-laser.gcode, print: none), ngc, laser, both or none'),
    tool: toolSection,
    spindleRpm: num({ min: 0, max: 100000, unit: 'rev/min', exclusiveMin: true }).optional().describe(`spindle speed, rev/min (${PRESET}, e.g. aluminium 16000)`),
    feedMmPerMin: num({ min: 0, max: 100000, unit: 'mm/min', exclusiveMin: true }).optional().describe(`cutting feed along the lines, mm/min (${PRESET}, e.g. aluminium 400)`),
    plungeMmPerMin: num({ min: 0, max: 100000, unit: 'mm/min', exclusiveMin: true }).optional().describe(`plunge feed into the stock, mm/min (${PRESET}, e.g. aluminium 100)`),
    stepDownMm: num({ min: 0, max: 50, unit: 'mm', exclusiveMin: true }).optional().describe(`deepest single pass, mm (${PRESET}, e.g. aluminium 0.15)`),
    safeZMm: num({ min: 0, max: 200, unit: 'mm', exclusiveMin: true }).default(5).describe('safe height above the stock top for the first and last moves and tool changes, mm'),
    clearanceZMm: num({ min: 0, max: 200, unit: 'mm', exclusiveMin: true }).default(1).describe('height above the stock top for rapids between lines, mm (at most safeZMm)'),
    rapidMmPerMin: num({ min: 0, max: 200000, unit: 'mm/min', exclusiveMin: true }).default(3000).describe('rapid (G0) rate of the machine, mm/min, for the time estimate only'),
    laserPowerPct: num({ min: 0, max: 100, unit: '%', exclusiveMin: true }).optional().describe(`laser power while scoring, percent of the machine maximum (${PRESET}, e.g. acrylic 30)`),
    laserSpeedMmPerMin: num({ min: 0, max: 200000, unit: 'mm/min', exclusiveMin: true }).optional().describe(`laser scoring speed, mm/min (${PRESET}, e.g. acrylic 3000)`),
    laserMaxS: num({ min: 0, max: 100000, unit: '', exclusiveMin: true }).default(1000).describe('the S word for 100 % laser power (GRBL $30; default 1000)'),
  })
  .superRefine((e, ctx) => {
    if (e.clearanceZMm > e.safeZMm) {
      ctx.addIssue({ code: 'custom', path: ['clearanceZMm'], input: e.clearanceZMm, message: `allowed: at most engrave.safeZMm (${e.safeZMm} mm)` });
    }
  })
  .prefault({});
