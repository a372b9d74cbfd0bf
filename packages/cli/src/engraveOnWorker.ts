import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { DialSpec, PlateDrawing, SpecError } from '@umbrafab/geometry';
import type { EngraveFace, EngraveProgram, SpecEngraving } from '@umbrafab/fabricate';

/** What a build needs of its engraving: the program files and report.json's `engraving` section (engraveFromSpec's result). */
export type Engraving = Pick<SpecEngraving, 'files' | 'report'>;

/** One spec's engraving from its plate drawing (engraveFromSpec), for one side of a plate engraved on both faces when `face` is given, of `only` those programs when given. */
export type Engrave = (spec: DialSpec, drawing: PlateDrawing, face?: EngraveFace, only?: readonly EngraveProgram[]) => Promise<Engraving>;

/**
 * A worker thread that engraves one build: `prepare` tells it the spec as
 * soon as it is read (it loads what the engraving will need), `engrave`
 * hands it the spec and drawing (`inThread` is the same work in this
 * thread, for when the worker cannot); `close` stops it when the build needs
 * no engraving or ended before it.
 */
export interface EngraveWorker {
  readonly prepare: (spec: DialSpec) => void;
  readonly engrave: (spec: DialSpec, drawing: PlateDrawing, inThread: Engrave, face?: EngraveFace, only?: readonly EngraveProgram[]) => Promise<Engraving>;
  readonly close: () => void;
}

/** An error as the worker sends it back: a SpecError keeps its field, value and allowed values. */
export interface WorkerError {
  readonly name: string;
  readonly message: string;
  readonly stack?: string;
  readonly spec?: { readonly field: string; readonly value: unknown; readonly allowed: string; readonly problems?: SpecError['problems'] };
}

/**
 * One build's engraving on a worker thread (engraveWorker.ts), for
 * `umbrafab build`: the toolpaths, the laser fill and the program texts are
 * most of a laser build's CPU time and need nothing the other outputs make,
 * so on two cores they run beside them. Start it once the spec is read (a
 * refused spec costs no thread; the worker loads its code while this thread
 * lays out the dial); `engrave` hands it the spec and plate drawing once, and
 * the worker stops once it has answered.
 *
 * The same function runs there on the same plain data (structured clone
 * copies every number exactly), so the files are byte for byte those of an
 * in-thread build. The worker is the bundle's `engraveWorker.mjs` beside
 * this code; run from the TypeScript sources (tests, tsx) there is none, and
 * `undefined` is returned: the build engraves in its own thread. If the
 * worker fails to start or dies, the engraving runs here instead.
 */
export function engraveOnWorker(): EngraveWorker | undefined {
  const file = new URL('./engraveWorker.mjs', import.meta.url);
  if (file.protocol !== 'file:' || !existsSync(fileURLToPath(file))) return undefined;
  let worker: Worker | undefined;
  try {
    worker = new Worker(file);
  } catch {
    return undefined;
  }
  worker.unref();
  const w = worker;
  let used = false;
  let closed = false;
  /** Set once the worker failed to load, died or was stopped: no answer will come from it. */
  let gone = false;
  /** What to do when it is gone with a job in hand. */
  let onGone: (() => void) | undefined;
  const lost = () => {
    gone = true;
    onGone?.();
  };
  // Listening from the start: an 'error' with no listener would throw in this thread.
  w.on('error', lost);
  w.on('exit', lost);
  const engrave: EngraveWorker['engrave'] = (spec, drawing, inThread, face, only) => {
    if (used) throw new Error('engraveOnWorker: the worker serves one build');
    used = true;
    // The worker could not load or died: engrave here (same code, same bytes); closed by the build: nothing is wanted.
    const here = (): Promise<Engraving> => (closed ? Promise.reject(new Error('engraveOnWorker: closed before the engraving was done')) : inThread(spec, drawing, face, only));
    if (gone) return here();
    return new Promise<Engraving>((resolve, reject) => {
      let done = false;
      const finish = (f: () => void) => {
        if (done) return;
        done = true;
        onGone = undefined;
        void w.terminate();
        f();
      };
      onGone = () => finish(() => here().then(resolve, reject));
      w.once('message', (m: Engraving | { error: WorkerError }) => finish(() => ('error' in m ? reject(rebuiltError(m.error)) : resolve(m))));
      w.postMessage({ spec, drawing, face, only });
    });
  };
  const close = () => {
    closed = true;
    void w.terminate();
  };
  const prepare = (spec: DialSpec) => {
    if (!gone) w.postMessage({ prepare: spec });
  };
  return { prepare, engrave, close };
}

/**
 * The worker's error as this thread's, with its message and stack: a
 * SpecError again by its shape (name, field, value, allowed: what
 * isSpecError and the CLI's exit 1 go by; this module imports no package
 * code, so the worker starts before this thread loads the geometry),
 * anything else an Error (a bug, exit 2).
 */
function rebuiltError(e: WorkerError): Error {
  const err = Object.assign(new Error(e.message), { name: e.name, stack: e.stack });
  return e.spec ? Object.assign(err, { field: e.spec.field, value: e.spec.value, allowed: e.spec.allowed }, e.spec.problems ? { problems: e.spec.problems } : {}) : err;
}
