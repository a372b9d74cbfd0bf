import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { faceToWedge, fitsBed, layoutDial, parseSpec, partsPlan, printedWedge, SpecError, type Mesh, type Vec3 } from '@umbrafab/geometry';
import { buildFiles, parseSpecText } from '@umbrafab/cli';
import { runAdmesh, type AdmeshReport } from './helpers/admesh.ts';
import { expectClose } from './helpers/closeTo.ts';

const ROOT = resolve(import.meta.dirname, '..');
const demoRaw = parseSpecText(readFileSync(join(ROOT, 'fixtures/demo.yaml'), 'utf8')) as Record<string, Record<string, unknown>>;
/** The demo, printed: PETG, no engraving programs (a printed plate carries its lines as grooves). */
const demoPrintRaw = { ...demoRaw, plate: { ...demoRaw.plate, material: 'petg' }, process: { method: 'print' }, engrave: { programs: 'none' } };
/** A 35° N dial with hours 07–17: the auto plate is 411 mm wide, nearly twice a 220 mm bed. */
const widePrintRaw = {
  name: 'Wide print',
  site: { latitude: 35, longitude: 139.7, timezone: 'Asia/Tokyo' },
  hours: { from: '07:00', to: '17:00', step: 30 },
  plate: { thickness: 4, material: 'pla' },
  process: { method: 'print' },
};

// Densities as the table gives them (materials.ts): PETG 1.27, PLA 1.24 g/cm³ (typical filament data sheets — memory).
const DENSITY: Record<string, number> = { petg: 1.27, pla: 1.24 };

const dir = mkdtempSync(join(tmpdir(), 'umbrafab-parts-print-'));
const builds = await Promise.all(
  [
    { name: 'demo-print', raw: demoPrintRaw },
    { name: 'wide-print', raw: widePrintRaw },
  ].map(async ({ name, raw }) => ({ name, spec: parseSpec(raw), result: await buildFiles(parseSpec(raw)) })),
);

function admeshOf(build: string, file: string, bytes: Uint8Array): AdmeshReport {
  const path = join(dir, `${build}_${file}`);
  writeFileSync(path, bytes);
  return runAdmesh(path);
}

describe.each(builds)('printed parts of $name', ({ name, spec, result }) => {
  const stls = result.files.filter((f) => f.name.endsWith('.stl'));
  const report = result.report as unknown as { parts: Record<string, any>; weights: any };
  const checked = new Map(stls.map((f) => [f.name, admeshOf(name, f.name, f.bytes)]));

  it('writes the gnomon, the plate and the wedge (whole or in pieces)', () => {
    const names = stls.map((f) => f.name);
    expect(names).toContain('gnomon.stl');
    expect(names.some((n) => /^plate(-\d+-of-\d+)?\.stl$/.test(n))).toBe(true);
    expect(names.some((n) => /^wedge(-\d+-of-\d+)?\.stl$/.test(n))).toBe(true);
  });

  it('every STL passes admesh (Debian ADMesh 0.98): binary, one closed part, no repair', () => {
    for (const [file, r] of checked) {
      expect(r.fileType, file).toBe('Binary STL file');
      expect(r.disconnectedFacets, file).toBe(0);
      expect(r.facetsWith1DisconnectedEdge + r.facetsWith2DisconnectedEdges + r.facetsWith3DisconnectedEdges, file).toBe(0);
      expect(r.parts, file).toBe(1);
      expect([r.degenerateFacets, r.edgesFixed, r.facetsRemoved, r.facetsAdded, r.facetsReversed, r.backwardsEdges, r.normalsFixed], file).toEqual([0, 0, 0, 0, 0, 0, 0]);
      expect(r.volumeMm3, file).toBeGreaterThan(0);
    }
  });

  it('every printed file fits the bed as it lies in its file (print orientation, z up), or turned a quarter turn', () => {
    const bed = partsPlan(layoutDial(spec)).print.bed;
    for (const [file, r] of checked) {
      const [dx, dy, dz] = [0, 1, 2].map((k) => r.max[k] - r.min[k]);
      expect(fitsBed(dx, dy, dz, bed), `${file}: ${dx} x ${dy} x ${dz} mm on ${bed.widthMm} x ${bed.depthMm} x ${bed.heightMm}`).toBe(true);
    }
  });

  it.each(['plate', 'wedge'])('%s: the pieces add up to the whole within 0.1 per cent (admesh volumes; the keys\' clearance gaps counted apart)', (part) => {
    const p = report.parts[part];
    if (!p.split) {
      expect(checked.has(`${part}.stl`)).toBe(true);
      return;
    }
    const pieces = p.split.pieces.map((q: { file: string }) => checked.get(q.file)!.volumeMm3);
    const sum = pieces.reduce((s: number, v: number) => s + v, 0);
    const whole = p.volumeMm3;
    const gap = p.split.keyGapVolumeMm3;
    expectClose(sum + gap, whole, 0.001 * whole, `${part}: Σ pieces + key gaps vs whole`, ' mm³');
    expect(gap).toBeGreaterThan(0);
    expect(gap).toBeLessThan(0.01 * whole);
    console.log(`${name} ${part}: ${pieces.length} pieces, Σ ${sum.toFixed(1)} mm³ + key gaps ${gap.toFixed(1)} mm³ = ${(sum + gap).toFixed(1)} mm³ vs whole ${whole.toFixed(1)} mm³ (${p.split.dovetailKeys} keys)`);
  });

  it('the plate volume is the closed form T · area − depth · groove area (right prisms, common practice) within 0.1 %', () => {
    const p = report.parts.plate;
    const T = layoutDial(spec).plate.thicknessMm;
    const expected = T * p.areasMm2.plate - p.grooveDepthMm * p.areasMm2.grooves;
    expectClose(p.volumeMm3, expected, 0.001 * expected, 'plate volume', ' mm³');
  });

  it('the shelled wedge saves material against the solid wedge (saving logged)', () => {
    const s = report.parts.wedge.shell;
    expect(s.volumeMm3).toBeLessThan(s.solidVolumeMm3);
    expectClose(s.savingPercent, 100 * (1 - s.volumeMm3 / s.solidVolumeMm3), 1e-6, 'saving', ' %');
    expect(s.savingPercent).toBeGreaterThan(30);
    expect(s.hollowCells).toBe(s.drainHolesMm.length);
    console.log(`${name} wedge: solid ${(s.solidVolumeMm3 / 1000).toFixed(1)} cm³, shell (wall ${s.wallMm} mm, ${s.ribXsMm.length} ribs, ${s.hollowCells} cells) ${(s.volumeMm3 / 1000).toFixed(1)} cm³: saving ${s.savingPercent.toFixed(1)} %`);
  });

  it('masses are volume × density within 0.1 % and filament length is V / (π (d/2)²) (common practice)', () => {
    const w = report.weights;
    const material = w.filament.material as string;
    const d = w.filament.diameterMm as number;
    expect(d).toBe(1.75);
    let total = 0;
    for (const part of ['gnomon', 'plate', 'wedge']) {
      const files = ([] as string[]).concat(w.filament.parts[part].file);
      const admeshVolume = files.reduce((s, f) => s + checked.get(f)!.volumeMm3, 0);
      const gap = report.parts[part]?.split?.keyGapVolumeMm3 ?? 0;
      const v = admeshVolume + gap; // the whole part as modelled
      const m = w.parts.find((q: { part: string }) => q.part === part);
      expectClose(m.massG, (v / 1000) * DENSITY[material], 0.001 * m.massG, `${part} mass`, ' g');
      expectClose(w.filament.parts[part].lengthMm, v / (Math.PI * (d / 2) ** 2), 0.001 * w.filament.parts[part].lengthMm, `${part} filament`, ' mm');
      total += m.massG;
      console.log(`${name} ${part}: ${(m.massG).toFixed(1)} g of ${material}, ${w.filament.parts[part].lengthM.toFixed(2)} m of ${d} mm filament`);
    }
    expectClose(w.totalMassG, total, 1e-6 * total, 'total mass', ' g');
    expect(w.densities[material].source).toMatch(/memory|common practice/);
    console.log(`${name}: total to lift and ship ${w.totalMassKg.toFixed(3)} kg`);
  });
});

describe('bed splitting', () => {
  it('splits the 411 mm wide plate of a 35° N, 07–17 h dial and says so on the console', () => {
    const wide = builds.find((b) => b.name === 'wide-print')!;
    const plate = (wide.result.report.parts as any).plate;
    expect(wide.result.layout.plate.widthMm).toBeGreaterThan(400);
    expect(plate.split.pieces.length).toBeGreaterThanOrEqual(2);
    expect(wide.result.notes.some((n) => /^plate\.stl: .* does not fit the 220 x 220 x 250 mm print bed: cut into \d+ pieces/.test(n))).toBe(true);
    console.log(`wide plate ${wide.result.layout.plate.widthMm} x ${wide.result.layout.plate.lengthMm} mm: ${plate.split.pieces.length} pieces, cuts x = ${plate.split.xCutsMm.join(', ')} mm`);
  });

  it('refuses, naming parts.print.bed, a wedge taller than the bed (pieces are cut upright only)', async () => {
    const spec = parseSpec({ ...widePrintRaw, site: { ...widePrintRaw.site, latitude: 70 }, plate: { ...widePrintRaw.plate, length: 300 } });
    const err = await buildFiles(spec).then(() => null, (e: unknown) => e);
    expect(err).toBeInstanceOf(SpecError);
    expect((err as SpecError).field).toBe('parts.print.bed');
    expect((err as Error).message).toMatch(/wedge\.stl cannot be split to fit: it stands \d+\.\d mm tall/);
  });

  it('refuses a gnomon longer than the bed rather than cutting the fin', async () => {
    const spec = parseSpec({ ...demoPrintRaw, parts: { print: { bed: { width: 60, depth: 60, height: 100 } } } });
    const err = await buildFiles(spec).then(() => null, (e: unknown) => e);
    expect(err).toBeInstanceOf(SpecError);
    expect((err as SpecError).field).toBe('parts.print.bed');
    expect((err as Error).message).toMatch(/gnomon is not split/);
  });
});

/** Centroid of the distinct mesh corners within `r` of point c on the plane through c with normal n (a hole's rim there). */
function rimCentre(mesh: Mesh, c: Vec3, n: Vec3, r: number): { centre: Vec3; count: number } {
  const unique = [...new Map(mesh.positions.map((p) => [p.join(','), p])).values()];
  const hits = unique.filter((p) => {
    const d: Vec3 = [p[0] - c[0], p[1] - c[1], p[2] - c[2]];
    const along = d[0] * n[0] + d[1] * n[1] + d[2] * n[2];
    return Math.abs(along) < 1e-3 && Math.hypot(d[0], d[1], d[2]) < r;
  });
  const centre = [0, 1, 2].map((k) => hits.reduce((s, p) => s + p[k], 0) / hits.length) as unknown as Vec3;
  return { centre, count: hits.length };
}

describe('insert pockets line up with the plate holes', () => {
  it('demo print: each pocket rim centre lies on its plate hole centre, plate on the seat, within 0.05 mm', async () => {
    const spec = parseSpec(demoPrintRaw);
    const layout = layoutDial(spec);
    const plan = partsPlan(layout);
    const pw = await printedWedge(layout, plan);
    const plateFile = builds[0].result.files.filter((f) => /^plate.*\.stl$/.test(f.name));
    // The plate's holes as built: the hole rims on the plate's underside (z = 0) of the plate pieces' meshes.
    const plateMeshes = plateFile.map((f) => readStl(f.bytes));
    const toWedge = faceToWedge(layout, pw.solid);
    const n = pw.solid.seatNormal;
    let worst = 0;
    expect(pw.pockets.length).toBe(layout.plate.holes.length);
    for (const h of layout.plate.holes) {
      const guess: Vec3 = [h.cx, h.cy, 0];
      const rims = plateMeshes.map((m) => rimCentre(m, guess, [0, 0, 1], h.radiusMm * 1.1)).filter((q) => q.count >= 16);
      expect(rims.length).toBe(1);
      const [px, py] = rims[0].centre;
      const onSeat = toWedge([px - layout.plate.substyleX, py - layout.plate.faceOriginY, -layout.plate.thicknessMm]);
      const pocket = pw.pockets.find((p) => Math.hypot(p.plateHoleMm[0] - h.cx, p.plateHoleMm[1] - h.cy) < 1e-9)!;
      const rim = rimCentre(pw.shell.mesh, pocket.mouthMm, n, pocket.diameterMm * 0.6);
      expect(rim.count).toBeGreaterThanOrEqual(16);
      const err = Math.hypot(rim.centre[0] - onSeat[0], rim.centre[1] - onSeat[1], rim.centre[2] - onSeat[2]);
      worst = Math.max(worst, err);
      expect(err).toBeLessThanOrEqual(0.05);
    }
    console.log(`insert pockets (${pw.insert!.thread}, Ø${pw.insert!.holeDiameterMm} mm x ${pw.pockets[0].depthMm} mm) vs plate holes: worst offset ${worst.toExponential(2)} mm`);
  });
});

/** A binary STL's triangles as a mesh (corners not shared: enough for locating rims). */
function readStl(bytes: Uint8Array): Mesh {
  const v = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const n = v.getUint32(80, true);
  const positions: Vec3[] = [];
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < 3; k++) {
      const o = 84 + 50 * i + 12 + 12 * k;
      positions.push([v.getFloat32(o, true), v.getFloat32(o + 4, true), v.getFloat32(o + 8, true)]);
    }
  }
  return { positions, triangles: [] };
}
