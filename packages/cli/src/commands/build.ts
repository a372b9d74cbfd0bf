import { join } from 'node:path';
import { buildFiles } from '../buildFiles.ts';
import { readSpecFile } from '../readSpec.ts';
import { writeFilesAtomic } from '../writeFilesAtomic.ts';
import type { CommandModule } from './commandTypes.ts';

export const buildCommand: CommandModule = {
  command: 'build <spec>',
  describe: 'write the fabrication files for a spec (plate.dxf, preview.svg, report.json, …)',
  builder: (y) =>
    y
      .positional('spec', { type: 'string', demandOption: true, describe: 'dial spec file (.yaml or .json)' })
      .option('out', { type: 'string', alias: 'o', describe: 'output folder (default: out/<spec name>)' })
      .option('force', { type: 'boolean', default: false, describe: 'replace files that already exist in the output folder' }),
  run: async (args, io) => {
    const spec = readSpecFile(args.spec);
    const result = await buildFiles(spec);
    const outDir: string = args.out ?? join('out', specBaseName(args.spec));
    writeFilesAtomic(outDir, result.files, args.force);
    const p = result.layout.plate;
    const total = result.files.reduce((s, f) => s + f.bytes.length, 0);
    io.out(
      `umbrafab: wrote ${result.files.length} files (${(total / 1024).toFixed(1)} KiB) to ${outDir}: ${result.files.map((f) => f.name).join(', ')} — plate ${p.widthMm} x ${p.lengthMm} mm, ${result.layout.marks.length} marks, ${spec.process.method} kerf ${spec.process.kerf} mm`,
    );
    for (const note of result.notes) io.out(`note: ${note}`);
    return 0;
  },
};

/** "fixtures/demo.yaml" → "demo". */
export function specBaseName(path: string): string {
  const file = path.split(/[\\/]/).pop() ?? 'dial';
  return file.replace(/\.(ya?ml|json)$/i, '') || 'dial';
}
