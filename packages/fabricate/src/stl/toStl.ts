/**
 * Binary STL writer.
 *
 * Layout (3D Systems, Inc., "StereoLithography Interface Specification",
 * 1989, binary format; also M. Burns, *Automated Fabrication*, Prentice Hall
 * 1993, §6.5 — memory), all numbers little-endian:
 *
 *   UINT8[80]   header (free text; here ASCII, space padded)
 *   UINT32      number of triangles
 *   per triangle (50 bytes):
 *     REAL32[3] unit normal
 *     REAL32[3] vertex 1, REAL32[3] vertex 2, REAL32[3] vertex 3
 *               (counter-clockwise seen from outside, right-hand rule)
 *     UINT16    attribute byte count, 0
 *
 * Units are not recorded by the format; umbrafab writes millimetres
 * (docs/design.md §5). The header must not begin with "solid", which some readers
 * take for the ASCII variant.
 */

/** Point or direction, mm. Structurally the same as the geometry package's Vec3. */
export type StlVec3 = readonly [number, number, number];

/** Indexed triangle mesh with outward CCW winding (the geometry package's Mesh). */
export interface StlMesh {
  readonly positions: readonly StlVec3[];
  readonly triangles: readonly (readonly [number, number, number])[];
}

export interface StlOptions {
  /** header text naming the part and spec summary: printable ASCII, at most 80 characters */
  readonly header: string;
}

export const STL_HEADER_BYTES = 80;
export const STL_FACET_BYTES = 50;

/**
 * Serialise a closed mesh as binary STL. Coordinates are rounded once to
 * float32 (so shared corners stay bit-identical), and each facet's normal is
 * computed from those rounded corners and its winding, normalised, never
 * zero. Output depends only on the input: byte-stable.
 *
 * Throws on a bad header (non-ASCII, over 80 characters, starting with
 * "solid"), an index out of range, a non-finite coordinate or a facet whose
 * normal is zero (degenerate after rounding).
 *
 * @example toStl(gnomonSolid().mesh, { header: 'umbrafab gnomon h=20 t=3 mm' }) // Uint8Array
 */
export function toStl(mesh: StlMesh, options: StlOptions): Uint8Array {
  const header = options.header;
  if (typeof header !== 'string' || !/^[\x20-\x7e]*$/.test(header)) {
    throw new Error(`toStl: header = ${JSON.stringify(header)} is not allowed: it must be printable ASCII`);
  }
  if (header.length > STL_HEADER_BYTES) {
    throw new Error(`toStl: header is ${header.length} characters long; at most ${STL_HEADER_BYTES} are allowed`);
  }
  if (/^\s*solid/i.test(header)) {
    throw new Error(`toStl: header = ${JSON.stringify(header)} is not allowed: a binary STL header must not begin with "solid"`);
  }

  const f32 = mesh.positions.map((p, i) => {
    if (p.length !== 3 || !p.every((c) => Number.isFinite(c))) {
      throw new Error(`toStl: mesh.positions[${i}] = [${p.join(', ')}] is not three finite numbers`);
    }
    return [Math.fround(p[0]), Math.fround(p[1]), Math.fround(p[2])] as const;
  });
  const count = mesh.triangles.length;
  const bytes = new Uint8Array(STL_HEADER_BYTES + 4 + STL_FACET_BYTES * count);
  const view = new DataView(bytes.buffer);
  for (let k = 0; k < STL_HEADER_BYTES; k++) bytes[k] = k < header.length ? header.charCodeAt(k) : 0x20;
  view.setUint32(STL_HEADER_BYTES, count, true);

  let at = STL_HEADER_BYTES + 4;
  mesh.triangles.forEach((t, ti) => {
    if (!t.every((i) => Number.isInteger(i) && i >= 0 && i < f32.length)) {
      throw new Error(`toStl: mesh.triangles[${ti}] = [${t.join(', ')}] needs indices in 0..${f32.length - 1}`);
    }
    const a = f32[t[0]];
    const b = f32[t[1]];
    const c = f32[t[2]];
    const ux = b[0] - a[0], uy = b[1] - a[1], uz = b[2] - a[2];
    const vx = c[0] - a[0], vy = c[1] - a[1], vz = c[2] - a[2];
    const nx = uy * vz - uz * vy;
    const ny = uz * vx - ux * vz;
    const nz = ux * vy - uy * vx;
    const len = Math.hypot(nx, ny, nz);
    if (!(len > 0)) throw new Error(`toStl: mesh.triangles[${ti}] = [${t.join(', ')}] is degenerate (zero normal)`);
    for (const value of [nx / len, ny / len, nz / len, ...a, ...b, ...c]) {
      view.setFloat32(at, value, true);
      at += 4;
    }
    view.setUint16(at, 0, true);
    at += 2;
  });
  return bytes;
}
