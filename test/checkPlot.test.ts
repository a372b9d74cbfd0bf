import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { runCli } from './helpers/runCli.ts';
import { readSvgRows, type SvgRows } from './helpers/svgRows.ts';

const ROOT = resolve(import.meta.dirname, '..');

/** Run `umbrafab check --out` on a spec (JSON in a temporary folder) and read back check.json and check.svg. */
async function checkOut(spec: Record<string, unknown>): Promise<{ code: number; json: any; svg: SvgRows }> {
  const dir = mkdtempSync(join(tmpdir(), 'umbrafab-checkplot-'));
  const file = join(dir, 'spec.json');
  writeFileSync(file, JSON.stringify(spec));
  const r = await runCli(['check', file, '--out', join(dir, 'out')]);
  return { code: r.code, json: JSON.parse(readFileSync(join(dir, 'out', 'check.json'), 'utf8')), svg: readSvgRows(join(dir, 'out', 'check.svg')) };
}

/** The rows of one class ('curve', 'line'), failing ones included. */
const rowsOf = (svg: SvgRows, cls: string) => svg.rows.filter((row) => row.cls.split(' ')[0] === cls);

/** Every check.json curve has its row, in order, labelled, classed 'fail' exactly when it fails, its bar growing with its worst distance. */
function expectCurveRows(svg: SvgRows, curves: readonly { label: string; worstMm: number; pass: boolean }[]): void {
  const rows = rowsOf(svg, 'curve');
  expect(rows.length).toBe(curves.length);
  curves.forEach((c, i) => {
    expect(rows[i].title.startsWith(`${c.label}: worst `)).toBe(true);
    expect(rows[i].cls.includes('fail')).toBe(!c.pass);
  });
  for (let i = 0; i < curves.length; i++) for (let j = 0; j < curves.length; j++) if (curves[i].worstMm > curves[j].worstMm + 1e-9) expect(rows[i].width).toBeGreaterThanOrEqual(rows[j].width);
}

const NODUS = { site: { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' }, hours: { from: '09:00', to: '15:00', step: 60 }, gnomon: { nodus: true }, dial: { meanTimeCurves: true, reads: 'standard' } };

describe('check.svg plots the date lines and mean-time curves check.json measures', () => {
  it('polar with a nodus: one labelled row per curve of check.json, the curve tolerance line; none without a nodus', async () => {
    const ok = await checkOut({ ...NODUS, check: { sampling: { everyDays: 30 } } });
    expect(ok.code).toBe(0);
    expect(ok.json.curves.length).toBeGreaterThan(3);
    expectCurveRows(ok.svg, ok.json.curves);
    expect(ok.svg.texts.some((t) => t.text === `${ok.json.curveToleranceMm} mm tolerance`)).toBe(true);
    expect(ok.svg.texts.some((t) => t.cls === 'heading' && /^Date lines and mean-time curves/.test(t.text))).toBe(true);
    // Below the year plot (480 px high), which keeps its marks' series.
    expect(ok.svg.height).toBeGreaterThan(480 + 16 * ok.json.curves.length);

    const tight = await checkOut({ ...NODUS, check: { sampling: { everyDays: 30 }, tolerance: 1e-6 } });
    expect(tight.code).toBe(1);
    const failing = tight.json.curves.filter((c: { pass: boolean }) => !c.pass).length;
    expect(failing).toBeGreaterThan(0);
    expectCurveRows(tight.svg, tight.json.curves);
    expect(rowsOf(tight.svg, 'curve').filter((row) => row.cls.includes('fail')).length).toBe(failing);

    const plain = await checkOut({ ...NODUS, gnomon: {}, dial: {}, check: { sampling: { everyDays: 30 } } });
    expect(plain.json.curves).toEqual([]);
    expect(plain.svg.rows).toEqual([]);
    expect(plain.svg.height).toBe(480);
  });

  it('planar (a declining wall with a nodus): a row per hour line and per curve of check.json', async () => {
    const spec = parse(readFileSync(join(ROOT, 'fixtures/planar/wall-declining.yaml'), 'utf8'));
    const r = await checkOut({ ...spec, check: { sampling: { everyDays: 30 } } });
    expect(r.code).toBe(0);
    expect(r.json.curves.length).toBeGreaterThan(3);
    expectCurveRows(r.svg, r.json.curves);
    const lines = rowsOf(r.svg, 'line');
    expect(lines.length).toBe(r.json.marks.length);
    r.json.marks.forEach((m: { label: string; edge: string }, i: number) => expect(lines[i].title.startsWith(`${m.label} ${m.edge}: worst `)).toBe(true));
    expect(r.svg.texts.filter((t) => t.text === `${r.json.toleranceMm} mm tolerance`).length).toBe(2);
    expect(r.svg.texts[0].text).toMatch(/^PASS: vertical face over 2027, \d+ lines; worst /);
  });

  it('an equatorial plate engraved on both faces: both faces plotted, one under the other', async () => {
    const spec = parse(readFileSync(join(ROOT, 'fixtures/planar/equatorial-both.yaml'), 'utf8'));
    const r = await checkOut({ ...spec, check: { sampling: { everyDays: 30 } } });
    expect(r.code).toBe(0);
    expect(rowsOf(r.svg, 'line').length).toBe(r.json.marks.length + r.json.lowerFace.marks.length);
    expect(rowsOf(r.svg, 'curve').length).toBe(r.json.curves.length + r.json.lowerFace.curves.length);
    expect(r.svg.texts.filter((t) => t.cls === 'title').map((t) => t.text.split(',')[0])).toEqual(['PASS: equatorial upper face over 2027', 'PASS: equatorial lower face over 2027']);
  });
});
