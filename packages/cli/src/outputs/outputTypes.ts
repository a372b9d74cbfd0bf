import type { DialLayout, DialSpec, PlateDrawing } from '@umbrafab/geometry';
import type { EngraveWorker } from '../engraveOnWorker.ts';
import type { OutputFile } from '../writeFilesAtomic.ts';

/** What every producer can read: the spec, its layout and the plate drawing (computed once). */
export interface BuildContext {
  readonly spec: DialSpec;
  readonly layout: DialLayout;
  readonly drawing: PlateDrawing;
  /** `umbrafab build`'s worker thread for the engraving programs (engraveOnWorker); without it they are made in this thread */
  readonly engraveWorker?: EngraveWorker;
}

/**
 * What a producer adds: files, and its own top-level sections of report.json
 * (`R`, declared beside the producer; no two producers share a section).
 */
export interface ProducerResult<R extends object = object> {
  readonly files: readonly OutputFile[];
  readonly report: R;
  /** notes for the user: report.json's notes (after the layout's) and the console */
  readonly notes?: readonly string[];
}

/**
 * One group of outputs (the plate, the printed parts, the toolpaths, …), in
 * its own file under outputs/, with the type `R` of the report sections it
 * writes. Pure: no file system, no clock. May be async (e.g. a WASM mesh
 * engine that loads once).
 */
export type Producer<R extends object = object> = (ctx: BuildContext) => ProducerResult<R> | Promise<ProducerResult<R>>;

export const utf8 = (s: string): Uint8Array => new TextEncoder().encode(s);
