import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { parse as parseYaml } from 'yaml';
import { describe, expect, it } from 'vitest';
import { layoutPlanar, parseSpec, placePlanarAssembly, PILLAR_LEVELLING_GAP_MM, type Vec3 } from '@umbrafab/geometry';

const ROOT = resolve(import.meta.dirname, '..');
const layoutOf = (name: string) => layoutPlanar(parseSpec(parseYaml(readFileSync(join(ROOT, `fixtures/planar/${name}.yaml`), 'utf8'))));
const dot = (a: Vec3, b: Vec3) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];

// What a viewer checks first in the picture (common practice for assembly drawings): nothing floats, nothing
// stands in front of the face it carries.
describe('placePlanarAssembly', () => {
  it('stands the horizontal plate level on its pillar, the gap of the levelling nuts between, the pillar on the ground', () => {
    const a = placePlanarAssembly(layoutOf('garden-horizontal'))!;
    expect(a.mounting).toBe('pillar');
    expect(a.face.normal).toEqual([0, 0, 1]);
    const zs = (name: string) => a.parts.filter((p) => p.name === name).flatMap((p) => p.facets.flatMap((f) => f.points.map((q) => q[2])));
    const pillar = zs('pillar');
    const plate = zs('plate');
    expect(Math.min(...pillar)).toBeCloseTo(0, 9);
    expect(Math.min(...plate) - Math.max(...pillar)).toBeCloseTo(PILLAR_LEVELLING_GAP_MM, 9);
    // The studs reach from the pillar top through the plate.
    const studs = zs('fixings');
    expect(Math.min(...studs)).toBeCloseTo(Math.max(...pillar), 9);
    expect(Math.max(...studs)).toBeGreaterThan(Math.max(...plate));
  });

  it.each(['wall-declining', 'wall-reclining', 'meridian-east'])('hangs %s on its mount flat on the wall, nothing behind the wall face, the wall behind the dial', (name) => {
    const layout = layoutOf(name);
    const a = placePlanarAssembly(layout)!;
    expect(a.mounting).toBe('wall');
    const b = a.backdrop;
    expect(b.kind).toBe('wall');
    const height = (p: Vec3) => dot(b.normal, [p[0] - b.origin[0], p[1] - b.origin[1], p[2] - b.origin[2]]);
    for (const part of a.parts) {
      const hs = part.facets.flatMap((f) => f.points.map(height));
      if (part.name === 'wall') expect(Math.max(...hs), 'the wall slab lies behind its face').toBeLessThan(1e-9);
      else expect(Math.min(...hs), `${part.name} in front of the wall`).toBeGreaterThan(-1e-9);
      // The mount's back lies on the wall; the plate's back on the mount.
      if (part.name === 'mount') expect(Math.min(...hs)).toBeCloseTo(0, 9);
      if (part.name === 'plate') expect(Math.min(...hs)).toBeCloseTo(layout.plate.thicknessMm, 9);
    }
    // The wall is square to the plumb line: its level axis is horizontal.
    expect(Math.abs(b.uAxis[2])).toBeLessThan(1e-12);
    expect(b.normal).toEqual(layout.face.normal);
  });

  it.each(['equatorial', 'equatorial-lower'])('sets %s on its stand, its feet on the ground, the stand behind the face', (name) => {
    const layout = layoutOf(name);
    const a = placePlanarAssembly(layout)!;
    expect(a.mounting).toBe('stand');
    const all = a.parts.flatMap((p) => p.facets.flatMap((f) => f.points));
    expect(Math.min(...all.map((q) => q[2]))).toBeCloseTo(0, 6);
    const behind = (p: Vec3) => dot(a.face.normal, [p[0] - a.face.origin[0], p[1] - a.face.origin[1], p[2] - a.face.origin[2]]);
    const stand = a.parts.find((p) => p.name === 'stand')!.facets.flatMap((f) => f.points.map(behind));
    expect(Math.max(...stand), 'the stand lies behind the plate').toBeLessThanOrEqual(-layout.plate.thicknessMm + 1e-6);
  });
});
