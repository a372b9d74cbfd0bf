// Builds the CLI to plain JavaScript (packages/cli/dist/), so the bin runs
// with no TypeScript transform: one esbuild bundle of the three workspace
// packages, split at every dynamic import() so that a command loads only the
// code (and the third-party modules) its outputs need.
//
//   node packages/cli/scripts/build.mjs        (the root `prepare` hook runs it on install)
//
// Layout: dist/<hash>/main.mjs (the CLI), fullBuildWorker.mjs (the page
// server's build thread), engraveWorker.mjs (the build's engraving thread,
// a bundle of its own), chunk-*.mjs, page/ (the page: page.js bundled from
// src/serve/page/*.ts by pageBundle.mjs, index.html, page.css), and
// dist/current.json naming that folder with every input's size and mtime, so
// the bin (scripts/distEntry.mjs) can tell a stale build and rebuild it. The
// folder name is a hash of the output, so concurrent rebuilds of the same
// sources agree and never write into a folder another process is running.
//
// Plain-JavaScript dependencies are bundled too (zod alone is 95 module
// files, yargs about 40: one file each parses much faster). The packages that
// find their own files at run time (the PDF writer's font metrics, the
// rasteriser's native binary, the mesh kernel's WASM) stay outside, imported
// by their real path relative to the output (pnpm gives each package only its
// own dependencies, so a bare name would not resolve from packages/cli/dist);
// the code loads them with import() only when an output needs them.
import { createHash } from 'node:crypto';
import { copyFileSync, existsSync, mkdirSync, readdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { builtinModules } from 'node:module';
import { dirname, join, relative, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';
import { PAGE_DIR, PAGE_STATIC_FILES, bundlePage } from './pageBundle.mjs';

const CLI = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const ROOT = resolve(CLI, '../..');
const DIST = join(CLI, 'dist');
/** Files whose change must rebuild beside the bundled sources: this script and the package manifests (exports, sideEffects). */
const CONFIG_INPUTS = [fileURLToPath(import.meta.url), fileURLToPath(new URL('./pageBundle.mjs', import.meta.url)), ...['cli', 'geometry', 'fabricate'].map((p) => join(ROOT, 'packages', p, 'package.json'))];

/** The dist format; a change here rebuilds every dist. */
const FORMAT = 1;
/** Packages left outside the bundle: they read files beside their own code (pdfkitAtItsOwnPath handles the PDF writer's). */
const NOT_BUNDLED = new Set(['@resvg/resvg-js', 'manifold-3d']);

/**
 * Build dist/ from the sources and point dist/current.json at it.
 * @returns the absolute path of the built main.mjs
 */
export async function buildDist() {
  const esbuild = await import('esbuild');
  mkdirSync(DIST, { recursive: true });
  const tmp = join(DIST, `.tmp-${process.pid}-${Date.now().toString(36)}`);
  const externals = new Set();
  const common = {
    absWorkingDir: CLI,
    outdir: tmp,
    bundle: true,
    format: 'esm',
    platform: 'node',
    target: 'node20',
    outExtension: { '.js': '.mjs' },
    metafile: true,
    sourcemap: 'linked',
    sourcesContent: false,
    legalComments: 'none',
    minifyWhitespace: true,
    minifySyntax: true,
    // Bundled CommonJS packages require() Node's built-ins: give ESM chunks a require.
    banner: { js: "import { createRequire as __umbrafabRequire } from 'node:module';\nconst require = __umbrafabRequire(import.meta.url);" },
    logLevel: 'error',
    plugins: [pdfkitAtItsOwnPath(), thirdPartyByRealPath(externals), packageIndexAsStars()],
  };
  try {
    const r = await esbuild.build({
      ...common,
      entryPoints: { main: 'src/main.ts', fullBuildWorker: 'src/serve/fullBuildWorker.ts' },
      splitting: true,
      chunkNames: 'chunk-[hash]',
    });
    // The build's engraving thread (engraveOnWorker.ts) on its own, unsplit: one file of only the
    // engraving's code (about 60 KB) loads in a fraction of the time the shared chunks take.
    const worker = await esbuild.build({ ...common, entryPoints: { engraveWorker: 'src/engraveWorker.ts' }, splitting: false });
    for (const [k, v] of Object.entries(worker.metafile.inputs)) r.metafile.inputs[k] = v;
    Object.assign(r.metafile.outputs, worker.metafile.outputs);
    // The page: its modules bundled for the browser (pageBundle.mjs), its HTML and CSS as they are.
    const page = await bundlePage();
    mkdirSync(join(tmp, 'page'));
    writeFileSync(join(tmp, 'page', 'page.js'), page.bytes);
    for (const f of PAGE_STATIC_FILES) copyFileSync(join(PAGE_DIR, f), join(tmp, 'page', f));

    // Inputs to watch: every bundled project file; for a bundled third-party
    // file, only its package's package.json (it changes with the version, on
    // install), which keeps the bin's freshness check to a few hundred stats.
    const bundled = Object.keys(r.metafile.inputs).filter((p) => !p.startsWith(`${LEFT_OUT}:`)).map((p) => resolve(CLI, p));
    const inputs = [
      ...bundled.map((f) => packageManifestOf(f) ?? f),
      ...listFiles(PAGE_DIR),
      ...page.inputs,
      ...CONFIG_INPUTS,
      ...externals,
    ];
    // Which project sources and bundled third-party packages (their folder in pnpm's store, once each)
    // each output file holds, for tests that check what a command loads.
    const chunks = {};
    for (const [out, o] of Object.entries(r.metafile.outputs)) {
      if (!out.endsWith('.mjs')) continue;
      const files = Object.keys(o.inputs).filter((p) => !p.startsWith(`${LEFT_OUT}:`));
      const packages = new Set(files.filter((p) => p.includes('node_modules')).map((p) => dirname(packageManifestOf(resolve(CLI, p)) ?? resolve(CLI, p))));
      chunks[out.split('/').pop()] = [...files.filter((p) => !p.includes('node_modules')).map((p) => resolve(CLI, p)), ...[...packages].sort()].map((p) => relative(CLI, p).split(sep).join('/'));
    }
    writeFileSync(join(tmp, 'chunks.json'), JSON.stringify(chunks, null, 1) + '\n');
    const hash = createHash('sha256');
    for (const f of listFiles(tmp).sort()) hash.update(relative(tmp, f)).update('\0').update(readFileSync(f)).update('\0');
    const name = hash.digest('hex').slice(0, 16);
    const dir = join(DIST, name);
    // A build folder appears whole (one rename) and is never replaced: another
    // process may be loading its chunks. If it exists, it holds these very bytes.
    if (!existsSync(join(dir, 'main.mjs'))) {
      try {
        renameSync(tmp, dir);
      } catch (e) {
        if (!existsSync(join(dir, 'main.mjs'))) throw e; // not another process's identical build
      }
    }
    const current = { format: FORMAT, dir: name, inputs: [...new Set(inputs)].sort().map((f) => stamp(f)) };
    const part = join(DIST, `.current-${process.pid}.json`);
    writeFileSync(part, JSON.stringify(current) + '\n');
    renameSync(part, join(DIST, 'current.json'));
    pruneOld(name);
    return join(dir, 'main.mjs');
  } finally {
    rmSync(tmp, { recursive: true, force: true });
  }
}

/** For a file inside node_modules, its package's package.json; otherwise undefined. */
function packageManifestOf(file) {
  const parts = file.split(sep);
  const i = parts.lastIndexOf('node_modules');
  if (i < 0) return undefined;
  const n = parts[i + 1]?.startsWith('@') ? 3 : 2;
  return parts.slice(0, i + n).concat('package.json').join(sep);
}

/** [path relative to packages/cli, size, mtime in ms] of one input. */
function stamp(file) {
  const s = statSync(file);
  return [relative(CLI, file).split(sep).join('/'), s.size, s.mtimeMs];
}

function listFiles(dir) {
  const out = [];
  for (const e of readdirSync(dir, { withFileTypes: true })) {
    const p = join(dir, e.name);
    if (e.isDirectory()) out.push(...listFiles(p));
    else out.push(p);
  }
  return out;
}

/** "@scope/name/sub/path" → "@scope/name"; "name/sub" → "name". */
function packageName(specifier) {
  const parts = specifier.split('/');
  return specifier.startsWith('@') ? parts.slice(0, 2).join('/') : parts[0];
}

/** Remove older builds, keeping the current one and any built in the last hour (a running process may still load its chunks). */
function pruneOld(keep) {
  const hourAgo = Date.now() - 3600_000;
  for (const e of readdirSync(DIST, { withFileTypes: true })) {
    if (!e.isDirectory() || e.name === keep) continue;
    const p = join(DIST, e.name);
    try {
      if (statSync(p).mtimeMs < hourAgo) rmSync(p, { recursive: true, force: true });
    } catch {
      /* removed meanwhile */
    }
  }
}

/**
 * Node built-ins and the NOT_BUNDLED packages are left to Node, the latter
 * rewritten to the real path of the file esbuild resolves, relative to the
 * output folder (dist/<hash>/); everything else is bundled.
 */
function thirdPartyByRealPath(externals) {
  const builtins = new Set(builtinModules);
  return {
    name: 'third-party-by-real-path',
    setup(build) {
      build.onResolve({ filter: /^[^./]/ }, async (args) => {
        if (args.pluginData === 'inner') return undefined;
        if (args.path.startsWith('node:') || builtins.has(args.path)) return { path: args.path, external: true };
        if (args.path.startsWith('@umbrafab/') || !NOT_BUNDLED.has(packageName(args.path))) return undefined;
        const r = await build.resolve(args.path, { kind: args.kind, resolveDir: args.resolveDir, importer: args.importer, pluginData: 'inner' });
        if (r.errors.length) return { errors: r.errors };
        externals.add(r.path);
        const fromOut = relative(join(DIST, 'x'), r.path).split(sep).join('/');
        return { path: fromOut.startsWith('.') ? fromOut : `./${fromOut}`, external: true };
      });
    },
  };
}

/** esbuild's namespace of the modules the bundle replaces (no file on disk: not a build input). */
const LEFT_OUT = 'umbrafab-left-out';
/** pdfkit's ES module build, the file the bundle takes in. */
const PDFKIT_MODULE = /[\\/]pdfkit[\\/]js[\\/]pdfkit\.node\.mjs$/;

/**
 * The PDF writer bundled, less its font engine. pdfkit imports fontkit at
 * load for the font files it can embed; the template writes only the PDF
 * standard fonts (Helvetica, from their metrics, no font file), so fontkit
 * and the Unicode tables and decompressors it loads (more than half of
 * pdfkit's load time) are replaced by a module whose `create` says so
 * (a bug, if it is ever reached). pdfkit finds its standard-font metrics and
 * colour profile from its own file's URL: in the bundle `import.meta.url`
 * names that file, at its real path relative to the output folder (as the
 * NOT_BUNDLED packages are imported), so they load from the installed
 * package as before. A pdfkit whose file no longer reads its URL twice
 * fails the build here, not a template at run time.
 */
function pdfkitAtItsOwnPath() {
  return {
    name: 'pdfkit-at-its-own-path',
    setup(build) {
      build.onResolve({ filter: /^fontkit$/ }, (args) => (PDFKIT_MODULE.test(args.importer) ? { path: 'fontkit', namespace: LEFT_OUT } : undefined));
      build.onLoad({ filter: /.*/, namespace: LEFT_OUT }, () => ({
        contents: "export function create() { throw new Error('umbrafab bundles pdfkit without fontkit: a PDF may use only the standard fonts (see pdfkitAtItsOwnPath in packages/cli/scripts/build.mjs)'); }",
        loader: 'js',
      }));
      build.onLoad({ filter: PDFKIT_MODULE }, (args) => {
        const text = readFileSync(args.path, 'utf8');
        const uses = text.split('import.meta.url').length - 1;
        if (uses !== 2) return { errors: [{ text: `${args.path}: expected import.meta.url twice (the standard fonts' require and the colour profile), found ${uses}` }] };
        const fromOut = relative(join(DIST, 'x'), args.path).split(sep).join('/');
        return { contents: text.replaceAll('import.meta.url', `new URL(${JSON.stringify(fromOut)}, import.meta.url)`), loader: 'js', resolveDir: dirname(args.path) };
      });
    },
  };
}

/** A package entry point: its `export { a, type B } from './x.ts'` lines name the package's public API. */
const PACKAGE_INDEX = /[\\/]packages[\\/](?:geometry|fabricate)[\\/]src[\\/]index\.ts$/;

/**
 * Hands esbuild each package index with its named re-exports as `export *`
 * from the same files (and its type-only lines dropped). esbuild cannot split
 * a file between chunks, and a file that re-exports names counts as reached,
 * with every file it re-exports from, by every chunk that imports any one of
 * them: the whole package would then sit in one chunk that `check` loads with
 * the PDF template (esbuild issues #2869 and #3531). Star re-exports resolve
 * straight to the defining file, so each chunk keeps only what it uses. The
 * names the bundle can reach stay those the index lists: every importer is
 * type-checked against it.
 */
function packageIndexAsStars() {
  return {
    name: 'package-index-as-stars',
    setup(build) {
      build.onLoad({ filter: PACKAGE_INDEX }, (args) => {
        const text = readFileSync(args.path, 'utf8');
        const stars = text.replace(/export\s+type\s*\{[^}]*\}\s*from\s*'[^']+';/g, '').replace(/export\s*\{[^}]*\}\s*from\s*('[^']+');/g, 'export * from $1;');
        if (/export\s*\{/.test(stars)) return { errors: [{ text: `${args.path}: an export this build cannot turn into export * (only \`export { ... } from '...'\` lines)` }] };
        return { contents: stars, loader: 'ts', resolveDir: dirname(args.path) };
      });
    },
  };
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const main = await buildDist();
  console.log(`umbrafab: built ${relative(ROOT, dirname(main))}`);
}
