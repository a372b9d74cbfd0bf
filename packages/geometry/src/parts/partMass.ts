import { materialDensity } from './materials.ts';
import { assertNonNegative } from '../guards.ts';

/** A part's mass from its volume and material. */
export interface PartMass {
  readonly part: string;
  readonly material: string;
  readonly volumeMm3: number;
  readonly densityGPerCm3: number;
  /** volume × density, grams */
  readonly massG: number;
}

/** Cubic millimetres per cubic centimetre. */
const MM3_PER_CM3 = 1000;

/**
 * Mass of a part: volume × density (the density table of materials.ts);
 * mm³ / 1000 = cm³, × g/cm³ = g. For a printed part the volume is the
 * modelled solid (its walls and ribs as drawn, printed solid); a slicer's
 * sparse infill inside thick walls makes the real part lighter.
 *
 * @param part a name for reports, e.g. 'plate'
 * @param volumeMm3 enclosed volume, mm³ (at least 0)
 * @param material a name from DENSITY_MATERIALS
 * @example partMass('plate', 1e5, 'aluminium').massG // 270
 */
export function partMass(part: string, volumeMm3: number, material: string): PartMass {
  assertNonNegative(`${part}.volumeMm3`, volumeMm3);
  const { densityGPerCm3 } = materialDensity(material);
  return { part, material, volumeMm3, densityGPerCm3, massG: (volumeMm3 / MM3_PER_CM3) * densityGPerCm3 };
}

/** The sum of several parts' masses, grams and kilograms. */
export function totalMass(parts: readonly PartMass[]): { readonly massG: number; readonly massKg: number } {
  const massG = parts.reduce((s, p) => s + p.massG, 0);
  return { massG, massKg: massG / 1000 };
}
