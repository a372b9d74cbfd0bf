import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from './helpers/runCli.ts';

const ROOT = resolve(import.meta.dirname, '..');
const DEMO = join(ROOT, 'fixtures/demo.yaml');

describe('umbrafab check (CLI)', () => {
  it('passes on the demo spec: exit 0, a table with every mark and a PASS line', async () => {
    const r = await runCli(['check', DEMO]);
    expect(r.code).toBe(0);
    expect(r.err).toBe('');
    const lines = r.out.split('\n');
    expect(lines[0]).toMatch(/^mark\s+lit days\s+worst mm\s+worst s/);
    expect(lines.filter((l) => /^\d\d:\d\d (west|east)\s/.test(l)).length).toBe(33);
    expect(r.out).toMatch(/^PASS: /m);
    expect(r.out).toMatch(/33 engraved marks measured \(from the layout\) x 365 days of 2027, \d+ sun positions/);
  });

  it('--out writes check.json and check.svg, byte-identical on a second run; --year changes the simulated year', async () => {
    const a = mkdtempSync(join(tmpdir(), 'umbrafab-check-a-'));
    const b = mkdtempSync(join(tmpdir(), 'umbrafab-check-b-'));
    expect((await runCli(['check', DEMO, '--out', a])).code).toBe(0);
    expect((await runCli(['check', DEMO, '--out', b])).code).toBe(0);
    for (const f of ['check.json', 'check.svg']) expect(readFileSync(join(a, f)).equals(readFileSync(join(b, f))), f).toBe(true);
    const json = JSON.parse(readFileSync(join(a, 'check.json'), 'utf8'));
    expect(json).toMatchObject({ year: 2027, pass: true, toleranceMm: 0.05, source: 'layout' });
    expect(json.marks[0].errorsMm.length).toBe(365);
    expect(readFileSync(join(a, 'check.svg'), 'utf8')).toMatch(/^<svg xmlns="http:\/\/www.w3.org\/2000\/svg"/);
    const again = await runCli(['check', DEMO, '--out', a]);
    expect(again.code).toBe(1);
    expect(again.err).toMatch(/--force/);
    const y = await runCli(['check', DEMO, '--year', '2028']);
    expect(y.code).toBe(0);
    expect(y.out).toMatch(/x 366 days of 2028/);
  });

  it('the tolerance is a spec option: a tilt error simulated in the spec fails, naming the mark and the day', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-check-spec-'));
    const spec = join(dir, 'tilted.yaml');
    writeFileSync(spec, readFileSync(DEMO, 'utf8') + 'check:\n  tolerance: 0.5\n  tiltError: 2\n  sampling:\n    everyDays: 7\n');
    const r = await runCli(['check', spec]);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/^umbrafab check: mark \d\d:\d\d (west|east) is \d+\.\d{4} mm off the simulated shadow on 2027-\d\d-\d\d \(tolerance 0.5 mm\)/);
  });

  it('bad input: a missing --plate file and an unknown check field are exit 1 with the field named', async () => {
    const r = await runCli(['check', DEMO, '--plate', join(ROOT, 'nope.dxf')]);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/--plate: no such file/);
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-check-bad-'));
    const spec = join(dir, 'bad.yaml');
    writeFileSync(spec, readFileSync(DEMO, 'utf8') + 'check:\n  tolerence: 0.1\n');
    const bad = await runCli(['check', spec]);
    expect(bad.code).toBe(1);
    expect(bad.err).toMatch(/check/);
    writeFileSync(spec, readFileSync(DEMO, 'utf8') + 'check:\n  tolerance: -1\n');
    const neg = await runCli(['check', spec]);
    expect(neg.code).toBe(1);
    expect(neg.err).toMatch(/check\.tolerance.*allowed: a number greater than 0 mm/);
  });
});
