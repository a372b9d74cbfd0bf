import { assertPositive } from '@umbrafab/geometry';
import type { Vec2 } from './engraveInput.ts';

/** A tool-centre point `[x, y, z]`, mm; z < 0 is below the stock top. */
export type Vec3 = readonly [number, number, number];

/** A continuous in-the-cut toolpath and where it leaves the line. */
export interface RampedPasses {
  /** From the line's first point at Z0 to the last point at the final depth; one feed move per step. */
  readonly path: readonly Vec3[];
  /** Open lines: true when the tool ends back at points[0]. Closed lines end where the final depth was reached. */
  readonly endsAtStart: boolean;
}

/** Points of the polyline `leg` between arc lengths s0 and s1 (either order), both ends included. */
function slice(leg: readonly Vec2[], cum: readonly number[], s0: number, s1: number): Vec2[] {
  const at = (s: number): Vec2 => {
    let i = 1;
    while (i < leg.length - 1 && cum[i] < s) i += 1;
    const len = cum[i] - cum[i - 1];
    const t = len > 0 ? Math.min(1, Math.max(0, (s - cum[i - 1]) / len)) : 0;
    return [leg[i - 1][0] + (leg[i][0] - leg[i - 1][0]) * t, leg[i - 1][1] + (leg[i][1] - leg[i - 1][1]) * t];
  };
  const lo = Math.min(s0, s1);
  const hi = Math.max(s0, s1);
  const inner = leg.filter((_, i) => cum[i] > lo + 1e-9 && cum[i] < hi - 1e-9);
  const out = [at(lo), ...inner, at(hi)];
  return s0 <= s1 ? out : out.reverse();
}

function cumulative(leg: readonly Vec2[]): number[] {
  const cum = [0];
  for (let i = 1; i < leg.length; i += 1) cum.push(cum[i - 1] + Math.hypot(leg[i][0] - leg[i - 1][0], leg[i][1] - leg[i - 1][1]));
  return cum;
}

/**
 * Cut a line to its depth in passes without leaving the cut: the tool enters
 * at the line's first point on the stock top and ramps down along the line
 * (never plunges), and runs the passes back and forth (open lines) or round
 * and round (loops) without lifting.
 *
 * Rule: pass k (k = 1…n) aims at `depthsMm[k−1]`; the tool descends at
 * `slope` (mm of depth per mm along the line) whenever it is above the aim,
 * so each ramp lies at the start of its pass, where the previous pass has
 * already cut to the previous depth (no step deeper than one pass), and a
 * line shorter than one ramp takes more back-and-forth legs at a gentler
 * slope (at most firstDepth / (2·length), so no point is cut deeper than one
 * step at a time). A ramp
 * leaves a short stretch above the final depth: once the final depth is
 * reached, an open line is finished by going back over the ramp and on to the
 * far end, or on to the far end and back over the whole line, whichever is
 * shorter; a loop by one full turn at the final depth.
 *
 * @param points the line, at least 2 points, no repeated consecutive points
 * @param depthsMm increasing depths below the stock top, mm (stepDownPasses)
 * @param slope tan(ramp angle), > 0
 * @example rampedPasses([[0, 0], [10, 0]], false, [0.1, 0.2], 0.5).path.at(-1) // [10, 0, -0.2]
 */
export function rampedPasses(points: readonly Vec2[], closed: boolean, depthsMm: readonly number[], slope: number): RampedPasses {
  assertPositive('ramp slope', slope);
  if (points.length < 2 || depthsMm.length === 0) throw new Error(`rampedPasses needs at least 2 points and 1 depth, got ${points.length} and ${depthsMm.length}`);
  const forward: readonly Vec2[] = closed ? [...points, points[0]] : points;
  const backward: readonly Vec2[] = [...forward].reverse();
  const cumF = cumulative(forward);
  const lengthMm = cumF[cumF.length - 1];
  if (!(lengthMm > 0)) throw new Error('rampedPasses needs a line of positive length');
  const cumB = cumulative(backward);
  const finalDepth = depthsMm[depthsMm.length - 1];
  // On a line shorter than one ramp (one step of descent) the tool passes each
  // point again after at most 2·length of travel: a gentler slope keeps that
  // descent within one step (the first depth; the steps are equal).
  const slopeUsed = slope * lengthMm >= depthsMm[0] ? slope : Math.min(slope, depthsMm[0] / (2 * lengthMm));
  const out: Vec3[] = [[forward[0][0], forward[0][1], 0]];
  let depth = 0;
  // A guard against an endless walk: every leg descends by at least min(slope·length, the rest).
  const maxLegs = depthsMm.length + Math.ceil(finalDepth / (slopeUsed * lengthMm)) + 2;
  for (let k = 0; k < maxLegs; k += 1) {
    const back = !closed && k % 2 === 1;
    const leg = back ? backward : forward;
    const cum = back ? cumB : cumF;
    const aim = depthsMm[Math.min(k, depthsMm.length - 1)];
    for (let i = 1; i < leg.length; i += 1) {
      const a = leg[i - 1];
      const b = leg[i];
      const len = cum[i] - cum[i - 1];
      const before = depth;
      if (depth < aim && len > 0) {
        const need = (aim - depth) / slopeUsed;
        if (need < len) {
          const t = need / len;
          const c: Vec2 = [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];
          depth = aim;
          out.push([c[0], c[1], -depth]);
          if (aim === finalDepth) return finish(out, leg, cum, cum[i - 1] + need, closed, back);
        } else depth = Math.min(aim, depth + len * slopeUsed);
      }
      out.push([b[0], b[1], -depth]);
      if (before < finalDepth && depth === finalDepth) return finish(out, leg, cum, cum[i], closed, back);
    }
  }
  throw new Error(`rampedPasses did not reach ${finalDepth} mm in ${maxLegs} legs`);
}

/** Finish at the final depth from arc length `s` of `leg` (see rampedPasses). */
function finish(out: Vec3[], leg: readonly Vec2[], cum: readonly number[], s: number, closed: boolean, back: boolean): RampedPasses {
  const z = out[out.length - 1][2];
  const L = cum[cum.length - 1];
  const add = (pts: readonly Vec2[]): void => {
    for (const p of pts.slice(1)) out.push([p[0], p[1], z]);
  };
  if (closed) {
    add(slice(leg, cum, s, L));
    add(slice(leg, cum, 0, s));
    return { path: dedupe3(out), endsAtStart: false };
  }
  let endsAtLegStart: boolean;
  if (2 * s < L) {
    add(slice(leg, cum, s, 0));
    add(slice(leg, cum, 0, L));
    endsAtLegStart = false;
  } else {
    add(slice(leg, cum, s, L));
    add(slice(leg, cum, L, 0));
    endsAtLegStart = true;
  }
  // The leg runs backwards on odd legs: its start is the line's far end.
  return { path: dedupe3(out), endsAtStart: endsAtLegStart !== back };
}

function dedupe3(pts: readonly Vec3[]): Vec3[] {
  return pts.filter((p, i) => i === 0 || Math.abs(p[0] - pts[i - 1][0]) > 1e-12 || Math.abs(p[1] - pts[i - 1][1]) > 1e-12 || p[2] !== pts[i - 1][2]);
}
