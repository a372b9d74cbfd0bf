import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { stringify } from 'yaml';
import { describe, expect, it } from 'vitest';
import { runCli } from './helpers/runCli.ts';
import { runRs274 } from './helpers/rs274.ts';

const ROOT = resolve(import.meta.dirname, '..');
const BOTH = join(ROOT, 'fixtures/specs/engrave-demo-both.yaml');

describe('umbrafab build writes the engraving programs (CLI end to end)', () => {
  it('writes engrave.ngc and engrave-laser.gcode for a spec with engrave.programs: both, byte-stable', async () => {
    const a = mkdtempSync(join(tmpdir(), 'umbrafab-engrave-a-'));
    const b = mkdtempSync(join(tmpdir(), 'umbrafab-engrave-b-'));
    const r = await runCli(['build', BOTH, '--out', a]);
    expect(r.code, r.err).toBe(0);
    expect(r.out).toMatch(/engrave\.ngc, engrave-laser\.gcode/);
    expect((await runCli(['build', BOTH, '--out', b])).code).toBe(0);
    const files = readdirSync(a).sort();
    expect(files).toEqual(expect.arrayContaining(['engrave.ngc', 'engrave-laser.gcode', 'report.json']));
    for (const f of ['engrave.ngc', 'engrave-laser.gcode']) {
      expect(readFileSync(join(b, f)).equals(readFileSync(join(a, f))), f).toBe(true);
      runRs274(readFileSync(join(a, f), 'utf8'), f); // throws on an rs274 error
    }
    const report = JSON.parse(readFileSync(join(a, 'report.json'), 'utf8'));
    expect(report.files).toEqual(expect.arrayContaining(['engrave.ngc', 'engrave-laser.gcode']));
    const e = report.engraving;
    expect(e.programs).toEqual(['ngc', 'laser']);
    for (const key of ['ngc', 'laser']) {
      expect(e[key]).toMatchObject({
        passes: expect.any(Number),
        timeEstimateS: expect.any(Number),
        cuttingLengthMm: expect.any(Number),
        rapidTravelMm: { inputOrder: expect.any(Number), ordered: expect.any(Number), lowerBound: expect.any(Number), ratioToBound: expect.any(Number) },
      });
    }
    // Demo figures: 0.8 mm hour lines with a 90° V-bit → 0.4 mm (d = w / (2 tan 45°), docs/design.md §5);
    // aluminium preset step-down 0.15 mm → 3 passes.
    expect(e.ngc.vbitDepthMmMax).toBeCloseTo(0.4, 6);
    expect(e.ngc.passes).toBe(3);
    expect(e.ngc.tool).toEqual({ vbitAngleDeg: 90, vbitTipMm: 0, vbitMaxWidthMm: 3.175 });
    expect(e.laser.passes).toBe(1);
  });

  it('writes only engrave-laser.gcode for the demo spec as it stands (laser, engrave.programs: auto)', async () => {
    const out = mkdtempSync(join(tmpdir(), 'umbrafab-engrave-demo-'));
    const r = await runCli(['build', join(ROOT, 'fixtures/demo.yaml'), '--out', out]);
    expect(r.code, r.err).toBe(0);
    const files = readdirSync(out);
    expect(files).toContain('engrave-laser.gcode');
    // The demo asks for engrave.programs: both once the lead merges it; until then auto gives the laser program only.
    const spec = readFileSync(join(ROOT, 'fixtures/demo.yaml'), 'utf8');
    expect(files.includes('engrave.ngc')).toBe(/programs:\s*(both|ngc)/.test(spec));
  });
});

const good = {
  name: 'Engrave bench',
  site: { latitude: 47.4, longitude: 8.5, timezone: 'Europe/Zurich' },
  gnomon: { height: 45, thickness: 4 },
  plate: { thickness: 4, material: 'brass' },
  process: { method: 'router' },
};

function specWith(patch: Record<string, unknown>): string {
  const merged: Record<string, unknown> = structuredClone(good);
  for (const [k, v] of Object.entries(patch)) merged[k] = { ...(merged[k] as object | undefined), ...(v as object) };
  return stringify(merged);
}

// Every bad input: exit 1 (bad input, not an internal error), a message naming the field and the value, and no files.
const BAD: { name: string; patch: Record<string, unknown>; message: RegExp }[] = [
  {
    name: 'a V-bit narrower than the widest mark',
    patch: { engrave: { tool: { vbitMaxWidthMm: 0.5 } } },
    message: /engrave\.tool\.vbitMaxWidthMm: a 0\.5 mm V-bit is too narrow for the 0\.8 mm hour .*allowed: at least 0\.8 mm .*marks\.hour\.width/,
  },
  {
    name: 'a groove deeper than the sheet allows',
    // 3 mm lines with a 30° bit: d = 1.5 / tan 15° = 5.598 mm; a 4 mm sheet allows 4 - max(0.5, 2) = 2 mm.
    patch: { marks: { hour: { width: 3 } }, engrave: { tool: { vbitAngleDeg: 30 } } },
    message: /plate\.thickness: the 3 mm hour .* needs a 5\.598 mm deep groove with a 30 deg V-bit, deeper than a 4 mm sheet allows \(at most 2 mm.*allowed: a sheet at least 11\.196 mm thick/,
  },
  { name: 'a feed of zero', patch: { engrave: { feedMmPerMin: 0 } }, message: /engrave\.feedMmPerMin: got 0; allowed: a number greater than 0 mm\/min/ },
  { name: 'a plunge of zero', patch: { engrave: { plungeMmPerMin: 0 } }, message: /engrave\.plungeMmPerMin: got 0; allowed: a number greater than 0/ },
  { name: 'clearance above the safe height', patch: { engrave: { clearanceZMm: 12 } }, message: /engrave\.clearanceZMm: got 12; allowed: at most engrave\.safeZMm \(10 mm\)/ },
  { name: 'entry above the clearance height', patch: { engrave: { entryZMm: 3 } }, message: /engrave\.entryZMm: got 3; allowed: at most engrave\.clearanceZMm \(1 mm\)/ },
  { name: 'an unknown coolant', patch: { engrave: { coolant: 'air' } }, message: /engrave\.coolant: got "air"; allowed: "off", "mist", "flood"/ },
  { name: 'an unknown program choice', patch: { engrave: { programs: 'gcode' } }, message: /engrave\.programs: got "gcode"; allowed: "auto", "ngc", "laser", "both", "none"/ },
  {
    name: 'a material without an engraving preset',
    patch: { plate: { material: 'petg' } },
    message: /plate\.material: "petg" has no engraving preset; allowed for engraving: aluminium, brass, stainless, steel, acrylic, hardwood, plywood, slate .*engrave\.programs: none/,
  },
];

describe('bad engraving inputs through the spec', () => {
  it.each(BAD)('$name → exit 1 naming the field', async ({ patch, message }) => {
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-engrave-bad-'));
    const file = join(dir, 'bad.yaml');
    writeFileSync(file, specWith(patch));
    const out = join(dir, 'out');
    const r = await runCli(['build', file, '--out', out]);
    expect(r.code, r.out + r.err).toBe(1);
    expect(r.err).toMatch(message);
    expect(r.err).not.toMatch(/internal error/);
    expect(readdirSync(dir)).toEqual(['bad.yaml']);
  });

  it('builds the good spec, and a printed pla plate needs no preset (auto: none)', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-engrave-good-'));
    writeFileSync(join(dir, 'good.yaml'), specWith({}));
    const r = await runCli(['build', join(dir, 'good.yaml'), '--out', join(dir, 'out')]);
    expect(r.code, r.err).toBe(0);
    expect(readdirSync(join(dir, 'out'))).toContain('engrave.ngc');
    writeFileSync(join(dir, 'print.yaml'), specWith({ plate: { material: 'pla' }, process: { method: 'print' } }));
    const p = await runCli(['build', join(dir, 'print.yaml'), '--out', join(dir, 'print')]);
    expect(p.code, p.err).toBe(0);
    expect(readdirSync(join(dir, 'print')).filter((f) => f.startsWith('engrave'))).toEqual([]);
  });
});
