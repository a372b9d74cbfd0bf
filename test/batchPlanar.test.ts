import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parse as parseYaml } from 'yaml';
import { parseSpec } from '@umbrafab/geometry';
import { buildAnyFiles } from '@umbrafab/cli';
import { runCli } from './helpers/runCli.ts';

const ROOT = resolve(import.meta.dirname, '..');
const PLANAR = join(ROOT, 'fixtures/planar');

/** "N35", "S33.9" and "plate.dxf" → "plate-N35.dxf", as batch names a latitude's own files. */
const tag = (lat: number) => `${lat < 0 ? 'S' : 'N'}${Math.abs(lat)}`;
const tagged = (name: string, lat: number) => name.replace(/\.(\w+)$/, `-${tag(lat)}.$1`);

/**
 * Batch a planar spec and hold every latitude's files to `umbrafab build`'s
 * bytes for that latitude's spec (read as batch reads it: the latitude
 * replaced, pictures left to build). Returns the folder, the summary and the
 * files each latitude's build wrote.
 */
async function batchEqualsBuild(specFile: string, lats: readonly number[]) {
  const out = mkdtempSync(join(tmpdir(), 'umbrafab-pbatch-'));
  const r = await runCli(['batch', specFile, '--latitudes', lats.join(','), '--out', out, '--no-progress']);
  expect(r.err).toBe('');
  expect(r.code).toBe(0);
  const summary = JSON.parse(readFileSync(join(out, 'report.json'), 'utf8'));
  const raw = parseYaml(readFileSync(specFile, 'utf8'));
  const written = new Set(readdirSync(out));
  const built = new Map<number, string[]>();
  for (const lat of lats) {
    const spec = parseSpec({ ...raw, site: { ...raw.site, latitude: lat }, pictures: { ...(raw.pictures ?? {}), write: false } });
    const build = await buildAnyFiles(spec);
    const row = summary.latitudes.find((x: { latitudeDeg: number }) => x.latitudeDeg === lat);
    expect(row.files).toHaveLength(build.files.length);
    for (const f of build.files) {
      // Its own copy (plate-N40.dxf) or the one every latitude shares (gnomon.stl), never both.
      const names = [f.name, tagged(f.name, lat)].filter((n) => row.files.includes(n));
      expect(names, `${f.name} at ${lat}`).toHaveLength(1);
      expect(written.has(names[0]), names[0]).toBe(true);
      expect(Buffer.from(f.bytes).equals(readFileSync(join(out, names[0]))), `${names[0]} equals build's ${f.name} at ${lat}°`).toBe(true);
    }
    built.set(lat, build.files.map((f) => f.name));
  }
  return { out, r, summary, built, written };
}

describe('umbrafab batch on planar faces', () => {
  it("a horizontal face at three latitudes (both hemispheres): each latitude's files are build's bytes, one plate each", async () => {
    const lats = [45, 52.2, -35];
    const { summary, written, r } = await batchEqualsBuild(join(PLANAR, 'garden-horizontal.yaml'), lats);
    expect(summary.face).toEqual({ type: 'horizontal' });
    expect(summary.plate.shared).toBe(false);
    expect(summary.plate.files).toEqual(lats.map((l) => `plate-${tag(l)}.dxf`));
    // The style of a horizontal face rises at |latitude| (docs/design.md §8; common practice).
    for (const lat of lats) expect(summary.latitudes.find((x: { latitudeDeg: number }) => x.latitudeDeg === lat).styleHeightDeg).toBeCloseTo(Math.abs(lat), 9);
    for (const lat of lats) for (const f of [`plate-${tag(lat)}.dxf`, `install-${tag(lat)}.md`, `report-${tag(lat)}.json`]) expect(written.has(f), f).toBe(true);
    expect([...written].filter((n) => n.endsWith('.png'))).toEqual([]);
    expect(r.out).toMatch(/^latitude\s+style height\s+plate file\s+gnomon file\s+install sheet$/m);
    expect(r.out).toMatch(/^-35°\s+35\.00°\s+plate-S35\.dxf\s+gnomon-S35\.dxf\s+install-S35\.md$/m);
  });

  it("a declining wall at two latitudes: plate, fin, mount and programs are build's bytes for each latitude", async () => {
    const lats = [40, 47.4];
    const { summary, written } = await batchEqualsBuild(join(PLANAR, 'wall-declining.yaml'), lats);
    expect(summary.face).toEqual({ type: 'vertical' });
    for (const lat of lats) for (const f of ['plate', 'gnomon', 'mount']) expect(written.has(`${f}-${tag(lat)}.dxf`), `${f}-${tag(lat)}.dxf`).toBe(true);
    const rows = summary.latitudes as { latitudeDeg: number; mountFile: string; styleHeightDeg: number }[];
    expect(rows.map((x) => x.mountFile)).toEqual(lats.map((l) => `mount-${tag(l)}.dxf`));
    // A vertical wall declining D: sin ψ = cos φ · cos D (Waugh 1973, ch. 10 — recalled from memory).
    for (const { latitudeDeg, styleHeightDeg } of rows) {
      const psi = (Math.asin(Math.cos((latitudeDeg * Math.PI) / 180) * Math.cos((24.5 * Math.PI) / 180)) * 180) / Math.PI;
      expect(Math.abs(styleHeightDeg - psi)).toBeLessThan(0.001);
    }
  });

  it('an equatorial face writes its rod once (the same at every latitude) and a plate per latitude', async () => {
    const lats = [30, 40.6, 50];
    const { written, summary } = await batchEqualsBuild(join(PLANAR, 'equatorial.yaml'), lats);
    expect(written.has('gnomon.stl')).toBe(true);
    expect([...written].filter((n) => n.startsWith('gnomon'))).toEqual(['gnomon.stl']);
    expect(summary.latitudes.map((x: { gnomonFile: string }) => x.gnomonFile)).toEqual(['gnomon.stl', 'gnomon.stl', 'gnomon.stl']);
  });

  it('refuses a latitude at which the wall sees none of its hours (exit 1), naming the latitude and writing nothing', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-pbatch-'));
    const spec = join(dir, 'north.yaml');
    // A wall facing the pole (declination 180°): at 20°N the midsummer sun stands north of the zenith at noon, at 47°N never.
    writeFileSync(
      spec,
      [
        'name: North Yard dial',
        'site: { latitude: 20, longitude: 8.5, timezone: Europe/Zurich, place: North Yard }',
        'face: { type: vertical, wallDeclination: 180 }',
        'gnomon: { height: 60, thickness: 3, tabLength: 4 }',
        'hours: { from: "10:00", to: "14:00", step: 60 }',
        'dial: { reads: solar }',
        'process: { method: laser }',
        '',
      ].join('\n'),
    );
    const ok = await runCli(['build', spec, '--out', join(dir, 'one')]);
    expect(ok.code, ok.err).toBe(0);
    const out = join(dir, 'out');
    const r = await runCli(['batch', spec, '--latitudes', '20,47', '--out', out, '--no-progress']);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/^umbrafab: site\.latitude: got 47 \(batch latitude 2 of 2\), where hours\.from: the face never sees the sun at this hour/);
    expect(r.err).toMatch(/allowed: a latitude at which this vertical face \(face\.wallDeclination 180°, face\.reclination 0°\) can be made with the rest of the spec, or leave 47 out/);
    expect(() => readdirSync(out)).toThrow();
  });

  it('refuses a horizontal face 2° from the equator (its style would lie almost flat), naming site.latitude', async () => {
    const out = mkdtempSync(join(tmpdir(), 'umbrafab-pbatch-'));
    const r = await runCli(['batch', join(PLANAR, 'garden-horizontal.yaml'), '--latitudes', '52.2,2', '--out', out, '--no-progress']);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/site\.latitude: got 2 \(batch latitude 2 of 2\), where the style would stand 2\.00° from this face.*allowed: for a horizontal face, a latitude at least 5° from the equator/);
    expect(readdirSync(out)).toEqual([]);
  });
});
