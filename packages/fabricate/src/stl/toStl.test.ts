import { describe, expect, it } from 'vitest';
import { STL_FACET_BYTES, STL_HEADER_BYTES, toStl, type StlMesh } from './toStl.ts';

// Unit right tetrahedron, outward CCW winding.
const tetra: StlMesh = {
  positions: [[0, 0, 0], [1, 0, 0], [0, 1, 0], [0, 0, 1]],
  triangles: [[0, 2, 1], [0, 1, 3], [0, 3, 2], [1, 2, 3]],
};

describe('toStl (binary STL, 3D Systems 1989 layout)', () => {
  const bytes = toStl(tetra, { header: 'umbrafab test tetra' });
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);

  it('has an 80-byte space-padded ASCII header, a uint32 count and 50 bytes per facet', () => {
    expect(bytes.length).toBe(STL_HEADER_BYTES + 4 + STL_FACET_BYTES * 4);
    const header = new TextDecoder('ascii').decode(bytes.subarray(0, 80));
    expect(header).toBe('umbrafab test tetra'.padEnd(80, ' '));
    expect(view.getUint32(80, true)).toBe(4);
  });

  it('writes little-endian float32 unit normals from the winding, the corners, and attribute 0', () => {
    const facet = (k: number) => {
      const at = 84 + 50 * k;
      return {
        normal: [0, 1, 2].map((i) => view.getFloat32(at + 4 * i, true)),
        corners: [0, 1, 2].map((v) => [0, 1, 2].map((i) => view.getFloat32(at + 12 + 12 * v + 4 * i, true))),
        attribute: view.getUint16(at + 48, true),
      };
    };
    expect(facet(0)).toEqual({ normal: [0, 0, -1], corners: [[0, 0, 0], [0, 1, 0], [1, 0, 0]], attribute: 0 });
    expect(facet(1).normal).toEqual([0, -1, 0]);
    expect(facet(2).normal).toEqual([-1, 0, 0]);
    const s = Math.fround(1 / Math.sqrt(3));
    expect(facet(3).normal).toEqual([s, s, s]);
    for (let k = 0; k < 4; k++) expect(Math.hypot(...facet(k).normal)).toBeCloseTo(1, 6);
  });

  it('is byte-stable', () => {
    expect(toStl(tetra, { header: 'umbrafab test tetra' })).toEqual(bytes);
  });

  it('does not mutate the mesh', () => {
    const copy = JSON.parse(JSON.stringify(tetra));
    toStl(tetra, { header: 'x' });
    expect(tetra).toEqual(copy);
  });

  it('rejects bad headers and degenerate or malformed facets, naming the problem', () => {
    expect(() => toStl(tetra, { header: 'x'.repeat(81) })).toThrow(/81 characters/);
    expect(() => toStl(tetra, { header: 'solid gnomon' })).toThrow(/must not begin with "solid"/);
    expect(() => toStl(tetra, { header: 'gnómon' })).toThrow(/printable ASCII/);
    const flat: StlMesh = { positions: [[0, 0, 0], [1, 0, 0], [2, 0, 0]], triangles: [[0, 1, 2]] };
    expect(() => toStl(flat, { header: 'flat' })).toThrow(/triangles\[0\] .*zero normal/);
    expect(() => toStl({ ...tetra, triangles: [[0, 1, 9]] }, { header: 'x' })).toThrow(/triangles\[0\]/);
    expect(() => toStl({ ...tetra, positions: [[0, 0, Number.NaN], ...tetra.positions.slice(1)] }, { header: 'x' })).toThrow(/positions\[0\]/);
  });
});
