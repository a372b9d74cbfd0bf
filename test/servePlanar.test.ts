import { mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '@umbrafab/cli';
import { runCli } from './helpers/runCli.ts';

const ROOT = resolve(import.meta.dirname, '..');
const WALL = join(ROOT, 'fixtures/planar/wall-declining.yaml');
const GARDEN = join(ROOT, 'fixtures/planar/garden-horizontal.yaml');

async function postJson(server: RunningServer, path: string, value: unknown) {
  const res = await fetch(server.url + path.slice(1), { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(value) });
  return { status: res.status, json: (await res.json()) as any };
}
const getJson = async (server: RunningServer, path: string) => (await (await fetch(server.url + path.slice(1))).json()) as any;

describe('serve: a declining wall face (fixtures/planar/wall-declining.yaml)', () => {
  let server: RunningServer;
  let setup: any;
  let out: string;
  let report: any;
  beforeAll(async () => {
    out = mkdtempSync(join(tmpdir(), 'umbrafab-page-wall-'));
    const cli = await runCli(['build', WALL, '--out', out]);
    expect(cli.code, cli.err).toBe(0);
    report = JSON.parse(readFileSync(join(out, 'report.json'), 'utf8'));
    server = await startServer({ specPath: WALL, port: 0, log: () => {} });
    setup = await getJson(server, '/api/setup');
  });
  afterAll(async () => server?.close());

  it('lists the face section fields from the schema, filled from the spec', () => {
    const byKey = new Map(setup.fields.map((f: any) => [f.key, f]));
    expect(byKey.get('face.type')).toMatchObject({ kind: 'choice', choices: ['polar', 'horizontal', 'vertical', 'meridian', 'equatorial'], default: 'polar' });
    expect(byKey.get('face.wallDeclination')).toMatchObject({ kind: 'number', unit: '°', min: -180, max: 180, default: 0 });
    expect(byKey.get('face.reclination')).toMatchObject({ kind: 'number', min: -75, max: 75 });
    expect(byKey.get('face.facing')).toMatchObject({ kind: 'choice', choices: ['east', 'west'] });
    expect(byKey.get('face.side')).toMatchObject({ kind: 'choice', choices: ['upper', 'lower', 'both'] });
    expect(setup.values['face.type']).toBe('vertical');
    expect(setup.values['face.wallDeclination']).toBe(24.5);
  });

  it("draws the face as build's preview.svg, its numbers from the layout and the plate and fin as installed", async () => {
    const r = await postJson(server, '/api/view', { fields: setup.values });
    expect(r.status, JSON.stringify(r.json.error)).toBe(200);
    expect(r.json.svg).toBe(readFileSync(join(out, 'preview.svg'), 'utf8'));
    expect(r.json.frame).toMatchObject({ plateWidthMm: report.plate.widthMm, plateLengthMm: report.plate.lengthMm });
    const row = (key: string) => r.json.summary.find((s: any) => s.key === key)?.value;
    expect(row('face')).toBe('vertical, declination 24.5°');
    expect(row('styleHeight')).toBe(`${Number(report.face.styleHeightDeg.toFixed(3))}°`);
    expect(r.json.notes).toEqual(report.notes);
    const scene = r.json.scene;
    // The scene of assembly.png: a patch of wall, the wall mount, the anchors' heads, the plate, its screws and the fin.
    expect(scene.meshes.map((m: any) => m.name)).toEqual(['wall', 'mount', 'fixings', 'plate', 'fixings', 'gnomon']);
    for (const m of scene.meshes) expect(m.positions.length % 9, m.name).toBe(0);
    // The face frame's z axis is the wall's outward normal (report.json face.normalEnu); a wall stands upright (tilt 90°).
    for (let k = 0; k < 3; k++) expect(scene.faceToWorld[8 + k]).toBeCloseTo(report.face.normalEnu[k], 5); // report.json rounds to 6 decimals
    expect(scene.tiltDeg).toBeCloseTo(90, 9);
    const zs = scene.meshes.flatMap((m: any) => m.positions.filter((_: number, i: number) => i % 3 === 2));
    expect(Math.min(...zs)).toBeCloseTo(0, 3);
    const mesh = (name: string) => scene.meshes.find((m: any) => m.name === name).positions as number[];
    // The plate stands on its edge: its world height is its length (the wall's plumb line runs along the drawing's y when undeclined; turned here by plateTurnDeg).
    const plateZ = mesh('plate').filter((_: number, i: number) => i % 3 === 2);
    expect(Math.max(...plateZ) - Math.min(...plateZ)).toBeGreaterThan(Math.min(report.plate.widthMm, report.plate.lengthMm) - 1e-6);
    // Along the face's normal: the plate's top is the face (0) and its back rests on the mount, whose back rests on the wall.
    const o = scene.faceToWorld.slice(12, 15);
    const n = scene.faceToWorld.slice(8, 11);
    const heights = (name: string) => {
      const q = mesh(name);
      const h: number[] = [];
      for (let i = 0; i < q.length; i += 3) h.push((q[i] - o[0]) * n[0] + (q[i + 1] - o[1]) * n[1] + (q[i + 2] - o[2]) * n[2]);
      return { min: Math.min(...h), max: Math.max(...h) };
    };
    const t = report.plate.thicknessMm;
    expect(heights('plate').max).toBeCloseTo(0, 2);
    expect(heights('plate').min).toBeCloseTo(-t, 2);
    expect(heights('mount').max).toBeCloseTo(-t, 2);
    expect(heights('wall').max).toBeCloseTo(heights('mount').min, 2);
    expect(heights('gnomon').max).toBeGreaterThan(10);
    expect(scene.faceRect.x0).toBeCloseTo(-report.plate.substyleX, 5);
    expect(scene.faceRect.y0).toBeCloseTo(-report.plate.faceOriginY, 5);
    expect([scene.faceRect.widthMm, scene.faceRect.lengthMm]).toEqual([report.plate.widthMm, report.plate.lengthMm]);
  });

  it('serves every file of `umbrafab build` byte for byte', async () => {
    const r = await postJson(server, '/api/view', { fields: setup.values });
    const list = await getJson(server, r.json.filesUrl);
    expect(list.files.map((f: any) => f.name).sort()).toEqual(readdirSync(out).sort());
    for (const f of list.files) {
      const got = Buffer.from(await (await fetch(server.url + f.url.slice(1))).arrayBuffer());
      expect(got.equals(readFileSync(join(out, f.name))), `${f.name} vs umbrafab build`).toBe(true);
    }
  });

  it('draws no shadow while the sun is behind the wall (a June morning, the sun in the north-east)', async () => {
    const r = await postJson(server, '/api/sun', { fields: setup.values, date: '2027-06-21', time: '06:30', kind: 'clock' });
    expect(r.status).toBe(200);
    expect(r.json.sun.altitudeDeg).toBeGreaterThan(0);
    expect(r.json.sun.state).toBe('behind');
    expect(r.json.sun.shadowFace).toEqual([]);
  });

  it('refuses a wall the style would lie almost flat on (422, face.wallDeclination named)', async () => {
    const r = await postJson(server, '/api/view', { fields: { ...setup.values, 'face.wallDeclination': 89 } });
    expect(r.status).toBe(422);
    expect(r.json.error.field).toBe('face.wallDeclination');
  });
});

describe('serve: the sun on a horizontal face (fixtures/planar/garden-horizontal.yaml)', () => {
  let server: RunningServer;
  let values: Record<string, unknown>;
  beforeAll(async () => {
    server = await startServer({ specPath: GARDEN, port: 0, log: () => {} });
    values = (await getJson(server, '/api/setup')).values;
  });
  afterAll(async () => server?.close());

  it('at apparent noon the fin shadow lies along the noon line, within the fin thickness (common practice)', async () => {
    const r = await postJson(server, '/api/sun', { fields: values, date: '2027-03-20', time: '12:00', kind: 'apparent' });
    expect(r.status).toBe(200);
    const sun = r.json.sun;
    expect(sun.state).toBe('lit');
    expect(sun.hourAngleDeg).toBeCloseTo(0, 6);
    const pts = sun.shadowFace.flat();
    expect(pts.length).toBeGreaterThan(3);
    // Face x runs across the noon line (x = 0 on the substyle): the 3 mm fin's shadow stays within ±1.5 mm of it.
    expect(Math.max(...pts.map((p: number[]) => Math.abs(p[0])))).toBeCloseTo(1.5, 9);
    // Its far end: the fin's tip, h = 80 mm above the point R = h / tan 52.2° up the substyle (the style rises at the latitude),
    // casts its shadow h / tan(altitude) further north at noon (common practice).
    const R = 80 / Math.tan((52.2 * Math.PI) / 180);
    const ys = pts.map((p: number[]) => p[1]);
    expect(Math.max(...ys)).toBeCloseTo(R + 80 / Math.tan((sun.altitudeDeg * Math.PI) / 180), 6);
    expect(r.json.shadowPreview.length).toBe(sun.shadowFace.length);
  });

  it("builds the same preview as `umbrafab build` after changing the face type on the form (vertical, south wall)", async () => {
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-page-h-'));
    const r = await postJson(server, '/api/view', { fields: { ...values, 'face.type': 'vertical' } });
    expect(r.status, JSON.stringify(r.json.error)).toBe(200);
    expect(r.json.summary.find((s: any) => s.key === 'face').value).toBe('vertical, declination 0°');
    // A south wall at 52.2°N: style height 90° − 52.2° (common practice).
    expect(r.json.summary.find((s: any) => s.key === 'styleHeight').value).toBe('37.8°');
    const spec = join(dir, 'wall.yaml');
    const { writeFileSync } = await import('node:fs');
    writeFileSync(spec, readFileSync(GARDEN, 'utf8').replace('face: { type: horizontal }', 'face: { type: vertical }'));
    expect((await runCli(['build', spec, '--out', join(dir, 'out')])).code).toBe(0);
    expect(r.json.svg).toBe(readFileSync(join(dir, 'out', 'preview.svg'), 'utf8'));
  });
});
