import { describe, expect, it } from 'vitest';
import type { Mesh, Triangle, Vec3 } from './mesh.ts';
import { meshBounds } from './meshBounds.ts';
import { meshVolumeMm3 } from './meshVolumeMm3.ts';
import { validateMesh } from './validateMesh.ts';

// Unit right tetrahedron: closed form V = 1/6 (volume of a tetrahedron = base area × height / 3, common practice).
const tetra: Mesh = {
  positions: [[0, 0, 0], [1, 0, 0], [0, 1, 0], [0, 0, 1]],
  triangles: [[0, 2, 1], [0, 1, 3], [0, 3, 2], [1, 2, 3]],
};

describe('validateMesh', () => {
  it('accepts a closed outward tetrahedron', () => {
    expect(validateMesh(tetra)).toBe(tetra);
  });
  it('rejects an open surface (edge without twin)', () => {
    expect(() => validateMesh({ ...tetra, triangles: tetra.triangles.slice(0, 3) })).toThrow(/no opposite twin/);
  });
  it('rejects a reversed triangle (same directed edge twice)', () => {
    const t = [...tetra.triangles] as Triangle[];
    t[3] = [1, 3, 2];
    expect(() => validateMesh({ ...tetra, triangles: t })).toThrow(/same direction/);
  });
  it('rejects a repeated corner and a zero-area triangle', () => {
    expect(() => validateMesh({ ...tetra, triangles: [[0, 0, 1], ...tetra.triangles] })).toThrow(/repeats a corner/);
    const flat: Mesh = { positions: [[0, 0, 0], [1, 0, 0], [2, 0, 0], [0, 1, 0]], triangles: [[0, 1, 2]] };
    expect(() => validateMesh(flat)).toThrow(/zero area/);
  });
  it('rejects non-finite numbers, duplicated positions and bad indices, naming them', () => {
    const p = [...tetra.positions] as Vec3[];
    p[2] = [0, Number.NaN, 0];
    expect(() => validateMesh({ ...tetra, positions: p })).toThrow(/positions\[2\]/);
    expect(() => validateMesh({ ...tetra, positions: [...tetra.positions, [1, 0, 0]] })).toThrow(/duplicates positions\[1\]/);
    expect(() => validateMesh({ ...tetra, triangles: [[0, 1, 7]] })).toThrow(/triangles\[0\]/);
  });
});

describe('meshVolumeMm3 and meshBounds', () => {
  it('gives 1/6 for the unit tetrahedron and −1/6 when every triangle is reversed', () => {
    expect(meshVolumeMm3(tetra)).toBeCloseTo(1 / 6, 12);
    const flipped: Mesh = { ...tetra, triangles: tetra.triangles.map(([a, b, c]) => [a, c, b] as Triangle) };
    expect(meshVolumeMm3(flipped)).toBeCloseTo(-1 / 6, 12);
  });
  it('is independent of where the solid sits (translated tetrahedron)', () => {
    const moved: Mesh = { ...tetra, positions: tetra.positions.map(([x, y, z]) => [x + 10, y - 5, z + 3] as Vec3) };
    expect(meshVolumeMm3(moved)).toBeCloseTo(1 / 6, 9);
  });
  it('bounds the positions', () => {
    expect(meshBounds(tetra)).toEqual({ min: [0, 0, 0], max: [1, 1, 1] });
    expect(() => meshBounds({ positions: [], triangles: [] })).toThrow(/empty/);
  });
});
