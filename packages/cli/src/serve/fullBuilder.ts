import { Worker } from 'node:worker_threads';
import type { DialSpec } from '@umbrafab/geometry';
import { buildAnyFiles } from '../buildFiles.ts';
import type { OutputFile } from '../writeFilesAtomic.ts';

/** How long the build worker stays up with nothing to do, ms: then it stops and its memory goes back to the system. */
export const WORKER_IDLE_MS = 15_000;

/** Runs full builds; `close()` stops its worker. */
export interface FullBuilder {
  /** is the worker thread up now? (it stops after WORKER_IDLE_MS without a job) */
  readonly running: () => boolean;
  /** start the worker now (it takes a few seconds to load the sources), so the first build answers sooner */
  readonly warm: () => void;
  readonly build: (spec: DialSpec) => Promise<readonly OutputFile[]>;
  readonly close: () => Promise<void>;
}

/**
 * Full builds (`buildAnyFiles`, as `umbrafab build`: the polar plate or any other face) in one worker thread, one job at a time, so the
 * server keeps answering the page meanwhile. The worker loads the TypeScript
 * sources through tsx's loader, as bin/umbrafab.js does. If the worker
 * cannot start, builds run on the main thread instead (same code, same bytes,
 * only slower to answer while building).
 */
export function fullBuilder(options: { readonly idleMs?: number } = {}): FullBuilder {
  const idleMs = options.idleMs ?? WORKER_IDLE_MS;
  let worker: Worker | undefined;
  let broken = false;
  let next = 0;
  let idle: NodeJS.Timeout | undefined;
  const waiting = new Map<number, { spec: DialSpec; ok: (f: readonly OutputFile[]) => void; fail: (e: unknown) => void }>();
  // With no job left, stop the worker after a while: a large build's heap and pixel buffers leave with it.
  const idleLater = () => {
    clearTimeout(idle);
    if (waiting.size > 0 || !worker) return;
    idle = setTimeout(() => {
      if (waiting.size > 0 || !worker) return;
      const w = worker;
      worker = undefined;
      void w.terminate();
    }, idleMs);
    idle.unref();
  };

  const start = (): Worker | undefined => {
    if (worker || broken) return worker;
    try {
      const w = new Worker(new URL('./fullBuildWorker.mjs', import.meta.url));
      w.unref();
      w.on('message', (m: { job: number; files?: OutputFile[]; error?: { name: string; message: string; field?: string; stack?: string } }) => {
        const p = waiting.get(m.job);
        if (!p) return;
        waiting.delete(m.job);
        idleLater();
        if (m.files) p.ok(m.files.map((f) => ({ name: f.name, bytes: new Uint8Array(f.bytes) })));
        else p.fail(Object.assign(new Error(m.error?.message), { name: m.error?.name ?? 'Error', ...(m.error?.field !== undefined ? { field: m.error.field } : {}), stack: m.error?.stack }));
      });
      w.on('error', () => {
        // The worker could not load or crashed: finish its jobs here, and run later ones here too.
        broken = true;
        worker = undefined;
        for (const p of waiting.values()) buildAnyFiles(p.spec).then((r) => p.ok(r.files), p.fail);
        waiting.clear();
      });
      worker = w;
    } catch {
      broken = true;
    }
    return worker;
  };

  return {
    running: () => worker !== undefined,
    warm: () => {
      start();
      idleLater();
    },
    build: (spec) => {
      clearTimeout(idle);
      const w = start();
      if (!w) return buildAnyFiles(spec).then((r) => r.files);
      const job = ++next;
      return new Promise((ok, fail) => {
        waiting.set(job, { spec, ok, fail });
        w.postMessage({ job, spec });
      });
    },
    close: async () => {
      clearTimeout(idle);
      await worker?.terminate();
      worker = undefined;
    },
  };
}
