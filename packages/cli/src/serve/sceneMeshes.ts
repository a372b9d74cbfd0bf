import { placeAssembly, placePlanarAssembly, planarGnomonSolid, type DialLayout, type FaceFrame, type Mesh, type PlacedPart, type PlanarLayout, type Vec3 } from '@umbrafab/geometry';

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
  return {
    meshes: partMeshes(a.parts),
    faceToWorld: faceMatrix(a.face),
    tiltDeg: (a.tiltRad * 180) / Math.PI,
    faceRect: { x0: -layout.plate.substyleX, y0: -layout.plate.faceOriginY, widthMm: layout.plate.widthMm, lengthMm: layout.plate.lengthMm },
  };
}

const round1um = (v: number) => Math.round(v * 1000) / 1000;

/** Placed parts as flat triangle lists, each flat face (convex, or a triangle) split into a fan. */
function partMeshes(parts: readonly PlacedPart[]): SceneMesh[] {
  return parts.map((part) => {
    const positions: number[] = [];
    for (const f of part.facets) {
      for (let i = 1; i + 1 < f.points.length; i++) {
        for (const p of [f.points[0], f.points[i], f.points[i + 1]]) positions.push(round1um(p[0]), round1um(p[1]), round1um(p[2]));
      }
    }
    return { name: part.name, positions };
  });
}

/** A face frame as a column-major 4×4 matrix (three.js Matrix4.fromArray). */
function faceMatrix({ origin: o, xAxis: x, yAxis: y, normal: n }: FaceFrame): number[] {
  return [x[0], x[1], x[2], 0, y[0], y[1], y[2], 0, n[0], n[1], n[2], 0, o[0], o[1], o[2], 1];
}

/**
 * A horizontal, wall, meridian or equatorial face as installed, the same
 * scene as its assembly picture (`placePlanarAssembly`: the plate on its
 * pillar and studs, on its wall mount against a patch of wall, or on its
 * equatorial stand, with the fin or rod; world X east, Y north, Z up),
 * raised so that its lowest point stands on the ground (Z = 0) and rounded
 * to 1 µm. An equatorial face beyond its stand's latitudes has no
 * placed assembly: then the plate (a box of plate.thickness under the face)
 * and its gnomon (`planarGnomonSolid`) alone, raised so that the lowest
 * point stands on the ground (Z = 0).
 */
export function planarSceneMeshes(layout: PlanarLayout): Scene {
  const p = layout.plate;
  const faceRect = { x0: -p.substyleX, y0: -p.faceOriginY, widthMm: p.widthMm, lengthMm: p.lengthMm };
  const n = layout.face.normal;
  const tiltDeg = (Math.acos(Math.max(-1, Math.min(1, n[2]))) * 180) / Math.PI;
  const a = placePlanarAssembly(layout);
  if (a !== null) {
    // A wall's patch hangs below the face's origin: raise the scene so it stands on the page's ground grid (Z = 0).
    const lift = -Math.min(0, ...a.parts.flatMap((q) => q.facets.flatMap((f) => f.points.map((pt) => pt[2]))));
    const up = (pt: Vec3): Vec3 => [pt[0], pt[1], pt[2] + lift];
    const parts = a.parts.map((q) => ({ ...q, facets: q.facets.map((f) => ({ ...f, points: f.points.map(up) })) }));
    return { meshes: partMeshes(parts), faceToWorld: faceMatrix({ ...a.face, origin: up(a.face.origin) }), tiltDeg, faceRect };
  }
  const { right: x, up: y } = layout.face;
  const plate = boxMesh([faceRect.x0, faceRect.y0, -p.thicknessMm], [faceRect.x0 + p.widthMm, faceRect.y0 + p.lengthMm, 0]);
  const gnomon = planarGnomonSolid(layout).mesh;
  const toWorld = (q: Vec3, lift: number): Vec3 => [0, 1, 2].map((k) => q[0] * x[k] + q[1] * y[k] + q[2] * n[k] + (k === 2 ? lift : 0)) as unknown as Vec3;
  const lift = -Math.min(...[plate, gnomon].flatMap((m) => m.positions.map((q) => toWorld(q, 0)[2])));
  const flat = (mesh: Mesh) => mesh.triangles.flatMap((t) => t.flatMap((i) => toWorld(mesh.positions[i], lift).map(round1um)));
  return {
    meshes: [
      { name: 'plate', positions: flat(plate) },
      { name: 'gnomon', positions: flat(gnomon) },
    ],
    faceToWorld: faceMatrix({ origin: [0, 0, lift], xAxis: x, yAxis: y, normal: n }),
    tiltDeg,
    faceRect,
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
