import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { DialLayout, DialSpec, PlateDrawing } from '@umbrafab/geometry';
import { utf8 } from '../outputs/outputTypes.ts';
import type { Report } from '../outputs/report.ts';
import type { OutputFile } from '../writeFilesAtomic.ts';
import { assertOutFolder, specBaseName } from './build.ts';
import { UsageError, type CommandModule } from './commandTypes.ts';

/** The plate's cut drawing, true size or pre-compensated for the kerf. */
const PLATE_DXF = /^plate(-offset-[0-9.]+mm)?\.dxf$/;
/** Show a progress bar from this many latitudes on ("long runs"). */
const PROGRESS_FROM = 4;

/** One latitude of a batch, as the summary and the batch's report.json give it. */
export interface BatchRow {
  readonly latitudeDeg: number;
  readonly wedgeAngleDeg: number;
  /** this latitude's wedge (or stand), if the spec writes one */
  readonly wedgeFile: string | null;
  readonly plateFile: string;
  /** every file this latitude uses, shared or its own, in build order */
  readonly files: readonly string[];
  /** rise of the plate's pole-ward edge over its lower edge, mm: length × sin(tilt) (docs/design.md §4) */
  readonly riseMm: number;
}

/** One latitude of a batch of a horizontal, wall, meridian or equatorial face. */
export interface PlanarBatchRow {
  readonly latitudeDeg: number;
  readonly faceType: string;
  /** the style's angle over this latitude's face, degrees */
  readonly styleHeightDeg: number;
  readonly plateFile: string;
  /** gnomon.dxf for sheet work, else gnomon.stl */
  readonly gnomonFile: string | null;
  /** a wall face's mounting plate (mount.dxf, else mount.stl) */
  readonly mountFile: string | null;
  /** every file this latitude uses, shared or its own, in build order */
  readonly files: readonly string[];
}

export const batchCommand: CommandModule = {
  command: 'batch <spec>',
  describe: 'build a spec for each of several latitudes: every file build writes, each written once when it is the same for all (one plate, a wedge and an install sheet per latitude)',
  builder: (y) =>
    y
      .positional('spec', { type: 'string', demandOption: true, describe: 'dial spec file (.yaml or .json); its site.latitude is replaced by each listed latitude' })
      .option('latitudes', { type: 'string', describe: 'latitudes in degrees, north positive, comma separated, e.g. 30,35,40 or -35,-40' })
      .option('latitudes-file', { type: 'string', describe: 'a text file of latitudes, one or more per line (commas or spaces; # starts a comment)' })
      .option('out', { type: 'string', alias: 'o', describe: 'output folder (default: out/<spec name>-batch)' })
      .option('force', { type: 'boolean', default: false, describe: 'replace files that already exist in the output folder' })
      .option('progress', { type: 'boolean', default: true, describe: `show a progress bar on stderr (from ${PROGRESS_FROM} latitudes on)` }),
  run: async (args, io) => {
    // Loaded only when the command runs, so `--help`, `--version` and `init` stay quick.
    const deps = await import('./batchDeps.ts');
    const { WEDGE_MAX_TILT_DEG, cliProgress, GENERATOR, parseSpec, readRawSpec, toReportJson, writeFilesAtomic } = deps;
    const latitudes = batchLatitudes(args.latitudes, args['latitudes-file'], WEDGE_MAX_TILT_DEG);
    const raw = readRawSpec(args.spec) as Record<string, unknown>;
    const outDir: string = args.out ?? `out/${specBaseName(args.spec)}-batch`;
    assertOutFolder(outDir);
    // Each latitude through the one normaliser, as `build` would read a spec file with that latitude.
    const site = raw.site !== null && typeof raw.site === 'object' ? (raw.site as Record<string, unknown>) : {};
    // Pictures (preview.png, the assembly view) are left to `build` of one latitude: rendering them for every latitude would
    // multiply the run time for files a shop does not cut from.
    const pictures = raw.pictures !== null && typeof raw.pictures === 'object' ? raw.pictures : {};
    const specs = latitudes.map((lat) => parseSpec({ ...raw, site: { ...site, latitude: lat }, pictures: { ...pictures, write: false } }));
    // Every latitude has the same face section, so the first spec tells the kind: the polar plate or another planar face.
    const planar = deps.faceOrientationOf(specs[0]) !== null;

    const bar =
      args.progress && latitudes.length >= PROGRESS_FROM
        ? new cliProgress.SingleBar(
            { format: 'umbrafab batch [{bar}] {value}/{total} latitudes, now {lat}', noTTYOutput: true, notTTYSchedule: 1000, stream: process.stderr, hideCursor: true },
            cliProgress.Presets.shades_classic,
          )
        : null;
    const done = (i: number) => bar?.increment(1, { lat: latitudeTag(latitudes[i]) });
    let builds: LatitudeBuild[];
    try {
      builds = planar ? await planarBuilds(deps, specs, done) : await polarBuilds(deps, specs, () => bar?.start(latitudes.length, 0, { lat: '' }), done);
    } finally {
      bar?.stop();
    }
    const keys = builds.map((b) => b.faceKey);

    // Every file once where it is the same for all, once per face group where it is the same within it, else per latitude.
    const files: OutputFile[] = [];
    const written = new Set<string>();
    const perLat = latitudes.map(() => new Map<string, string>());
    const names = [...new Set(builds.flatMap((b) => b.files.map((f) => f.name)))];
    const membersOf = builds.map((_, i) => builds.map((_, j) => j).filter((j) => keys[j] === keys[i]));
    for (const name of names) {
      const all = builds.map((b) => b.files.find((f) => f.name === name)?.bytes);
      const ids = contentIds(all);
      for (const [i, bytes] of all.entries()) {
        if (!bytes) continue;
        const members = membersOf[i];
        let fileName: string;
        if (ids.every((id) => id === ids[i])) fileName = name;
        else if (members.length > 1 && members.every((j) => ids[j] === ids[i]) && members.length < builds.length) fileName = tagged(name, rangeTag(members.map((j) => latitudes[j])));
        else fileName = tagged(name, latitudeTag(latitudes[i]));
        perLat[i].set(name, fileName);
        if (!written.has(fileName)) {
          written.add(fileName);
          files.push({ name: fileName, bytes });
        }
      }
    }
    const plateFileOf = (mine: ReadonlyMap<string, string>) => [...mine.entries()].find(([name]) => PLATE_DXF.test(name))?.[1] ?? '';
    const plates = new Set(perLat.map(plateFileOf));
    const lo = Math.min(...latitudes);
    const hi = Math.max(...latitudes);
    if (written.has('report.json')) throw new Error('batch: every latitude wrote the same report.json');
    const shared = files.filter((f) => names.includes(f.name)).map((f) => f.name);
    const table = planar ? planarTable(builds, perLat, plateFileOf) : polarTable(builds, perLat, plateFileOf);
    const plateNote = planar
      ? plates.size === 1
        ? `one plate serves every latitude from ${latLabel(lo)} to ${latLabel(hi)}: its drawing is the same at each`
        : `${plates.size} plates: this ${String(specs[0].face?.type)} face's lines and title depend on the latitude, so each latitude has its own plate; a file whose bytes are the same for every latitude is written once`
      : plates.size === 1
        ? `one plate serves every latitude from ${latLabel(lo)} to ${latLabel(hi)}: its lines do not depend on the latitude, only the wedge does; its title states that range`
        : `${plates.size} plates: the faces differ between some latitudes (e.g. across hemispheres); latitudes with the same face share one, titled with their range`;
    const summary = {
      generator: GENERATOR,
      specFile: args.spec,
      latitudeRangeDeg: [lo, hi],
      ...(planar ? { face: { type: specs[0].face?.type } } : {}),
      plate: { shared: plates.size === 1, files: [...plates], note: plateNote },
      pictures: 'not written by batch (pictures.write: false for every latitude); umbrafab build the spec with one latitude for its preview.png and assembly picture',
      latitudes: table.rows,
      files: [...files.map((f) => f.name), 'report.json'],
    };
    files.push({ name: 'report.json', bytes: utf8(toReportJson(summary)) });
    writeFilesAtomic(outDir, files, args.force);

    io.out(`umbrafab: batch of ${builds.length} latitudes (${latLabel(lo)} to ${latLabel(hi)}) written to ${outDir}: ${files.length} files, ${plates.size === 1 ? 'one shared plate.dxf' : `${plates.size} plates`}; shared by all: ${shared.join(', ') || 'none'}`);
    io.out(formatTable(table.head, table.cells));
    io.out(`note: ${plateNote}`);
    io.out(`umbrafab: the summary is in ${join(outDir, 'report.json')}`);
    return 0;
  },
};

/** What `batch` loads when it runs (batchDeps.ts). */
type BatchDeps = typeof import('./batchDeps.ts');

/** One latitude's build, as batch shares its files out. */
interface LatitudeBuild {
  readonly lat: number;
  readonly files: readonly OutputFile[];
  /** the latitude's report.json: the polar report or a planar face's */
  readonly report: Report;
  readonly plateLengthMm: number;
  /** latitudes with the same key have the same face: a file whose bytes are the same within the group is written once for it */
  readonly faceKey: string;
}

/**
 * The polar builds: latitudes whose faces are the same (hour lines,
 * numerals, plate, gnomon) share one plate, titled with their range.
 * `start` runs once the faces are laid out (every latitude checked).
 */
async function polarBuilds(deps: BatchDeps, specs: readonly DialSpec[], start: () => void, done: (i: number) => void): Promise<LatitudeBuild[]> {
  const latitudes = specs.map((s) => s.site.latitude);
  const keys = specs.map((spec, i) => faceKey(atLatitude(deps, specs, i, () => deps.layoutDial(spec))));
  const groupOf = (i: number) => latitudes.filter((_, j) => keys[j] === keys[i]);
  start();
  const builds: LatitudeBuild[] = [];
  // Latitudes whose plate drawings are the same get the very same drawing object, so that the work the producers
  // do once per drawing (the engraving's toolpaths, the etched outlines, the template: perDrawing) is done once.
  const drawings = new Map<string, PlateDrawing>();
  for (const [i, spec] of specs.entries()) {
    const group = groupOf(i);
    const range = group.length > 1 ? ([Math.min(...group), Math.max(...group)] as const) : undefined;
    const ctx = atLatitude(deps, specs, i, () => deps.buildContext(spec, range ? { latitudeRangeDeg: range } : {}));
    const drawingKey = JSON.stringify(ctx.drawing);
    const drawing = drawings.get(drawingKey) ?? ctx.drawing;
    drawings.set(drawingKey, drawing);
    const result = await atLatitudeAsync(deps, specs, i, () => deps.buildFiles(spec, { ...ctx, drawing }));
    builds.push({ lat: latitudes[i], files: result.files, report: result.report, plateLengthMm: result.layout.plate.lengthMm, faceKey: keys[i] });
    done(i);
  }
  return builds;
}

/**
 * The builds of a horizontal, wall, meridian or equatorial face: each
 * latitude exactly `umbrafab build` of its own spec (`buildAnyFiles`). Its
 * lines change with the latitude and its title names it, so latitudes
 * share a face only when their plate drawings are the same.
 */
async function planarBuilds(deps: BatchDeps, specs: readonly DialSpec[], done: (i: number) => void): Promise<LatitudeBuild[]> {
  const builds: LatitudeBuild[] = [];
  for (const [i, spec] of specs.entries()) {
    const result = await atLatitudeAsync(deps, specs, i, () => deps.buildAnyFiles(spec));
    if (!('drawing' in result)) throw new Error('batch: a planar spec built as the polar plate');
    builds.push({ lat: spec.site.latitude, files: result.files, report: result.report, plateLengthMm: result.layout.plate.lengthMm, faceKey: JSON.stringify(result.drawing) });
    done(i);
  }
  return builds;
}

/**
 * Run one latitude's work; a SpecError it throws comes back naming the
 * latitude (site.latitude, its place in the list) and what the face allows,
 * with the original problem inside.
 */
function atLatitude<T>(deps: BatchDeps, specs: readonly DialSpec[], i: number, work: () => T): T {
  try {
    return work();
  } catch (e) {
    throw latitudeError(deps, specs, i, e);
  }
}

async function atLatitudeAsync<T>(deps: BatchDeps, specs: readonly DialSpec[], i: number, work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (e) {
    throw latitudeError(deps, specs, i, e);
  }
}

function latitudeError(deps: BatchDeps, specs: readonly DialSpec[], i: number, e: unknown): unknown {
  if (!deps.isSpecError(e)) return e;
  const lat = specs[i].site.latitude;
  // The inner problem, without repeating the field when it is the latitude itself.
  const cause = e.field === 'site.latitude' ? e.message.slice('site.latitude: '.length) : e.message;
  return new deps.SpecError('site.latitude', lat, `allowed: a latitude at which ${faceDescription(specs[i])} can be made with the rest of the spec, or leave ${lat} out of the batch's latitudes`, `got ${lat} (batch latitude ${i + 1} of ${specs.length}), where ${cause}`);
}

/** "this vertical face (face.wallDeclination 24.5°, face.reclination 0°)": the face a batch builds. */
function faceDescription(spec: DialSpec): string {
  const f = spec.face;
  if (!f || f.type === 'polar') return 'the polar plate';
  if (f.type === 'vertical') return `this vertical face (face.wallDeclination ${f.wallDeclination}°, face.reclination ${f.reclination}°)`;
  if (f.type === 'meridian') return `this meridian face (face.facing ${f.facing})`;
  if (f.type === 'equatorial') return `this equatorial face (face.side ${f.side})`;
  return `this ${f.type} face`;
}

/** A batch's summary: its rows for report.json, the console table's head and cells. */
interface BatchTable {
  readonly rows: readonly object[];
  readonly head: readonly string[];
  readonly cells: readonly (readonly string[])[];
}

function polarTable(builds: readonly LatitudeBuild[], perLat: readonly ReadonlyMap<string, string>[], plateFileOf: (mine: ReadonlyMap<string, string>) => string): BatchTable {
  const rows: BatchRow[] = builds.map((b, i) => {
    const wedge = (b.report as { wedge?: { angleDeg?: number } }).wedge; // absent when the spec writes no wedge
    const mine = perLat[i];
    return {
      latitudeDeg: b.lat,
      wedgeAngleDeg: round(wedge?.angleDeg ?? Math.abs(b.lat), 3),
      // A printed wedge split to fit the bed: its first piece names the set (wedge-1-of-2-S30.stl, …).
      wedgeFile: mine.get('wedge.stl') ?? [...mine.entries()].find(([name]) => /^wedge-1-of-\d+\.stl$/.test(name))?.[1] ?? mine.get('stand.stl') ?? mine.get('stand.dxf') ?? null,
      plateFile: plateFileOf(mine),
      files: [...mine.values()],
      riseMm: round(b.plateLengthMm * Math.sin((Math.abs(b.lat) * Math.PI) / 180), 1),
    };
  });
  return {
    rows,
    head: ['latitude', 'wedge angle', 'rise over plate', 'wedge file', 'install sheet', 'plate file'],
    cells: rows.map((r, i) => [`${r.latitudeDeg}°`, `${r.wedgeAngleDeg.toFixed(2)}°`, `${r.riseMm.toFixed(1)} mm`, r.wedgeFile ?? '-', perLat[i].get('install.md') ?? '-', r.plateFile]),
  };
}

function planarTable(builds: readonly LatitudeBuild[], perLat: readonly ReadonlyMap<string, string>[], plateFileOf: (mine: ReadonlyMap<string, string>) => string): BatchTable {
  const rows: PlanarBatchRow[] = builds.map((b, i) => {
    const { face } = b.report as { face: { type: string; styleHeightDeg: number } };
    const mine = perLat[i];
    return {
      latitudeDeg: b.lat,
      faceType: face.type,
      styleHeightDeg: round(face.styleHeightDeg, 3),
      plateFile: plateFileOf(mine),
      gnomonFile: mine.get('gnomon.dxf') ?? mine.get('gnomon.stl') ?? null,
      mountFile: mine.get('mount.dxf') ?? mine.get('mount.stl') ?? null,
      files: [...mine.values()],
    };
  });
  const mounts = rows.some((r) => r.mountFile);
  return {
    rows,
    head: ['latitude', 'style height', 'plate file', 'gnomon file', ...(mounts ? ['mount file'] : []), 'install sheet'],
    cells: rows.map((r, i) => [`${r.latitudeDeg}°`, `${r.styleHeightDeg.toFixed(2)}°`, r.plateFile, r.gnomonFile ?? '-', ...(mounts ? [r.mountFile ?? '-'] : []), perLat[i].get('install.md') ?? '-']),
  };
}

/** "plate.dxf" + "N35" → "plate-N35.dxf". */
function tagged(name: string, tag: string): string {
  return /\.\w+$/.test(name) ? name.replace(/\.(\w+)$/, `-${tag}.$1`) : `${name}-${tag}`;
}

/** "N30-N40": the latitudes a shared file serves. */
function rangeTag(lats: readonly number[]): string {
  return `${latitudeTag(Math.min(...lats))}-${latitudeTag(Math.max(...lats))}`;
}

/** "35°N", "33.9°S". */
function latLabel(lat: number): string {
  return `${Math.abs(lat)}°${lat < 0 ? 'S' : 'N'}`;
}

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

/** What makes two plates the same, apart from the title text. */
function faceKey(layout: DialLayout): string {
  return JSON.stringify({ hemisphere: layout.hemisphere, marks: layout.marks, numerals: layout.numerals, plate: layout.plate, gnomon: layout.gnomon, time: layout.time });
}

/**
 * For each file, the index of the first file with the same bytes (-1 for a
 * missing one): files compared by a SHA-256 digest, then byte for byte.
 */
function contentIds(all: readonly (Uint8Array | undefined)[]): number[] {
  const firstByDigest = new Map<string, number[]>();
  return all.map((bytes, i) => {
    if (!bytes) return -1;
    const digest = createHash('sha256').update(bytes).digest('hex');
    const seen = firstByDigest.get(digest) ?? [];
    const match = seen.find((j) => Buffer.from(all[j]!.buffer, all[j]!.byteOffset, all[j]!.byteLength).equals(bytes));
    if (match !== undefined) return match;
    firstByDigest.set(digest, [...seen, i]);
    return i;
  });
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
