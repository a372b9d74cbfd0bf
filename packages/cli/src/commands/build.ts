import { existsSync, statSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { UsageError, type CommandModule } from './commandTypes.ts';

export const buildCommand: CommandModule = {
  command: 'build <spec>',
  describe: 'write the fabrication files for a spec (plate.dxf, preview.svg, report.json, …)',
  builder: (y) =>
    y
      .positional('spec', { type: 'string', demandOption: true, describe: 'dial spec file (.yaml or .json)' })
      .option('out', { type: 'string', alias: 'o', describe: 'output folder (default: out/<spec name>)' })
      .option('force', { type: 'boolean', default: false, describe: 'replace files that already exist in the output folder' }),
  run: async (args, io) => {
    // Loaded only when the command runs, so `--help`, `--version` and `init` stay quick.
    const { buildAnyFiles, countMarks, engraveOnWorker, engraveProgramsFor, markCountText, readSpecFile, writeFilesAtomic } = await import('./buildDeps.ts');
    const outDir: string = args.out ?? join('out', specBaseName(args.spec));
    assertOutFolder(outDir);
    const spec = readSpecFile(args.spec);
    // The engraving worker once the spec is good and asks for a program (a refused spec or one with
    // no engraving starts no thread): it loads its code (and manifold-3d for a filled laser program)
    // while this thread lays out the dial.
    const engraveWorker = engraveProgramsFor(spec.engrave.programs, spec.process.method).length > 0 ? engraveOnWorker() : undefined;
    engraveWorker?.prepare(spec);
    // Stopped once the build is done (its work is in) or failed (not needed).
    const result = await buildAnyFiles(spec, engraveWorker).finally(() => engraveWorker?.close());
    const { recovered } = writeFilesAtomic(outDir, result.files, args.force);
    if (recovered) io.out(`note: ${outDir}: ${recovered}`);
    const p = result.layout.plate;
    const total = result.files.reduce((s, f) => s + f.bytes.length, 0);
    io.out(
      `umbrafab: wrote ${result.files.length} files (${(total / 1024).toFixed(1)} KiB) to ${outDir}: ${result.files.map((f) => f.name).join(', ')} — plate ${p.widthMm} x ${p.lengthMm} mm, ${markCountText(countMarks(result.layout.marks))}, ${spec.process.method} kerf ${spec.process.kerf} mm`,
    );
    for (const note of 'notes' in result ? result.notes : result.layout.notes) io.out(`note: ${note}`);
    for (const line of cutFileLines(result.report)) io.out(line);
    return 0;
  },
};

/**
 * The console lines about the cutting drawings: which are pre-compensated
 * (offset by kerf/2: the machine must not offset again), which are true size.
 */
export function cutFileLines(report: object): string[] {
  const r = report as { plate?: unknown; parts?: unknown };
  const plate = (r.plate as { cut?: { file?: string; drawn?: string; offsetMm?: number; kerfMm?: number } } | undefined)?.cut;
  const gnomon = (r.parts as { gnomonDxf?: { file?: string; drawn?: string; offsetMm?: number } } | undefined)?.gnomonDxf;
  const out: string[] = [];
  for (const c of [plate, gnomon]) {
    if (!c?.file) continue;
    out.push(
      c.drawn === 'precompensated'
        ? `PRE-COMPENSATED: ${c.file} is offset by ${c.offsetMm} mm (kerf/2) for a machine with no offset of its own; do not apply a kerf offset again`
        : `cut file: ${c.file} is true size (nominal); the machine or CAM applies its own kerf or tool offset`,
    );
  }
  return out;
}

/**
 * Refuse an output folder that names an existing file (or a path through
 * one) before any work, naming it.
 * @throws UsageError
 */
export function assertOutFolder(dir: string): void {
  let p = resolve(dir);
  for (;;) {
    if (existsSync(p)) {
      if (!statSync(p).isDirectory()) {
        throw new UsageError(p === resolve(dir) ? `--out: ${dir} is a file, not a folder; allowed: a folder (new or existing) for the output files` : `--out: ${dir} lies under ${p}, which is a file; allowed: a folder path`);
      }
      return;
    }
    const up = dirname(p);
    if (up === p) return;
    p = up;
  }
}

/** "fixtures/demo.yaml" → "demo". */
export function specBaseName(path: string): string {
  const file = path.split(/[\\/]/).pop() ?? 'dial';
  return file.replace(/\.(ya?ml|json)$/i, '') || 'dial';
}
