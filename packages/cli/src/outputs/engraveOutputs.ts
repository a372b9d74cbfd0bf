import { engraveProgramsFor, engravingPlanKey, planEngraving, writeEngraving, type EngravingReport } from '@umbrafab/fabricate';
import { utf8, type Producer } from './outputTypes.ts';
import { perDrawing } from './perDrawing.ts';
import { engraveBeside } from '../engraveBeside.ts';
import type { Engrave } from '../engraveOnWorker.ts';

/**
 * The engraving programs of `umbrafab build` (engrave.ngc for a router or
 * mill, engrave-laser.gcode for a laser engraver, as spec `engrave.programs`
 * chooses) and the report's `engraving` section (depths, passes, time
 * estimate, rapid travel before and after ordering with its lower bound).
 * The toolpaths are planned once per drawing and engraving settings
 * (perDrawing); each spec writes only its own header over them. With the
 * build's engraving worker (ctx.engraveWorker), it runs there, or with both
 * programs the laser's there and the router's here (engraveBeside).
 */
/** The report.json section of the engraving programs. */
export interface EngraveSections {
  readonly engraving: EngravingReport;
}

export const engraveOutputs: Producer<EngraveSections> = async ({ spec, drawing, engraveWorker }) => {
  const inThread: Engrave = async (_spec, _drawing, _face, only) =>
    writeEngraving(await perDrawing(drawing, `engrave ${engravingPlanKey(spec)}${only ? ` of ${only.join(' ')}` : ''}`, () => planEngraving(spec, drawing, only)), spec);
  const onWorker = engraveWorker && engraveProgramsFor(spec.engrave.programs, spec.process.method).length > 0;
  if (!onWorker) engraveWorker?.close();
  const r = onWorker ? await engraveBeside(engraveWorker, spec, drawing, inThread) : await inThread(spec, drawing);
  return {
    files: r.files.map((f) => ({ name: f.name, bytes: utf8(f.text) })),
    report: { engraving: r.report },
  };
};
