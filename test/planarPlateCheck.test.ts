import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { moveDxfVertices } from './helpers/moveDxfVertices.ts';
import { runCli } from './helpers/runCli.ts';

const ROOT = resolve(import.meta.dirname, '..');

describe('umbrafab check --plate on every planar face type (marks read back from plate.dxf)', () => {
  for (const fixture of ['garden-horizontal', 'wall-declining', 'wall-reclining', 'meridian-east', 'equatorial', 'equatorial-lower']) {
    it(`${fixture}: the written plate.dxf checks clean; one hour line moved 0.5 mm fails, naming that line`, async () => {
      const spec = join(ROOT, `fixtures/planar/${fixture}.yaml`);
      const out = mkdtempSync(join(tmpdir(), 'umbrafab-pplate-'));
      const b = await runCli(['build', spec, '--out', out, '--force']);
      expect(b.code, b.err).toBe(0);
      const dxf = readFileSync(join(out, 'plate.dxf'), 'utf8');
      const clean = await runCli(['check', spec, '--plate', join(out, 'plate.dxf')]);
      expect(clean.code, clean.err).toBe(0);
      expect(clean.out).toMatch(/pass: every line and curve within tolerance/);

      const report = JSON.parse(readFileSync(join(out, 'report.json'), 'utf8'));
      const marks = report.marks.filter((m: { underGnomon?: boolean }) => !m.underGnomon);
      // A line in the middle of the list, moved 0.5 mm square to itself (across the shadow).
      const target = marks[marks.length >> 1];
      const { substyleX, faceOriginY } = report.plate;
      const ends: [number, number][] = [[target.x0Mm + substyleX, target.y0Mm + faceOriginY], [target.x1Mm + substyleX, target.y1Mm + faceOriginY]];
      const len = Math.hypot(ends[1][0] - ends[0][0], ends[1][1] - ends[0][1]);
      const across: [number, number] = [(-(ends[1][1] - ends[0][1]) / len) * 0.5, ((ends[1][0] - ends[0][0]) / len) * 0.5];
      const edit = moveDxfVertices(dxf, ends, across);
      expect(edit.moved).toBeGreaterThanOrEqual(2);
      const file = join(mkdtempSync(join(tmpdir(), 'umbrafab-pplate-moved-')), 'plate.dxf');
      writeFileSync(file, edit.text);
      const r = await runCli(['check', spec, '--plate', file]);
      console.log(`${fixture}: moved line ${target.label} ${target.edge} by 0.5 mm across -> ${r.err.trim()}`);
      expect(r.code).toBe(1);
      expect(r.err).toContain(`mark ${target.label} ${target.edge} is`);
      expect(r.err).toMatch(/mm off the simulated shadow on \d{4}-\d{2}-\d{2}/);
    });
  }

  it('a plate.dxf with the hour lines gone: exit 1 naming --plate and a line', async () => {
    const spec = join(ROOT, 'fixtures/planar/garden-horizontal.yaml');
    const out = mkdtempSync(join(tmpdir(), 'umbrafab-pplate-'));
    expect((await runCli(['build', spec, '--out', out, '--force'])).code).toBe(0);
    const stripped = readFileSync(join(out, 'plate.dxf'), 'utf8').replace(/\n\s*8\n(LINE_SCORE|MARK_CENTRE_NO_CUT|LINE_ETCH_OUTLINE)\n/g, '\n  8\nOTHER\n');
    const file = join(out, 'bare.dxf');
    writeFileSync(file, stripped);
    const r = await runCli(['check', spec, '--plate', file]);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/--plate/);
    expect(r.err).toMatch(/has no line in the drawing/);
  });
});
