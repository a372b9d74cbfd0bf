import { readFileSync } from 'node:fs';
import type { DialLayout, DialSpec } from '@umbrafab/geometry';
import { utf8 } from '../outputs/outputTypes.ts';
import type { OutputFile } from '../writeFilesAtomic.ts';
import { specBaseName } from './build.ts';
import { UsageError, type CommandModule } from './commandTypes.ts';

/** Show a progress bar from this many latitudes on ("long runs"). */
const PROGRESS_FROM = 4;

/** One latitude of a batch, as the summary and batch.json give it. */
export interface BatchRow {
  readonly latitudeDeg: number;
  readonly wedgeAngleDeg: number;
  readonly wedgeFile: string;
  readonly plateFile: string;
  /** rise of the plate's pole-ward edge over its lower edge, mm: length × sin(tilt) (docs/design.md §4) */
  readonly riseMm: number;
}

export const batchCommand: CommandModule = {
  command: 'batch <spec>',
  describe: 'write one plate and a latitude wedge for each of several latitudes (the plate once when it is the same for all)',
  builder: (y) =>
    y
      .positional('spec', { type: 'string', demandOption: true, describe: 'dial spec file (.yaml or .json); its site.latitude is replaced by each listed latitude' })
      .option('latitudes', { type: 'string', describe: 'latitudes in degrees, north positive, comma separated, e.g. 30,35,40' })
      .option('latitudes-file', { type: 'string', describe: 'a text file of latitudes, one or more per line (commas or spaces; # starts a comment)' })
      .option('out', { type: 'string', alias: 'o', describe: 'output folder (default: out/<spec name>-batch)' })
      .option('force', { type: 'boolean', default: false, describe: 'replace files that already exist in the output folder' })
      .option('progress', { type: 'boolean', default: true, describe: `show a progress bar on stderr (from ${PROGRESS_FROM} latitudes on)` }),
  run: async (args, io) => {
    // Loaded only when the command runs, so `--help`, `--version` and `init` stay quick.
    const { WEDGE_MAX_TILT_DEG, buildContext, cliProgress, GENERATOR, partsOutputs, plateOutputs, readSpecFile, toReportJson, writeFilesAtomic } = await import('./batchDeps.ts');
    const latitudes = batchLatitudes(args.latitudes, args['latitudes-file'], WEDGE_MAX_TILT_DEG);
    const base = readSpecFile(args.spec);
    const outDir: string = args.out ?? `out/${specBaseName(args.spec)}-batch`;

    const bar =
      args.progress && latitudes.length >= PROGRESS_FROM
        ? new cliProgress.SingleBar(
            { format: 'umbrafab batch [{bar}] {value}/{total} latitudes, now {lat}', noTTYOutput: true, notTTYSchedule: 1000, stream: process.stderr, hideCursor: true },
            cliProgress.Presets.shades_classic,
          )
        : null;
    bar?.start(latitudes.length, 0, { lat: '' });
    const builds: { lat: number; spec: DialSpec; layout: DialLayout; plate: readonly OutputFile[]; parts: readonly OutputFile[]; wedgeAngleDeg: number }[] = [];
    try {
      for (const lat of latitudes) {
        const spec: DialSpec = { ...base, site: { ...base.site, latitude: lat } };
        const ctx = buildContext(spec);
        const { layout } = ctx;
        const plate = (await plateOutputs(ctx)).files;
        const parts = await partsOutputs(ctx);
        builds.push({ lat, spec, layout, plate, parts: parts.files, wedgeAngleDeg: parts.report.wedge.angleDeg });
        bar?.increment(1, { lat: latitudeTag(lat) });
      }
    } finally {
      bar?.stop();
    }

    // One plate when every latitude gives the same face (hour lines, numerals, plate, gnomon).
    const samePlate = builds.every((b) => faceKey(b.layout) === faceKey(builds[0].layout));
    const files: OutputFile[] = [];
    const rows: BatchRow[] = [];
    const pick = (list: readonly OutputFile[], name: string) => list.find((f) => f.name === name);
    if (samePlate) {
      for (const f of builds[0].plate) files.push(f);
    }
    const sharedParts = new Map<string, Uint8Array>();
    for (const b of builds) {
      const tag = latitudeTag(b.lat);
      if (!samePlate) for (const f of b.plate) files.push({ name: f.name.replace(/\.(\w+)$/, `-${tag}.$1`), bytes: f.bytes });
      const wedge = pick(b.parts, 'wedge.stl');
      if (!wedge) throw new UsageError(`parts.write: the spec writes no wedge.stl; allowed: "auto" or a list that includes "wedge.stl" for umbrafab batch`);
      const wedgeFile = `wedge-${tag}.stl`;
      files.push({ name: wedgeFile, bytes: wedge.bytes });
      for (const f of b.parts) {
        if (f.name === 'wedge.stl' || f.name === 'body.stl') continue;
        const prev = sharedParts.get(f.name);
        if (!prev) sharedParts.set(f.name, f.bytes);
        else if (!sameBytes(prev, f.bytes)) throw new Error(`batch: ${f.name} differs between latitudes; it should not depend on the latitude`);
      }
      const p = b.layout.plate;
      rows.push({
        latitudeDeg: b.lat,
        wedgeAngleDeg: round(b.wedgeAngleDeg, 3),
        wedgeFile,
        plateFile: samePlate ? plateDxfName(b.plate) : plateDxfName(b.plate).replace(/\.dxf$/, `-${tag}.dxf`),
        riseMm: round(p.lengthMm * Math.sin((Math.abs(b.lat) * Math.PI) / 180), 1),
      });
    }
    for (const [name, bytes] of sharedParts) files.push({ name, bytes });
    const summary = {
      generator: GENERATOR,
      spec: base,
      plate: samePlate ? { shared: true, file: plateDxfName(builds[0].plate), note: `one plate serves every latitude: its lines do not depend on the latitude; the title block names the spec's first listed latitude (${builds[0].lat}°)` } : { shared: false, note: 'one plate per latitude (the faces differ, e.g. across hemispheres)' },
      latitudes: rows,
      files: [...files.map((f) => f.name), 'batch.json'],
    };
    files.push({ name: 'batch.json', bytes: utf8(toReportJson(summary)) });
    writeFilesAtomic(outDir, files, args.force);

    io.out(`umbrafab: batch of ${rows.length} latitudes written to ${outDir}: ${samePlate ? `one shared ${plateDxfName(builds[0].plate)}` : `${rows.length} plates`}, ${rows.length} wedges`);
    io.out(formatTable(['latitude', 'wedge angle', 'rise over plate', 'wedge file', 'plate file'], rows.map((r) => [`${r.latitudeDeg}°`, `${r.wedgeAngleDeg.toFixed(2)}°`, `${r.riseMm.toFixed(1)} mm`, r.wedgeFile, r.plateFile])));
    if (samePlate) io.out(`note: ${summary.plate.note}`);
    return 0;
  },
};

/**
 * The latitudes of a batch from --latitudes and/or --latitudes-file: numbers
 * from −maxDeg to maxDeg (the steepest printable wedge, WEDGE_MAX_TILT_DEG
 * = 89°), no repeats, at least one.
 */
export function batchLatitudes(list: unknown, file: unknown, maxDeg: number): number[] {
  const MAX_LATITUDE_DEG = maxDeg;
  const items: { text: string; where: string }[] = [];
  if (list === undefined && file === undefined) throw new UsageError('--latitudes: missing; allowed: --latitudes 30,35,40 or --latitudes-file <file>');
  if (list !== undefined) {
    String(list)
      .split(/[\s,;]+/)
      .filter((s) => s !== '')
      .forEach((text, i) => items.push({ text, where: `--latitudes item ${i + 1}` }));
  }
  if (file !== undefined) {
    let body: string;
    try {
      body = readFileSync(String(file), 'utf8');
    } catch (e) {
      throw new UsageError(`--latitudes-file: cannot read ${String(file)} (${(e as NodeJS.ErrnoException).code ?? (e as Error).message}); allowed: a readable text file of latitudes`);
    }
    body.split(/\r?\n/).forEach((line, n) => {
      line
        .replace(/#.*/, '')
        .split(/[\s,;]+/)
        .filter((s) => s !== '')
        .forEach((text) => items.push({ text, where: `--latitudes-file line ${n + 1}` }));
    });
  }
  if (items.length === 0) throw new UsageError('--latitudes: no latitude given; allowed: numbers from -89 to 89 degrees, e.g. 30,35,40');
  const seen = new Set<number>();
  return items.map(({ text, where }) => {
    const v = /^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(text) ? Number(text) : NaN;
    if (!Number.isFinite(v) || Math.abs(v) > MAX_LATITUDE_DEG) {
      throw new UsageError(`${where}: got ${JSON.stringify(text)}; allowed: a latitude in degrees from -${MAX_LATITUDE_DEG} to ${MAX_LATITUDE_DEG} (north positive; a wedge steeper than ${MAX_LATITUDE_DEG}° cannot be printed)`);
    }
    if (seen.has(v)) throw new UsageError(`${where}: ${text} is listed twice; allowed: each latitude once`);
    seen.add(v);
    return v;
  });
}

/** "N35", "S33.9": a latitude for file names. */
export function latitudeTag(lat: number): string {
  return `${lat < 0 ? 'S' : 'N'}${Math.abs(lat)}`;
}

/** The plate's cutting drawing among its files: plate.dxf, or plate-offset-K mm.dxf when pre-compensated. */
function plateDxfName(files: readonly OutputFile[]): string {
  return files.find((f) => /^plate(-offset-[0-9.]+mm)?\.dxf$/.test(f.name))?.name ?? 'plate.dxf';
}

/** What makes two plates the same, apart from the title text. */
function faceKey(layout: DialLayout): string {
  return JSON.stringify({ hemisphere: layout.hemisphere, marks: layout.marks, numerals: layout.numerals, plate: layout.plate, gnomon: layout.gnomon, time: layout.time });
}

function sameBytes(a: Uint8Array, b: Uint8Array): boolean {
  return a.length === b.length && a.every((v, i) => v === b[i]);
}

function round(v: number, d: number): number {
  const f = 10 ** d;
  return Math.round(v * f) / f;
}

/** A plain text table with a header rule. */
function formatTable(head: readonly string[], rows: readonly (readonly string[])[]): string {
  const w = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i].length)));
  const line = (cells: readonly string[]) => cells.map((c, i) => c.padEnd(w[i])).join('  ').trimEnd();
  return [line(head), w.map((n) => '-'.repeat(n)).join('  '), ...rows.map(line)].join('\n');
}
