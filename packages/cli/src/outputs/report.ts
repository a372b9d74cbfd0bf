import type { DialSpec } from '@umbrafab/geometry';
import type { CutSections } from './cutOutputs.ts';
import type { EngraveSections } from './engraveOutputs.ts';
import type { PartsSections } from './partsSections.ts';
import type { PicturesSections } from './picturesOutputs.ts';
import type { PlanarReport } from './planarReport.ts';
import type { PlateSections } from './plateOutputs.ts';
import type { StandSections } from './standOutputs.ts';
import type { SheetSections } from './sheetOutputs.ts';
import type { TimeSections } from './timeOutputs.ts';

/**
 * report.json, the contract other tools read (docs/design.md §6): the polar
 * plate's report, or a horizontal, wall, meridian or equatorial face's
 * (`PlanarReport`, told apart by its `face` section). docs/report.schema.json
 * is generated from this type (`pnpm report-schema`) and checked against
 * every build in test/reportSchema.test.ts.
 */
export type Report = PolarReport | PlanarReport;

/**
 * The polar plate's report.json (buildFiles): the
 * normalised spec, then each producer's own sections (declared beside the
 * producer in outputs/, one line here per producer), the layout's notes and
 * the list of files written. Lengths in mm, angles in degrees where a name
 * says `Deg`, times as the field says.
 */
export type PolarReport = ReportHead & PlateSections & PartsSections & StandSections & SheetSections & EngraveSections & CutSections & TimeSections & PicturesSections & ReportTail;

/** What every report starts with. */
export interface ReportHead {
  /** the program and version that wrote the files */
  readonly generator: string;
  /** the spec as normalised: every field, defaults filled in */
  readonly spec: DialSpec;
}

/** What every report ends with. */
export interface ReportTail {
  /** what the layout changed or noticed (shrunk numerals, clamped ranges, …), in words */
  readonly notes: readonly string[];
  /** every file of the build, report.json last */
  readonly files: readonly string[];
}

