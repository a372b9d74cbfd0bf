import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import yargs from 'yargs';
import { isSpecError } from '@umbrafab/geometry';
import { buildFiles } from './buildFiles.ts';
import { readSpecFile } from './readSpec.ts';
import { starterSpecYaml } from './starterSpec.ts';
import { OutputError, writeFilesAtomic } from './writeFilesAtomic.ts';

/** Exit codes: 0 success, 1 bad input (spec, arguments, output folder), 2 internal error. */
export const EXIT = { ok: 0, badInput: 1, internal: 2 } as const;

export interface Io {
  readonly out: (line: string) => void;
  readonly err: (line: string) => void;
}

const defaultIo: Io = {
  out: (l) => process.stdout.write(l + '\n'),
  err: (l) => process.stderr.write(l + '\n'),
};

/** A usage problem found by yargs (unknown option, missing argument). */
class UsageError extends Error {}

/**
 * Run the umbrafab command line with `argv` (without node and script) and
 * return the exit code; never calls process.exit, so tests can call it.
 */
export async function main(argv: readonly string[], io: Io = defaultIo): Promise<number> {
  let code: number = EXIT.ok;
  const cli = yargs([...argv])
    .scriptName('umbrafab')
    .usage('$0 <command> [options]\n\nTurns a dial spec into the fabrication files of a polar sundial.')
    .command(
      'build <spec>',
      'write plate.dxf, preview.svg and report.json for a spec',
      (y) =>
        y
          .positional('spec', { type: 'string', demandOption: true, describe: 'dial spec file (.yaml or .json)' })
          .option('out', { type: 'string', alias: 'o', describe: 'output folder (default: out/<spec name>)' })
          .option('force', { type: 'boolean', default: false, describe: 'replace files that already exist in the output folder' }),
      (args) => {
        const spec = readSpecFile(args.spec);
        const result = buildFiles(spec);
        const outDir = args.out ?? join('out', baseName(args.spec));
        writeFilesAtomic(outDir, result.files, args.force);
        const p = result.layout.plate;
        const total = result.files.reduce((s, f) => s + f.bytes.length, 0);
        io.out(
          `umbrafab: wrote ${result.files.length} files (${(total / 1024).toFixed(1)} KiB) to ${outDir}: ${result.files.map((f) => f.name).join(', ')} — plate ${p.widthMm} x ${p.lengthMm} mm, ${result.layout.marks.length} marks, ${spec.process.method} kerf ${spec.process.kerf} mm`,
        );
        for (const note of result.layout.notes) io.out(`note: ${note}`);
      },
    )
    .command(
      'init [file]',
      'write a commented starter spec',
      (y) =>
        y
          .positional('file', { type: 'string', default: 'dial.yaml', describe: 'where to write the spec' })
          .option('year', { type: 'number', describe: 'calendar year for the time tables (default: the coming year)' })
          .option('force', { type: 'boolean', default: false, describe: 'replace an existing file' }),
      (args) => {
        const file = args.file;
        const year = args.year ?? new Date().getFullYear() + 1;
        if (!Number.isInteger(year) || year < 1900 || year > 2200) throw new UsageError(`--year: got ${args.year}; allowed: a whole year from 1900 to 2200`);
        if (existsSync(file) && !args.force) throw new OutputError(`${file}: already exists; allowed: a new file name, or --force to replace it`);
        const dir = resolve(file, '..');
        writeFilesAtomic(dir, [{ name: resolve(file).slice(dir.length + 1), bytes: new TextEncoder().encode(starterSpecYaml(year)) }], true);
        io.out(`umbrafab: wrote a starter spec to ${file}; edit site: first, then run: umbrafab build ${file}`);
      },
    )
    .demandCommand(1, 'name a command: build or init (see --help)')
    .strict()
    .help()
    .alias('help', 'h')
    .version('0.1.0')
    .exitProcess(false)
    .fail((msg, err) => {
      throw err ?? new UsageError(msg);
    });
  try {
    await cli.parseAsync();
  } catch (e) {
    code = report(e, io);
  }
  return code;
}

function report(e: unknown, io: Io): number {
  if (isSpecError(e) || e instanceof OutputError || e instanceof UsageError) {
    io.err(`umbrafab: ${(e as Error).message}`);
    return EXIT.badInput;
  }
  io.err(`umbrafab: internal error: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`);
  io.err('umbrafab: this is a bug; please report it with the spec that caused it');
  return EXIT.internal;
}

function baseName(path: string): string {
  const file = path.split(/[\\/]/).pop() ?? 'dial';
  return file.replace(/\.(ya?ml|json)$/i, '') || 'dial';
}
