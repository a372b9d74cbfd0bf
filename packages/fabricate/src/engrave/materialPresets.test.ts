import { describe, expect, it } from 'vitest';
import { ENGRAVE_DEFAULTS, MATERIAL_NAMES, MATERIAL_PRESETS, resolveEngraveSettings } from './materialPresets.ts';

describe('resolveEngraveSettings', () => {
  it('gives the preset plus the defaults', () => {
    for (const m of MATERIAL_NAMES) {
      const s = resolveEngraveSettings(m);
      expect(s).toEqual({ ...ENGRAVE_DEFAULTS, ...MATERIAL_PRESETS[m], material: m });
    }
  });

  it('merges overrides over the preset, ignoring undefined values', () => {
    const s = resolveEngraveSettings('brass', { feedMmPerMin: 350, vbitAngleDeg: 60, stepDownMm: undefined, flatEndMillMm: 1.5 });
    expect(s.feedMmPerMin).toBe(350);
    expect(s.vbitAngleDeg).toBe(60);
    expect(s.stepDownMm).toBe(MATERIAL_PRESETS.brass.stepDownMm);
    expect(s.flatEndMillMm).toBe(1.5);
    expect(s.spindleRpm).toBe(MATERIAL_PRESETS.brass.spindleRpm);
  });

  it('rejects bad values, naming the field and the value', () => {
    expect(() => resolveEngraveSettings('brass', { feedMmPerMin: 0 })).toThrow('feedMmPerMin: got 0; a number greater than 0 is required');
    expect(() => resolveEngraveSettings('brass', { feedMmPerMin: -5 })).toThrow('feedMmPerMin: got -5; a number greater than 0 is required');
    expect(() => resolveEngraveSettings('brass', { plungeMmPerMin: 0 })).toThrow(/plungeMmPerMin: got 0;/);
    expect(() => resolveEngraveSettings('brass', { clearanceZMm: 11 })).toThrow('clearanceZMm: got 11; allowed: at most safeZMm (10)');
    expect(() => resolveEngraveSettings('brass', { entryZMm: 2 })).toThrow('entryZMm: got 2; allowed: at most clearanceZMm (1)');
    expect(() => resolveEngraveSettings('brass', { coolant: 'air' as never })).toThrow('coolant: got "air"; allowed: off, mist, flood');
    expect(() => resolveEngraveSettings('brass', { spindleDwellS: -1 })).toThrow('spindleDwellS: got -1; a number 0 or greater is required');
    expect(() => resolveEngraveSettings('brass', { rampAngleDeg: 95 })).toThrow('rampAngleDeg: got 95; allowed: more than 0°, up to 90°');
    expect(() => resolveEngraveSettings('brass', { vbitAngleDeg: 0 })).toThrow('vbitAngleDeg: got 0; allowed: more than 0° and less than 180°');
    expect(() => resolveEngraveSettings('brass', { laserPowerPct: 120 })).toThrow('laserPowerPct: got 120; allowed: more than 0%, up to 100%');
    expect(() => resolveEngraveSettings('brass', { vbitTipMm: 4 })).toThrow('vbitMaxWidthMm: got 3.175; allowed: more than vbitTipMm (4)');
    expect(() => resolveEngraveSettings('brass', { flatEndMillMm: 2, flatMinWidthMm: 1 })).toThrow('flatMinWidthMm: got 1; allowed: flatEndMillMm (2) or more');
  });

  it('rejects an unknown material, listing the allowed ones', () => {
    expect(() => resolveEngraveSettings('granite')).toThrow(
      'stock.material: "granite" has no engraving preset; allowed: aluminium, brass, stainless, steel, acrylic, hardwood, plywood, slate',
    );
  });

  it('rejects an unknown override key', () => {
    expect(() => resolveEngraveSettings('slate', { feed: 100 } as never)).toThrow(/^engrave: the setting "feed" is unknown; allowed: .*feedMmPerMin/);
  });
});
