import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parse as parseYaml } from 'yaml';
import { parseSpec } from '@umbrafab/geometry';
import { buildContext, buildFiles } from '@umbrafab/cli';
import { runCli } from './helpers/runCli.ts';
import { expectClose } from './helpers/closeTo.ts';

const ROOT = resolve(import.meta.dirname, '..');
const DEMO = join(ROOT, 'fixtures/demo.yaml');

/**
 * The seat tilt of a binary STL wedge, degrees: the largest facet area whose
 * normal leans toward −y and up (the seat, normal (0, −sin a, cos a)), a = acos(n_z).
 * Binary STL layout: 80-byte header, uint32 count, 50 bytes per facet
 * (normal, three vertices as float32 LE, uint16 attribute) — common practice
 * (the format's 3D Systems definition).
 */
function seatTiltDeg(stl: Buffer): number {
  const n = stl.readUInt32LE(80);
  const areaByTilt = new Map<number, number>();
  for (let i = 0; i < n; i++) {
    const o = 84 + 50 * i;
    const v = Array.from({ length: 9 }, (_, k) => stl.readFloatLE(o + 12 + 4 * k));
    const e1 = [v[3] - v[0], v[4] - v[1], v[5] - v[2]];
    const e2 = [v[6] - v[0], v[7] - v[1], v[8] - v[2]];
    const c = [e1[1] * e2[2] - e1[2] * e2[1], e1[2] * e2[0] - e1[0] * e2[2], e1[0] * e2[1] - e1[1] * e2[0]];
    const len = Math.hypot(c[0], c[1], c[2]);
    if (len === 0) continue;
    const [nx, ny, nz] = c.map((x) => x / len);
    if (Math.abs(nx) > 1e-4 || !(ny < -1e-4) || !(nz > 1e-4)) continue;
    const tilt = Math.round((Math.acos(nz) * 180) / Math.PI * 1000) / 1000;
    areaByTilt.set(tilt, (areaByTilt.get(tilt) ?? 0) + len / 2);
  }
  return [...areaByTilt.entries()].sort((a, b) => b[1] - a[1])[0][0];
}

describe('umbrafab batch', () => {
  it('writes one plate and five wedges for five latitudes, each wedge tilted by its latitude', async () => {
    const out = mkdtempSync(join(tmpdir(), 'umbrafab-batch-'));
    const lats = [30, 35, 40, 45, 50];
    const r = await runCli(['batch', DEMO, '--latitudes', lats.join(','), '--out', out, '--no-progress']);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const names = readdirSync(out).sort();
    expect(names.filter((n) => n.endsWith('.dxf') && n.startsWith('plate'))).toEqual(['plate.dxf']);
    expect(names.filter((n) => n.startsWith('stand-') && n.endsWith('.stl'))).toEqual(lats.map((l) => `stand-N${l}.stl`));
    const summary = JSON.parse(readFileSync(join(out, 'report.json'), 'utf8'));
    expect(summary.plate.shared).toBe(true);
    expect(summary.latitudeRangeDeg).toEqual([30, 50]);
    // Per latitude: its stand, install sheet, report and template (the template draws the stand's parts at 1:1); the plate and its preview once; pictures are left to build.
    expect(names.filter((n) => n.endsWith('.png'))).toEqual([]);
    for (const lat of lats) for (const f of [`stand-N${lat}.stl`, `stand-N${lat}.dxf`, `install-N${lat}.md`, `report-N${lat}.json`, `template-N${lat}.pdf`]) expect(names, f).toContain(f);
    for (const f of ['plate.dxf', 'preview.svg', 'gnomon.dxf']) expect(names, f).toContain(f);
    expect(readFileSync(join(out, 'install-N45.md'), 'utf8')).toMatch(/45/);
    // The shared plate states the range it serves, not one latitude: it is build's plate for that range title.
    const spec30 = parseSpec({ ...parseYaml(readFileSync(DEMO, 'utf8')), site: { ...parseYaml(readFileSync(DEMO, 'utf8')).site, latitude: 30 } });
    const ranged = buildContext(spec30, { latitudeRangeDeg: [30, 50] });
    expect(ranged.layout.title.map((t) => t.text).join(' | ')).toMatch(/30\.000N TO 50\.000N/);
    expect(buildContext(spec30).layout.title.map((t) => t.text).join(' | ')).not.toMatch(/ TO /);
    const plate = (await buildFiles(spec30, ranged)).files.find((f) => f.name === 'plate.dxf')!;
    expect(Buffer.from(plate.bytes).equals(readFileSync(join(out, 'plate.dxf')))).toBe(true);
    for (const lat of lats) {
      // The tilt equals |latitude| (docs/design.md §4), read back from the STL's seat facets.
      expectClose(seatTiltDeg(readFileSync(join(out, `stand-N${lat}.stl`))), lat, 0.01, `stand-N${lat}.stl seat tilt`, '°');
      expect(summary.latitudes.find((x: { latitudeDeg: number }) => x.latitudeDeg === lat).wedgeAngleDeg).toBe(lat);
    }
    // Summary table: a header and one row per latitude.
    expect(r.out).toMatch(/latitude\s+wedge angle/);
    for (const lat of lats) expect(r.out).toMatch(new RegExp(`^${lat}°\\s+${lat}\\.00°.*stand-N${lat}\\.stl\\s+install-N${lat}\\.md\\s+plate\\.dxf$`, 'm'));
    expect(r.out).toMatch(/one plate serves every latitude from 30°N to 50°N/);
  });

  it("writes each latitude's files with build's bytes for that latitude's spec (engraving programs, stand, sheet, install)", async () => {
    const out = mkdtempSync(join(tmpdir(), 'umbrafab-batch-'));
    const lats = [32, 41];
    const r = await runCli(['batch', DEMO, '--latitudes', lats.join(','), '--out', out, '--no-progress']);
    expect(r.code).toBe(0);
    const raw = parseYaml(readFileSync(DEMO, 'utf8'));
    for (const lat of lats) {
      // As batch reads it: the latitude replaced, pictures left to build; the shared plate titled with the range.
      const spec = parseSpec({ ...raw, site: { ...raw.site, latitude: lat }, pictures: { ...(raw.pictures ?? {}), write: false } });
      const built = await buildFiles(spec, buildContext(spec, { latitudeRangeDeg: [32, 41] }));
      const names = ['engrave.ngc', 'engrave-laser.gcode', 'stand.stl', 'stand.dxf', 'sheet.dxf', 'install.md'];
      for (const name of names) {
        const mine = built.files.find((f) => f.name === name);
        expect(mine, name).toBeDefined();
        const file = name.replace(/\.(\w+)$/, `-N${lat}.$1`);
        expect(Buffer.from(mine!.bytes).equals(readFileSync(join(out, file))), file).toBe(true);
      }
      // The program header names this latitude.
      expect(readFileSync(join(out, `engrave-N${lat}.ngc`), 'utf8')).toMatch(new RegExp(`latitude: ${lat}\\b`));
    }
  });

  it('makes one plate per latitude when the hemispheres differ', async () => {
    const out = mkdtempSync(join(tmpdir(), 'umbrafab-batch-'));
    const r = await runCli(['batch', DEMO, '--latitudes', '35,-35', '--out', out, '--no-progress']);
    expect(r.code).toBe(0);
    expect(readdirSync(out).filter((n) => n.endsWith('.dxf') && n.startsWith('plate')).sort()).toEqual(['plate-N35.dxf', 'plate-S35.dxf']);
    expectClose(seatTiltDeg(readFileSync(join(out, 'stand-S35.stl'))), 35, 0.01, 'southern wedge tilt', '°');
  });

  it.each([{ args: ['--latitudes', '-35,-40'] }, { args: ['--latitudes=-35,-40'] }, { args: ['--latitudes', '-35', '--latitudes', '-40'] }])('takes negative latitudes in every form: $args', async ({ args }) => {
    const out = mkdtempSync(join(tmpdir(), 'umbrafab-batch-'));
    const r = await runCli(['batch', DEMO, ...args, '--out', out, '--no-progress']);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const names = readdirSync(out);
    for (const f of ['stand-S35.stl', 'stand-S40.stl', 'install-S35.md', 'install-S40.md', 'plate.dxf']) expect(names, f).toContain(f);
    expectClose(seatTiltDeg(readFileSync(join(out, 'stand-S40.stl'))), 40, 0.01, 'stand-S40.stl seat tilt', '°');
    expect(r.out).toMatch(/from 40°S to 35°S/);
  });

  it('writes body.stl per latitude when the spec asks for it', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-batch-'));
    const r = await runCli(['batch', join(ROOT, 'fixtures/specs/page-print.yaml'), '--latitudes', '-30,-34', '--out', dir, '--no-progress']);
    expect(r.err).toBe('');
    const names = readdirSync(dir);
    // The body (in bed-sized pieces when it is large) once if it is the same for both, else per latitude.
    expect(names.some((n) => /^body(-\d+-of-\d+)?(-S30)?\.stl$/.test(n))).toBe(true);
    expect(names.some((n) => /^body(-\d+-of-\d+)?(-S34)?\.stl$/.test(n))).toBe(true);
    expect(names.some((n) => /^wedge(-\d+-of-\d+)?-S34\.stl$/.test(n))).toBe(true);
    expect(r.out).toMatch(/^-34°\s+34\.00°.*wedge(-\d+-of-\d+)?-S34\.stl/m);
  });

  it('reads latitudes from a file with comments', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-batch-'));
    const list = join(dir, 'lats.txt');
    writeFileSync(list, '# shop list\n30, 32.5\n34 # south coast\n');
    const r = await runCli(['batch', DEMO, '--latitudes-file', list, '--out', join(dir, 'out'), '--no-progress']);
    expect(r.code).toBe(0);
    expect(readdirSync(join(dir, 'out')).filter((n) => n.startsWith('stand-') && n.endsWith('.stl'))).toEqual(['stand-N30.stl', 'stand-N32.5.stl', 'stand-N34.stl']);
  });

  for (const [bad, why] of [
    ['30,abc', /--latitudes item 2: got "abc"; allowed: a latitude in degrees from -89 to 89/],
    ['30,95', /--latitudes item 2: got "95"; allowed/],
    ['30,30', /listed twice/],
    [',', /no latitude given/],
  ] as const) {
    it(`refuses --latitudes ${bad} clearly (exit 1), writing nothing`, async () => {
      const out = mkdtempSync(join(tmpdir(), 'umbrafab-batch-'));
      const r = await runCli(['batch', DEMO, '--latitudes', bad, '--out', out, '--no-progress']);
      expect(r.code).toBe(1);
      expect(r.err).toMatch(why);
      expect(readdirSync(out)).toEqual([]);
    });
  }

  it('refuses a run without latitudes', async () => {
    const r = await runCli(['batch', DEMO, '--no-progress']);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/--latitudes: missing/);
  });
});
