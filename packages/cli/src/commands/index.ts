import { batchCommand } from './batch.ts';
import { buildCommand } from './build.ts';
import { checkCommand } from './check.ts';
import { initCommand } from './init.ts';
import { serveCommand } from './serve.ts';
import { wallCommand } from './wall.ts';
import type { CommandModule } from './commandTypes.ts';

/** Every command of the CLI, in the order --help lists them. Add a command: one file, one line here. */
export const COMMANDS: readonly CommandModule[] = [buildCommand, batchCommand, checkCommand, initCommand, serveCommand, wallCommand];
