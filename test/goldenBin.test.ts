import { spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { parse, stringify } from 'yaml';
import { afterAll, describe, expect, it } from 'vitest';
import { GOLDEN_SKIP, GOLDEN_SPECS, goldenDir } from '../scripts/update-golden.ts';
import { runCli } from './helpers/runCli.ts';

// The bin runs the bundle (packages/cli/dist/), where `umbrafab build` makes
// the engraving programs on a worker thread (engraveOnWorker.ts); the golden
// test builds in memory from the sources, in one thread. Both must give the
// same bytes, and a bad input found on the worker must come out as the same
// SpecError (exit 1, field named, no files) as in one thread.

const ROOT = resolve(import.meta.dirname, '..');
const BIN = join(ROOT, 'packages/cli/bin/umbrafab.js');
const PROBE = join(ROOT, 'test/helpers/loadedModules.mjs');
const work = mkdtempSync(join(tmpdir(), 'umbrafab-golden-bin-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function bin(args: readonly string[], modules?: string) {
  return spawnSync(process.execPath, [...(modules ? ['--import', PROBE] : []), BIN, ...args], {
    cwd: ROOT,
    encoding: 'utf8',
    env: { ...process.env, ...(modules ? { UMBRAFAB_LOADED_MODULES: modules } : {}) },
  });
}

describe.each(GOLDEN_SPECS)('the bin writes the golden files of %s', (spec) => {
  it('byte for byte, with the engraving (if any) made on the worker thread', () => {
    const out = join(work, spec.replace(/\W/g, '_'));
    const modules = join(work, `${spec.replace(/\W/g, '_')}.modules.txt`);
    const r = bin(['build', spec, '--out', out], modules);
    expect(r.status, r.stderr).toBe(0);
    // With engraving programs to write, the worker's own entry was loaded (workers inherit the --import probe), so
    // this was not the in-thread fallback; a spec with none (print-body) stops the worker unused.
    const programs = (JSON.parse(readFileSync(join(out, 'report.json'), 'utf8')) as { engraving: { programs: string[] } }).engraving.programs;
    if (programs.length > 0) expect(readFileSync(modules, 'utf8')).toMatch(/\/engraveWorker\.mjs\n/);
    const dir = goldenDir(spec);
    const written = readdirSync(out).filter((n) => !GOLDEN_SKIP.test(n)).sort();
    expect(written).toEqual(readdirSync(dir).sort());
    const differ = written.filter((n) => !readFileSync(join(out, n)).equals(readFileSync(join(dir, n))));
    expect(differ, 'files that differ from fixtures/golden (compare with test/golden.test.ts)').toEqual([]);
  });
});

describe('the bin builds every planar fixture with its pictures, from a folder outside the repository', () => {
  it.each(['garden-horizontal', 'wall-declining', 'equatorial-both'])('%s: exit 0, preview.png and assembly.png written, the same bytes as the in-process build', async (name) => {
    // Run from another folder and without pnpm's environment: every package must resolve from the bundle itself.
    const out = join(work, `planar-${name}`);
    const r = spawnSync(process.execPath, [BIN, 'build', join(ROOT, `fixtures/planar/${name}.yaml`), '--out', out], { cwd: work, encoding: 'utf8', env: { PATH: process.env.PATH ?? '', HOME: work } });
    expect(r.status, r.stderr).toBe(0);
    const names = readdirSync(out);
    expect(names).toContain('preview.png');
    expect(names).toContain('assembly.png');
    const inProcess = join(work, `planar-${name}-src`);
    expect((await runCli(['build', join(ROOT, `fixtures/planar/${name}.yaml`), '--out', inProcess])).code).toBe(0);
    const differ = names.filter((n) => !readFileSync(join(out, n)).equals(readFileSync(join(inProcess, n))));
    expect(differ).toEqual([]);
  });
});

describe('a face engraved with both programs (the laser program on the worker, the router program in the build thread: engraveBeside.ts)', () => {
  it('garden-horizontal with engrave.programs both: the same bytes as the in-process build', async () => {
    const spec = parse(readFileSync(join(ROOT, 'fixtures/planar/garden-horizontal.yaml'), 'utf8')) as { engrave?: Record<string, unknown> };
    const file = join(work, 'garden-both.yaml');
    writeFileSync(file, stringify({ ...spec, engrave: { ...spec.engrave, programs: 'both' } }));
    const out = join(work, 'garden-both');
    const r = spawnSync(process.execPath, [BIN, 'build', file, '--out', out], { cwd: ROOT, encoding: 'utf8' });
    expect(r.status, r.stderr).toBe(0);
    const names = readdirSync(out);
    expect(names).toEqual(expect.arrayContaining(['engrave.ngc', 'engrave-laser.gcode', 'report.json']));
    const inProcess = join(work, 'garden-both-src');
    expect((await runCli(['build', file, '--out', inProcess])).code).toBe(0);
    expect(names.filter((n) => !readFileSync(join(out, n)).equals(readFileSync(join(inProcess, n))))).toEqual([]);
  });
});

describe('a bad engraving input found on the worker thread', () => {
  it('is the same SpecError as in one thread: exit 1, the same message, no files', async () => {
    // The router fixture with a 0.5 mm V-bit for its 1 mm hour marks: refused by the engraving's tool check, which runs on the worker.
    const spec = parse(readFileSync(join(ROOT, 'fixtures/specs/engrave-router-brass.yaml'), 'utf8')) as { engrave: { tool: Record<string, unknown> } };
    spec.engrave.tool.vbitMaxWidthMm = 0.5;
    const file = join(work, 'bad-vbit.yaml');
    writeFileSync(file, stringify(spec));
    const r = bin(['build', file, '--out', join(work, 'bad-out')]);
    const here = await runCli(['build', file, '--out', join(work, 'bad-out-here')]);
    expect(r.status, r.stderr).toBe(1);
    expect(here.code).toBe(1);
    expect(r.stderr).toMatch(/engrave\.tool\.vbitMaxWidthMm: a 0\.5 mm V-bit is too narrow/);
    expect(r.stderr.trim()).toBe(here.err.trim());
    expect(readdirSync(work)).not.toContain('bad-out');
  });
});
