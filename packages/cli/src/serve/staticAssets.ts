import { readFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';

/** One file the server may send, by URL path: a fixed table, never a path taken from a request. */
export interface StaticAsset {
  readonly type: string;
  /** the bytes to send (a file read on each request, or the page bundle) */
  readonly read: () => Promise<Uint8Array>;
}

/**
 * The page's folder: in the built CLI, dist/<hash>/page/ (page.js already
 * bundled by scripts/build.mjs); run from the TypeScript sources (tests, tsx
 * scripts), src/serve/page/, whose modules are bundled in memory here.
 */
const PAGE_DIR = join(import.meta.dirname, 'page');
const FROM_SOURCES = import.meta.url.endsWith('.ts');
const THREE_BUILD = dirname(createRequire(import.meta.url).resolve('three'));

const JS = 'text/javascript; charset=utf-8';

const file =
  (path: string) =>
  (): Promise<Uint8Array> =>
    readFile(path);

let sourceBundle: Promise<Uint8Array> | undefined;

/**
 * page.js run from the sources: the same esbuild bundle build.mjs writes
 * (scripts/pageBundle.mjs), built once per process. The script is imported
 * by a computed URL so that the CLI bundle never holds it (or esbuild).
 */
function pageFromSources(): Promise<Uint8Array> {
  sourceBundle ??= (async () => {
    const script = new URL('../../scripts/pageBundle.mjs', import.meta.url).href;
    const { bundlePage } = (await import(/* @vite-ignore */ script)) as { bundlePage: () => Promise<{ bytes: Uint8Array }> };
    return (await bundlePage()).bytes;
  })();
  sourceBundle.catch(() => (sourceBundle = undefined)); // a failed build is tried again on the next request
  return sourceBundle;
}

/**
 * Every static file of the page: the page itself and three.js's module build
 * with OrbitControls (mapped in index.html's import map). Any other URL is 404.
 */
export const STATIC_ASSETS: Readonly<Record<string, StaticAsset>> = {
  '/': { read: file(join(PAGE_DIR, 'index.html')), type: 'text/html; charset=utf-8' },
  '/page.js': { read: FROM_SOURCES ? pageFromSources : file(join(PAGE_DIR, 'page.js')), type: JS },
  '/page.css': { read: file(join(PAGE_DIR, 'page.css')), type: 'text/css; charset=utf-8' },
  '/vendor/three.module.js': { read: file(join(THREE_BUILD, 'three.module.js')), type: JS },
  '/vendor/three.core.js': { read: file(join(THREE_BUILD, 'three.core.js')), type: JS },
  '/vendor/OrbitControls.js': { read: file(join(THREE_BUILD, '..', 'examples', 'jsm', 'controls', 'OrbitControls.js')), type: JS },
};
