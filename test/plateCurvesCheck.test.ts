import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { drawnCurvesFromLayout, layoutDial, layoutPlanar, type DrawnCurve } from '@umbrafab/geometry';
import { readSpecFile } from '@umbrafab/cli';
import { moveDxfVertices } from './helpers/moveDxfVertices.ts';
import { runCli } from './helpers/runCli.ts';

const ROOT = resolve(import.meta.dirname, '..');

/** Ten vertices from the middle of a curve's first piece, in plate coordinates. */
function stretchOf(curve: DrawnCurve, plate: { readonly substyleX: number; readonly faceOriginY: number }): [number, number][] {
  const p = curve.paths[0];
  const i0 = Math.floor(p.length / 2) - 5;
  return p.slice(i0, i0 + 10).map(([x, y]) => [x + plate.substyleX, y + plate.faceOriginY]);
}

// The date lines and mean-time curves are read back from plate.dxf by check --plate: the
// centre-lines on LINE_SCORE (scored plates) or MARK_CENTRE_NO_CUT (etched ones, beside the outlines).
const cases = [
  { name: 'polar, laser score (page-nodus)', spec: 'fixtures/specs/page-nodus.yaml', polar: true },
  { name: 'polar, waterjet etch (waterjet-nodus-60n)', spec: 'fixtures/specs/waterjet-nodus-60n.yaml', polar: true },
  { name: 'planar wall, waterjet etch (wall-declining)', spec: 'fixtures/planar/wall-declining.yaml', polar: false },
];

describe.each(cases)('umbrafab check --plate reads the curves back: $name', ({ spec: specPath, polar }) => {
  it('the written plate.dxf checks clean with its curves read from it; 12:00 mean time moved 0.5 mm in the drawing fails, naming it', async () => {
    const spec = join(ROOT, specPath);
    const out = mkdtempSync(join(tmpdir(), 'umbrafab-plate-curves-'));
    const b = await runCli(['build', spec, '--out', out, '--force']);
    expect(b.code, b.err).toBe(0);
    const clean = await runCli(['check', spec, '--plate', join(out, 'plate.dxf')]);
    expect(clean.code, clean.err).toBe(0);
    expect(clean.out).toMatch(polar ? /\d+ date line\(s\) and curve\(s\) \(read from the plate drawing\)/ : /note: the \d+ date line\(s\) and curve\(s\) checked were read from/);
    expect(clean.out).not.toMatch(/checked from the layout/);

    const parsed = readSpecFile(spec);
    const layout = polar ? layoutDial(parsed) : layoutPlanar(parsed);
    const curves: readonly DrawnCurve[] = polar ? drawnCurvesFromLayout(layoutDial(parsed)) : layoutPlanar(parsed).curves;
    const noon = curves.find((c) => c.label === '12:00 mean time')!;
    const edit = moveDxfVertices(readFileSync(join(out, 'plate.dxf'), 'utf8'), stretchOf(noon, layout.plate), [0.5, 0]);
    expect(edit.moved).toBe(10);
    const file = join(mkdtempSync(join(tmpdir(), 'umbrafab-plate-curves-moved-')), 'plate.dxf');
    writeFileSync(file, edit.text);
    const r = await runCli(['check', spec, '--plate', file]);
    console.log(`${specPath}: 12:00 mean time moved 0.5 mm in plate.dxf -> ${r.err.trim()}`);
    expect(r.code).toBe(1);
    // Across the curve by up to 0.5 mm (less where the stretch runs along x): beyond the 0.05 mm tolerance either way.
    expect(Number(/(0\.\d{4}) mm off/.exec(r.err)?.[1])).toBeGreaterThan(0.1);
    expect(r.err).toMatch(/12:00 mean time:? (is )?0\.\d{4} mm off the nodus shadow on \d{4}-\d\d-\d\d/);
  });
});
