import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import type { Vec3 } from './mesh.ts';
import { meshBounds } from './meshBounds.ts';
import { meshVolumeMm3 } from './meshVolumeMm3.ts';
import { validateMesh } from './validateMesh.ts';
import { WEDGE_DEFAULTS, wedgeSolid, type WedgePart } from './wedgeSolid.ts';

const DEG = Math.PI / 180;

/**
 * Closed-form volume of the wedge built from WEDGE_DEFAULTS-style options.
 * Cross-section (right prism: V = A · W, common practice), split into
 * - the body under the seat line from the lip foot to the back: a trapezoid
 *   with parallel sides b and b + Y·tan a over the width Y = (lw + S)·cos a
 *   (trapezoid area = mean of the parallel sides × their distance);
 * - the lip: a rectangle lw × lipH;
 * - the fill under the lip's front: a right triangle with legs lipH·sin a and lipH·cos a;
 * - the toe: a rectangle toe × b.
 * Minus the holes: a cylinder π r² h for the bore and a cone frustum
 * π h/3 (r² + r R + R²) for the countersink (common practice), or with
 * `polygon`, the same with the circumscribed regular N-gon area N r² tan(π/N)
 * and the frustum formula h/3 (A1 + A2 + √(A1·A2)) (common practice), which
 * is what the mesh is exactly. Minus the arrow recess: a prism
 * (shaft rectangle + head triangle) × depth.
 */
function closedFormSection(part: WedgePart, latitudeDeg: number, o = WEDGE_DEFAULTS): number {
  const a = Math.abs(latitudeDeg) * DEG;
  const b = o.minBaseMm;
  const Y = (o.lipWidthMm + o.seatLengthMm) * Math.cos(a);
  const body = (Y * (b + (b + Y * Math.tan(a)))) / 2;
  const lip = o.lipWidthMm * o.lipMm;
  const fill = 0.5 * o.lipMm ** 2 * Math.sin(a) * Math.cos(a);
  const toe = part.toeLengthMm * b;
  return body + lip + fill + toe;
}

function closedFormVolume(part: WedgePart, latitudeDeg: number, polygon: boolean, o = WEDGE_DEFAULTS): number {
  const b = o.minBaseMm;
  const area = (r: number) => (polygon ? o.holes.segments * r * r * Math.tan(Math.PI / o.holes.segments) : Math.PI * r * r);
  let holes = 0;
  for (const h of part.holes) {
    const A1 = area(h.boreRadiusMm);
    const A2 = area(h.topRadiusMm);
    const cs = h.countersinkDepthMm;
    holes += A1 * (b - cs) + (cs / 3) * (A1 + A2 + Math.sqrt(A1 * A2));
  }
  const ar = o.arrow;
  const arrow = ar ? (ar.shaftWidthMm * (ar.lengthMm - ar.headLengthMm) + 0.5 * ar.headWidthMm * ar.headLengthMm) * ar.depthMm : 0;
  return closedFormSection(part, latitudeDeg, o) * o.seatWidthMm - holes - arrow;
}

/** Outward unit normals (from the winding) of the triangles lying on the seat rectangle. */
function seatNormals(part: WedgePart): Vec3[] {
  const key = (p: Vec3) => p.join(',');
  const seat = new Set(part.seatCorners.map(key));
  const out: Vec3[] = [];
  for (const [i, j, k] of part.mesh.triangles) {
    const [a, b, c] = [i, j, k].map((n) => part.mesh.positions[n]);
    if (![a, b, c].every((p) => seat.has(key(p)))) continue;
    const u = [b[0] - a[0], b[1] - a[1], b[2] - a[2]];
    const v = [c[0] - a[0], c[1] - a[1], c[2] - a[2]];
    const n = [u[1] * v[2] - u[2] * v[1], u[2] * v[0] - u[0] * v[2], u[0] * v[1] - u[1] * v[0]];
    const len = Math.hypot(n[0], n[1], n[2]);
    out.push([n[0] / len, n[1] / len, n[2] / len]);
  }
  return out;
}

const LATITUDES = [0, 5, 45, 70, -35, 89];

describe('wedgeSolid', () => {
  it.each(LATITUDES)('latitude %s°: closed mesh, volume against the closed form', (lat) => {
    const part = wedgeSolid({ latitudeDeg: lat });
    validateMesh(part.mesh);
    const v = meshVolumeMm3(part.mesh);
    const circles = closedFormVolume(part, lat, false);
    const exact = closedFormVolume(part, lat, true);
    expectClose(v, circles, 0.001 * circles, `wedge ${lat}° volume vs cylinder/cone formulas`, ' mm³');
    expectClose(v, exact, 1e-9 * exact, `wedge ${lat}° volume vs N-gon prism/frustum formulas`, ' mm³');
    const section = closedFormSection(part, lat);
    expectClose(part.profileAreaMm2, section, 1e-9 * section, `wedge ${lat}° cross-section (shoelace vs decomposition)`, ' mm²');
  });

  it.each([0, 5, 45, 70, -35])('latitude %s°: seat normal makes |latitude| with the vertical within 0.01°', (lat) => {
    const part = wedgeSolid({ latitudeDeg: lat });
    const normals = seatNormals(part);
    expect(normals.length).toBe(2); // one flat quad, no needless triangle
    for (const n of normals) {
      const angleDeg = Math.acos(n[2]) / DEG;
      expectClose(angleDeg, Math.abs(lat), 0.01, `seat tilt at ${lat}°`, '°');
      if (lat !== 0) expect(n[1]).toBeLessThan(0); // seat rises toward +y, so it faces −y
      expectClose(n[0], 0, 1e-12, 'seat normal x');
      expectClose(n[1], part.seatNormal[1], 1e-12, 'reported seat normal y');
    }
    // Seat length measured along the slope.
    const [p0, , , p3] = part.seatCorners;
    expectClose(Math.hypot(p3[1] - p0[1], p3[2] - p0[2]), WEDGE_DEFAULTS.seatLengthMm, 1e-9, 'seat length', ' mm');
  });

  it('treats −35° exactly like +35°', () => {
    expect(wedgeSolid({ latitudeDeg: -35 })).toEqual(wedgeSolid({ latitudeDeg: 35 }));
  });

  it('is a flat slab of minBase with a lip at 0°', () => {
    const part = wedgeSolid({ latitudeDeg: 0 });
    expect(part.design).toBe('slab');
    const b = meshBounds(part.mesh);
    expect(b.min[2]).toBe(0);
    expect(b.max[2]).toBe(WEDGE_DEFAULTS.minBaseMm + WEDGE_DEFAULTS.lipMm);
    expect(part.seatCorners.every((p) => p[2] === WEDGE_DEFAULTS.minBaseMm)).toBe(true);
  });

  it.each([45, 70, 89])('latitude %s°: stand keeps the seat and its payload over the footprint', (lat) => {
    const part = wedgeSolid({ latitudeDeg: lat });
    expect(part.design).toBe('stand');
    const o = WEDGE_DEFAULTS;
    const [nx, ny, nz] = part.seatNormal;
    for (const c of part.seatCorners) {
      for (const lift of [0, o.payloadHeightMm]) {
        const y = c[1] + lift * ny;
        expect(y).toBeGreaterThanOrEqual(part.footprint.yMinMm);
        expect(y).toBeLessThanOrEqual(part.footprint.yMaxMm);
        expect(c[2] + lift * nz).toBeGreaterThan(0);
        expect(c[0] + lift * nx).toBeGreaterThanOrEqual(part.footprint.xMinMm);
      }
    }
    // The whole mesh stands on its footprint (nothing overhangs the base outline).
    const b = meshBounds(part.mesh);
    expect(b.min[1]).toBe(part.footprint.yMinMm);
    expect(b.max[1]).toBe(part.footprint.yMaxMm);
  });

  it('places countersunk holes in pairs clear of the arrow and of the edges', () => {
    const part = wedgeSolid({ latitudeDeg: 45, holes: { count: 4 } });
    validateMesh(part.mesh);
    expect(part.holes.map((h) => h.xMm)).toEqual([...part.holes.map((h) => h.xMm)].sort((p, q) => p - q));
    expect(part.holes.length).toBe(4);
    for (const h of part.holes) {
      expect(Math.abs(h.xMm)).toBeGreaterThan(WEDGE_DEFAULTS.arrow!.headWidthMm / 2 + h.topRadiusMm);
      expect(Math.abs(h.xMm) + h.topRadiusMm).toBeLessThan(WEDGE_DEFAULTS.seatWidthMm / 2);
      // 90° countersink: depth = (R − r) / tan 45° (common practice).
      expectClose(h.countersinkDepthMm, h.topRadiusMm - h.boreRadiusMm, 1e-12, 'countersink depth', ' mm');
    }
    expectClose(meshVolumeMm3(part.mesh), closedFormVolume(part, 45, true), 1e-6, 'volume with 4 holes', ' mm³');
  });

  it('builds without countersink, holes or arrow', () => {
    for (const opts of [{ holes: { countersink: null } }, { holes: { count: 0 } }, { arrow: null }, { holes: { count: 0 }, arrow: null }] as const) {
      const part = wedgeSolid({ latitudeDeg: 30, ...opts });
      validateMesh(part.mesh);
      const o = { ...WEDGE_DEFAULTS, holes: { ...WEDGE_DEFAULTS.holes, ...(opts as { holes?: object }).holes }, arrow: 'arrow' in opts ? null : WEDGE_DEFAULTS.arrow };
      expectClose(meshVolumeMm3(part.mesh), closedFormVolume(part, 30, true, o), 1e-6, `volume ${JSON.stringify(opts)}`, ' mm³');
    }
  });

  it('rejects wedges that cannot be printed, naming the field and value', () => {
    expect(() => wedgeSolid({ latitudeDeg: 89.5 })).toThrow(/wedge\.latitudeDeg: got 89\.5;/);
    expect(() => wedgeSolid({ latitudeDeg: -90 })).toThrow(/wedge\.latitudeDeg: got -90;/);
    expect(() => wedgeSolid({ latitudeDeg: Number.NaN })).toThrow(/wedge\.latitudeDeg: got NaN \(not a number\);/);
    expect(() => wedgeSolid({ seatWidthMm: 10 })).toThrow(/wedge\.seatWidthMm: got 10;/);
    expect(() => wedgeSolid({ seatLengthMm: 0 })).toThrow(/wedge\.seatLengthMm: got 0;/);
    expect(() => wedgeSolid({ minBaseMm: 0 })).toThrow(/wedge\.minBaseMm: got 0;/);
    expect(() => wedgeSolid({ lipMm: -1 })).toThrow(/wedge\.lipMm: got -1;/);
    expect(() => wedgeSolid({ holes: { count: 3 } })).toThrow(/wedge\.holes\.count: got 3; allowed: an even number/);
    expect(() => wedgeSolid({ holes: { count: 12 } })).toThrow(/wedge\.holes\.count: 12 holes of .* do not fit; allowed: /);
    expect(() => wedgeSolid({ minBaseMm: 2.5 })).toThrow(/wedge\.holes\.countersink/);
    expect(() => wedgeSolid({ holes: { countersink: { diameterMm: 4, angleDeg: 90 } } })).toThrow(/countersink\.diameterMm: got 4;/);
    expect(() => wedgeSolid({ arrow: { depthMm: 6 } })).toThrow(/wedge\.arrow\.depthMm: got 6;/);
  });
});

describe('wedgeSolid (property)', () => {
  it('gives a valid closed mesh matching the closed form for any tilt 0…89° and hole count', () => {
    fc.assert(
      fc.property(fc.double({ min: -89, max: 89, noNaN: true }), fc.constantFrom(0, 2, 4), (lat, count) => {
        const part = wedgeSolid({ latitudeDeg: lat, holes: { count } });
        validateMesh(part.mesh);
        const o = { ...WEDGE_DEFAULTS, holes: { ...WEDGE_DEFAULTS.holes, count } };
        const exact = closedFormVolume(part, lat, true, o);
        expect(Math.abs(meshVolumeMm3(part.mesh) - exact)).toBeLessThan(1e-9 * exact);
      }),
      { numRuns: 100, seed: 20250102 },
    );
  });
});
