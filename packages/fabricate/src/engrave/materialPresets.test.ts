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
    expect(() => resolveEngraveSettings('brass', { feedMmPerMin: 0 })).toThrow('feedMmPerMin must be > 0 mm/min, got 0');
    expect(() => resolveEngraveSettings('brass', { feedMmPerMin: -5 })).toThrow('feedMmPerMin must be > 0 mm/min, got -5');
    expect(() => resolveEngraveSettings('brass', { plungeMmPerMin: 0 })).toThrow(/plungeMmPerMin .*got 0/);
    expect(() => resolveEngraveSettings('brass', { clearanceZMm: 11 })).toThrow('clearanceZMm 11 must not exceed safeZMm 10');
    expect(() => resolveEngraveSettings('brass', { entryZMm: 2 })).toThrow('entryZMm 2 must not exceed clearanceZMm 1');
    expect(() => resolveEngraveSettings('brass', { coolant: 'air' as never })).toThrow('coolant must be one of off, mist, flood, got "air"');
    expect(() => resolveEngraveSettings('brass', { spindleDwellS: -1 })).toThrow('spindleDwellS must be >= 0 s, got -1');
    expect(() => resolveEngraveSettings('brass', { rampAngleDeg: 95 })).toThrow(/rampAngleDeg must be in \(0, 90\] deg, got 95/);
    expect(() => resolveEngraveSettings('brass', { vbitAngleDeg: 0 })).toThrow(/vbitAngleDeg must be in \(0, 180\) deg, got 0/);
    expect(() => resolveEngraveSettings('brass', { laserPowerPct: 120 })).toThrow(/laserPowerPct must be in \(0, 100\] %, got 120/);
    expect(() => resolveEngraveSettings('brass', { vbitTipMm: 4 })).toThrow('vbitMaxWidthMm 3.175 must exceed vbitTipMm 4');
    expect(() => resolveEngraveSettings('brass', { flatEndMillMm: 2, flatMinWidthMm: 1 })).toThrow(/flatMinWidthMm 1 must be >= flatEndMillMm 2/);
  });

  it('rejects an unknown material, listing the allowed ones', () => {
    expect(() => resolveEngraveSettings('granite')).toThrow(
      'stock.material "granite" has no engraving preset; allowed: aluminium, brass, stainless, steel, acrylic, hardwood, plywood, slate',
    );
  });

  it('rejects an unknown override key', () => {
    expect(() => resolveEngraveSettings('slate', { feed: 100 } as never)).toThrow(/engrave setting "feed" is unknown; allowed: .*feedMmPerMin/);
  });
});
