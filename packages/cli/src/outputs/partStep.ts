import { filamentUse, partMass, type FilamentUse, type PartMass, type PartsPlan } from '@umbrafab/geometry';
import type { OutputFile } from '../writeFilesAtomic.ts';
import type { BuildContext } from './outputTypes.ts';

/** What every part step reads: the build's context, the parts plan and the wording of the site and the elevated pole. */
export interface PartsContext extends BuildContext {
  readonly plan: PartsPlan;
  /** the latitude as the STL headers write it, e.g. '51.48 deg N' */
  readonly latText: string;
  /** 'true north' or 'true south': the elevated pole */
  readonly pole: string;
}

/** A printed part's filament row of report.json: the amount and the file or files it prints. */
export type FilamentRow = FilamentUse & { readonly file: string | readonly string[] };

/** A part made instead of others (body.stl for plate and gnomon): its mass, kept out of the total. */
export type AlternativePart = PartMass & { readonly massKg: number; readonly replaces: readonly string[] };

/**
 * What one part's step adds to the parts outputs: its files and report
 * figures, its masses in the total, its filament rows, and notes; the
 * producer joins the steps in file order.
 */
export interface PartStep<R> {
  readonly files: readonly OutputFile[];
  readonly report: R;
  readonly masses: readonly PartMass[];
  readonly filament: Readonly<Record<string, FilamentRow>>;
  readonly notes: readonly string[];
}

/**
 * A printed part's mass (from the plan's filament density) and its filament row.
 * @example printedAmounts(plan, 'wedge', 120_000, 'wedge.stl').filament.wedge.lengthM
 */
export function printedAmounts(plan: PartsPlan, part: string, volumeMm3: number, file: string | readonly string[]): Pick<PartStep<unknown>, 'masses' | 'filament'> {
  const filament = plan.print.filament;
  return { masses: [partMass(part, volumeMm3, filament)], filament: { [part]: { file, ...filamentUse(volumeMm3, filament, plan.print.filamentDiameterMm) } } };
}
