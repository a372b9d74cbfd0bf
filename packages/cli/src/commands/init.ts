import { basename, dirname } from 'node:path';
import { OutputError, entryExists, writeFilesAtomic } from '../writeFilesAtomic.ts';
import { UsageError, type CommandModule } from './commandTypes.ts';

export const initCommand: CommandModule = {
  command: 'init [file]',
  describe: 'write a commented starter spec',
  builder: (y) =>
    y
      .positional('file', { type: 'string', default: 'dial.yaml', describe: 'where to write the spec' })
      .option('year', { type: 'number', describe: 'calendar year for the time tables (default: the coming year)' })
      .option('force', { type: 'boolean', default: false, describe: 'replace an existing file' }),
  run: async (args, io) => {
    const file: string = args.file;
    const year: number = args.year ?? new Date().getFullYear() + 1;
    if (!Number.isInteger(year) || year < 1900 || year > 2200) throw new UsageError(`--year: got ${args.year}; allowed: a whole year from 1900 to 2200`);
    if (entryExists(file) && !args.force) throw new OutputError(`${file}: already exists; allowed: a new file name, or --force to replace it`);
    const { starterSpecYaml } = await import('../starterSpec.ts'); // the schema: loaded only when the command runs
    writeFilesAtomic(dirname(file), [{ name: basename(file), bytes: new TextEncoder().encode(starterSpecYaml(year)) }], true);
    io.out(`umbrafab: wrote a starter spec to ${file}; edit site: first, then run: umbrafab build ${file}`);
    return 0;
  },
};
