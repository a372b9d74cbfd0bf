import { describe, expect, it } from 'vitest';
import { relievedSlot, relieveTabRoots, RELIEF_OVERSIZE_MM } from './cornerRelief.ts';
import type { RoundedRect, Vec2 } from '../types.ts';

/** Even-odd point in polygon (boundary points may fall either way). */
function inside(p: Vec2, ring: readonly Vec2[]): boolean {
  let c = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [xi, yi] = ring[i];
    const [xj, yj] = ring[j];
    if (yi > p[1] !== yj > p[1] && p[0] < ((xj - xi) * (p[1] - yi)) / (yj - yi) + xi) c = !c;
  }
  return c;
}

const slot = (w: number, h: number): RoundedRect => ({ kind: 'rect', cx: 10, cy: 20, widthMm: w, heightMm: h, cornerRadiusMm: 0 });

describe('relievedSlot', () => {
  it('gives dog-bones on a wide slot: the nominal corners lie inside, the lobes reach 0.29·ρ past the walls', () => {
    const r = 1.5875;
    const { path, relief } = relievedSlot(slot(10, 20), r, 0.005);
    expect(relief).toBe('dogbone');
    const eps = 1e-3;
    for (const [x, y] of [[5 + eps, 10 + eps], [15 - eps, 10 + eps], [15 - eps, 30 - eps], [5 + eps, 30 - eps]] as Vec2[]) expect(inside([x, y], path.points)).toBe(true);
    const rho = r + RELIEF_OVERSIZE_MM;
    const xs = path.points.map((p) => p[0]);
    expect(Math.min(...xs)).toBeCloseTo(5 - rho * (1 - Math.SQRT1_2), 2);
  });

  it('gives round ends on a slot too narrow for two dog-bones: a stadium through the nominal corners', () => {
    const { path, relief } = relievedSlot(slot(3.2, 15.2), 1.5875, 0.005);
    expect(relief).toBe('round-ends');
    const ys = path.points.map((p) => p[1]);
    expect(Math.min(...ys)).toBeCloseTo(20 - 7.6 - 1.6, 9);
    expect(Math.max(...ys)).toBeCloseTo(20 + 7.6 + 1.6, 9);
    expect(inside([8.4 + 1e-3, 12.4 + 1e-3], path.points)).toBe(true);
  });

  it('leaves a slot alone with no tool, and refuses a tool wider than the slot', () => {
    expect(relievedSlot(slot(3, 10), 0).relief).toBe('none');
    expect(() => relievedSlot(slot(3, 10), 1.6)).toThrow(/does not fit/);
  });
});

describe('relieveTabRoots', () => {
  const fin: Vec2[] = [[0, 3], [10, 3], [10, 0], [25, 0], [25, 3], [60, 3], [60, 40], [0, 40]];
  it('notches the fin at each tab root, keeping the tab full width', () => {
    const out = relieveTabRoots(fin, 1.5875, 3, 0.005);
    const rho = 1.5875 + RELIEF_OVERSIZE_MM;
    expect(out.length).toBeGreaterThan(fin.length);
    // the tab sides are untouched: both tab bottom corners stay
    expect(out).toContainEqual([10, 0]);
    expect(out).toContainEqual([25, 0]);
    const top = Math.max(...out.filter((p) => p[0] < 10 && p[1] > 3 && p[1] < 10).map((p) => p[1]));
    expect(Math.abs(top - (3 + rho))).toBeLessThan(0.005);
  });
  it('refuses a tool whose reliefs do not fit the foot', () => {
    expect(() => relieveTabRoots([[0, 3], [2, 3], [2, 0], [25, 0], [25, 3], [60, 3], [60, 40], [0, 40]], 1.5875, 3)).toThrow(/process.kerf/);
  });
});
