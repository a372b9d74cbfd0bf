import { placeAssembly, planarGnomonSolid, type DialLayout, type Mesh, type PlanarLayout, type Vec3 } from '@umbrafab/geometry';

/** One part for three.js: flat triangle corners (x, y, z, x, y, z, …), world mm. */
export interface SceneMesh {
  readonly name: string;
  readonly positions: readonly number[];
}

/** What the page's 3D view draws: the placed parts and where the face lies. */
export interface Scene {
  readonly meshes: readonly SceneMesh[];
  /** face frame → world, a 4×4 matrix in column-major order (three.js Matrix4.fromArray) */
  readonly faceToWorld: readonly number[];
  /** the seat's tilt, degrees (= |latitude|); a planar face: its tilt from level (0 horizontal, 90 a wall) */
  readonly tiltDeg: number;
  /** the plate's top face in face coordinates: lower-left corner and size, mm (where preview.svg's plate goes) */
  readonly faceRect: { readonly x0: number; readonly y0: number; readonly widthMm: number; readonly lengthMm: number };
}

/**
 * The assembly as placed by the geometry package (`placeAssembly`: wedge on
 * level ground, plate on its seat, gnomon in the slots; world X east, Y
 * north, Z up), each flat face split into a triangle fan (the faces are
 * convex) and rounded to 1 µm for transport.
 */
export function sceneMeshes(layout: DialLayout): Scene {
  const a = placeAssembly(layout);
  const r = (v: number) => Math.round(v * 1000) / 1000;
  const meshes = a.parts.map((part) => {
    const positions: number[] = [];
    for (const f of part.facets) {
      for (let i = 1; i + 1 < f.points.length; i++) {
        for (const p of [f.points[0], f.points[i], f.points[i + 1]]) positions.push(r(p[0]), r(p[1]), r(p[2]));
      }
    }
    return { name: part.name, positions };
  });
  const { origin: o, xAxis: x, yAxis: y, normal: n } = a.face;
  return {
    meshes,
    faceToWorld: [x[0], x[1], x[2], 0, y[0], y[1], y[2], 0, n[0], n[1], n[2], 0, o[0], o[1], o[2], 1],
    tiltDeg: (a.tiltRad * 180) / Math.PI,
    faceRect: { x0: -layout.plate.substyleX, y0: -layout.plate.faceOriginY, widthMm: layout.plate.widthMm, lengthMm: layout.plate.lengthMm },
  };
}

/**
 * A horizontal, wall, meridian or equatorial face as installed: the plate
 * (its outline as a box of plate.thickness under the face) and its gnomon
 * (`planarGnomonSolid`: the fin with its tabs through the plate, or the
 * rod), turned from the face frame (x right, y along the substyle, z out of
 * the face: `layout.face`) into the world (X east, Y north, Z up), raised
 * so that the lowest point stands on the ground (Z = 0). Rounded to 1 µm.
 */
export function planarSceneMeshes(layout: PlanarLayout): Scene {
  const { right: x, up: y, normal: n } = layout.face;
  const p = layout.plate;
  const [x0, y0] = [-p.substyleX, -p.faceOriginY];
  const plate = boxMesh([x0, y0, -p.thicknessMm], [x0 + p.widthMm, y0 + p.lengthMm, 0]);
  const gnomon = planarGnomonSolid(layout).mesh;
  const toWorld = (q: Vec3, lift: number): Vec3 => [0, 1, 2].map((k) => q[0] * x[k] + q[1] * y[k] + q[2] * n[k] + (k === 2 ? lift : 0)) as unknown as Vec3;
  const lift = -Math.min(...[plate, gnomon].flatMap((m) => m.positions.map((q) => toWorld(q, 0)[2])));
  const r = (v: number) => Math.round(v * 1000) / 1000;
  const flat = (mesh: Mesh) => mesh.triangles.flatMap((t) => t.flatMap((i) => toWorld(mesh.positions[i], lift).map(r)));
  return {
    meshes: [
      { name: 'plate', positions: flat(plate) },
      { name: 'gnomon', positions: flat(gnomon) },
    ],
    faceToWorld: [x[0], x[1], x[2], 0, y[0], y[1], y[2], 0, n[0], n[1], n[2], 0, 0, 0, lift, 1],
    tiltDeg: (Math.acos(Math.max(-1, Math.min(1, n[2]))) * 180) / Math.PI,
    faceRect: { x0, y0, widthMm: p.widthMm, lengthMm: p.lengthMm },
  };
}

/** An axis-aligned box from its two corners, outward-facing triangles. */
function boxMesh(lo: Vec3, hi: Vec3): Mesh {
  const c = (i: number): Vec3 => [i & 1 ? hi[0] : lo[0], i & 2 ? hi[1] : lo[1], i & 4 ? hi[2] : lo[2]];
  const positions = Array.from({ length: 8 }, (_, i) => c(i));
  // Each face counter-clockwise seen from outside, two triangles.
  const quads = [[0, 2, 3, 1], [4, 5, 7, 6], [0, 1, 5, 4], [2, 6, 7, 3], [0, 4, 6, 2], [1, 3, 7, 5]];
  return { positions, triangles: quads.flatMap(([a, b, cc, d]) => [[a, b, cc], [a, cc, d]] as [number, number, number][]) };
}
