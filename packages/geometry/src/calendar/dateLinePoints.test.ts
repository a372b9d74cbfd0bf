import { describe, expect, test } from 'vitest';
import { dateLinePoints } from './dateLinePoints.ts';
import type { FacePoint } from './types.ts';

const DEG = Math.PI / 180;

/**
 * Independent shadow construction (docs/design.md §2): sun vector in the face frame
 * s = (−cosδ·sinH, sinδ, cosδ·cosH) with x east-positive; the nodus sits at
 * height h above the style edge that casts the shadow (x = ±t/2); the shadow is
 * the ray's intersection with z = 0. Returns [xEast, y] for hour angle H.
 */
function shadowByRay(h: number, t: number, deltaRad: number, hourAngleRad: number): FacePoint {
  const s = [-Math.cos(deltaRad) * Math.sin(hourAngleRad), Math.sin(deltaRad), Math.cos(deltaRad) * Math.cos(hourAngleRad)];
  const edge = hourAngleRad < 0 ? -t / 2 : t / 2; // west style in the morning
  const k = h / s[2];
  // Shadow falls away from the Sun: point − k·s. The x axis of s points east, the
  // shadow's x = −k·s_x = h·tanH (east in the afternoon).
  return [edge - k * s[0], -k * s[1]];
}

const H = 60;
const T = 6;
const SOLSTICE = 23.44 * DEG; // docs/design.md §2: the solstice lines at ±23.44°

describe('dateLinePoints', () => {
  test('points follow y = −tanδ·√(h² + (|x| − t/2)²) within 0.01 mm (handbook formula, docs/design.md §2)', () => {
    let worst = 0;
    for (const delta of [SOLSTICE, -SOLSTICE, 11.47 * DEG, -20.15 * DEG]) {
      for (const hemisphere of ['north', 'south'] as const) {
        const { west, east } = dateLinePoints({ declinationRad: delta, heightMm: H, thicknessMm: T, xMinMm: -200, xMaxMm: 200, stepMm: 5, hemisphere });
        for (const [x, y] of [...west, ...east]) {
          const expected = -Math.tan(delta) * Math.sqrt(H * H + (Math.abs(x) - T / 2) ** 2);
          worst = Math.max(worst, Math.abs(y - expected));
        }
      }
    }
    console.log(`date lines vs formula: largest difference ${worst.toExponential(2)} mm`);
    expect(worst).toBeLessThan(0.01);
  });

  test('solstice lines agree with the ray construction from the sun vector within 0.01 mm', () => {
    let worst = 0;
    for (const delta of [SOLSTICE, -SOLSTICE]) {
      const { west, east } = dateLinePoints({ declinationRad: delta, heightMm: H, thicknessMm: T, xMinMm: -200, xMaxMm: 200, stepMm: 5, hemisphere: 'north' });
      for (const [x, y] of [...west, ...east]) {
        // Hour angle whose shadow lands at x (north: x is east-positive).
        const hA = Math.sign(x) * Math.atan((Math.abs(x) - T / 2) / H) || (x < 0 ? -1e-12 : 1e-12);
        const [xr, yr] = shadowByRay(H, T, delta, hA);
        worst = Math.max(worst, Math.abs(xr - x), Math.abs(yr - y));
      }
    }
    console.log(`solstice lines vs ray construction: largest difference ${worst.toExponential(2)} mm`);
    expect(worst).toBeLessThan(0.01);
  });

  test('45° check: one gnomon height from the style edge, y = −tanδ·h·√2', () => {
    const { east } = dateLinePoints({ declinationRad: SOLSTICE, heightMm: H, thicknessMm: T, xMinMm: -200, xMaxMm: 200, stepMm: H, hemisphere: 'north' });
    const p = east.find(([x]) => Math.abs(x - (T / 2 + H)) < 1e-9);
    expect(p).toBeDefined();
    expect(p![1]).toBeCloseTo(-Math.tan(SOLSTICE) * H * Math.SQRT2, 9);
  });

  test('branches: nothing under the gnomon, edge points included, sorted by x', () => {
    const { west, east } = dateLinePoints({ declinationRad: SOLSTICE, heightMm: H, thicknessMm: T, xMinMm: -101, xMaxMm: 97, stepMm: 10, hemisphere: 'north' });
    for (const [x] of [...west, ...east]) expect(Math.abs(x)).toBeGreaterThanOrEqual(T / 2);
    expect(west[0][0]).toBe(-101);
    expect(west[west.length - 1][0]).toBe(-T / 2);
    expect(east[0][0]).toBe(T / 2);
    expect(east[east.length - 1][0]).toBe(97);
    expect(east.map(([x]) => x)).toEqual([3, 13, 23, 33, 43, 53, 63, 73, 83, 93, 97]);
    for (const line of [west, east]) for (let i = 1; i < line.length; i++) expect(line[i][0]).toBeGreaterThan(line[i - 1][0]);
  });

  test('hemispheres: the west (morning) branch is on the left in the north, on the right in the south', () => {
    const opts = { declinationRad: SOLSTICE, heightMm: H, thicknessMm: T, xMinMm: -50, xMaxMm: 50, stepMm: 10 } as const;
    const n = dateLinePoints({ ...opts, hemisphere: 'north' });
    const s = dateLinePoints({ ...opts, hemisphere: 'south' });
    expect(n.west.every(([x]) => x < 0)).toBe(true);
    expect(s.west.every(([x]) => x > 0)).toBe(true);
    expect(s.west).toEqual(n.east);
  });

  test('local summer (δ toward the pole > 0) lies toward the equator-ward end (y < 0)', () => {
    const { east } = dateLinePoints({ declinationRad: SOLSTICE, heightMm: H, xMinMm: -50, xMaxMm: 50, hemisphere: 'north' });
    expect(east.every(([, y]) => y < 0)).toBe(true);
  });

  test('a range entirely on one side gives one empty branch', () => {
    const { west, east } = dateLinePoints({ declinationRad: SOLSTICE, heightMm: H, thicknessMm: T, xMinMm: 10, xMaxMm: 50, stepMm: 10, hemisphere: 'north' });
    expect(west).toEqual([]);
    expect(east[0][0]).toBe(10);
  });

  test('rejects bad input, naming the field', () => {
    const ok = { declinationRad: 0.1, heightMm: 50, xMinMm: -10, xMaxMm: 10, hemisphere: 'north' } as const;
    expect(() => dateLinePoints({ ...ok, heightMm: 0 })).toThrow(/heightMm/);
    expect(() => dateLinePoints({ ...ok, xMaxMm: -20 })).toThrow(/xMaxMm/);
    expect(() => dateLinePoints({ ...ok, stepMm: 1e-9 })).toThrow(/stepMm/);
    expect(() => dateLinePoints({ ...ok, declinationRad: Math.PI / 2 })).toThrow(/declinationRad/);
    expect(() => dateLinePoints({ ...ok, thicknessMm: -1 })).toThrow(/thicknessMm/);
  });
});
