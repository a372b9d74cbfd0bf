import yargs from 'yargs';
import { isSpecError } from '@umbrafab/geometry';
import { COMMANDS } from './commands/index.ts';
import { UsageError, type Io } from './commands/commandTypes.ts';
import { OutputError } from './writeFilesAtomic.ts';

export type { Io } from './commands/commandTypes.ts';

/** Exit codes: 0 success, 1 bad input (spec, arguments, output folder) or a failed check, 2 internal error. */
export const EXIT = { ok: 0, badInput: 1, internal: 2 } as const;

const defaultIo: Io = {
  out: (l) => process.stdout.write(l + '\n'),
  err: (l) => process.stderr.write(l + '\n'),
};

/**
 * Run the umbrafab command line with `argv` (without node and script) and
 * return the exit code; never calls process.exit, so tests can call it.
 */
export async function main(argv: readonly string[], io: Io = defaultIo): Promise<number> {
  let code: number = EXIT.ok;
  let cli = yargs([...argv])
    .scriptName('umbrafab')
    .usage('$0 <command> [options]\n\nTurns a dial spec into the fabrication files of a polar sundial.');
  for (const c of COMMANDS) {
    cli = cli.command(c.command, c.describe, c.builder, async (args) => {
      code = await c.run(args as Record<string, any>, io);
    });
  }
  cli = cli
    .demandCommand(1, `name a command: ${COMMANDS.map((c) => c.command.split(' ')[0]).join(', ')} (see --help)`)
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
    code = reportError(e, io);
  }
  return code;
}

function reportError(e: unknown, io: Io): number {
  if (isSpecError(e) || e instanceof OutputError || e instanceof UsageError) {
    io.err(`umbrafab: ${(e as Error).message}`);
    return EXIT.badInput;
  }
  io.err(`umbrafab: internal error: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`);
  io.err('umbrafab: this is a bug; please report it with the spec that caused it');
  return EXIT.internal;
}
