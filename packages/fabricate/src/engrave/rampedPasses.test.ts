import { describe, expect, it } from 'vitest';
import { rampedPasses } from './rampedPasses.ts';

// Own rules (rampedPasses' doc): ramps at the given slope, no lift, every point
// of the line finished at the final depth, no descent of more than one step
// between two visits of a point.

const SLOPE = Math.tan((14.4775 * Math.PI) / 180);

describe('rampedPasses', () => {
  it('ramps into an open line, runs the passes back and forth and runs back over the last ramp', () => {
    const r = rampedPasses([[0, 0], [10, 0]], false, [0.1, 0.2, 0.3], 0.25);
    expect(r.path).toEqual([
      [0, 0, 0],
      [0.4, 0, -0.1],
      [10, 0, -0.1],
      [9.6, 0, -0.2],
      [0, 0, -0.2],
      [0.4, 0, -0.3],
      [0, 0, -0.3],
      [10, 0, -0.3],
    ].map(([x, y, z]) => [expect.closeTo(x, 9), expect.closeTo(y, 9), expect.closeTo(z, 9)]));
    expect(r.endsAtStart).toBe(false);
  });

  it('goes round a loop, ramping, and finishes with one full turn at the final depth', () => {
    const r = rampedPasses([[0, 0], [5, 0], [5, 5], [0, 5]], true, [0.1, 0.2], 0.25);
    const last = r.path[r.path.length - 1];
    expect(last[2]).toBe(-0.2);
    // The final turn starts and ends where the final depth was reached (0.4 mm along the first edge).
    expect(last[0]).toBeCloseTo(0.4, 9);
    const atFinal = r.path.filter((p) => p[2] === -0.2);
    let len = 0;
    for (let i = 1; i < atFinal.length; i += 1) len += Math.hypot(atFinal[i][0] - atFinal[i - 1][0], atFinal[i][1] - atFinal[i - 1][1]);
    expect(len).toBeCloseTo(20, 9);
  });

  it('zigzags along a line shorter than a ramp, never more than one step deeper per visit', () => {
    const r = rampedPasses([[0, 0], [0.3, 0]], false, [0.1, 0.2], SLOPE);
    for (let i = 1; i < r.path.length; i += 1) expect(r.path[i][2]).toBeLessThanOrEqual(r.path[i - 1][2]);
    // Depth at x = 0 on each visit: 0, then at most 0.1 deeper each time.
    const atStart = r.path.filter((p) => Math.abs(p[0]) < 1e-9).map((p) => -p[2]);
    for (let i = 1; i < atStart.length; i += 1) expect(atStart[i] - atStart[i - 1]).toBeLessThanOrEqual(0.1 + 1e-9);
    const end = r.path[r.path.length - 1];
    expect(end[2]).toBe(-0.2);
    // The whole line is at the final depth at the end: the last leg spans it.
    const tail = r.path.slice(r.path.findIndex((p) => p[2] === -0.2));
    expect(Math.min(...tail.map((p) => p[0]))).toBeCloseTo(0, 9);
    expect(Math.max(...tail.map((p) => p[0]))).toBeCloseTo(0.3, 9);
  });

  it('ends where it started on an open line when going on and back is shorter', () => {
    // Two passes of 1 mm on a 3 mm line at slope 0.5: the final depth is reached 2 mm into pass 2, past half-way.
    const r = rampedPasses([[0, 0], [3, 0]], false, [1, 2], 0.5);
    expect(r.endsAtStart).toBe(false);
    const r2 = rampedPasses([[0, 0], [3, 0]], false, [1], 0.5);
    // One pass: reached 2 mm along, past half-way: on to the end and back over the whole line.
    expect(r2.endsAtStart).toBe(true);
    expect(r2.path[r2.path.length - 1]).toEqual([0, 0, -1]);
  });
});
