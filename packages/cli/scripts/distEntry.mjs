// The bin's way to its plain-JavaScript build: read dist/current.json,
// compare every recorded input's size and mtime with the file on disk (a
// few milliseconds), and rebuild (scripts/build.mjs, esbuild) when anything
// differs or is missing, so a source change never runs old code.
import { readFileSync, statSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const CLI = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const DIST = join(CLI, 'dist');
const FORMAT = 1;

/** The built main.mjs if dist/ matches the sources, else undefined. */
export function freshDist() {
  let current;
  try {
    current = JSON.parse(readFileSync(join(DIST, 'current.json'), 'utf8'));
  } catch {
    return undefined;
  }
  if (current.format !== FORMAT || typeof current.dir !== 'string' || !Array.isArray(current.inputs)) return undefined;
  for (const [file, size, mtimeMs] of current.inputs) {
    const s = statSync(join(CLI, file), { throwIfNoEntry: false });
    if (!s || s.size !== size || s.mtimeMs !== mtimeMs) return undefined;
  }
  const main = join(DIST, current.dir, 'main.mjs');
  return statSync(main, { throwIfNoEntry: false }) ? main : undefined;
}

/** The built main.mjs, rebuilt first when stale or missing. */
export async function distEntry() {
  const fresh = freshDist();
  if (fresh) return fresh;
  const { buildDist } = await import('./build.mjs');
  try {
    return await buildDist();
  } catch (e) {
    const err = new Error(`umbrafab: the built CLI in ${DIST} is missing or older than the sources and could not be rebuilt (${e instanceof Error ? e.message : String(e)}); run \`node packages/cli/scripts/build.mjs\``);
    err.code = 'UMBRAFAB_STALE_BUILD';
    throw err;
  }
}
