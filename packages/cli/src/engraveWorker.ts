// Worker thread of engraveOnWorker.ts: one build's engraving programs
// (engraveFromSpec: toolpaths, laser fill, ordering, the program texts) off
// the main thread, so they run on the second core while the main thread
// writes the other outputs. Bundled as dist/<hash>/engraveWorker.mjs.
// Messages in: {prepare: spec} as soon as the spec is read, then {spec,
// drawing, face?, only?} (face: one side of a plate engraved on both faces;
// only: just those programs); out:
// {files, report} or {error}.
import { parentPort } from 'node:worker_threads';
import { isSpecError, manifoldEngine, type DialSpec, type PlateDrawing } from '@umbrafab/geometry';
import { engraveFromSpec, engraveProgramsFor, type EngraveFace, type EngraveProgram } from '@umbrafab/fabricate';
import type { WorkerError } from './engraveOnWorker.ts';

parentPort?.on('message', async (m: { prepare: DialSpec } | { spec: DialSpec; drawing: PlateDrawing; face?: EngraveFace; only?: readonly EngraveProgram[] }) => {
  if ('prepare' in m) {
    // A filled laser program needs the mesh kernel (laserFill.ts): load it while the main thread lays out the dial.
    const spec = m.prepare;
    if (spec.engrave.laserFill === 'fill' && engraveProgramsFor(spec.engrave.programs, spec.process.method).includes('laser')) void manifoldEngine().catch(() => undefined);
    return;
  }
  const { spec, drawing, face, only } = m;
  try {
    const r = await engraveFromSpec(spec, drawing, face, only);
    parentPort?.postMessage({ files: r.files, report: r.report });
  } catch (e) {
    const err = e instanceof Error ? e : new Error(String(e));
    const error: WorkerError = { name: err.name, message: err.message, stack: err.stack };
    if (isSpecError(err)) Object.assign(error, { spec: { field: err.field, value: err.value, allowed: err.allowed, problems: err.problems } });
    parentPort?.postMessage({ error });
  }
});
