import { describe, expect, it } from 'vitest';
import { shoelaceArea, type SheetPart } from '@umbrafab/geometry';
import { roundSegments, toolCentrePaths } from './toolCentrePaths.ts';

// Closed forms (common geometry): a convex polygon grown by r has area
// A + P·r + π·r² (its perimeter P swept outward, the corners' arcs adding one
// full circle); a rectangle w × h shrunk by r is (w − 2r) × (h − 2r).

const area = shoelaceArea;

const PART: SheetPart = {
  name: 'test square',
  material: 'aluminium',
  thicknessMm: 3,
  outer: { kind: 'path', closed: true, points: [[0, 0], [10, 0], [10, 10], [0, 10]] },
  inner: [
    { kind: 'path', closed: true, points: [[3, 1], [3, 9], [7, 9], [7, 1]] },
    { kind: 'circle', cx: 5, cy: 5, radiusMm: 1 },
  ],
};

describe('toolCentrePaths', () => {
  it('grows the outer profile and shrinks each slot by the tool radius (circles are left to drilling and boring)', async () => {
    const r = 1;
    const tol = 0.001;
    const { outer, slots } = await toolCentrePaths(PART, r, tol);
    const n = roundSegments(r, tol);
    // The round joins are chords with vertices on the arc: their area falls short of π r² by at most the chord segments.
    const arcShort = Math.PI * r * r - (n / 2) * r * r * Math.sin((2 * Math.PI) / n);
    expect(area(outer.points)).toBeGreaterThan(100 + 40 * r + Math.PI * r * r - arcShort - 1e-6);
    expect(area(outer.points)).toBeLessThanOrEqual(100 + 40 * r + Math.PI * r * r + 1e-6);
    expect(slots).toHaveLength(1);
    expect(area(slots[0].points)).toBeCloseTo((4 - 2 * r) * (8 - 2 * r), 6);
    expect(outer.side).toBe('outer');
    expect(slots[0].side).toBe('inner');
  });

  it('throws when a slot is no wider than the tool', async () => {
    await expect(toolCentrePaths(PART, 2.5, 0.005)).rejects.toThrow(/cut-out 1 has 0 loops/);
  });

  it('chooses enough segments for the chord tolerance: r (1 - cos(pi/n)) <= tolerance', () => {
    const n = roundSegments(1.5875, 0.005);
    expect(1.5875 * (1 - Math.cos(Math.PI / n))).toBeLessThanOrEqual(0.005);
    expect(1.5875 * (1 - Math.cos(Math.PI / (n - 1)))).toBeGreaterThan(0.005);
  });
});
