import { describe, expect, it } from 'vitest';
import type { Vec2 } from '../types.ts';
import { chordSag, curveEnd, refineByChord } from './refineByChord.ts';

/** Largest distance of the curve, sampled densely, from the drawn polyline through the refined samples. */
function worstDistance(curve: (u: number) => Vec2, u0: number, u1: number, drawn: readonly Vec2[]): number {
  let worst = 0;
  for (let k = 0; k <= 20_000; k++) {
    const p = curve(u0 + ((u1 - u0) * k) / 20_000);
    let best = Infinity;
    for (let i = 0; i + 1 < drawn.length; i++) best = Math.min(best, chordSag(drawn[i], p, drawn[i + 1]));
    worst = Math.max(worst, best);
  }
  return worst;
}

describe('refineByChord', () => {
  const circle = (u: number): Vec2 => [50 * Math.cos(u), 50 * Math.sin(u)];

  it('keeps every first sample and halves steps until each chord lies within the tolerance of the curve', () => {
    const params = [0, 0.5, 1, 1.5];
    const out = refineByChord(params, (u) => ({ point: circle(u), u }), { toleranceMm: 0.0005, maxHalvings: 12 });
    const us = out.map((s) => s!.u);
    for (const p of params) expect(us).toContain(p);
    expect(us).toEqual([...us].sort((a, b) => a - b));
    // A circle of radius R needs chords of angle 2·acos(1 − tol/R): 0.0089 rad here, so 2⁶ halvings of 0.5 rad (0.0078 rad).
    expect(out.length).toBe(3 * 64 + 1);
    // The sagitta of the circle, R(1 − cos(Δ/2)), is the distance the tolerance bounds (common geometry).
    const worst = worstDistance(circle, 0, 1.5, out.map((s) => s!.point));
    console.log(`circle R 50 mm: ${out.length} points, worst ${worst.toExponential(2)} mm`);
    expect(worst).toBeLessThanOrEqual(0.0005);
  });

  it('does not refine across a null sample or between runs, and stops at maxHalvings', () => {
    const out = refineByChord([0, 1, 2], (u) => (u > 0.9 && u < 1.1 ? null : { point: circle(u), run: u < 1 ? 'a' : 'b' }), { toleranceMm: 0.0005, maxHalvings: 3, sameRun: (a, b) => a.run === b.run });
    // A null end stops the refinement on both of its steps.
    expect(out.length).toBe(3);
    expect(out[1]).toBeNull();
    const capped = refineByChord([0, 1], (u) => ({ point: circle(u) }), { toleranceMm: 0.0005, maxHalvings: 3 });
    expect(capped.length).toBe(2 ** 3 + 1);
    const split = refineByChord([0, 2], (u) => ({ point: circle(u), run: u < 1 ? 'a' : 'b' }), { toleranceMm: 0.0005, maxHalvings: 12, sameRun: (a, b) => a.run === b.run });
    expect(split.length).toBe(2);
  });

  it('the example: a parabola over [0, 1] at 0.01 mm', () => {
    // By hand: the sag of y = u² over a step L is (L²/4)/√(1 + slope²): steps 0.125 over [0, 0.5], 0.25 over [0.5, 1].
    expect(refineByChord([0, 1], (u) => ({ point: [u, u * u] as const }), { toleranceMm: 0.01, maxHalvings: 12 }).length).toBe(7);
  });

  it('with endWidth, runs a curve to where it stops within a step (both sides), and refines up to that end', () => {
    // A circle drawn for u in [0.37, 1.23] only, sampled every 0.5: without endWidth it stops at 0.5 and 1.
    const at = (u: number) => (u >= 0.37 && u <= 1.23 ? { point: circle(u), u } : null);
    const plain = refineByChord([0, 0.5, 1, 1.5], at, { toleranceMm: 0.0005, maxHalvings: 12 }).filter((s) => s !== null);
    expect(Math.min(...plain.map((s) => s.u))).toBe(0.5);
    expect(Math.max(...plain.map((s) => s.u))).toBe(1);
    const out = refineByChord([0, 0.5, 1, 1.5], at, { toleranceMm: 0.0005, maxHalvings: 12, endWidth: 1e-9 });
    expect(out[0]).toBeNull();
    expect(out[out.length - 1]).toBeNull();
    const drawn = out.filter((s) => s !== null);
    const us = drawn.map((s) => s.u);
    expect(us).toEqual([...us].sort((a, b) => a - b));
    expect(0.37 - us[0]).toBeLessThanOrEqual(0);
    expect(us[0] - 0.37).toBeLessThan(1e-9);
    expect(1.23 - us[us.length - 1]).toBeLessThan(1e-9);
    expect(worstDistance(circle, us[0], us[us.length - 1], drawn.map((s) => s.point))).toBeLessThanOrEqual(0.0005);
  });

  it('curveEnd: bisects toward the undrawn end to the given width, from either side', () => {
    const at = (u: number) => (u < 0.3 ? u : null);
    const forward = curveEnd(0, at(0), 1, at(1), at, 1e-6);
    expect(forward.u).toBeLessThan(0.3);
    expect(0.3 - forward.u).toBeLessThanOrEqual(1e-6);
    const at2 = (u: number) => (u > 0.3 ? u : null);
    const back = curveEnd(0, at2(0), 1, at2(1), at2, 1e-6);
    expect(back.u).toBeGreaterThan(0.3);
    expect(back.u - 0.3).toBeLessThanOrEqual(1e-6);
    expect(() => curveEnd(0, 1, 1, 2, () => 1, 1e-6)).toThrow(/exactly one end/);
  });
});
