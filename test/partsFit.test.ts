import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { dialGnomon, dialWedge, faceToWedge, gnomonOnPlate, layoutDial, meshBounds, meshVolumeMm3, parseSpec, partsPlan, printedWedge, type Vec3 } from '@umbrafab/geometry';
import { buildFiles, readSpecFile } from '@umbrafab/cli';
import { expectClose } from './helpers/closeTo.ts';
import { ezdxfDump } from './helpers/ezdxf.ts';

const ROOT = resolve(import.meta.dirname, '..');
const DEG = Math.PI / 180;

/** A print spec at a given latitude (solar time, so longitude and zone do not move the lines). */
function printSpec(latitude: number, extra: Record<string, unknown> = {}) {
  return parseSpec({ name: `lat ${latitude}`, site: { latitude, longitude: 0, timezone: 'UTC' }, process: { method: 'print' }, ...extra });
}

/** Triangles of a binary STL (3D Systems 1989 layout: 80-byte header, count, 50-byte facets). */
function stlFacets(bytes: Uint8Array): Vec3[][] {
  const v = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const n = v.getUint32(80, true);
  return Array.from({ length: n }, (_, k) => [0, 1, 2].map((c) => [0, 1, 2].map((i) => v.getFloat32(84 + 50 * k + 12 + 12 * c + 4 * i, true)) as unknown as Vec3));
}

function unitNormal([a, b, c]: Vec3[]): Vec3 {
  const u = [b[0] - a[0], b[1] - a[1], b[2] - a[2]];
  const w = [c[0] - a[0], c[1] - a[1], c[2] - a[2]];
  const n = [u[1] * w[2] - u[2] * w[1], u[2] * w[0] - u[0] * w[2], u[0] * w[1] - u[1] * w[0]];
  const l = Math.hypot(n[0], n[1], n[2]);
  return [n[0] / l, n[1] / l, n[2] / l];
}

describe('closed-form volumes (prism V = A·t, right prism: base area times length — common practice)', () => {
  const specs = ([
    ['demo', readSpecFile(join(ROOT, 'fixtures/demo.yaml'))],
    ['print north with nodus', readSpecFile(join(ROOT, 'fixtures/specs/parts-print.yaml'))],
    ['print south', readSpecFile(join(ROOT, 'fixtures/specs/parts-south.yaml'))],
  ] as const).map(([name, spec]) => ({ name, spec }));

  it.each(specs)('$name: gnomon volume = t · (L·h + Σ tab length · depth − notch s²/4) within 0.1 per cent', ({ name: _n, spec }) => {
    const layout = layoutDial(spec);
    const plan = partsPlan(layout);
    const g = layout.gnomon;
    const T = layout.plate.thicknessMm;
    // Side outline area: the fin rectangle L × h, each through tab (length × plate thickness),
    // minus a 90° V-notch of opening s (a triangle of base s and height s/2: s²/4).
    const notch = spec.parts.nodus ? spec.parts.nodusSize ** 2 / 4 : 0;
    const area = (g.y1Mm - g.y0Mm) * g.heightMm + g.tabs.reduce((s, t) => s + t.lengthMm * T, 0) - notch;
    const expected = g.thicknessMm * area;
    const v = meshVolumeMm3(dialGnomon(plan, layout).mesh);
    expectClose(v, expected, 0.001 * expected, 'gnomon volume', ' mm³');
    console.log(`${_n}: gnomon ${v.toFixed(3)} mm³, closed form ${expected.toFixed(3)} mm³`);
  });

  it.each(specs)('$name: wedge volume = section area · width − holes − arrow within 0.1 per cent', ({ name: _n, spec }) => {
    const layout = layoutDial(spec);
    const plan = partsPlan(layout);
    const w = plan.wedge;
    const part = dialWedge(plan, layout);
    const a = Math.abs(spec.site.latitude) * DEG;
    const b = w.minBaseMm;
    // Cross-section (extruded over the seat width, V = A · W): the trapezoid under the seat
    // line (parallel sides b and b + Y·tan a, distance Y = (lip width + seat)·cos a; trapezoid
    // area = mean of the parallel sides × their distance), the lip rectangle, the right
    // triangle filling under the lip's front (legs lip·sin a, lip·cos a), the toe rectangle.
    const Y = (w.lipWidthMm + w.seatLengthMm) * Math.cos(a);
    const section = (Y * (2 * b + Y * Math.tan(a))) / 2 + w.lipWidthMm * w.lipMm + 0.5 * w.lipMm ** 2 * Math.sin(a) * Math.cos(a) + part.toeLengthMm * b;
    // Holes: regular N-gon prisms (area N r² tan(π/N), circumscribed) and frustums
    // h/3 (A1 + A2 + √(A1 A2)) for the countersinks (common practice).
    const N = w.holes.segments;
    const ngon = (r: number) => N * r * r * Math.tan(Math.PI / N);
    const holes = part.holes.reduce((s, h) => {
      const A1 = ngon(h.boreRadiusMm);
      const A2 = ngon(h.topRadiusMm);
      return s + A1 * (b - h.countersinkDepthMm) + (h.countersinkDepthMm / 3) * (A1 + A2 + Math.sqrt(A1 * A2));
    }, 0);
    const ar = w.arrow;
    const arrow = ar ? (ar.shaftWidthMm * (ar.lengthMm - ar.headLengthMm) + 0.5 * ar.headWidthMm * ar.headLengthMm) * ar.depthMm : 0;
    const expected = section * w.seatWidthMm - holes - arrow;
    const v = meshVolumeMm3(part.mesh);
    expectClose(v, expected, 0.001 * expected, 'wedge volume', ' mm³');
    console.log(`${_n}: wedge ${v.toFixed(1)} mm³, closed form ${expected.toFixed(1)} mm³ (${(((v - expected) / expected) * 100).toExponential(2)} %)`);
  });
});

describe('wedge seat normal at |latitude| from the vertical within 0.01°, read back from wedge.stl', () => {
  it.each([0, 5, 45, 70, -35, -60])('latitude %s°', async (lat) => {
    const built = await buildFiles(printSpec(lat));
    // The printed wedge as built (base and back as adjusted for the insert pockets), whole or in pieces.
    const wedge = (await printedWedge(built.layout, partsPlan(built.layout))).solid;
    const stls = built.files.filter((f) => /^wedge(-\d+-of-\d+)?\.stl$/.test(f.name));
    expect(stls.length).toBeGreaterThan(0);
    // Seat facets: all three corners on the seat plane and inside the seat rectangle (float32 corners as in the file).
    const [c0, , c2] = wedge.seatCorners;
    const n0 = wedge.seatNormal;
    const onSeat = (p: Vec3) =>
      Math.abs((p[0] - c0[0]) * n0[0] + (p[1] - c0[1]) * n0[1] + (p[2] - c0[2]) * n0[2]) < 1e-3 &&
      p[0] >= c0[0] - 1e-3 && p[0] <= c2[0] + 1e-3 && p[1] >= c0[1] - 1e-3 && p[1] <= c2[1] + 1e-3;
    const normals = stls.flatMap((stl) => stlFacets(stl.bytes)).filter((t) => t.every(onSeat)).map(unitNormal);
    expect(normals.length).toBeGreaterThanOrEqual(2);
    for (const n of normals) {
      const fromVertical = Math.acos(Math.min(1, n[2])) / DEG;
      expectClose(fromVertical, Math.abs(lat), 0.01, `seat tilt at ${lat}°`, '°');
      expect(Math.abs(n[0])).toBeLessThan(0.01 * DEG); // float32 corners of small facets round the pocket rims
      // Rising toward +y (the elevated pole): the seat faces the equator, −y.
      if (lat !== 0) expect(n[1]).toBeLessThan(0);
    }
    const report = built.report.wedge;
    expect(report.angleDeg).toBe(Math.abs(lat));
    expect(report.risesToward).toBe(lat >= 0 ? 'true north' : 'true south');
  });
});

describe('fits as assembled', () => {
  const cases = ([
    ['demo (laser, sheet gnomon)', readSpecFile(join(ROOT, 'fixtures/demo.yaml'))],
    ['print north', readSpecFile(join(ROOT, 'fixtures/specs/parts-print.yaml'))],
    ['print south', readSpecFile(join(ROOT, 'fixtures/specs/parts-south.yaml'))],
    ['tab depth 2 mm in a 4 mm plate', printSpec(40, { plate: { thickness: 4 }, parts: { tabDepth: 2 } })],
  ] as const).map(([name, spec]) => ({ name, spec }));

  it.each(cases)('$name: style edges gnomon height above the face within 0.01 mm; tabs end at the underside', ({ spec }) => {
    const layout = layoutDial(spec);
    const plan = partsPlan(layout);
    const part = dialGnomon(plan, layout);
    const placed = gnomonOnPlate(part, plan);
    const b = meshBounds(placed);
    const h = spec.gnomon.height;
    const T = spec.plate.thickness;
    // The face (the plate's top surface) is z = 0; the fin rests on it, tabs through the slots.
    expectClose(b.max[2], h, 0.01, 'style above the face', ' mm');
    expectClose(-b.min[2], spec.parts.tabDepth === 'through' ? T : spec.parts.tabDepth, 1e-9, 'tab bottom below the face', ' mm');
    expectClose(b.min[1], layout.gnomon.y0Mm, 1e-9, 'fin start', ' mm');
    expectClose(b.max[1], layout.gnomon.y1Mm, 1e-9, 'fin end', ' mm');
    // On the wedge: distance of every style corner from the plane of the plate's top face.
    const wedge = dialWedge(plan, layout);
    const map = faceToWedge(layout, wedge);
    const o = map([0, 0, 0]);
    const n = wedge.seatNormal;
    const top = placed.positions.filter((p) => Math.abs(p[2] - h) < 1e-9 && Math.abs(Math.abs(p[0]) - spec.gnomon.thickness / 2) < 1e-9);
    expect(top.length).toBeGreaterThanOrEqual(4);
    let worst = 0;
    for (const p of top) {
      const q = map(p);
      const d = (q[0] - o[0]) * n[0] + (q[1] - o[1]) * n[1] + (q[2] - o[2]) * n[2];
      worst = Math.max(worst, Math.abs(d - h));
    }
    expect(worst).toBeLessThanOrEqual(0.01);
    // The plate's underside lies on the seat: face point z = −T maps onto the seat plane.
    const seatPoint = wedge.seatCorners[0];
    const u = map([0, 0, -T]);
    expectClose((u[1] - seatPoint[1]) * n[1] + (u[2] - seatPoint[2]) * n[2], 0, 1e-9, 'plate underside on the seat', ' mm');
  });

  it('body.stl (print north): the style 30 mm above the face, i.e. 34 mm above the underside, within 0.01 mm', async () => {
    const built = await buildFiles(readSpecFile(join(ROOT, 'fixtures/specs/parts-print.yaml')));
    const stl = built.files.find((f) => f.name === 'body.stl')!;
    const zs = stlFacets(stl.bytes).flat().map((p) => p[2]);
    expectClose(Math.max(...zs), 30 + 4, 0.01, 'body style height above the underside', ' mm');
    expectClose(Math.min(...zs), 0, 1e-9, 'body underside', ' mm');
    const body = built.report.parts as Required<typeof built.report.parts>;
    expect(body.body.volumeMm3).toBeGreaterThan(0);
  });

  it.each(([
    ['print (kerf 0, clearance 0.2)', printSpec(45), 0.2, 0],
    ['demo laser (kerf 0.15, clearance 0.1)', readSpecFile(join(ROOT, 'fixtures/demo.yaml')), 0.1, 0.15],
  ] as const).map(([name, spec, c, kerf]) => ({ name, spec, c, kerf })))('$name: slot = tab + 2 · clearance (per side) in the layout and in plate.dxf (true size: the machine applies the kerf of $kerf mm)', async ({ spec, c }) => {
    const built = await buildFiles(spec);
    const layout = built.layout;
    const t = layout.gnomon.thicknessMm;
    expect(layout.plate.slots.length).toBe(layout.gnomon.tabs.length);
    layout.plate.slots.forEach((s, i) => {
      expectClose(s.widthMm, t + 2 * c, 1e-9, 'slot width', ' mm');
      expectClose(s.heightMm, layout.gnomon.tabs[i].lengthMm + 2 * c, 1e-9, 'slot length', ' mm');
      expectClose(s.cy - layout.plate.faceOriginY, layout.gnomon.tabs[i].centerYMm, 1e-9, 'slot centre', ' mm');
    });
    // Outside reader: ezdxf (Debian python3-ezdxf). plate.dxf draws the slot at its nominal size.
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-slots-'));
    const file = join(dir, 'plate.dxf');
    writeFileSync(file, built.files.find((f) => f.name === 'plate.dxf')!.bytes);
    const dump = ezdxfDump(file);
    const slots = dump.entities
      .filter((e) => e.layer === 'CUT_PROFILE' && e.type === 'LWPOLYLINE')
      .map((e) => {
        const xs = e.points!.map((p) => p[0]);
        const ys = e.points!.map((p) => p[1]);
        return { w: Math.max(...xs) - Math.min(...xs), l: Math.max(...ys) - Math.min(...ys) };
      })
      .filter((r) => r.w < 20);
    expect(slots.length).toBe(layout.gnomon.tabs.length);
    for (const [i, s] of slots.entries()) {
      expectClose(s.w, t + 2 * c, 1e-6, 'slot width in plate.dxf', ' mm');
      expectClose(s.l, layout.gnomon.tabs[i].lengthMm + 2 * c, 1e-6, 'slot length in plate.dxf', ' mm');
    }
    const parts = built.report.parts;
    for (const s of parts.slots) expectClose(s.widthMm - s.tabWidthMm, 2 * c, 1e-9, 'report slot − tab', ' mm');
  });
});
