import { cutFromSpec, type CuttingReport } from '@umbrafab/fabricate';
import { utf8, type Producer } from './outputTypes.ts';

/** The report.json section of the router cutting program (only when cut.ngc is written). */
export interface CutSections {
  readonly cutting?: CuttingReport;
}

/**
 * The router cutting program of `umbrafab build` (cut.ngc: holes, slots, then
 * the outer profiles of the plate and the sheet gnomon, cut through with the
 * process.kerf end mill; process.method router with engrave.cut.write) and
 * the report's `cutting` section.
 */
export const cutOutputs: Producer<CutSections> = async ({ spec, layout, drawing }) => {
  const r = await cutFromSpec(spec, layout, drawing);
  if (r === null) return { files: [], report: {} };
  return { files: [{ name: r.file.name, bytes: utf8(r.file.text) }], report: { cutting: r.report } };
};
