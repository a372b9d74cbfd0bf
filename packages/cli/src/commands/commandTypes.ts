import type { Argv } from 'yargs';

/** Where a command prints: stdout lines and stderr lines (tests capture both). */
export interface Io {
  readonly out: (line: string) => void;
  readonly err: (line: string) => void;
}

/**
 * One CLI command, in its own file under commands/. `run` throws a
 * SpecError / OutputError / UsageError for bad input (exit 1) and returns
 * the exit code otherwise (0, or 1 when e.g. a check fails).
 */
export interface CommandModule {
  readonly command: string;
  readonly describe: string;
  readonly builder: (y: Argv) => Argv<any>;
  readonly run: (args: Record<string, any>, io: Io) => Promise<number> | number;
}

/** A usage problem (bad option value, missing argument): exit code 1. */
export class UsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UsageError';
  }
}
