import { SpecError, isSpecError, type DialSpec } from '@umbrafab/geometry';
import { MATERIAL_NAMES, resolveEngraveSettings, type EngraveOverrides, type EngraveSettings } from './materialPresets.ts';

/** The settings that sit under `engrave.tool` in the spec (the rest sit under `engrave`). */
const TOOL_SETTINGS: ReadonlySet<string> = new Set(['vbitAngleDeg', 'vbitTipMm', 'vbitMaxWidthMm', 'flatEndMillMm', 'flatMinWidthMm', 'flatDepthMm', 'flatStepoverFraction']);

/**
 * The engraving settings of a spec: the preset of `plate.material`
 * (MATERIAL_PRESETS) with every `engrave:` field the spec sets merged over
 * it (engraveSection.ts names the fields after the settings).
 *
 * @throws SpecError on `plate.material` when the material has no engraving
 *   preset (pla, petg), listing the materials that have one
 * @example engraveSettingsFromSpec(spec).feedMmPerMin // 400 for aluminium
 */
export function engraveSettingsFromSpec(spec: DialSpec): EngraveSettings {
  const material = spec.plate.material;
  if (!(MATERIAL_NAMES as readonly string[]).includes(material)) {
    throw new SpecError(
      'plate.material',
      material,
      `allowed for engraving: ${MATERIAL_NAMES.join(', ')} (the materials with an engraving preset); or engrave.programs: none`,
      `${JSON.stringify(material)} has no engraving preset`,
    );
  }
  const e = spec.engrave;
  const overrides: EngraveOverrides = {
    spindleRpm: e.spindleRpm,
    feedMmPerMin: e.feedMmPerMin,
    plungeMmPerMin: e.plungeMmPerMin,
    stepDownMm: e.stepDownMm,
    laserPowerPct: e.laserPowerPct,
    laserSpeedMmPerMin: e.laserSpeedMmPerMin,
    safeZMm: e.safeZMm,
    clearanceZMm: e.clearanceZMm,
    vbitAngleDeg: e.tool.vbitAngleDeg,
    vbitTipMm: e.tool.vbitTipMm,
    vbitMaxWidthMm: e.tool.vbitMaxWidthMm,
    flatEndMillMm: e.tool.flatEndMillMm,
    flatMinWidthMm: e.tool.flatMinWidthMm,
    flatDepthMm: e.tool.flatDepthMm,
    flatStepoverFraction: e.tool.flatStepoverFraction,
    laserMaxS: e.laserMaxS,
    rapidMmPerMin: e.rapidMmPerMin,
    entryZMm: e.entryZMm,
    rampAngleDeg: e.rampAngleDeg,
    spindleDwellS: e.spindleDwellS,
    toolWords: e.toolWords,
    coolant: e.coolant,
    parkXMm: e.parkXMm,
    parkYMm: e.parkYMm,
  };
  try {
    return resolveEngraveSettings(material, overrides);
  } catch (err) {
    // The schema checks each field alone; the settings' own checks (one value
    // against another, e.g. clearanceZMm against safeZMm) name the spec field here.
    if (!isSpecError(err)) throw err;
    throw new SpecError(TOOL_SETTINGS.has(err.field) ? `engrave.tool.${err.field}` : `engrave.${err.field}`, err.value, err.allowed);
  }
}
