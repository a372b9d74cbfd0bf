#!/usr/bin/env node
// Runs the CLI's plain-JavaScript build (packages/cli/dist/, made on install
// by scripts/build.mjs); if the sources changed since, it rebuilds first
// (scripts/distEntry.mjs), so it never runs old code and never needs a
// TypeScript transform at run time.
import { pathToFileURL } from 'node:url';
import { distEntry } from '../scripts/distEntry.mjs';

// A reader that stops early (`umbrafab check spec.yaml | head -3`) closes the pipe: the rest of the
// output has nowhere to go and is dropped, and the command still finishes and sets its exit code
// (a build has written its files whole before it prints). Any other stream error is a real one.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (e) => {
    if (e.code !== 'EPIPE' && e.code !== 'ERR_STREAM_DESTROYED') throw e;
  });
}

let main;
try {
  ({ main } = await import(pathToFileURL(await distEntry()).href));
} catch (e) {
  process.stderr.write(`${e instanceof Error && e.code === 'UMBRAFAB_STALE_BUILD' ? e.message : `umbrafab: internal error: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`}\n`);
  process.exit(2);
}
process.exitCode = await main(process.argv.slice(2));
