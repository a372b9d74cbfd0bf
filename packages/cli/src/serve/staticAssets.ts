import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';

/** One file the server may send, by URL path: a fixed table, never a path taken from a request. */
export interface StaticAsset {
  readonly file: string;
  readonly type: string;
}

const PAGE_DIR = join(import.meta.dirname, 'page');
const THREE_BUILD = dirname(createRequire(import.meta.url).resolve('three'));

const JS = 'text/javascript; charset=utf-8';

/**
 * Every static file of the page: the page itself and three.js's module build
 * with OrbitControls (mapped in index.html's import map). Any other URL is 404.
 */
export const STATIC_ASSETS: Readonly<Record<string, StaticAsset>> = {
  '/': { file: join(PAGE_DIR, 'index.html'), type: 'text/html; charset=utf-8' },
  '/page.js': { file: join(PAGE_DIR, 'page.js'), type: JS },
  '/page.css': { file: join(PAGE_DIR, 'page.css'), type: 'text/css; charset=utf-8' },
  '/vendor/three.module.js': { file: join(THREE_BUILD, 'three.module.js'), type: JS },
  '/vendor/three.core.js': { file: join(THREE_BUILD, 'three.core.js'), type: JS },
  '/vendor/OrbitControls.js': { file: join(THREE_BUILD, '..', 'examples', 'jsm', 'controls', 'OrbitControls.js'), type: JS },
};
