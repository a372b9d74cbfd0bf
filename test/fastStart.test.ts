import { spawn, spawnSync } from 'node:child_process';
import { cpSync, mkdtempSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer } from '@umbrafab/cli';

// The bin runs the plain-JavaScript build (packages/cli/dist/) and each
// command loads only what its outputs need. What a child process loads is
// read from the ES module loader itself (test/helpers/loadedModules.mjs
// records every module URL it loads), not inferred from timings.

const ROOT = resolve(import.meta.dirname, '..');
const BIN = join(ROOT, 'packages/cli/bin/umbrafab.js');
const PROBE = join(ROOT, 'test/helpers/loadedModules.mjs');
const work = mkdtempSync(join(tmpdir(), 'umbrafab-faststart-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));
// In a working tree whose sources changed since the last bundle the bin rebuilds first (loading esbuild):
// run it once so the processes measured below start from a current bundle, as on a fresh clone after set-up.
beforeAll(() => {
  const r = spawnSync(process.execPath, [BIN, '--version'], { cwd: ROOT, encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`umbrafab --version failed: ${r.stderr}`);
}, 120_000);

/** Third-party packages that only some outputs need, by the folder pnpm stores them in (loaded from there, or bundled: chunks.json names each chunk's packages by that folder). */
const HEAVY_PACKAGES: Record<string, RegExp> = {
  'the PDF writer (pdfkit)': /\/node_modules\/\.pnpm\/pdfkit@/,
  'the rasteriser (@resvg/resvg-js)': /\/node_modules\/\.pnpm\/@resvg\+resvg-js/,
  'the mesh kernel (manifold-3d)': /\/node_modules\/\.pnpm\/manifold-3d@/,
  'the 3D page library (three)': /\/node_modules\/\.pnpm\/three@/,
  'the TypeScript transform (tsx)': /\/node_modules\/\.pnpm\/(tsx|esbuild)@/,
};
/** Project modules that only some outputs need, by their source path (dist/<hash>/chunks.json lists the sources in each chunk). */
const HEAVY_SOURCES: Record<string, string> = {
  'the PDF template writer': 'fabricate/src/template/toTemplatePdf.ts',
  'the PNG writer': 'fabricate/src/pictures/toPng.ts',
  'the mesh booleans': 'geometry/src/parts/bodySolid.ts',
  'the year-long shadow check': 'geometry/src/shadow/checkDial.ts',
  'the engraving path ordering': 'fabricate/src/engrave/',
  'the page server': 'src/serve/handleRequest.ts',
};

let runs = 0;
/** Run the bin with `args`; the URLs of every module the process loaded, and its output. */
function loaded(args: readonly string[], bin = BIN, cwd = ROOT): { urls: string[]; stdout: string; status: number | null; stderr: string } {
  const list = join(work, `modules-${++runs}.txt`);
  const r = spawnSync(process.execPath, ['--import', PROBE, bin, ...args], { cwd, encoding: 'utf8', env: { ...process.env, UMBRAFAB_LOADED_MODULES: list } });
  let urls: string[] = [];
  try {
    urls = readFileSync(list, 'utf8').split('\n').filter(Boolean);
  } catch {
    /* nothing loaded: the assertions below fail */
  }
  return { urls, stdout: r.stdout, stderr: r.stderr, status: r.status };
}

/** The project sources and bundled packages a process ran: those of every loaded dist chunk, from the build's own chunks.json. */
function distSources(urls: readonly string[]): string[] {
  const out: string[] = [];
  for (const u of urls) {
    const m = /^(.*\/packages\/cli\/dist\/[0-9a-f]+)\/([^/]+\.mjs)$/.exec(fileURLToPath(u.startsWith('file:') ? u : 'file:///nothing'));
    if (!m) continue;
    const chunks = JSON.parse(readFileSync(join(m[1], 'chunks.json'), 'utf8')) as Record<string, string[]>;
    out.push(...(chunks[m[2]] ?? []));
  }
  return out;
}
const holds = (sources: readonly string[], path: string) => sources.some((s) => s.includes(path));

/** Whether a process loaded the heavy package `what`: from its own folder, or in a bundled chunk. */
function loadedPackage(urls: readonly string[], what: string): boolean {
  const re = HEAVY_PACKAGES[what];
  return urls.some((u) => re.test(u)) || distSources(urls).some((s) => re.test(`/${s}`));
}

function expectNoneHeavy(urls: readonly string[]): void {
  for (const what of Object.keys(HEAVY_PACKAGES)) expect(loadedPackage(urls, what), what).toBe(false);
  const sources = distSources(urls);
  expect(sources.length).toBeGreaterThan(0);
  for (const [what, path] of Object.entries(HEAVY_SOURCES)) expect(holds(sources, path), what).toBe(false);
}

describe('the bin loads only what a command needs', () => {
  const cases: [string, string[]][] = [
    ['--help', ['--help']],
    ['--version', ['--version']],
    ['init', ['init', join(work, 'starter.yaml')]],
  ];
  for (const [name, args] of cases) {
    it(`${name} runs the built JavaScript and loads none of the heavy modules`, () => {
      const r = loaded(args);
      expect(r.status, r.stderr).toBe(0);
      expect(r.urls.some((u) => /\/packages\/cli\/dist\/[0-9a-f]+\/main\.mjs$/.test(u))).toBe(true);
      expect(r.urls.some((u) => u.endsWith('.ts'))).toBe(false);
      expectNoneHeavy(r.urls);
    });
  }

  it('the probe sees the heavy modules when an output needs them (the demo build writes a PDF and PNGs; the booleans of a printed body need the mesh kernel)', () => {
    const demo = loaded(['build', join(ROOT, 'fixtures/demo.yaml'), '--out', join(work, 'demo'), '--force']);
    expect(demo.status, demo.stderr).toBe(0);
    expect(loadedPackage(demo.urls, 'the PDF writer (pdfkit)')).toBe(true);
    expect(loadedPackage(demo.urls, 'the rasteriser (@resvg/resvg-js)')).toBe(true);
    // The template uses only the PDF standard fonts: pdfkit is bundled without its font engine (build.mjs, pdfkitAtItsOwnPath).
    expect([...demo.urls, ...distSources(demo.urls)].filter((u) => /\/\.pnpm\/fontkit@/.test(`/${u}`))).toEqual([]);
    expect(holds(distSources(demo.urls), 'fabricate/src/template/toTemplatePdf.ts')).toBe(true);
    expect(holds(distSources(demo.urls), 'fabricate/src/engrave/')).toBe(true);
    const body = loaded(['build', join(ROOT, 'fixtures/golden-specs/print-body.yaml'), '--out', join(work, 'body'), '--force']);
    expect(body.status, body.stderr).toBe(0);
    expect(loadedPackage(body.urls, 'the mesh kernel (manifold-3d)')).toBe(true);
  });

  it('check loads neither the PDF writer, the rasteriser nor the mesh kernel', () => {
    const r = loaded(['check', join(ROOT, 'fixtures/demo.yaml')]);
    expect(r.status, r.stderr).toBe(0);
    for (const what of ['the PDF writer (pdfkit)', 'the rasteriser (@resvg/resvg-js)', 'the mesh kernel (manifold-3d)', 'the TypeScript transform (tsx)']) {
      expect(loadedPackage(r.urls, what), what).toBe(false);
    }
    expect(holds(distSources(r.urls), 'geometry/src/shadow/checkDial.ts')).toBe(true);
    expect(holds(distSources(r.urls), 'fabricate/src/template/toTemplatePdf.ts')).toBe(false);
  });

  it("the page's full build runs in the built worker thread (no TypeScript transform) and serves the build's files", async () => {
    const list = join(work, 'modules-serve.txt');
    const child = spawn(process.execPath, ['--import', PROBE, BIN, 'serve', join(ROOT, 'fixtures/demo.yaml'), '--port', '0'], {
      cwd: ROOT,
      stdio: ['ignore', 'pipe', 'pipe'],
      env: { ...process.env, UMBRAFAB_LOADED_MODULES: list },
    });
    try {
      const url = await new Promise<string>((ok, fail) => {
        let out = '';
        child.stdout.on('data', (d) => {
          out += d;
          const m = /(http:\/\/127\.0\.0\.1:\d+)\//.exec(out);
          if (m) ok(m[1]);
        });
        child.on('exit', (code) => fail(new Error(`umbrafab serve exited ${code}`)));
      });
      const setup = (await (await fetch(`${url}/api/setup`)).json()) as { values: Record<string, unknown> };
      const view = (await (await fetch(`${url}/api/view`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ fields: setup.values }) })).json()) as { filesUrl: string };
      const files = (await (await fetch(url + view.filesUrl)).json()) as { files: { name: string; url: string }[] };
      expect(files.files.map((f) => f.name)).toContain('template.pdf');
      const pdf = Buffer.from(await (await fetch(url + files.files.find((f) => f.name === 'template.pdf')!.url)).arrayBuffer());
      expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
      expect(pdf.equals(readFileSync(join(ROOT, 'fixtures/golden/demo/template.pdf')))).toBe(true);
      // The page's script: build.mjs's bundle of src/serve/page/*.ts, the very bytes the server run from the sources bundles in memory.
      const builtPage = Buffer.from(await (await fetch(`${url}/page.js`)).arrayBuffer());
      const fromSources = await startServer({ specPath: join(ROOT, 'fixtures/demo.yaml'), port: 0, log: () => {} });
      try {
        const sourcePage = Buffer.from(await (await fetch(`${fromSources.url}page.js`)).arrayBuffer());
        expect(builtPage.toString()).toContain('import * as THREE from "three";');
        expect(builtPage.equals(sourcePage)).toBe(true);
      } finally {
        await fromSources.close();
      }
    } finally {
      child.kill();
    }
    const urls = readFileSync(list, 'utf8').split('\n').filter(Boolean);
    expect(urls.some((u) => /\/packages\/cli\/dist\/[0-9a-f]+\/fullBuildWorker\.mjs$/.test(u))).toBe(true);
    expect(urls.filter((u) => HEAVY_PACKAGES['the TypeScript transform (tsx)'].test(u) || u.endsWith('.ts'))).toEqual([]);
  });
});

describe('the bin never runs a stale build', () => {
  it('rebuilds dist/ when a source changes after the last build (in a copy of the packages)', () => {
    // A copy of the three packages beside links to this checkout's installed dependencies.
    const copy = join(work, 'repo');
    for (const p of ['cli', 'geometry', 'fabricate']) {
      cpSync(join(ROOT, 'packages', p), join(copy, 'packages', p), { recursive: true, filter: (src) => !/[\\/](node_modules|dist)$/.test(src) });
      symlinkSync(join(ROOT, 'packages', p, 'node_modules'), join(copy, 'packages', p, 'node_modules'));
    }
    symlinkSync(join(ROOT, 'node_modules'), join(copy, 'node_modules'));
    const bin = join(copy, 'packages/cli/bin/umbrafab.js');
    const mainTs = join(copy, 'packages/cli/src/main.ts');
    const version = /\.version\('([^']+)'\)/.exec(readFileSync(mainTs, 'utf8'))?.[1];
    expect(version).toBeDefined();

    const first = loaded(['--version'], bin, copy); // no dist yet: the bin builds it
    expect(first.status, first.stderr).toBe(0);
    expect(first.stdout.trim()).toBe(version);

    writeFileSync(mainTs, readFileSync(mainTs, 'utf8').replace(`.version('${version}')`, `.version('${version}-changed')`));
    const second = loaded(['--version'], bin, copy);
    expect(second.status, second.stderr).toBe(0);
    expect(second.stdout.trim()).toBe(`${version}-changed`);
    const dirs = (r: { urls: string[] }) => r.urls.map((u) => /\/dist\/([0-9a-f]+)\/main\.mjs$/.exec(u)?.[1]).filter(Boolean);
    expect(dirs(second)).not.toEqual(dirs(first));

    const third = loaded(['--version'], bin, copy); // fresh now: no rebuild, the same build
    expect(third.stdout.trim()).toBe(`${version}-changed`);
    expect(dirs(third)).toEqual(dirs(second));
    expect(third.urls.some((u) => u.endsWith('/scripts/build.mjs'))).toBe(false);
  });
});
