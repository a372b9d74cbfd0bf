import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { parse as parseYaml } from 'yaml';
import { describe, expect, it } from 'vitest';
import { checkDial, eastToFaceX, markOffsetEastMm, marksFromPlate, parseSpec, type DialLayout } from '@umbrafab/geometry';
import { checkTableText } from '@umbrafab/fabricate';
import { buildFiles, parsePlateDxf } from '@umbrafab/cli';
import { runCli } from './helpers/runCli.ts';

const ROOT = resolve(import.meta.dirname, '..');
const DEMO = join(ROOT, 'fixtures/demo.yaml');
const DEG = Math.PI / 180;

type Built = Awaited<ReturnType<typeof buildFiles>>;
const text = (built: Built, name: string) => new TextDecoder().decode(built.files.find((f) => f.name === name)!.bytes);

const demo = await buildFiles(parseSpec(parseYaml(readFileSync(DEMO, 'utf8'))));
const south = await buildFiles(
  parseSpec({ site: { latitude: -33.9, longitude: 18.4, timezone: 'Africa/Johannesburg' }, process: { method: 'waterjet' }, marks: { hour: { width: 1.6 }, half: { width: 1.2 }, quarter: { width: 1 } }, check: { sampling: { everyDays: 3 } } }),
);

/**
 * Move the LINE_SCORE polyline whose x is `xPlate` by `dxMm` in the DXF text
 * itself (group code 10 = vertex x, AutoCAD DXF Reference), as a CAD edit would.
 */
function moveScoreLine(dxf: string, xPlate: number, dxMm: number): { text: string; moved: number } {
  const lines = dxf.split('\n');
  let layer = '';
  let moved = 0;
  for (let i = 0; i + 1 < lines.length; i += 2) {
    const code = lines[i].trim();
    const value = lines[i + 1];
    if (code === '0') layer = '';
    if (code === '8') layer = value.trim();
    if (code === '10' && layer === 'LINE_SCORE' && Math.abs(Number(value) - xPlate) < 1e-5) {
      lines[i + 1] = String(Number(value) + dxMm);
      moved++;
    }
  }
  return { text: lines.join('\n'), moved };
}

describe('umbrafab check on correct builds', () => {
  // Acceptance: the layout's tan law with the thick gnomon, cast
  // with the real Sun (astronomy-engine, docs/design.md §7) from the real mesh.
  it('the demo build checks clean: worst geometric error <= 0.001 mm over the year', () => {
    const r = checkDial(demo.layout);
    console.log(`demo (layout marks): worst ${r.worst!.errorMm.toExponential(2)} mm (${r.worst!.errorS.toExponential(2)} s) at ${r.worst!.label} ${r.worst!.style} on ${r.worst!.date}; ${r.sunPositions} sun positions`);
    expect(r.pass).toBe(true);
    expect(Math.abs(r.worst!.errorMm)).toBeLessThanOrEqual(0.001);
    expect(r.days.length).toBe(365);
    expect(r.marks.length).toBe(demo.layout.marks.length);
    for (const m of r.marks) expect(m.reachedDays).toBeGreaterThan(100);
  });

  it('the demo plate.dxf read back checks clean too (marks from the drawing, 6-decimal coordinates)', () => {
    const found = marksFromPlate(demo.layout, parsePlateDxf(text(demo, 'plate.dxf')).lines);
    expect(found.unmatched).toEqual([]);
    const r = checkDial(demo.layout, { drawn: found.drawn, source: 'plate' });
    console.log(`demo (plate.dxf): worst ${r.worst!.errorMm.toExponential(2)} mm at ${r.worst!.label} ${r.worst!.style}`);
    expect(r.pass).toBe(true);
    expect(Math.abs(r.worst!.errorMm)).toBeLessThanOrEqual(0.001);
  });

  it('a southern waterjet plate (etched outlines, mirrored face) reads back and checks clean', () => {
    const found = marksFromPlate(south.layout, parsePlateDxf(text(south, 'plate.dxf')).lines);
    const r = checkDial(south.layout, { drawn: found.drawn, source: 'plate' });
    console.log(`south waterjet (plate.dxf): worst ${r.worst!.errorMm.toExponential(2)} mm at ${r.worst!.label} ${r.worst!.style}`);
    expect(r.hemisphere).toBe('south');
    expect(Math.abs(r.worst!.errorMm)).toBeLessThanOrEqual(0.001);
  });

  it('the equation-of-time offset of a standard-time dial is reported apart: about −16.4 … +14.2 min (common practice: E from −14 to +16 min)', () => {
    const r = checkDial(demo.layout, { everyDays: 2 });
    for (const m of r.marks) {
      expect(m.clockOffsetMin.min).toBeGreaterThan(-17);
      expect(m.clockOffsetMin.min).toBeLessThan(-16);
      expect(m.clockOffsetMin.max).toBeGreaterThan(14);
      expect(m.clockOffsetMin.max).toBeLessThan(14.5);
    }
  });
});

describe('umbrafab check catches broken plates', () => {
  it('a plate.dxf with one mark moved by 0.5 mm: exit 1, the message names the mark and a day', async () => {
    const target = demo.layout.marks.find((m) => m.label === '10:00')!;
    const xPlate = demo.layout.plate.substyleX + target.xMm;
    const edit = moveScoreLine(text(demo, 'plate.dxf'), xPlate, 0.5);
    expect(edit.moved).toBe(2); // both ends of the centre-line
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-check-moved-'));
    const file = join(dir, 'plate.dxf');
    writeFileSync(file, edit.text);
    const r = await runCli(['check', DEMO, '--plate', file]);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/mark 10:00 west is 0\.50\d\d mm off the simulated shadow on \d{4}-\d{2}-\d{2}/);
    expect(r.out).toMatch(/FAIL: mark 10:00 west: shadow -0\.50\d mm/);
    // only that mark fails
    expect(r.out.match(/FAIL:/g)?.length).toBe(1);
  });

  it('a layout that ignores the gnomon thickness (marks for t = 0, real gnomon 3 mm): every mark fails by t/2 (no mark sits at H = 0 on this standard-time dial)', () => {
    const L = demo.layout;
    const thin: DialLayout = {
      ...L,
      marks: L.marks.map((m) => ({ ...m, xMm: eastToFaceX(markOffsetEastMm(m.hourAngleDeg * DEG, L.gnomon.heightMm, 0, m.style), L.hemisphere) })),
    };
    const r = checkDial(thin, { everyDays: 5 });
    expect(r.pass).toBe(false);
    const table = checkTableText(r);
    expect(table).toMatch(/FAIL: mark 09:00 west: shadow -1\.500 mm/);
    expect(table).toMatch(/FAIL: mark 15:00 east: shadow \+1\.500 mm/);
    for (const f of r.failures) expect(Math.abs(f.errorMm)).toBeCloseTo(L.gnomon.thicknessMm / 2, 6);
    console.log(`thin-style layout: ${r.failures.length} of ${r.marks.length} marks fail, worst ${r.worst!.errorMm.toFixed(4)} mm (${r.worst!.errorS.toFixed(1)} s) at ${r.worst!.label} ${r.worst!.style}`);
  });

  it('an installation error shows as geometric error, and the per-degree shifts match it', () => {
    const r = checkDial(demo.layout, { everyDays: 7, azimuthErrorDeg: 1 });
    const base = checkDial(demo.layout, { everyDays: 7 });
    expect(r.pass).toBe(false);
    for (let i = 0; i < r.marks.length; i++) {
      // the simulated 1° error (as a time lag) equals the predicted shift per degree, to first order
      const predicted = base.marks[i].azimuthShiftMinPerDeg.meanAbs;
      expect(r.marks[i].errorS.meanAbs / 60).toBeCloseTo(predicted, 1);
    }
  });
});
