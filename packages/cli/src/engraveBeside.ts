import { engraveProgramsFor, joinEngravings, type EngraveFace } from '@umbrafab/fabricate';
import type { DialSpec, PlateDrawing } from '@umbrafab/geometry';
import type { Engrave, EngraveWorker, Engraving } from './engraveOnWorker.ts';

/**
 * One build's engraving with its worker thread (engraveOnWorker). With both
 * programs, the laser's (its fill is most of the engraving's work) runs on
 * the worker and the router's in this thread meanwhile, once the build's
 * other outputs have started: on two cores the threads then end closer
 * together than with both programs on the worker. With one program, all of
 * it runs on the worker. The files and report are those of `inThread` for
 * the whole spec, byte for byte (joinEngravings), and a refusal of the
 * router's program is the one reported, as in one thread (it is planned
 * first there).
 */
export async function engraveBeside(worker: EngraveWorker, spec: DialSpec, drawing: PlateDrawing, inThread: Engrave, face?: EngraveFace): Promise<Engraving> {
  const programs = engraveProgramsFor(spec.engrave.programs, spec.process.method);
  if (!(programs.includes('ngc') && programs.includes('laser'))) return worker.engrave(spec, drawing, inThread, face);
  const laser = worker.engrave(spec, drawing, inThread, face, ['laser']);
  laser.catch(() => undefined);
  // The build's other producers start first (the PNG renderer's threads among them).
  await new Promise((ready) => setImmediate(ready));
  const ngc = await inThread(spec, drawing, face, ['ngc']);
  return joinEngravings([ngc, await laser], programs);
}
