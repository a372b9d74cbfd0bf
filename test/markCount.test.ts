import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { countMarks, layoutDial } from '@umbrafab/geometry';
import { readSpecFile, summaryRows } from '@umbrafab/cli';
import { runCli } from './helpers/runCli.ts';

const ROOT = resolve(import.meta.dirname, '..');
// Solar time, 08:00–16:00 every 15 min: 33 times, of which 12:00 is the noon band under the fin (two lines, neither engraved).
const SOLAR = join(ROOT, 'fixtures/specs/serve-solar.yaml');

describe('one count of marks', () => {
  it('build, the page, install.md and check give the same count; noon counts once', async () => {
    const layout = layoutDial(readSpecFile(SOLAR));
    const n = countMarks(layout.marks);
    expect(n).toEqual({ marks: 33, engraved: 32, underGnomon: ['12:00'] });
    expect(layout.marks.filter((m) => m.label === '12:00').length).toBe(2);
    const out = mkdtempSync(join(tmpdir(), 'umbrafab-marks-'));
    const build = await runCli(['build', SOLAR, '--out', out]);
    expect(build.code, build.err).toBe(0);
    expect(build.out).toMatch(/, 33 marks \(12:00 is the noon band under the gnomon, not engraved\), laser kerf/);
    const md = readFileSync(join(out, 'install.md'), 'utf8');
    expect(md).toMatch(/All 33 marks are reached/);
    expect(summaryRows(layout).find((r) => r.key === 'marks')?.value).toBe('33 marks (12:00 is the noon band under the gnomon, not engraved)');
    const check = await runCli(['check', SOLAR]);
    expect(check.out).toMatch(/^32 engraved marks measured \(from the layout\)/m);
    expect(check.out).toMatch(/^note: the face has 33 marks \(12:00 is the noon band under the gnomon, not engraved\); the check measures the 32 engraved ones$/m);
  });
});
