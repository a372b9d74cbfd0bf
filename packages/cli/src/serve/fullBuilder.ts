import { Worker } from 'node:worker_threads';
import type { DialSpec } from '@umbrafab/geometry';
import { buildFiles } from '../buildFiles.ts';
import type { OutputFile } from '../writeFilesAtomic.ts';

/** Runs full builds; `close()` stops its worker. */
export interface FullBuilder {
  /** start the worker now (it takes a few seconds to load the sources), so the first build answers sooner */
  readonly warm: () => void;
  readonly build: (spec: DialSpec) => Promise<readonly OutputFile[]>;
  readonly close: () => Promise<void>;
}

/**
 * Full builds (`buildFiles`) in one worker thread, one job at a time, so the
 * server keeps answering the page meanwhile. The worker loads the TypeScript
 * sources through tsx's loader, as bin/umbrafab.js does. If the worker
 * cannot start, builds run on the main thread instead (same code, same bytes,
 * only slower to answer while building).
 */
export function fullBuilder(): FullBuilder {
  let worker: Worker | undefined;
  let broken = false;
  let next = 0;
  const waiting = new Map<number, { spec: DialSpec; ok: (f: readonly OutputFile[]) => void; fail: (e: unknown) => void }>();

  const start = (): Worker | undefined => {
    if (worker || broken) return worker;
    try {
      const w = new Worker(new URL('./fullBuildWorker.mjs', import.meta.url));
      w.unref();
      w.on('message', (m: { job: number; files?: OutputFile[]; error?: { name: string; message: string; field?: string; stack?: string } }) => {
        const p = waiting.get(m.job);
        if (!p) return;
        waiting.delete(m.job);
        if (m.files) p.ok(m.files.map((f) => ({ name: f.name, bytes: new Uint8Array(f.bytes) })));
        else p.fail(Object.assign(new Error(m.error?.message), { name: m.error?.name ?? 'Error', ...(m.error?.field !== undefined ? { field: m.error.field } : {}), stack: m.error?.stack }));
      });
      w.on('error', () => {
        // The worker could not load or crashed: finish its jobs here, and run later ones here too.
        broken = true;
        worker = undefined;
        for (const p of waiting.values()) buildFiles(p.spec).then((r) => p.ok(r.files), p.fail);
        waiting.clear();
      });
      worker = w;
    } catch {
      broken = true;
    }
    return worker;
  };

  return {
    warm: () => void start(),
    build: (spec) => {
      const w = start();
      if (!w) return buildFiles(spec).then((r) => r.files);
      const job = ++next;
      return new Promise((ok, fail) => {
        waiting.set(job, { spec, ok, fail });
        w.postMessage({ job, spec });
      });
    },
    close: async () => {
      await worker?.terminate();
      worker = undefined;
    },
  };
}
