import { materialDensity, totalMass, type PartMass, type PartsPlan } from '@umbrafab/geometry';
import type { AlternativePart, FilamentRow } from './partStep.ts';
import type { WeightsSection } from './partsSections.ts';

/**
 * Weights and amounts: every part's mass from its material's density (the
 * densities used, with their sources), the alternatives kept out of the
 * total, filament for the printed ones, and the total to lift and ship.
 * @example partWeights(plan, masses, {}, amounts).totalMassKg
 */
export function partWeights(plan: PartsPlan, masses: readonly PartMass[], alternatives: Readonly<Record<string, AlternativePart>>, amounts: Readonly<Record<string, FilamentRow>>): WeightsSection {
  const total = totalMass(masses);
  return {
    basis: 'volume x density; printed parts as modelled (walls, ribs and plate solid at 100 % infill): an upper bound, sparse infill in thick walls prints lighter',
    densities: Object.fromEntries([...new Set(masses.map((m) => m.material))].map((m) => [m, materialDensity(m)])),
    parts: masses.map((m) => ({ ...m, massKg: m.massG / 1000 })),
    ...(Object.keys(alternatives).length > 0 ? { alternatives } : {}),
    filament: { material: plan.print.filament, diameterMm: plan.print.filamentDiameterMm, parts: amounts },
    totalMassG: total.massG,
    totalMassKg: total.massKg,
  };
}
