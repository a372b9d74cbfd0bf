// Runs `buildAnyFiles` (as `umbrafab build`) off the server's main thread, so the page's views stay
// quick while a full build (pictures, programs, PDF: about a second) runs.
// Messages in: {job, spec}; out: {job, files} or {job, error}.
import { parentPort } from 'node:worker_threads';
import type { DialSpec } from '@umbrafab/geometry';
import { buildAnyFiles } from '../buildFiles.ts';

parentPort?.on('message', async ({ job, spec }: { job: number; spec: DialSpec }) => {
  try {
    const r = await buildAnyFiles(spec);
    parentPort?.postMessage({ job, files: r.files.map((f) => ({ name: f.name, bytes: f.bytes })) });
  } catch (e) {
    const err = e as Error & { field?: string };
    parentPort?.postMessage({ job, error: { name: err.name, message: err.message, field: err.field, stack: err.stack } });
  }
});
