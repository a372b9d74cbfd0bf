import { SpecError, assertNonNegative, assertPositive, assertRange } from '@umbrafab/geometry';
import type { MaterialName } from './materialPresets.ts';

/**
 * Settings of the router cutting program (cut.ngc): per-material starting
 * points for cutting sheet through with a flat end mill, and the options.
 *
 * Presets are conservative starting points of the kind printed in end-mill
 * makers' feed charts for a 1/8" (3.175 mm) two-flute carbide end mill on a
 * small CNC router with a 0.5–1 kW spindle (common practice, memory): about
 * 0.15–0.3 × the diameter per pass in metals, up to 0.6 × in wood and
 * plastics. They are not measured here: cut a test piece and tune them.
 */

/** The material-dependent part of the cutting settings. */
export interface CutPreset {
  readonly spindleRpm: number;
  readonly feedMmPerMin: number;
  readonly plungeMmPerMin: number;
  /** Largest depth of one pass, mm. */
  readonly stepDownMm: number;
}

export const CUT_PRESETS: Readonly<Record<MaterialName, CutPreset>> = {
  // Single- or two-flute bit for aluminium, mist or alcohol to keep chips from welding.
  aluminium: { spindleRpm: 18000, feedMmPerMin: 600, plungeMmPerMin: 150, stepDownMm: 0.5 },
  brass: { spindleRpm: 16000, feedMmPerMin: 500, plungeMmPerMin: 120, stepDownMm: 0.4 },
  // Stainless work-hardens: keep the tool cutting, never rubbing.
  stainless: { spindleRpm: 10000, feedMmPerMin: 150, plungeMmPerMin: 40, stepDownMm: 0.15 },
  steel: { spindleRpm: 10000, feedMmPerMin: 200, plungeMmPerMin: 50, stepDownMm: 0.2 },
  // Cast acrylic: an O-flute bit, fast enough not to melt.
  acrylic: { spindleRpm: 18000, feedMmPerMin: 1200, plungeMmPerMin: 300, stepDownMm: 1 },
  hardwood: { spindleRpm: 18000, feedMmPerMin: 1800, plungeMmPerMin: 600, stepDownMm: 2 },
  plywood: { spindleRpm: 18000, feedMmPerMin: 2000, plungeMmPerMin: 600, stepDownMm: 2 },
  // Slate is abrasive: a diamond-coated or carbide bit, water or dust extraction.
  slate: { spindleRpm: 12000, feedMmPerMin: 400, plungeMmPerMin: 100, stepDownMm: 0.5 },
};

/** Climb: the tooth meets the material at its thickest chip (with M3: outer profiles counter-clockwise, cut-outs clockwise); conventional: the opposite. */
export type MillingDirection = 'climb' | 'conventional';

export interface CutSettings extends CutPreset {
  /** Diameter of the end mill, mm (spec process.kerf for a router). */
  readonly toolDiameterMm: number;
  /** How far the last pass goes below the stock, into the spoilboard, mm. */
  readonly breakthroughMm: number;
  /** Holding tabs per outer profile (0 = none). */
  readonly tabCount: number;
  /** Width of the material bridge each tab leaves, along the profile, mm (the tool stays up over widthMm + the tool diameter). */
  readonly tabWidthMm: number;
  /** Height of the bridge above the bottom of the stock, mm. */
  readonly tabHeightMm: number;
  /** Length of the straight lead-in from the waste side and of the lead-out, mm. */
  readonly leadInMm: number;
  readonly direction: MillingDirection;
}

/** Defaults that do not depend on the material (common practice, memory). */
export const CUT_DEFAULTS = {
  breakthroughMm: 0.3, // just through: a sacrificial spoilboard takes the rest
  tabCount: 4,
  tabWidthMm: 4,
  tabHeightMm: 0.8,
  direction: 'climb',
} as const satisfies Partial<CutSettings>;

/** A hole is drilled (plunged straight) when its diameter is within this of the tool's, mm. */
export const DRILL_MATCH_MM = 0.05;

/**
 * Check resolved cutting settings; throws a SpecError naming the field and value.
 * @example checkCutSettings({ ...CUT_PRESETS.aluminium, ...CUT_DEFAULTS, toolDiameterMm: 3.175, leadInMm: 1.5875 }, 3)
 */
export function checkCutSettings(s: CutSettings, thicknessMm: number): void {
  for (const key of ['toolDiameterMm', 'spindleRpm', 'feedMmPerMin', 'plungeMmPerMin', 'stepDownMm'] as const) assertPositive(key, s[key]);
  assertNonNegative('breakthroughMm', s.breakthroughMm);
  if (!Number.isInteger(s.tabCount) || s.tabCount < 0) throw new SpecError('tabCount', s.tabCount, 'allowed: a whole number 0 or more');
  assertPositive('tabWidthMm', s.tabWidthMm);
  assertRange('tabHeightMm', s.tabHeightMm, 0, thicknessMm, ' mm', 'both');
  assertNonNegative('leadInMm', s.leadInMm);
  if (s.direction !== 'climb' && s.direction !== 'conventional') throw new SpecError('direction', s.direction, 'allowed: climb or conventional');
}
