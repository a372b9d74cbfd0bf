import { materialDensity } from './materials.ts';
import { assertNonNegative, assertPositive } from '../guards.ts';

/** Filament diameter most printers take, mm (1.75 mm; 2.85 mm is the other size sold — common practice). */
export const FILAMENT_DIAMETER_MM = 1.75;

/** Filament a printed part needs. */
export interface FilamentUse {
  readonly material: string;
  readonly diameterMm: number;
  /** length of filament holding the part's volume, mm */
  readonly lengthMm: number;
  /** the same in metres (spools are sold by mass, printers report metres) */
  readonly lengthM: number;
  /** volume × density, grams */
  readonly massG: number;
}

/**
 * Filament for a part of the given volume: length = V / (π·(d/2)²), the
 * volume of a round strand of diameter d (common practice: the figure
 * slicers report), mass = V × density. The volume is the modelled solid,
 * so this is the amount at 100 % infill of what is drawn; purge lines,
 * brims and supports come on top.
 *
 * @param volumeMm3 part volume, mm³
 * @param material a filament name (any name of the density table is accepted)
 * @param diameterMm filament diameter, mm (default 1.75)
 * @example filamentUse(2405.28, 'pla').lengthMm // ≈ 1000
 */
export function filamentUse(volumeMm3: number, material: string, diameterMm: number = FILAMENT_DIAMETER_MM): FilamentUse {
  assertNonNegative('filament.volumeMm3', volumeMm3);
  assertPositive('filament.diameterMm', diameterMm);
  const area = Math.PI * (diameterMm / 2) ** 2;
  const lengthMm = volumeMm3 / area;
  const { densityGPerCm3 } = materialDensity(material);
  return { material, diameterMm, lengthMm, lengthM: lengthMm / 1000, massG: (volumeMm3 / 1000) * densityGPerCm3 };
}
