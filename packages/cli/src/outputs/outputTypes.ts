import type { DialLayout, DialSpec, PlateDrawing } from '@umbrafab/geometry';
import type { OutputFile } from '../writeFilesAtomic.ts';

/** What every producer can read: the spec, its layout and the plate drawing (computed once). */
export interface BuildContext {
  readonly spec: DialSpec;
  readonly layout: DialLayout;
  readonly drawing: PlateDrawing;
}

/** What a producer adds: files, and top-level sections merged into report.json. */
export interface ProducerResult {
  readonly files: readonly OutputFile[];
  readonly report: Readonly<Record<string, unknown>>;
  /** console lines for the user (a part split to fit the bed, …), also listed in report.json's notes */
  readonly notes?: readonly string[];
}

/**
 * One group of outputs (the plate, the printed parts, the toolpaths, …), in
 * its own file under outputs/. Pure: no file system, no clock. May be async
 * (e.g. a WASM mesh engine that loads once).
 */
export type Producer = (ctx: BuildContext) => ProducerResult | Promise<ProducerResult>;

export const utf8 = (s: string): Uint8Array => new TextEncoder().encode(s);
