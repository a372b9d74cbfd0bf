import { describe, expect, it } from 'vitest';
import { DENSITY_MATERIALS, FILAMENTS, MATERIAL_DENSITIES, isFilament, materialDensity } from './materials.ts';
import { partMass, totalMass } from './partMass.ts';
import { filamentUse, FILAMENT_DIAMETER_MM } from './filamentUse.ts';
import { MATERIALS } from '../spec/schema.ts';

describe('density table', () => {
  it('has a row with a source for every plate material of the spec and every filament', () => {
    for (const m of [...MATERIALS, ...FILAMENTS]) {
      const row = materialDensity(m);
      expect(row.material).toBe(m);
      expect(row.source.length).toBeGreaterThan(10);
      expect(row.densityGPerCm3).toBeGreaterThanOrEqual(row.rangeGPerCm3[0]);
      expect(row.densityGPerCm3).toBeLessThanOrEqual(row.rangeGPerCm3[1]);
    }
    expect(Object.keys(MATERIAL_DENSITIES)).toEqual([...DENSITY_MATERIALS]);
  });
  it('rejects a name outside the table, naming it', () => {
    expect(() => materialDensity('unobtainium')).toThrow(/"unobtainium".*aluminium/);
    expect(() => materialDensity('toString')).toThrow(/toString/);
  });
  it('tells filaments from sheet stock', () => {
    expect(isFilament('petg')).toBe(true);
    expect(isFilament('aluminium')).toBe(false);
  });
});

describe('partMass', () => {
  it('is volume × density: 1000 cm³ of steel at 7850 kg/m³ is 7.85 kg (EN 1993-1-1 value, memory)', () => {
    const m = partMass('block', 1e6, 'steel');
    expect(m.massG).toBeCloseTo(7850, 9);
    expect(m.densityGPerCm3).toBe(7.85);
  });
  it('a 3 mm aluminium sheet of 200 × 150 mm weighs 243 g (2.70 g/cm³, memory)', () => {
    expect(partMass('plate', 200 * 150 * 3, 'aluminium').massG).toBeCloseTo(243, 9);
  });
  it('adds up parts and refuses a negative volume', () => {
    const t = totalMass([partMass('a', 1000, 'pla'), partMass('b', 2000, 'petg')]);
    expect(t.massG).toBeCloseTo(1.24 + 2 * 1.27, 12);
    expect(t.massKg).toBeCloseTo((1.24 + 2.54) / 1000, 12);
    expect(() => partMass('x', -1, 'pla')).toThrow(/x\.volumeMm3: got -1;/);
  });
});

describe('filamentUse', () => {
  it('length = V / (π (d/2)²) (common practice): one metre of 1.75 mm strand holds 2405.28 mm³', () => {
    const v = Math.PI * (1.75 / 2) ** 2 * 1000;
    const f = filamentUse(v, 'pla');
    expect(f.diameterMm).toBe(FILAMENT_DIAMETER_MM);
    expect(f.lengthMm).toBeCloseTo(1000, 9);
    expect(f.lengthM).toBeCloseTo(1, 12);
    expect(f.massG).toBeCloseTo((v / 1000) * 1.24, 12);
  });
  it('2.85 mm filament: a 1 kg PLA spool is about 126 m (common practice: 1.75 mm spools ≈ 330 m, 2.85 mm ≈ 125 m)', () => {
    const v = 1000 / 1.24 * 1000; // mm³ in 1 kg
    expect(filamentUse(v, 'pla', 2.85).lengthM).toBeGreaterThan(120);
    expect(filamentUse(v, 'pla', 2.85).lengthM).toBeLessThan(130);
    expect(filamentUse(v, 'pla').lengthM).toBeGreaterThan(325);
    expect(filamentUse(v, 'pla').lengthM).toBeLessThan(340);
    expect(() => filamentUse(v, 'pla', 0)).toThrow(/filament\.diameterMm: got 0;/);
  });
});
