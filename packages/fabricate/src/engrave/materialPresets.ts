import { SpecError, assertFinite, assertNonNegative, assertPositive, assertRange } from '@umbrafab/geometry';
import type { CoolantMode } from './gcodeRecords.ts';

/**
 * Engraving presets per plate material, and the merge of spec overrides over
 * them.
 *
 * Every value is a conservative starting point of the kind printed in router,
 * bit and laser makers' feed charts for a 1/8" (3.175 mm) shank 90° V-bit on
 * a small CNC router with a 0.5–1 kW spindle, and for a 40–60 W CO2 or a
 * 10–20 W diode laser (common practice, memory). They are not measured here:
 * cut a test groove on scrap and tune feeds, speeds and powers per machine.
 */

/** Materials with a preset. */
export const MATERIAL_NAMES = ['aluminium', 'brass', 'stainless', 'steel', 'acrylic', 'hardwood', 'plywood', 'slate'] as const;
export type MaterialName = (typeof MATERIAL_NAMES)[number];

/** The material-dependent part of the settings. */
export interface MaterialPreset {
  /** Spindle speed, rev/min. */
  readonly spindleRpm: number;
  /** Cutting feed along the path, mm/min. */
  readonly feedMmPerMin: number;
  /** Vertical plunge feed, mm/min. */
  readonly plungeMmPerMin: number;
  /** Largest depth of one pass, mm. */
  readonly stepDownMm: number;
  /** Laser power, percent of the machine's maximum. */
  readonly laserPowerPct: number;
  /** Laser scoring speed, mm/min. */
  readonly laserSpeedMmPerMin: number;
}

/** Presets by material (common practice, memory; see the file comment). */
export const MATERIAL_PRESETS: Readonly<Record<MaterialName, MaterialPreset>> = {
  // 6061/5052 sheet: high rpm, light chip, shallow passes, use mist or WD-40.
  // Bare aluminium reflects CO2/diode light: the laser values assume a
  // marking compound (or a fibre laser at its own settings).
  aluminium: { spindleRpm: 16000, feedMmPerMin: 400, plungeMmPerMin: 100, stepDownMm: 0.15, laserPowerPct: 100, laserSpeedMmPerMin: 600 },
  // Free-machining brass (CZ121/C360) cuts cleanly dry, a little faster than aluminium.
  brass: { spindleRpm: 12000, feedMmPerMin: 500, plungeMmPerMin: 120, stepDownMm: 0.15, laserPowerPct: 100, laserSpeedMmPerMin: 500 },
  // 304/316 stainless work-hardens: slow feed, very light passes, carbide bit.
  // Laser values again assume a marking compound.
  stainless: { spindleRpm: 10000, feedMmPerMin: 200, plungeMmPerMin: 50, stepDownMm: 0.05, laserPowerPct: 100, laserSpeedMmPerMin: 400 },
  // Mild steel (S235/1018-type): between brass and stainless; carbide bit,
  // light passes, cutting fluid. Laser values assume a marking compound.
  steel: { spindleRpm: 10000, feedMmPerMin: 250, plungeMmPerMin: 60, stepDownMm: 0.08, laserPowerPct: 100, laserSpeedMmPerMin: 400 },
  // Cast acrylic (PMMA): fast enough not to melt, single-flute bit; CO2 scores it at low power.
  acrylic: { spindleRpm: 16000, feedMmPerMin: 1000, plungeMmPerMin: 300, stepDownMm: 0.5, laserPowerPct: 30, laserSpeedMmPerMin: 3000 },
  // Oak, beech, iroko and the like.
  hardwood: { spindleRpm: 18000, feedMmPerMin: 1500, plungeMmPerMin: 500, stepDownMm: 1, laserPowerPct: 40, laserSpeedMmPerMin: 2000 },
  // Birch or poplar plywood: like a softer hardwood; the glue lines dull the
  // bit and char darker under a laser, so a little less laser power.
  plywood: { spindleRpm: 18000, feedMmPerMin: 1500, plungeMmPerMin: 500, stepDownMm: 1, laserPowerPct: 35, laserSpeedMmPerMin: 2500 },
  // Natural slate: abrasive and brittle, moderate feed; a laser marks it light grey.
  slate: { spindleRpm: 12000, feedMmPerMin: 600, plungeMmPerMin: 200, stepDownMm: 0.3, laserPowerPct: 60, laserSpeedMmPerMin: 1500 },
};

/** All settings the engraving writers use. Lengths mm, speeds mm/min. */
export interface EngraveSettings extends MaterialPreset {
  readonly material: MaterialName;
  /** Height for the first and last moves and around tool changes, mm above the stock top. */
  readonly safeZMm: number;
  /** Height for rapids between paths, mm above the stock top (<= safeZMm). */
  readonly clearanceZMm: number;
  /** Included angle of the V-bit, degrees. */
  readonly vbitAngleDeg: number;
  /** Width of the V-bit's flat tip, mm (0 for a sharp point). */
  readonly vbitTipMm: number;
  /** Widest groove the V-bit can cut (its diameter), mm. */
  readonly vbitMaxWidthMm: number;
  /** Diameter of an optional flat end mill for wide marks, mm; undefined = V-bit only. */
  readonly flatEndMillMm: number | undefined;
  /** Marks at least this wide go to the flat end mill when there is one, mm (default: the mill's diameter). */
  readonly flatMinWidthMm: number | undefined;
  /** Depth of flat-mill grooves, mm. */
  readonly flatDepthMm: number;
  /** Largest step across between parallel flat-mill passes, as a fraction of the mill diameter. */
  readonly flatStepoverFraction: number;
  /** The S word for 100 % laser power (GRBL's $30, default 1000). */
  readonly laserMaxS: number;
  /** Rapid (G0) rate used for the time estimate, mm/min. */
  readonly rapidMmPerMin: number;
  /** Height the tool rapids down to before it feeds onto the stock (at the cutting feed) and ramps in, mm above the stock top (<= clearanceZMm). */
  readonly entryZMm: number;
  /** Ramp angle into the cut, degrees from the horizontal; undefined = the steepest whose descent rate is the plunge feed, asin(plunge / feed). */
  readonly rampAngleDeg: number | undefined;
  /** Dwell after every spindle start so the spindle reaches speed before it cuts, s (G4). */
  readonly spindleDwellS: number;
  /** Write T1 M6 at the start (for a machine with a tool changer or a tool table). */
  readonly toolWords: boolean;
  /** Coolant during the job: 'off', 'mist' (M7) or 'flood' (M8); M9 at the end. */
  readonly coolant: CoolantMode | 'off';
  /** Park position at the end, at safe height, mm in work coordinates; undefined = X0 and the far (top) edge of the stock. */
  readonly parkXMm: number | undefined;
  readonly parkYMm: number | undefined;
}

/** Spec overrides: any setting but the material. */
export type EngraveOverrides = { readonly [K in Exclude<keyof EngraveSettings, 'material'>]?: EngraveSettings[K] };

/** Material-independent defaults (common practice, memory). */
export const ENGRAVE_DEFAULTS = {
  safeZMm: 10, // clears clamps, screws and hold-down tabs on a small router table
  clearanceZMm: 1, // enough over a flat, faced plate
  vbitAngleDeg: 90, // the most common engraving V-bit
  vbitTipMm: 0, // sharp point
  vbitMaxWidthMm: 3.175, // 1/8" shank 90° bit
  flatEndMillMm: undefined,
  flatMinWidthMm: undefined,
  flatDepthMm: 0.3, // a shallow, paint-fillable groove
  flatStepoverFraction: 0.5, // half the diameter: no ridges left between passes
  laserMaxS: 1000, // GRBL default $30
  rapidMmPerMin: 3000, // typical hobby-router G0 rate
  entryZMm: 0.2, // rapid down to just above a faced plate, then feed
  rampAngleDeg: undefined,
  spindleDwellS: 3, // a small VFD spindle reaches speed in 2-5 s
  toolWords: false, // most hobby routers change tools by hand
  coolant: 'off',
  parkXMm: undefined,
  parkYMm: undefined,
} as const satisfies Omit<EngraveSettings, 'material' | keyof MaterialPreset>;

const SETTING_KEYS: readonly string[] = [
  ...Object.keys(MATERIAL_PRESETS.aluminium),
  ...Object.keys(ENGRAVE_DEFAULTS),
].sort();

/**
 * Ramp slope (depth per mm along the line) of the settings: tan of
 * rampAngleDeg, by default the steepest ramp whose descent rate at the
 * cutting feed equals the plunge feed, sin(angle) = plunge / feed (at most 45°).
 */
export function rampSlope(s: { readonly rampAngleDeg: number | undefined; readonly feedMmPerMin: number; readonly plungeMmPerMin: number }): number {
  const deg = s.rampAngleDeg ?? Math.min(45, (Math.asin(Math.min(1, s.plungeMmPerMin / s.feedMmPerMin)) * 180) / Math.PI);
  return Math.tan((deg * Math.PI) / 180);
}

/**
 * Feed along a ramp: the cutting feed, lowered where needed so the descent
 * rate stays at or under the plunge feed (feed · sin(angle) <= plunge).
 */
export function rampFeedMmPerMin(s: { readonly feedMmPerMin: number; readonly plungeMmPerMin: number }, slope: number): number {
  const sin = slope / Math.hypot(1, slope);
  return Math.min(s.feedMmPerMin, s.plungeMmPerMin / sin);
}

/**
 * Merge spec overrides over the material preset and the defaults, then check
 * every value. Keys whose value is `undefined` are ignored.
 *
 * @param material one of MATERIAL_NAMES
 * @param overrides any EngraveSettings field but `material`
 * @throws SpecError naming the field (the setting's key) and value: unknown material (lists the allowed
 *   ones), unknown override key, feed/plunge/rpm/step-down <= 0, clearance above
 *   safe height, V-bit angle outside (0, 180) deg, tip wider than the bit,
 *   laser power outside (0, 100] %.
 * @example resolveEngraveSettings('brass', { feedMmPerMin: 350 }).feedMmPerMin // 350
 */
export function resolveEngraveSettings(material: string, overrides: EngraveOverrides = {}): EngraveSettings {
  if (!(MATERIAL_NAMES as readonly string[]).includes(material)) {
    throw new SpecError('stock.material', material, `allowed: ${MATERIAL_NAMES.join(', ')}`, `${JSON.stringify(material)} has no engraving preset`);
  }
  const given: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(overrides)) {
    if (!SETTING_KEYS.includes(key)) {
      throw new SpecError('engrave', key, `allowed: ${SETTING_KEYS.join(', ')}`, `the setting ${JSON.stringify(key)} is unknown`);
    }
    if (value !== undefined) given[key] = value;
  }
  const s = { ...ENGRAVE_DEFAULTS, ...MATERIAL_PRESETS[material as MaterialName], ...given, material } as EngraveSettings;

  for (const key of ['spindleRpm', 'feedMmPerMin', 'plungeMmPerMin', 'stepDownMm', 'safeZMm', 'clearanceZMm'] as const) assertPositive(key, s[key]);
  if (s.clearanceZMm > s.safeZMm) {
    throw new SpecError('clearanceZMm', s.clearanceZMm, `allowed: at most safeZMm (${s.safeZMm})`);
  }
  assertNonNegative('entryZMm', s.entryZMm);
  if (s.entryZMm > s.clearanceZMm) throw new SpecError('entryZMm', s.entryZMm, `allowed: at most clearanceZMm (${s.clearanceZMm})`);
  if (s.rampAngleDeg !== undefined) assertRange('rampAngleDeg', s.rampAngleDeg, 0, 90, '°', 'lo');
  assertNonNegative('spindleDwellS', s.spindleDwellS);
  if (typeof s.toolWords !== 'boolean') throw new SpecError('toolWords', s.toolWords, 'allowed: true or false');
  if (!['off', 'mist', 'flood'].includes(s.coolant)) throw new SpecError('coolant', s.coolant, 'allowed: off, mist, flood');
  if (s.parkXMm !== undefined) assertFinite('parkXMm', s.parkXMm);
  if (s.parkYMm !== undefined) assertFinite('parkYMm', s.parkYMm);
  assertRange('vbitAngleDeg', s.vbitAngleDeg, 0, 180, '°', 'both');
  assertNonNegative('vbitTipMm', s.vbitTipMm);
  assertPositive('vbitMaxWidthMm', s.vbitMaxWidthMm);
  if (!(s.vbitMaxWidthMm > s.vbitTipMm)) {
    throw new SpecError('vbitMaxWidthMm', s.vbitMaxWidthMm, `allowed: more than vbitTipMm (${s.vbitTipMm})`);
  }
  if (s.flatEndMillMm !== undefined) assertPositive('flatEndMillMm', s.flatEndMillMm);
  if (s.flatMinWidthMm !== undefined) {
    assertPositive('flatMinWidthMm', s.flatMinWidthMm);
    if (s.flatEndMillMm !== undefined && s.flatMinWidthMm < s.flatEndMillMm) {
      throw new SpecError('flatMinWidthMm', s.flatMinWidthMm, `allowed: flatEndMillMm (${s.flatEndMillMm}) or more (a mill cannot cut a narrower groove)`);
    }
  }
  assertPositive('flatDepthMm', s.flatDepthMm);
  assertRange('flatStepoverFraction', s.flatStepoverFraction, 0, 1, '', 'lo');
  assertRange('laserPowerPct', s.laserPowerPct, 0, 100, '%', 'lo');
  assertPositive('laserSpeedMmPerMin', s.laserSpeedMmPerMin);
  assertPositive('laserMaxS', s.laserMaxS);
  assertPositive('rapidMmPerMin', s.rapidMmPerMin);
  return s;
}
