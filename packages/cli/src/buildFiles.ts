import { faceOrientationOf, layoutDial, plateDrawing, timeFaceExtras, type DialLayout, type DialSpec, type LayoutOptions } from '@umbrafab/geometry';
import { buildPlanarFiles, type PlanarBuildResult } from './buildPlanarFiles.ts';
import { toReportJson } from '@umbrafab/fabricate';
import { PRODUCERS, START_ORDER, START_ORDER_ENGRAVING_ON_WORKER } from './outputs/index.ts';
import { utf8, type BuildContext, type ProducerResult } from './outputs/outputTypes.ts';
import type { PolarReport } from './outputs/report.ts';
import type { EngraveWorker } from './engraveOnWorker.ts';
import type { OutputFile } from './writeFilesAtomic.ts';

/** Everything one build produces, in memory (no I/O): the CLI writes it, other front ends serve it. */
export interface BuildResult {
  readonly layout: DialLayout;
  readonly files: readonly OutputFile[];
  readonly report: PolarReport;
  /** the layout's notes, then the producers' (also in report.json) */
  readonly notes: readonly string[];
}

export const GENERATOR = 'umbrafab 0.1.0';

/**
 * Run geometry then every producer for one validated spec, and add
 * report.json. The same spec always gives byte-identical files (no clock, no
 * randomness, fixed rounding).
 */
export async function buildFiles(spec: DialSpec, ctx: BuildContext = buildContext(spec)): Promise<BuildResult> {
  const { layout } = ctx;
  const files: OutputFile[] = [];
  const sections: Partial<PolarReport> = {};
  const notes: string[] = [...layout.notes];
  // Producers whose work runs mostly on worker threads (the engraving on
  // ctx.engraveWorker, PNG rendering) start first, so that their threads
  // overlap the others' work on this one; the
  // results are still taken in PRODUCERS order, and the first failure in that
  // order is the one reported, so output and messages stay deterministic.
  const started: Promise<ProducerResult>[] = new Array(PRODUCERS.length);
  for (const i of ctx.engraveWorker ? START_ORDER_ENGRAVING_ON_WORKER : START_ORDER) {
    try {
      started[i] = Promise.resolve(PRODUCERS[i](ctx));
    } catch (e) {
      started[i] = Promise.reject(e);
    }
  }
  const settled = await Promise.allSettled(started);
  for (const s of settled) if (s.status === 'rejected') throw s.reason;
  for (const s of settled) {
    const r = (s as PromiseFulfilledResult<ProducerResult>).value;
    files.push(...r.files);
    notes.push(...(r.notes ?? []));
    const twice = Object.keys(r.report).find((key) => key in sections);
    if (twice) throw new Error(`two producers both write the report section ${twice}`);
    Object.assign(sections, r.report);
  }
  const names = [...files.map((f) => f.name), 'report.json'];
  const dup = names.find((n, i) => names.indexOf(n) !== i);
  if (dup) throw new Error(`two producers both write ${dup}`);
  // Each producer's sections are typed beside it; together they make the
  // Report (test/reportSchema.test.ts holds every build to its schema).
  const report = { generator: GENERATOR, spec, ...sections, notes, files: names } as PolarReport;
  files.push({ name: 'report.json', bytes: utf8(toReportJson(report)) });
  return { layout, files, report, notes };
}

/**
 * `umbrafab build` for any face type: the polar plate through the producers
 * (`buildFiles`), a horizontal, wall, meridian or equatorial face through
 * `buildPlanarFiles` (spec `face.type`). `engraveWorker` (engraveOnWorker)
 * makes the engraving programs on a worker thread; the files are the same.
 */
export async function buildAnyFiles(spec: DialSpec, engraveWorker?: EngraveWorker): Promise<BuildResult | PlanarBuildResult> {
  return faceOrientationOf(spec) ? buildPlanarFiles(spec, GENERATOR, engraveWorker) : buildFiles(spec, { ...buildContext(spec), engraveWorker });
}

/** The geometry every producer reads, computed once per spec (the local page draws its views from it before the full build). */
export function buildContext(spec: DialSpec, options: LayoutOptions = {}): BuildContext {
  const layout = layoutDial(spec, options);
  const extras = timeFaceExtras(layout); // date lines, mean-time curves, engraved equation of time
  const drawing = plateDrawing(layout, extras.lines, extras.text);
  return { spec, layout, drawing };
}
