import { describe, expect, it } from 'vitest';
import { gnomonLaidFlat } from './gnomonLaidFlat.ts';
import type { Mesh } from './mesh.ts';

describe('gnomonLaidFlat', () => {
  it('maps (x, y, z) to (y + half length, z + tab depth, x + half thickness) and keeps the triangles', () => {
    const mesh: Mesh = { positions: [[-1.5, -50, -4], [1.5, 50, 20], [0, 0, 0]], triangles: [[0, 1, 2]] };
    const flat = gnomonLaidFlat(mesh, 50, 4, 3);
    expect(flat.positions).toEqual([[0, 0, 0], [100, 24, 3], [50, 4, 1.5]]);
    expect(flat.triangles).toEqual([[0, 1, 2]]);
  });
});
