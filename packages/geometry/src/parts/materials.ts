/**
 * Densities of the materials umbrafab makes parts from, for part masses,
 * filament amounts and the weight to lift and ship.
 *
 * Each entry gives a typical value and the spread met in practice (alloys,
 * species, brands differ), with where the typical value comes from. Values
 * marked "memory" were written from memory (DESIGN.md); "common practice"
 * marks a trade figure with no single source. A mass computed from these is
 * an estimate good to the spread shown, not a weighing.
 */

/** Filaments a printed part may be made of (the plate's own material when it is one of them). */
export const FILAMENTS = ['pla', 'petg', 'asa'] as const;
export type Filament = (typeof FILAMENTS)[number];

/** Every material with a density here: the plate materials of the spec plus the filaments. */
export const DENSITY_MATERIALS = ['aluminium', 'brass', 'stainless', 'steel', 'acrylic', 'hardwood', 'plywood', 'slate', 'pla', 'petg', 'asa'] as const;
export type DensityMaterial = (typeof DENSITY_MATERIALS)[number];

/** One row of the density table. */
export interface MaterialDensity {
  readonly material: DensityMaterial;
  /** typical density, g/cm³ (= t/m³; 1 g/cm³ = 0.001 g/mm³) */
  readonly densityGPerCm3: number;
  /** the spread met in practice, g/cm³ */
  readonly rangeGPerCm3: readonly [number, number];
  /** grade or kind the typical value is for */
  readonly grade: string;
  /** where the typical value comes from */
  readonly source: string;
}

/**
 * The density table, one row per material (g/cm³). The plate materials
 * match the spec's `plate.material` names.
 */
export const MATERIAL_DENSITIES: Readonly<Record<DensityMaterial, MaterialDensity>> = {
  aluminium: { material: 'aluminium', densityGPerCm3: 2.7, rangeGPerCm3: [2.66, 2.8], grade: 'wrought alloy 5754 / 6061 sheet', source: 'typical handbook value for wrought aluminium alloys, 2.70 g/cm³ (memory)' },
  brass: { material: 'brass', densityGPerCm3: 8.47, rangeGPerCm3: [8.4, 8.73], grade: 'CuZn37 (CW508L) sheet', source: 'typical supplier data sheet value for CuZn37, 8.44–8.5 g/cm³ (memory)' },
  stainless: { material: 'stainless', densityGPerCm3: 7.9, rangeGPerCm3: [7.7, 8.0], grade: '1.4301 (304) sheet', source: 'EN 10088-1 physical properties table, 7.9 g/cm³ for 1.4301 (memory)' },
  steel: { material: 'steel', densityGPerCm3: 7.85, rangeGPerCm3: [7.8, 7.87], grade: 'structural / mild steel sheet', source: 'EN 1993-1-1 §3.2.6, 7850 kg/m³ for structural steel (memory)' },
  acrylic: { material: 'acrylic', densityGPerCm3: 1.19, rangeGPerCm3: [1.17, 1.2], grade: 'cast PMMA sheet', source: 'typical sheet maker data sheet value for cast PMMA, 1.19 g/cm³ (memory)' },
  hardwood: { material: 'hardwood', densityGPerCm3: 0.7, rangeGPerCm3: [0.55, 0.9], grade: 'oak, ash or beech, seasoned (about 12 % moisture)', source: 'common practice (species and moisture vary widely)' },
  plywood: { material: 'plywood', densityGPerCm3: 0.68, rangeGPerCm3: [0.5, 0.75], grade: 'birch plywood, exterior grade', source: 'common practice (birch plywood 650–700 kg/m³; poplar and pine lighter)' },
  slate: { material: 'slate', densityGPerCm3: 2.8, rangeGPerCm3: [2.7, 2.9], grade: 'roofing / engraving slate', source: 'common practice' },
  pla: { material: 'pla', densityGPerCm3: 1.24, rangeGPerCm3: [1.21, 1.25], grade: 'PLA filament', source: 'typical filament data sheet value, 1.24 g/cm³ (memory)' },
  petg: { material: 'petg', densityGPerCm3: 1.27, rangeGPerCm3: [1.23, 1.29], grade: 'PETG filament', source: 'typical filament data sheet value, 1.27 g/cm³ (memory)' },
  asa: { material: 'asa', densityGPerCm3: 1.07, rangeGPerCm3: [1.05, 1.1], grade: 'ASA filament', source: 'typical filament data sheet value, 1.07 g/cm³ (memory)' },
};

/**
 * The density row of a material, or an Error naming the material and the
 * allowed names (a bug, since the spec only admits names from the table).
 *
 * @example materialDensity('aluminium').densityGPerCm3 // 2.7
 */
export function materialDensity(material: string): MaterialDensity {
  const row = (MATERIAL_DENSITIES as Readonly<Record<string, MaterialDensity>>)[material];
  if (row === undefined || !Object.hasOwn(MATERIAL_DENSITIES, material)) {
    throw new Error(`material = ${JSON.stringify(material)} is not allowed: it must be one of ${DENSITY_MATERIALS.join(', ')}`);
  }
  return row;
}

/** True for the filament names (a printed part's material). */
export function isFilament(material: string): material is Filament {
  return (FILAMENTS as readonly string[]).includes(material);
}
