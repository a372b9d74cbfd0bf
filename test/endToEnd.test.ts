import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = resolve(import.meta.dirname, '..');
const BIN = join(ROOT, 'packages/cli/bin/umbrafab.js');
const DEMO = join(ROOT, 'fixtures/demo.yaml');

function build(out: string): string {
  return execFileSync(process.execPath, [BIN, 'build', DEMO, '--out', out], { encoding: 'utf8', cwd: ROOT });
}

describe('end to end: the umbrafab bin on the demo spec', () => {
  const a = mkdtempSync(join(tmpdir(), 'umbrafab-e2e-a-'));
  const b = mkdtempSync(join(tmpdir(), 'umbrafab-e2e-b-'));
  const summary = build(a);
  build(b);
  const report = JSON.parse(readFileSync(join(a, 'report.json'), 'utf8'));

  it('prints a one-line summary and writes the files report.json lists', () => {
    expect(summary.split('\n')[0]).toMatch(/^umbrafab: wrote \d+ files .* to .*plate\.dxf/);
    expect(readdirSync(a).sort()).toEqual([...report.files].sort());
  });

  it('writes byte-identical files on a second run', () => {
    for (const f of report.files) expect(readFileSync(join(b, f)).equals(readFileSync(join(a, f))), f).toBe(true);
  });

  it('fills the report contract of docs/design.md §6', () => {
    for (const m of report.marks) {
      expect(Object.keys(m).filter((k) => k !== 'underGnomon').sort()).toEqual(['hourAngleDeg', 'kind', 'label', 'minutes', 'style', 'widthMm', 'xMm', 'y0Mm', 'y1Mm'].sort());
    }
    expect(report.plate).toMatchObject({ widthMm: expect.any(Number), lengthMm: expect.any(Number), substyleX: expect.any(Number) });
    expect(report.gnomon).toMatchObject({ heightMm: 50, thicknessMm: 3 });
    expect(report.time).toMatchObject({ standardMeridianDeg: 0, longitudeCorrectionMin: 13.64 });
    expect(report.spec.site.timezone).toBe('Europe/London');
  });

  it('exits 2 only for internal errors and 1 for bad input', () => {
    const r = spawnSync(process.execPath, [BIN, 'build', join(ROOT, 'nope.yaml')], { encoding: 'utf8' });
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/spec file: no such file/);
  });

  it('init writes a starter spec that builds', () => {
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-init-'));
    const file = join(dir, 'mine.yaml');
    execFileSync(process.execPath, [BIN, 'init', file, '--year', '2028'], { encoding: 'utf8' });
    expect(readFileSync(file, 'utf8')).toMatch(/year: 2028/);
    // The site is a placeholder build refuses; filled in, the starter builds.
    const refused = spawnSync(process.execPath, [BIN, 'build', file, '--out', join(dir, 'out')], { encoding: 'utf8' });
    expect(refused.status).toBe(1);
    expect(refused.stderr).toMatch(/site\.latitude: still the starter spec's placeholder/);
    writeFileSync(file, readFileSync(file, 'utf8').replace('latitude: EDIT ME', 'latitude: 43.55').replace('longitude: EDIT ME', 'longitude: -5.92').replace('timezone: EDIT ME', 'timezone: Europe/Madrid'));
    const out = execFileSync(process.execPath, [BIN, 'build', file, '--out', join(dir, 'out')], { encoding: 'utf8' });
    expect(out).toMatch(/wrote/);
    const again = spawnSync(process.execPath, [BIN, 'init', file], { encoding: 'utf8' });
    expect(again.status).toBe(1);
  });
});
