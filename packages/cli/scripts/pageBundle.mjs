// The dial page's browser code: the TypeScript modules of src/serve/page/
// bundled by esbuild into one plain ES module, page.js. three.js stays
// outside (index.html's import map points `three` and OrbitControls at the
// server's /vendor/ copies of the installed package), so the bundle holds
// only the page's own code. Type-only imports of the server's modules vanish
// in the bundle: the page shares the server's types, not its code.
//
// build.mjs writes the bundle into dist/<hash>/page/; the server run from
// its TypeScript sources (tests, tsx scripts) builds it in memory on first
// request (staticAssets.ts).
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const CLI = resolve(dirname(fileURLToPath(import.meta.url)), '..');
/** The page's folder: index.html, page.css and the TypeScript modules. */
export const PAGE_DIR = join(CLI, 'src/serve/page');
/** The files served as they are, beside the bundle. */
export const PAGE_STATIC_FILES = ['index.html', 'page.css'];

/**
 * Bundle the page's modules.
 * @returns page.js's bytes and the project files it holds (absolute paths)
 */
export async function bundlePage() {
  const esbuild = await import('esbuild');
  const r = await esbuild.build({
    absWorkingDir: CLI,
    entryPoints: ['src/serve/page/main.ts'],
    outfile: 'page.js',
    write: false,
    bundle: true,
    format: 'esm',
    platform: 'browser',
    target: 'es2022',
    external: ['three', 'three/addons/*'],
    metafile: true,
    legalComments: 'none',
    charset: 'utf8',
    logLevel: 'error',
  });
  const js = r.outputFiles.find((f) => f.path.endsWith('page.js'));
  if (!js) throw new Error('umbrafab: the page bundle has no page.js');
  return { bytes: js.contents, inputs: Object.keys(r.metafile.inputs).map((p) => resolve(CLI, p)) };
}
