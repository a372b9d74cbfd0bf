import yargs from 'yargs';
// The one module of the geometry package start-up needs (the index would bring every builder).
import { didYouMean } from '@umbrafab/geometry/didYouMean';
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
  const names = COMMANDS.map((c) => c.command.split(' ')[0]);
  const first = argv[0];
  if (first !== undefined && !first.startsWith('-') && !names.includes(first)) {
    const guess = didYouMean(first, names);
    io.err(`umbrafab: unknown command ${JSON.stringify(first)}${guess ? ` (did you mean ${guess}?)` : ''}; allowed: ${names.join(', ')} (see umbrafab --help)`);
    return EXIT.badInput;
  }
  let cli = yargs(negativeValuesJoined(argv))
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
  skipHelpCache(cli);
  try {
    await cli.parseAsync();
  } catch (e) {
    if (e instanceof UsageError && /^Unknown arguments?: /.test(e.message)) e.message = await withSuggestions(e.message, argv);
    code = reportError(e, io);
  }
  return code;
}

/**
 * yargs lays out a command's whole help text each time the command runs,
 * before its handler's work (held in case a failure should print it). Our
 * `.fail` handler throws instead and never prints it, and laying it out
 * (every line's display width through a large emoji pattern) costs a build
 * tens of milliseconds, so the cache is skipped; `--help` still lays it out
 * when asked. Guarded: an internal method, so a yargs without it is left as it is.
 */
function skipHelpCache(cli: object): void {
  const internal = (cli as { getInternalMethods?: () => { getUsageInstance?: () => { cacheHelpMessage?: () => void } } }).getInternalMethods?.();
  const usage = internal?.getUsageInstance?.();
  if (usage && typeof usage.cacheHelpMessage === 'function') usage.cacheHelpMessage = () => {};
}

/**
 * "--latitudes -35,-40" → "--latitudes=-35,-40": a value that starts with a
 * minus sign and a digit is the option's value, not a run of short flags.
 */
export function negativeValuesJoined(argv: readonly string[]): string[] {
  const out: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    const next = argv[i + 1];
    if (/^--[\w-]+$/.test(a) && next !== undefined && /^-\.?\d/.test(next)) {
      out.push(`${a}=${next}`);
      i++;
    } else out.push(a);
  }
  return out;
}

/** yargs' "Unknown argument: otu" as "unknown option --otu (did you mean --out?)"; extra words as extra arguments. */
async function withSuggestions(msg: string, argv: readonly string[]): Promise<string> {
  const m = /^Unknown arguments?: (.+)$/.exec(msg);
  if (!m) return msg;
  const command = COMMANDS.find((c) => c.command.split(' ')[0] === argv[0]);
  const probe = command ? command.builder(yargs([])) : yargs([]);
  const opts = (probe as unknown as { getOptions: () => { key: Record<string, unknown> } }).getOptions();
  const positional = new Set((command?.command ?? '').match(/[\w-]+(?=[\]>])/g) ?? []);
  const known = Object.keys(opts.key).filter((k) => k.length > 1 && !positional.has(k) && k !== 'version');
  const given = new Set(argv.filter((a) => a.startsWith('-')).map((a) => a.replace(/^-+(no-)?/, '').replace(/=.*$/, '')));
  const problems = m[1].split(', ').map((name) => {
    if (!given.has(name)) return `extra argument ${JSON.stringify(name)}`;
    const guess = didYouMean(name, known);
    return `unknown option ${name.length > 1 ? '--' : '-'}${name}${guess ? ` (did you mean --${guess}?)` : ''}`;
  });
  const usage = command ? `umbrafab ${command.command} with the options ` : 'the options ';
  return `${problems.join('; ')}; allowed: ${usage}${known.map((k) => `--${k}`).join(', ')} (see umbrafab ${command ? `${argv[0]} ` : ''}--help)`;
}

/**
 * A SpecError, told by its shape as geometry's isSpecError does, so that this
 * start-up module imports nothing of the geometry package (a good command line
 * loads it only when its command runs).
 */
function isSpecErrorLike(e: unknown): boolean {
  return e instanceof Error && e.name === 'SpecError' && 'field' in e;
}

function reportError(e: unknown, io: Io): number {
  if (isSpecErrorLike(e) || e instanceof OutputError || e instanceof UsageError) {
    io.err(`umbrafab: ${(e as Error).message}`);
    return EXIT.badInput;
  }
  io.err(`umbrafab: internal error: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`);
  io.err('umbrafab: this is a bug; please report it with the spec that caused it');
  return EXIT.internal;
}
