import { placeAssembly, type DialLayout } from '@umbrafab/geometry';

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
  /** the seat's tilt, degrees (= |latitude|) */
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
