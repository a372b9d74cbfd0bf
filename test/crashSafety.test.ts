import { execFileSync, spawn, spawnSync } from 'node:child_process';
import { existsSync, lstatSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { recoverInterrupted } from '@umbrafab/cli';

const ROOT = resolve(import.meta.dirname, '..');
const BIN = join(ROOT, 'packages/cli/bin/umbrafab.js');
const DEMO = join(ROOT, 'fixtures/demo.yaml');
const work = mkdtempSync(join(tmpdir(), 'umbrafab-crash-'));

/** A reference build of a spec: file name → bytes. */
function referenceBuild(spec: string): Map<string, Buffer> {
  const out = mkdtempSync(join(work, 'ref-'));
  execFileSync(process.execPath, [BIN, 'build', spec, '--out', out]);
  return new Map(readdirSync(out).map((f) => [f, readFileSync(join(out, f))]));
}

/** Start a build that blocks at a test pause point, then SIGKILL it there. */
async function killAt(envName: string, count: number, out: string): Promise<void> {
  const child = spawn(process.execPath, [BIN, 'build', DEMO, '--out', out, '--force'], {
    env: { ...process.env, [envName]: String(count) },
    stdio: ['ignore', 'ignore', 'pipe'],
  });
  await new Promise<void>((done, fail) => {
    let err = '';
    child.stderr.on('data', (d) => {
      err += String(d);
      if (err.includes('umbrafab-test: paused')) {
        child.kill('SIGKILL');
      }
    });
    child.on('exit', (code, signal) => (signal === 'SIGKILL' ? done() : fail(new Error(`build ended without pausing (code ${code}): ${err}`))));
  });
}

const ref = referenceBuild(DEMO);
const names = [...ref.keys()];
const other = join(work, 'other.yaml');
writeFileSync(other, readFileSync(DEMO, 'utf8').replace('name: "Windlecombe Quay"', 'name: "Windlecombe Quay east bed"'));
const refB = referenceBuild(other);
afterAll(() => rmSync(work, { recursive: true, force: true }));

/** A folder holding the old set (the other spec's files) and a user's own files, one named like an old-style temporary file. */
function folderWithOldSet(): string {
  const out = mkdtempSync(join(work, 'kill-'));
  for (const [f, bytes] of refB) writeFileSync(join(out, f), bytes);
  writeFileSync(join(out, '.x.tmp-999999-k1'), 'mine');
  writeFileSync(join(out, '.plate.dxf.tmp-999999-k1'), 'mine too');
  writeFileSync(join(out, 'notes.txt'), 'my notes');
  return out;
}

/** The folder's output files (names of the set) with their bytes compared to one reference set. */
function holdsWholeSet(out: string, set: Map<string, Buffer>): boolean {
  const finals = readdirSync(out).filter((f) => ref.has(f));
  return finals.length === set.size && finals.every((f) => readFileSync(join(out, f)).equals(set.get(f)!));
}

function userFilesIntact(out: string): void {
  expect(readFileSync(join(out, '.x.tmp-999999-k1'), 'utf8')).toBe('mine');
  expect(readFileSync(join(out, '.plate.dxf.tmp-999999-k1'), 'utf8')).toBe('mine too');
  expect(readFileSync(join(out, 'notes.txt'), 'utf8')).toBe('my notes');
}

describe('crash safety of umbrafab build', () => {
  it('a SIGKILL at each point of a --force rebuild leaves the whole old set or, once committed, the whole new set', async () => {
    const points: [string, number, 'old' | 'new'][] = [
      ['UMBRAFAB_TEST_PAUSE_AFTER_TEMPS', 0, 'old'],
      ['UMBRAFAB_TEST_PAUSE_AFTER_TEMPS', Math.floor(names.length / 2), 'old'],
      ['UMBRAFAB_TEST_PAUSE_AFTER_TEMPS', names.length, 'old'],
      // Each rename point: before the first rename, after one, half, all but one, and all of them.
      ...[0, 1, Math.floor(names.length / 2), names.length - 1, names.length].map((i): [string, number, 'old'] => ['UMBRAFAB_TEST_PAUSE_AFTER_RENAMES', i, 'old']),
      ['UMBRAFAB_TEST_PAUSE_AFTER_COMMIT', 0, 'new'],
    ];
    for (const [envName, count, expected] of points) {
      const out = folderWithOldSet();
      await killAt(envName, count, out);
      // Before renames start, and after the commit, the folder is already whole; in between the next write puts it right.
      if (envName === 'UMBRAFAB_TEST_PAUSE_AFTER_TEMPS') expect(holdsWholeSet(out, refB), `${envName}=${count} before recovery`).toBe(true);
      expect(readdirSync(out).some((f) => f.includes('.umbrafab-')), 'the dead write left its journal').toBe(true);
      recoverInterrupted(out);
      expect(holdsWholeSet(out, expected === 'old' ? refB : ref), `${envName}=${count}: whole ${expected} set`).toBe(true);
      expect(readdirSync(out).filter((f) => f.includes('.umbrafab-')), `${envName}=${count}: helper files removed`).toEqual([]);
      userFilesIntact(out);
    }
  });

  it('the next build does the recovery itself: without --force it rolls back and refuses; with --force it completes', async () => {
    const out = folderWithOldSet();
    await killAt('UMBRAFAB_TEST_PAUSE_AFTER_RENAMES', 3, out);
    expect(holdsWholeSet(out, refB)).toBe(false); // a mix, until the next write into this folder
    const r = spawnSync(process.execPath, [BIN, 'build', DEMO, '--out', out], { encoding: 'utf8' });
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/already holds .*--force to replace them \(put back the old files of an interrupted write/);
    expect(holdsWholeSet(out, refB)).toBe(true);
    execFileSync(process.execPath, [BIN, 'build', DEMO, '--out', out, '--force']);
    expect(holdsWholeSet(out, ref)).toBe(true);
    expect(readdirSync(out).filter((f) => f.startsWith('.')).sort()).toEqual(['.plate.dxf.tmp-999999-k1', '.x.tmp-999999-k1']);
    userFilesIntact(out);
  });

  it('a first build killed midway leaves, after recovery, no output file at all', async () => {
    const out = mkdtempSync(join(work, 'first-'));
    await killAt('UMBRAFAB_TEST_PAUSE_AFTER_RENAMES', 2, out);
    expect(recoverInterrupted(out)).toMatch(/put back the old files/);
    expect(readdirSync(out)).toEqual([]);
  });

  it('a failure midway through the renames is rolled back, and the message says so and no more', () => {
    const out = folderWithOldSet();
    const r = spawnSync(process.execPath, [BIN, 'build', DEMO, '--out', out, '--force'], { encoding: 'utf8', env: { ...process.env, UMBRAFAB_TEST_FAIL_AT_RENAME: '4' } });
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/--out: could not write into .*: test failure at UMBRAFAB_TEST_FAIL_AT_RENAME=4; the 4 files already replaced were put back as they were/);
    expect(holdsWholeSet(out, refB)).toBe(true);
    expect(readdirSync(out).filter((f) => f.includes('.umbrafab-'))).toEqual([]);
    userFilesIntact(out);
  });

  it("a user's .x.tmp-999999-k1 (a dead pid, our old naming) survives a build", () => {
    const out = mkdtempSync(join(work, 'user-'));
    writeFileSync(join(out, '.x.tmp-999999-k1'), 'mine');
    writeFileSync(join(out, '.umbrafab-00000000000000000000000000000000.journal'), 'not json');
    execFileSync(process.execPath, [BIN, 'build', DEMO, '--out', out]);
    expect(readFileSync(join(out, '.x.tmp-999999-k1'), 'utf8')).toBe('mine');
    expect(existsSync(join(out, '.umbrafab-00000000000000000000000000000000.journal'))).toBe(true);
  });

  it('a dangling symlink at an output name is an existing entry: refused without --force, replaced (not written through) with it', () => {
    const out = mkdtempSync(join(work, 'link-'));
    const target = join(work, 'link-target-that-does-not-exist');
    symlinkSync(target, join(out, 'install.md'));
    const r = spawnSync(process.execPath, [BIN, 'build', DEMO, '--out', out], { encoding: 'utf8' });
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/^umbrafab: --out: .* already holds install\.md; allowed: an empty or new folder, or --force/);
    expect(readdirSync(out)).toEqual(['install.md']);
    execFileSync(process.execPath, [BIN, 'build', DEMO, '--out', out, '--force']);
    expect(lstatSync(join(out, 'install.md')).isSymbolicLink()).toBe(false);
    expect(existsSync(target)).toBe(false);
  });

  it('two builds writing into one folder at once leave every file whole, from one build or the other', async () => {
    for (let round = 0; round < 4; round++) {
      const out = mkdtempSync(join(work, 'race-'));
      const run = (spec: string) =>
        new Promise<number>((done) => spawn(process.execPath, [BIN, 'build', spec, '--out', out, '--force'], { stdio: 'ignore' }).on('exit', (c) => done(c ?? -1)));
      const codes = await Promise.all([run(DEMO), run(other)]);
      expect(codes).toEqual([0, 0]);
      const finals = readdirSync(out).sort();
      expect(finals).toEqual([...names].sort());
      for (const f of finals) {
        const bytes = readFileSync(join(out, f));
        expect(bytes.equals(ref.get(f)!) || bytes.equals(refB.get(f)!), `${f} in round ${round}`).toBe(true);
      }
    }
  });

  // Needs root (mount); CI runs as root. Skipped with a message elsewhere.
  const canMount = spawnSync('sh', ['-c', 'd=$(mktemp -d) && mount -t tmpfs -o size=16k tmpfs "$d" && umount "$d"']).status === 0;

  it.skipIf(!canMount)('a full disk gives a clear error and no file at all', () => {
    const dir = mkdtempSync(join(work, 'full-'));
    execFileSync('mount', ['-t', 'tmpfs', '-o', 'size=48k', 'tmpfs', dir]);
    try {
      const r = spawnSync(process.execPath, [BIN, 'build', DEMO, '--out', join(dir, 'out')], { encoding: 'utf8' });
      expect(r.status).toBe(1);
      expect(r.stderr).toMatch(/the disk is full; no file in it was changed/);
      expect(readdirSync(join(dir, 'out'))).toEqual([]);
    } finally {
      execFileSync('umount', [dir]);
    }
  });

  it.skipIf(!canMount)('a read-only folder gives a clear error', () => {
    const dir = mkdtempSync(join(work, 'ro-'));
    mkdirSync(join(dir, 'out'));
    execFileSync('mount', ['-t', 'tmpfs', '-o', 'ro,size=64k', 'tmpfs', join(dir, 'out')]);
    try {
      const r = spawnSync(process.execPath, [BIN, 'build', DEMO, '--out', join(dir, 'out')], { encoding: 'utf8' });
      expect(r.status).toBe(1);
      expect(r.stderr).toMatch(/--out: could not write into .*: the folder is not writable/);
      expect(existsSync(join(dir, 'out', 'plate.dxf'))).toBe(false);
    } finally {
      execFileSync('umount', [join(dir, 'out')]);
    }
  });
});
