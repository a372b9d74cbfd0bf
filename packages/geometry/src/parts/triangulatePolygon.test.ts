import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Vec2 } from './mesh.ts';
import { triangulatePolygon } from './triangulatePolygon.ts';

const area2 = (a: Vec2, b: Vec2, c: Vec2) => (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);
const ringArea = (r: readonly Vec2[]) => r.reduce((s, p, k) => s + (p[0] * r[(k + 1) % r.length][1] - r[(k + 1) % r.length][0] * p[1]) / 2, 0);
const circle = (cx: number, cy: number, r: number, n: number): Vec2[] =>
  Array.from({ length: n }, (_, k) => [cx + r * Math.cos((2 * Math.PI * k) / n), cy + r * Math.sin((2 * Math.PI * k) / n)] as Vec2);

/** Every triangle positive, count n + 2h − 2 (Eberly §3, no added vertex), areas summing to the polygon's. */
function check(outer: Vec2[], holes: Vec2[][] = []) {
  const pts = [...outer, ...holes.flat()];
  const tris = triangulatePolygon(outer, holes);
  expect(tris.length).toBe(pts.length + 2 * holes.length - 2);
  let sum = 0;
  for (const [a, b, c] of tris) {
    const s = area2(pts[a], pts[b], pts[c]);
    expect(s).toBeGreaterThan(0);
    sum += s / 2;
  }
  const expected = Math.abs(ringArea(outer)) - holes.reduce((s, h) => s + Math.abs(ringArea(h)), 0);
  expect(Math.abs(sum - expected)).toBeLessThan(1e-9 * expected);
  return tris;
}

describe('triangulatePolygon', () => {
  it('splits a square into two triangles', () => {
    check([[0, 0], [2, 0], [2, 2], [0, 2]]);
  });
  it('accepts clockwise input and still returns CCW triangles', () => {
    check([[0, 2], [2, 2], [2, 0], [0, 0]]);
  });
  it('handles a non-convex comb outline (gnomon-like tabs)', () => {
    check([[-60, 0], [-37.5, 0], [-37.5, -3], [-22.5, -3], [-22.5, 0], [22.5, 0], [22.5, -3], [37.5, -3], [37.5, 0], [60, 0], [60, 20], [2, 20], [0, 18], [-2, 20], [-60, 20]]);
  });
  it('handles a rectangle with a row of polygonal holes and an arrow', () => {
    const arrow: Vec2[] = [[-0.8, -15], [0.8, -15], [0.8, -7], [2.5, -7], [0, -3], [-2.5, -7], [-0.8, -7]];
    check([[-50, -20], [50, -20], [50, 0], [-50, 0]], [circle(-40, -9, 4.5, 32), circle(40, -9, 4.5, 32), arrow, circle(-25, -9, 4.5, 16)]);
  });
  it('handles holes aligned on the same row in either order', () => {
    check([[0, 0], [30, 0], [30, 10], [0, 10]], [[[5, 4], [7, 4], [7, 6], [5, 6]], [[15, 4], [17, 4], [17, 6], [15, 6]], [[25, 4], [27, 4], [27, 6], [25, 6]]]);
  });
  it('is deterministic', () => {
    const outer: Vec2[] = [[0, 0], [10, 0], [10, 10], [5, 4], [0, 10]];
    expect(triangulatePolygon(outer)).toEqual(triangulatePolygon(outer));
  });
  it('rejects a polygon with fewer than 3 points, naming it', () => {
    expect(() => triangulatePolygon([[0, 0], [1, 1]])).toThrow(/outer has 2 points/);
  });
});

describe('triangulatePolygon (property)', () => {
  it('triangulates a rectangle with a random row of disjoint polygonal holes', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 6 }),
        fc.integer({ min: 3, max: 24 }),
        fc.double({ min: -2, max: 2, noNaN: true }),
        fc.double({ min: 0, max: 6.28, noNaN: true }),
        (count, sides, dy, phase) => {
          const holes: Vec2[][] = Array.from({ length: count }, (_, k) =>
            Array.from({ length: sides }, (_, j) => {
              const t = phase + (2 * Math.PI * j) / sides;
              return [10 + 15 * k + 4 * Math.cos(t), 10 + dy * (k % 2) + 4 * Math.sin(t)] as Vec2;
            }),
          );
          check([[0, 0], [15 * count + 5, 0], [15 * count + 5, 20], [0, 20]], holes);
        },
      ),
      { numRuns: 200, seed: 20250101 },
    );
  });
});
