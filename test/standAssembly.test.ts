import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { flatStand, layoutDial, parseSpec, type PartPlacement, type SizedStand, type Vec2, type Vec3 } from '@umbrafab/geometry';
import { parseSpecText } from '@umbrafab/cli';

/**
 * The flat-pack stand put together from its own joint geometry, as a fitter
 * would: the front foot laid on the ground, then every other part placed
 * only by a tab in its mate's slot (the tab's centre on the slot's centre,
 * its shoulder along the slot, pointing through it from the side the joint
 * names), never by the generator's intended placement. The seat angle is
 * then read off the seat rails, and the plate, laid on the lower rail with
 * its lower-left corner on the rail's (the datum the installation sheet
 * gives), must find a rail hole under each of its holes. Expected values:
 * the seat angle equals |latitude| (docs/design.md §4, the tilt of a polar dial),
 * within 0.05°; holes within 0.05 mm.
 */

const ROOT = resolve(import.meta.dirname, '..');
const demo = parseSpecText(readFileSync(join(ROOT, 'fixtures/demo.yaml'), 'utf8')) as Record<string, Record<string, unknown>>;

const add = (a: Vec3, b: Vec3): Vec3 => [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
const sub = (a: Vec3, b: Vec3): Vec3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
const mul = (a: Vec3, k: number): Vec3 => [a[0] * k, a[1] * k, a[2] * k];
const dot = (a: Vec3, b: Vec3) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const cross = (a: Vec3, b: Vec3): Vec3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const unit2 = (v: Vec2): Vec2 => [v[0] / Math.hypot(...v), v[1] / Math.hypot(...v)];
const at = (pl: PartPlacement, [x, y]: Vec2, w = 0): Vec3 => add(add(add(pl.origin, mul(pl.e1, x)), mul(pl.e2, y)), mul(pl.normal, w));
const dir = (pl: PartPlacement, [x, y]: Vec2): Vec3 => add(mul(pl.e1, x), mul(pl.e2, y));

interface Assembled {
  readonly placed: Map<string, PartPlacement>;
  /** worst mismatch of a joint whose both parts were placed by other joints, mm */
  readonly closureMm: number;
}

/** Place every part of the stand from the front foot by its joints alone. */
function assembleFromJoints(stand: SizedStand): Assembled {
  const partOf = new Map(stand.instances.map((i) => [i.id, stand.parts.find((p) => p.name === i.part)!]));
  const placed = new Map<string, PartPlacement>();
  // The reference: the front foot lying flat, drawn face up, on the ground (z from 0 to its thickness),
  // where the stand frame has it (so the result can be compared with the generator's placements).
  const T = partOf.get('foot-front')!.thicknessMm;
  const ref = stand.instances.find((i) => i.id === 'foot-front')!.placement;
  placed.set('foot-front', { origin: [ref.origin[0], ref.origin[1], T / 2], e1: [1, 0, 0], e2: [0, 1, 0], normal: [0, 0, 1] });
  let closureMm = 0;
  for (let round = 0; round < 10 && placed.size < stand.instances.length + 1; round++) {
    for (const j of stand.joints) {
      const tabPart = partOf.get(j.tab.instance)!;
      const ring = tabPart.outer.points;
      const n = ring.length;
      const [r0, t0, t1, r1] = [0, 1, 2, 3].map((k) => ring[(j.tab.vertex + k) % n]);
      const centre: Vec2 = [(r0[0] + t0[0] + t1[0] + r1[0]) / 4, (r0[1] + t0[1] + t1[1] + r1[1]) / 4];
      const U = unit2([r1[0] - r0[0], r1[1] - r0[1]]);
      const V = unit2([t0[0] - r0[0], t0[1] - r0[1]]);
      const sigma = j.entersFrom === 'front' ? -1 : 1;
      const a2 = j.slot.axis;
      const b2: Vec2 = [-a2[1], a2[0]];
      const tabPl = placed.get(j.tab.instance);
      const slotPl = placed.get(j.slot.instance);
      if (slotPl && !tabPl) {
        const A = dir(slotPl, a2);
        const M = mul(slotPl.normal, sigma);
        // 2D q = (q·U) U + (q·V) V  ↦  (q·U) A + (q·V) M
        const e1 = add(mul(A, U[0]), mul(M, V[0]));
        const e2 = add(mul(A, U[1]), mul(M, V[1]));
        const C = at(slotPl, j.slot.centre);
        placed.set(j.tab.instance, { origin: sub(sub(C, mul(e1, centre[0])), mul(e2, centre[1])), e1, e2, normal: cross(e1, e2) });
      } else if (tabPl && !slotPl) {
        const A = dir(tabPl, U);
        const m = mul(dir(tabPl, V), sigma);
        const B = cross(m, A);
        const e1 = add(mul(A, a2[0]), mul(B, b2[0]));
        const e2 = add(mul(A, a2[1]), mul(B, b2[1]));
        const C = at(tabPl, centre);
        placed.set(j.slot.instance, { origin: sub(sub(C, mul(e1, j.slot.centre[0])), mul(e2, j.slot.centre[1])), e1, e2, normal: cross(e1, e2) });
      } else if (tabPl && slotPl) {
        const d = sub(at(tabPl, centre), at(slotPl, j.slot.centre));
        closureMm = Math.max(closureMm, Math.hypot(...d));
        // the tab runs along the slot and points through it from the named side
        expect(dot(dir(tabPl, U), dir(slotPl, a2))).toBeGreaterThan(1 - 1e-9);
        expect(dot(dir(tabPl, V), slotPl.normal) * sigma).toBeGreaterThan(1 - 1e-9);
        // the tab is as deep as the slotted part is thick, and the slot is the tab plus the clearance each side
        const slotPart = partOf.get(j.slot.instance)!;
        expect(Math.hypot(t0[0] - r0[0], t0[1] - r0[1])).toBeCloseTo(slotPart.thicknessMm, 9);
        expect(j.slot.lengthMm - Math.hypot(r1[0] - r0[0], r1[1] - r0[1])).toBeCloseTo(2 * stand.dims.clearanceMm, 9);
        expect(j.slot.widthMm - tabPart.thicknessMm).toBeCloseTo(2 * stand.dims.clearanceMm, 9);
      }
    }
  }
  return { placed, closureMm };
}

const LATITUDES = [5, 35, 52, 70, -41];
const variants = [
  { name: 'demo (laser, 4 corner holes)', patch: {} },
  { name: 'router, 6 mm plywood, 2 holes at mid-length', patch: { process: { method: 'router' }, plate: { thickness: 6, material: 'plywood' }, holes: { count: 2, diameter: 6.6, inset: 12 } } },
];

const results: { name: string; lat: number; seatErrDeg: number; holeErrMm: number; closureMm: number }[] = [];

describe.each(variants)('flat-pack stand assembled from its joints: $name', ({ patch }) => {
  it.each(LATITUDES)('latitude %s°: seat angle = |latitude|, every plate hole over a rail hole', (lat) => {
    const raw = { ...demo, ...patch, site: { ...demo.site, latitude: lat } };
    const layout = layoutDial(parseSpec(raw));
    const stand = flatStand(layout);
    const { placed, closureMm } = assembleFromJoints(stand);
    for (const inst of stand.instances) expect(placed.has(inst.id), `${inst.id} placed by a joint`).toBe(true);
    // Every joint closes: both cheeks land in both feet and every rail, the cross member in both cheeks.
    expect(closureMm).toBeLessThan(1e-6);
    // The same stand as the generator's placements (which stand.stl and the pictures use).
    for (const inst of stand.instances) {
      const p = placed.get(inst.id)!;
      for (const k of ['origin', 'e1', 'e2', 'normal'] as const) for (let i = 0; i < 3; i++) expect(p[k][i]).toBeCloseTo(inst.placement[k][i], 6);
    }
    // Both feet flat on the ground.
    for (const id of ['foot-front', 'foot-rear']) {
      const p = placed.get(id)!;
      expect(p.normal[2]).toBeCloseTo(1, 12);
      expect(p.origin[2] - stand.dims.thicknessMm / 2).toBeCloseTo(0, 9);
    }
    // Seat angle from each rail's normal; all rails' top faces in one plane.
    const rails = stand.instances.filter((i) => i.id.startsWith('rail-')).map((i) => placed.get(i.id)!);
    let seatErrDeg = 0;
    const planes: number[] = [];
    for (const r of rails) {
      const angle = (Math.acos(Math.min(1, r.normal[2])) * 180) / Math.PI;
      seatErrDeg = Math.max(seatErrDeg, Math.abs(angle - Math.abs(lat)));
      planes.push(dot(at(r, [0, 0], stand.dims.thicknessMm / 2), rails[0].normal));
    }
    expect(seatErrDeg, `seat angle error at ${lat}°`).toBeLessThan(0.05);
    for (const p of planes) expect(p).toBeCloseTo(planes[0], 6);
    // The plate on the lower rail: its lower-left corner on the rail's, its holes where the layout puts them.
    const lower = placed.get('rail-1')!;
    const plate: PartPlacement = { origin: at(lower, [0, 0], stand.dims.thicknessMm / 2), e1: lower.e1, e2: lower.e2, normal: lower.normal };
    const railHoles: { p: Vec3; d: number }[] = [];
    for (const inst of stand.instances.filter((i) => i.id.startsWith('rail-'))) {
      const part = stand.parts.find((q) => q.name === inst.part)!;
      for (const f of part.inner) if (f.kind === 'circle') railHoles.push({ p: at(placed.get(inst.id)!, [f.cx, f.cy], stand.dims.thicknessMm / 2), d: 2 * f.radiusMm });
    }
    expect(railHoles.length).toBe(layout.plate.holes.length);
    let holeErrMm = 0;
    for (const h of layout.plate.holes) {
      const q = at(plate, [h.cx, h.cy]);
      const near = railHoles.map((r) => ({ r, dist: Math.hypot(...sub(r.p, q)) })).sort((a, b) => a.dist - b.dist)[0];
      holeErrMm = Math.max(holeErrMm, near.dist);
      expect(near.r.d).toBeCloseTo(2 * h.radiusMm, 9);
    }
    expect(holeErrMm, `worst plate-to-rail hole offset at ${lat}°`).toBeLessThan(0.05);
    results.push({ name: variants.find((v) => v.patch === patch)!.name, lat, seatErrDeg, holeErrMm, closureMm });
  });
});

describe('worst errors', () => {
  it('are reported', () => {
    const worstSeat = Math.max(...results.map((r) => r.seatErrDeg));
    const worstHole = Math.max(...results.map((r) => r.holeErrMm));
    console.log(`stand from its joints, ${results.length} cases: worst seat-angle error ${worstSeat.toExponential(2)}°, worst plate-hole offset ${worstHole.toExponential(2)} mm, worst joint closure ${Math.max(...results.map((r) => r.closureMm)).toExponential(2)} mm`);
    expect(results.length).toBe(LATITUDES.length * variants.length);
  });
});
