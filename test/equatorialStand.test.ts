import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  equatorialStand,
  layoutPlanar,
  METRIC_SIZES,
  parseSpec,
  pieceRows,
  placePoint,
  planarGnomonSolid,
  planarPlateDrawing,
  plateSheetPart,
  standSolid,
  type EquatorialStand,
  type Mesh,
  type PartPlacement,
  type PlanarLayout,
  type Vec3,
} from '@umbrafab/geometry';
import { buildAnyFiles, parseSpecText } from '@umbrafab/cli';
import { ezdxfDump } from './helpers/ezdxf.ts';
import { runAdmesh } from './helpers/admesh.ts';
import { jointsInDxf } from './helpers/standJoints.ts';

/**
 * The stand of an equatorial face, checked on the placed parts and by
 * outside tools:
 * - the rod, placed as the stand holds it, lies along the Earth's axis
 *   p = (0, cos φ, sin φ) in the horizon frame (x east, y north, z up;
 *   docs/design.md §8, after Waugh 1973, memory) within 0.01°, and passes
 *   through the centres of the plate's, the rail's and the hub's holes as
 *   meshed; the plate's face, as meshed, tilts 90° − |φ| from the horizontal
 *   within 0.01° (common practice: an equatorial plate is square to the axis);
 * - stand.dxf: ezdxf's audit clean, every tab in its slot with the clearance
 *   (shapely, test/helpers/stand_joint_fit.py), the pieces apart and every
 *   cut-out inside one piece (test/helpers/pieces_apart.py), the rails' holes
 *   at plate.dxf's hole centres as ezdxf reads both;
 * - stand.stl: admesh (one shell per part as assembled, one part when
 *   printed; no repair);
 * - no shadow on the face: every corner of every stand part lies behind the
 *   plate's back (n · (X − O) ≤ −thickness), so no ray from a lit point of
 *   the face toward the Sun (n · s > 0) can meet it; and a sampled check
 *   casts rays from points of every mark toward the Sun at the mark's hour
 *   on three dates of the face's half year (Sun direction by the formula of
 *   docs/design.md §8) against the stand's triangles: none is hit, while the
 *   same rays do meet the rod (the shadow the mark is for), so the ray test
 *   sees a shadow where there is one.
 */

const ROOT = resolve(import.meta.dirname, '..');
const dir = mkdtempSync(join(tmpdir(), 'umbrafab-eqstand-'));
const D2R = Math.PI / 180;
const fixture = (name: string) => parseSpecText(readFileSync(join(ROOT, `fixtures/planar/${name}.yaml`), 'utf8')) as Record<string, Record<string, unknown>>;
const south = { latitude: -33.9, longitude: 18.4, timezone: 'Africa/Johannesburg', place: 'Cape' };

const cases = [
  { name: 'upper face, 40.6° N, laser', raw: fixture('equatorial') },
  { name: 'lower face, 40.6° N, laser', raw: fixture('equatorial-lower') },
  { name: 'upper face, 33.9° S, waterjet, 5 mm steel stand', raw: { ...fixture('equatorial'), site: south, process: { method: 'waterjet' }, stand: { material: 'steel', thickness: 5 } } },
  { name: 'lower face, 33.9° S, router, 6 mm plywood', raw: { ...fixture('equatorial-lower'), site: south, process: { method: 'router' }, plate: { thickness: 6, material: 'plywood' } } },
  { name: 'upper face, 40.6° N, printed', raw: { ...fixture('equatorial'), process: { method: 'print' } } },
  { name: 'lower face, 55° N, printed', raw: { ...fixture('equatorial-lower'), site: { latitude: 55, longitude: -3, timezone: 'Europe/London', place: 'North' }, process: { method: 'print' } } },
  // Two holes at mid-length: a seat rail runs under them across the plate, behind the lower face (checked below: rails behind the plate's back, no shadow).
  { name: 'lower face, 40.6° N, laser, holes.count 2', raw: { ...fixture('equatorial-lower'), holes: { count: 2 } } },
];

const dot = (a: Vec3, b: Vec3) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const sub = (a: Vec3, b: Vec3): Vec3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
const cross = (a: Vec3, b: Vec3): Vec3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const norm = (a: Vec3) => Math.hypot(a[0], a[1], a[2]);
const unit = (a: Vec3): Vec3 => {
  const l = norm(a);
  return [a[0] / l, a[1] / l, a[2] / l];
};
const centroid = (ps: readonly Vec3[]): Vec3 => [0, 1, 2].map((i) => ps.reduce((s, p) => s + p[i], 0) / ps.length) as unknown as Vec3;
const angleDeg = (a: Vec3, b: Vec3) => Math.atan2(norm(cross(a, b)), dot(a, b)) / D2R;
const place = (mesh: Mesh, pl: PartPlacement): Mesh => ({ positions: mesh.positions.map((p) => placePoint(pl, p)), triangles: mesh.triangles });

/** The rod's axis from its placed mesh: the centroids of its two end rings. */
function meshAxis(mesh: Mesh): { from: Vec3; to: Vec3 } {
  const c = centroid(mesh.positions);
  const far = mesh.positions.reduce((best, p) => (norm(sub(p, c)) > norm(sub(best, c)) ? p : best));
  const d = sub(far, c);
  const hi = mesh.positions.filter((p) => dot(sub(p, c), d) > 0);
  const lo = mesh.positions.filter((p) => dot(sub(p, c), d) <= 0);
  return { from: centroid(lo), to: centroid(hi) };
}

/** Distance of a point from a line through `a` along unit `u`. */
const offLine = (p: Vec3, a: Vec3, u: Vec3) => norm(cross(sub(p, a), u));

/** The corners of one placed part's hole around the rod's axis (within `reachMm`), and their centre. */
function holeAround(mesh: Mesh, a: Vec3, u: Vec3, reachMm: number): { count: number; offMm: number } {
  const ring = mesh.positions.filter((p) => offLine(p, a, u) < reachMm);
  return { count: ring.length, offMm: ring.length ? offLine(centroid(ring), a, u) : Infinity };
}

/** Möller–Trumbore: does the ray o + t d (t > 1e-6) meet the triangle? */
function rayHits(o: Vec3, d: Vec3, p0: Vec3, p1: Vec3, p2: Vec3): boolean {
  const e1 = sub(p1, p0);
  const e2 = sub(p2, p0);
  const h = cross(d, e2);
  const det = dot(e1, h);
  if (Math.abs(det) < 1e-12) return false;
  const f = 1 / det;
  const s = sub(o, p0);
  const u = f * dot(s, h);
  if (u < 0 || u > 1) return false;
  const q = cross(s, e1);
  const v = f * dot(d, q);
  if (v < 0 || u + v > 1) return false;
  return f * dot(e2, q) > 1e-6;
}
const meshHit = (mesh: Mesh, o: Vec3, d: Vec3) => mesh.triangles.some(([i, j, k]) => rayHits(o, d, mesh.positions[i], mesh.positions[j], mesh.positions[k]));

/** The plate's engraved-face normal from its placed mesh: the triangle normal with the most area (the two faces; the edges are thin). */
function faceNormalOf(mesh: Mesh): Vec3 {
  const areas = new Map<string, { n: Vec3; a: number }>();
  for (const [i, j, k] of mesh.triangles) {
    const c = cross(sub(mesh.positions[j], mesh.positions[i]), sub(mesh.positions[k], mesh.positions[i]));
    const a = norm(c) / 2;
    if (a < 1e-9) continue;
    const n = unit(c);
    const key = n.map((x) => x.toFixed(5)).join(',');
    const e = areas.get(key) ?? { n, a: 0 };
    areas.set(key, { n: e.n, a: e.a + a });
  }
  return [...areas.values()].sort((p, q) => q.a - p.a)[0].n;
}

/** The stand, the plate and the rod as placed, site frame. */
async function assembled(layout: PlanarLayout, stand: EquatorialStand) {
  const drawing = planarPlateDrawing(layout);
  const platePart = plateSheetPart(drawing, { material: layout.spec.plate.material, thicknessMm: layout.plate.thicknessMm, reliefToolRadiusMm: 0, chordToleranceMm: 0.01 });
  const Tp = layout.plate.thicknessMm;
  const pl = stand.plate;
  const plateAt: PartPlacement = { ...pl, origin: [pl.origin[0] - (Tp / 2) * pl.normal[0], pl.origin[1] - (Tp / 2) * pl.normal[1], pl.origin[2] - (Tp / 2) * pl.normal[2]] };
  const plate = await standSolid({ parts: [platePart], instances: [{ id: 'plate', part: platePart.name, placement: plateAt }] });
  const F = stand.faceOriginMm;
  const rod = place(planarGnomonSolid(layout).mesh, { origin: F, e1: pl.e1, e2: pl.e2, normal: pl.normal });
  const parts = new Map<string, Mesh>();
  for (const inst of stand.instances) parts.set(inst.id, await standSolid({ parts: stand.parts, instances: [inst] }));
  return { plate, rod, parts };
}

describe.each(cases)('equatorial stand: $name', ({ name, raw }) => {
  it('rod on the Earth\'s axis, face tilt 90° − |φ|, files clean by ezdxf, shapely and admesh, no shadow on the face', async () => {
    const spec = parseSpec({ ...raw, pictures: { write: false } });
    const result = await buildAnyFiles(spec);
    const layout = layoutPlanar(spec);
    const stand = equatorialStand(layout);
    const print = spec.process.method === 'print';
    const names = result.files.map((f) => f.name);
    expect(names).toContain('stand.stl');
    expect(names.includes('stand.dxf')).toBe(!print);
    const tag = name.replace(/[^a-z0-9]+/gi, '-');
    const file = (n: string) => {
      const p = join(dir, `${tag}-${n}`);
      writeFileSync(p, result.files.find((f) => f.name === n)!.bytes);
      return p;
    };

    // ---- the rod's axis and the face's tilt, from the placed meshes
    const phi = spec.site.latitude * D2R;
    const p: Vec3 = [0, Math.cos(phi), Math.sin(phi)];
    const { plate, rod, parts } = await assembled(layout, stand);
    const ax = meshAxis(rod);
    const axis = unit(sub(ax.to, ax.from));
    const rodErr = Math.min(angleDeg(axis, p), angleDeg(axis, [-p[0], -p[1], -p[2]]));
    const faceN = faceNormalOf(plate);
    const tiltDeg = Math.acos(Math.abs(faceN[2])) / D2R;
    const tiltErr = Math.abs(tiltDeg - (90 - Math.abs(spec.site.latitude)));
    expect(rodErr).toBeLessThan(0.01);
    expect(tiltErr).toBeLessThan(0.01);
    // The rod goes through the plate's, the rail's and the hub's holes, each centred on its axis.
    const rr = layout.gnomon.thicknessMm / 2 + spec.process.clearance;
    const rodRail = stand.instances.find((i) => i.id.startsWith('rail') && stand.parts.find((q) => q.name === i.part)!.inner.some((h) => h.kind === 'circle' && Math.abs(h.radiusMm - rr) < 1e-9))!;
    const holes = [['plate', plate], ['rail', parts.get(rodRail.id)!], ['hub', parts.get('hub')!]] as const;
    let worstOff = 0;
    for (const [what, mesh] of holes) {
      const h = holeAround(mesh, ax.from, axis, rr + 0.5);
      expect(h.count, `${what}: the corners of a hole around the rod`).toBeGreaterThanOrEqual(24);
      expect(h.offMm, `${what}: hole centred on the rod`).toBeLessThan(0.01);
      worstOff = Math.max(worstOff, h.offMm);
    }
    // The rails lie against the plate's back: between −Tp − T and −Tp behind the face, both reached.
    const n = layout.face.normal;
    const F = stand.faceOriginMm;
    const Tp = layout.plate.thicknessMm;
    const T = stand.dims.thicknessMm;
    for (const [id, mesh] of parts) {
      if (!id.startsWith('rail')) continue;
      const ws = mesh.positions.map((q) => dot(sub(q, F), n));
      expect(Math.max(...ws)).toBeCloseTo(-Tp, 6);
      expect(Math.min(...ws)).toBeCloseTo(-Tp - T, 6);
    }

    // ---- no shadow: every stand corner behind the plate's back
    let front = -Infinity;
    for (const mesh of parts.values()) for (const q of mesh.positions) front = Math.max(front, dot(sub(q, F), n));
    expect(front).toBeLessThanOrEqual(-Tp + 1e-4); // the meshes' corners are float32 (manifold-3d)
    const standMeshes = [...parts.values()];
    const minZ = Math.min(...standMeshes.flatMap((m) => m.positions.map((q) => q[2])));
    expect(minZ).toBeCloseTo(0, 6);
    // Sampled rays from the marks toward the Sun at their hours.
    const upper = spec.face!.side === 'upper';
    const e = spec.site.latitude >= 0 ? 1 : -1;
    const decls = (upper ? [23.44, 12, 2] : [-23.44, -12, -2]).map((d) => e * d * D2R);
    const { right, up } = layout.face;
    let rays = 0;
    let standHits = 0;
    let rodHits = 0;
    for (const m of layout.marks) {
      const H = m.hourAngleDeg * D2R;
      for (const dec of decls) {
        const s: Vec3 = [-Math.cos(dec) * Math.sin(H), Math.cos(phi) * Math.sin(dec) - Math.sin(phi) * Math.cos(dec) * Math.cos(H), Math.sin(phi) * Math.sin(dec) + Math.cos(phi) * Math.cos(dec) * Math.cos(H)];
        if (!(s[2] > 0 && dot(s, n) > 0)) continue;
        for (const t of [0.25, 0.5, 0.75, 1]) {
          const x = m.a[0] + t * (m.b[0] - m.a[0]);
          const y = m.a[1] + t * (m.b[1] - m.a[1]);
          const o: Vec3 = [F[0] + x * right[0] + y * up[0] + 1e-4 * n[0], F[1] + x * right[1] + y * up[1] + 1e-4 * n[1], F[2] + x * right[2] + y * up[2] + 1e-4 * n[2]];
          rays++;
          if (standMeshes.some((mesh) => meshHit(mesh, o, s))) standHits++;
          if (meshHit(rod, o, s)) rodHits++;
        }
      }
    }
    console.log(`${name}: rod axis ${rodErr.toExponential(2)}°, tilt error ${tiltErr.toExponential(2)}°, holes off the axis ≤ ${worstOff.toExponential(2)} mm, stand's nearest corner ${(-front - Tp).toFixed(3)} mm behind the plate's back, ${rays} rays: ${standHits} meet the stand, ${rodHits} the rod`);
    expect(rays).toBeGreaterThan(100);
    expect(standHits).toBe(0);
    expect(rodHits).toBeGreaterThan(rays / 2);

    // ---- stand.stl
    const a = runAdmesh(file('stand.stl'));
    expect(a.parts).toBe(print ? 1 : stand.instances.length);
    for (const k of ['disconnectedFacets', 'degenerateFacets', 'edgesFixed', 'facetsRemoved', 'facetsAdded', 'facetsReversed', 'backwardsEdges', 'normalsFixed'] as const) expect(a[k], k).toBe(0);
    expect(a.min[2]).toBeCloseTo(0, 2);

    // ---- install.md and report.json
    const md = readFileSync(file('install.md'), 'utf8');
    expect(md).toMatch(/spirit level/);
    expect(md).toMatch(new RegExp(`true ${e > 0 ? 'north' : 'south'}, not magnetic`));
    expect(md).toMatch(new RegExp(`rod's upper end pointing up toward true ${e > 0 ? 'north' : 'south'}`));
    const report = result.report as unknown as { stand: { fasteners: { use: string; count: number }[]; fixings: unknown[]; faceTiltDeg: number } };
    expect(report.stand.fasteners.map((f) => f.use)).toEqual(['plate to seat rails', 'under each seat rail', 'under each seat rail', 'rod on each side of the hub', 'feet to the ground']);
    expect(report.stand.fixings.length).toBe(layout.plate.holes.length - 1);
    if (print) return;

    // ---- stand.dxf
    const dxfPath = file('stand.dxf');
    const dump = ezdxfDump(dxfPath);
    expect(dump.errors).toEqual([]);
    expect(dump.insunits).toBe(4);
    const apart = JSON.parse(execFileSync('/usr/bin/python3', [join(ROOT, 'test/helpers/pieces_apart.py'), dxfPath], { encoding: 'utf8' })) as { audit: string[]; pieces: number; valid: boolean; leastGapMm: number; cutoutsInOnePiece: boolean };
    const pieces = pieceRows(stand.parts);
    expect(apart).toMatchObject({ audit: [], pieces: pieces.length, valid: true, cutoutsInOnePiece: true });
    expect(apart.leastGapMm).toBeGreaterThan(5);
    const offset = (instance: string) => {
      const part = stand.instances.find((i) => i.id === instance)!.part;
      return pieces.find((q) => q.part === part && q.copy === 1)!.offsetMm;
    };
    const partOf = (instance: string) => stand.parts.find((q) => q.name === stand.instances.find((i) => i.id === instance)!.part)!;
    const joints = jointsInDxf(stand, pieces);
    const jsonPath = join(dir, `${tag}-joints.json`);
    writeFileSync(jsonPath, JSON.stringify({ dxf: dxfPath, joints }));
    const fit = JSON.parse(execFileSync('/usr/bin/python3', [join(ROOT, 'test/helpers/stand_joint_fit.py'), jsonPath], { encoding: 'utf8' })) as { audit: string[]; joints: { tabLength: number; tabDepth: number; inside: boolean; gap: number }[] };
    expect(fit.audit).toEqual([]);
    fit.joints.forEach((f, i) => {
      expect(f.inside, `joint ${i}: tab inside its slot`).toBe(true);
      expect(f.gap, `joint ${i}: least gap = clearance`).toBeCloseTo(spec.process.clearance, 5);
      expect(f.tabLength).toBeCloseTo(joints[i].nominalLength, 5);
      expect(f.tabDepth, `joint ${i}: tab as deep as the slotted part is thick`).toBeCloseTo(joints[i].slottedThickness, 5);
    });
    // The joints agree in 3D: each tab's shoulder midpoint, placed, lies in its slotted part's face at the slot's centre.
    for (const j of stand.joints) {
      const ring = partOf(j.tab.instance).outer.points;
      const [r0, , , r1] = [0, 1, 2, 3].map((k) => ring[(j.tab.vertex + k) % ring.length]);
      const tabPl = stand.instances.find((i) => i.id === j.tab.instance)!.placement;
      const slotPl = stand.instances.find((i) => i.id === j.slot.instance)!.placement;
      const mid = placePoint(tabPl, [(r0[0] + r1[0]) / 2, (r0[1] + r1[1]) / 2, 0]);
      const ts = partOf(j.slot.instance).thicknessMm;
      const face = placePoint(slotPl, [j.slot.centre[0], j.slot.centre[1], (j.entersFrom === 'front' ? 1 : -1) * (ts / 2)]);
      expect(norm(sub(mid, face)), `joint ${j.tab.instance} → ${j.slot.instance}`).toBeLessThan(1e-6);
    }
    // The rails' holes on plate.dxf's holes, as ezdxf reads both.
    const plateHoles = ezdxfDump(file('plate.dxf')).entities.filter((x) => x.type === 'CIRCLE' && x.layer === 'CUT_PROFILE');
    const standHoles = dump.entities.filter((x) => x.type === 'CIRCLE' && x.layer === 'CUT_PROFILE');
    for (const f of stand.fixings) {
      const o = offset(`rail-${f.rail}`);
      const ph = plateHoles.find((c) => Math.hypot(c.center![0] - f.plateMm[0], c.center![1] - f.plateMm[1]) < 1e-6);
      const sh = standHoles.find((c) => Math.hypot(c.center![0] - f.railMm[0] - o[0], c.center![1] - f.railMm[1] - o[1]) < 1e-6);
      expect(ph && sh, `fixing ${f.index}`).toBeTruthy();
      expect(sh!.radius).toBeCloseTo(ph!.radius!, 6);
      const rail = stand.instances.find((i) => i.id === `rail-${f.rail}`)!.placement;
      const onRail = placePoint(rail, [f.railMm[0], f.railMm[1], 0]);
      const onPlate = placePoint(stand.plate, [f.plateMm[0], f.plateMm[1], 0]);
      expect(norm(cross(sub(onRail, onPlate), n)), `fixing ${f.index} on one axis square to the face`).toBeLessThan(1e-6);
    }
  }, 120_000);
});

/**
 * The mounting screws' heads and washers clear the engraving of the face they
 * lie on, one face or both, holes.count 2 or 4: from plate.dxf as ezdxf reads
 * it, shapely's distance from each mounting hole's centre to the engraved
 * centre-lines of each face (LINE_SCORE, TEXT_ENGRAVE, their _LOWER layers),
 * less half the widest engraved stroke, is at least the plain washer's radius
 * (ISO 7089 outer diameter, the project's METRIC_SIZES, for the screw of
 * report.json) + 1 mm; and with two mid-length holes one seat rail spans
 * their row (the mid rail), which the stand cases above hold behind the
 * plate's back, off the engraved face. (The layout keeps the engraving's box
 * a washer radius + 1 mm from each hole centre, `plateMarginMm`; in these
 * cases the numerals and title set the plate's size and the clearance is
 * wider than that bound.)
 */
const CLEARANCE_PY = `
import json, sys, ezdxf
from shapely.geometry import LineString, Point
from shapely.ops import unary_union
doc = ezdxf.readfile(sys.argv[1])
holes = json.loads(sys.argv[2])
out = {}
for suffix in ('', '_LOWER'):
    lines = [LineString([(p[0], p[1]) for p in e.get_points('xy')]) for e in doc.modelspace() if e.dxftype() == 'LWPOLYLINE' and e.dxf.layer in ('LINE_SCORE' + suffix, 'TEXT_ENGRAVE' + suffix)]
    if lines:
        eng = unary_union(lines)
        out[suffix or 'face'] = {'entities': len(lines), 'distances': [eng.distance(Point(x, y)) for x, y in holes]}
print(json.dumps(out))
`;

const fixingCases = [
  { name: 'upper face, holes.count 2', raw: { ...fixture('equatorial'), holes: { count: 2 } }, faces: 1 },
  { name: 'lower face, holes.count 2', raw: { ...fixture('equatorial-lower'), holes: { count: 2 } }, faces: 1 },
  { name: 'lower face, holes.count 2, M8 holes 6 mm in, plate.margin 0', raw: { ...fixture('equatorial-lower'), holes: { count: 2, diameter: 9, inset: 6 }, plate: { margin: 0 } }, faces: 1 },
  { name: 'lower face, holes.count 4', raw: fixture('equatorial-lower'), faces: 1 },
  { name: 'both faces, holes.count 4', raw: fixture('equatorial-both'), faces: 2 },
];

describe.each(fixingCases)('equatorial plate fixings: $name', ({ name, raw, faces }) => {
  it('each washer (radius + 1 mm) clears every engraved line of the face it lies on; two holes have their mid rail', async () => {
    const spec = parseSpec({ ...raw, pictures: { write: false } });
    const result = await buildAnyFiles(spec);
    const layout = layoutPlanar(spec);
    const report = result.report as unknown as { stand: { fasteners: { item: string; size: string }[] } };
    const washer = report.stand.fasteners.find((f) => f.item.startsWith('plain washer ISO 7089'))!;
    const washerOdMm = METRIC_SIZES.find((m) => m.name === washer.size)!.washerOdMm;
    const { substyleX, faceOriginY } = layout.plate;
    const mounting = layout.plate.holes.filter((h) => !(Math.abs(h.cx - substyleX) < 1e-9 && Math.abs(h.cy - faceOriginY) < 1e-9));
    expect(mounting.length).toBe(spec.holes.count);
    const widest = Math.max(...[layout, ...(layout.lowerFace ? [layout.lowerFace] : [])].flatMap((f) => [...f.marks.map((m) => m.widthMm), ...[...f.numerals, ...f.title].map((t) => t.strokeWidthMm)]));
    const dxf = join(dir, `fixings-${name.replace(/[^a-z0-9]+/gi, '-')}-plate.dxf`);
    writeFileSync(dxf, result.files.find((f) => f.name === 'plate.dxf')!.bytes);
    const got = JSON.parse(execFileSync('/usr/bin/python3', ['-c', CLEARANCE_PY, dxf, JSON.stringify(mounting.map((h) => [h.cx, h.cy]))], { encoding: 'utf8' })) as Record<string, { entities: number; distances: number[] }>;
    expect(Object.keys(got).length).toBe(faces);
    const need = washerOdMm / 2 + 1;
    for (const [layers, g] of Object.entries(got)) {
      // The unsuffixed layers hold the face of face.side (the upper one with both), _LOWER the lower face of both.
      const face = layers === '_LOWER' ? 'lower' : spec.face!.side === 'both' ? 'upper' : spec.face!.side;
      expect(g.entities).toBeGreaterThan(40);
      const least = Math.min(...g.distances) - widest / 2;
      console.log(`${name}, ${face} face: ${washer.size} washer Ø ${washerOdMm} mm, hole centre to the nearest engraved line ${least.toFixed(2)} mm (at least ${need.toFixed(2)})`);
      expect(least).toBeGreaterThanOrEqual(need);
    }
    if (spec.holes.count === 2) {
      const rails = equatorialStand(layout).dims.rails;
      const row = mounting[0].cy;
      expect(rails.some((r) => r.lowerEdgeMm < row - mounting[0].radiusMm && r.lowerEdgeMm + r.widthMm > row + mounting[0].radiusMm)).toBe(true);
    }
  }, 60_000);
});
