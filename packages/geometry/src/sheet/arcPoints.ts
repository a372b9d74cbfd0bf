import type { Vec2 } from '../types.ts';

/** Default chord tolerance of drawn arcs, mm: the largest gap between an arc and its polyline (sagitta). */
export const CHORD_TOLERANCE_MM = 0.005;

/**
 * How many equal chords an arc of radius `radiusMm` sweeping `sweepRad` needs
 * so that no chord strays more than `toleranceMm` from the arc. A chord of
 * angle θ has sagitta R·(1 − cos(θ/2)) (circle geometry, common practice),
 * so θ ≤ 2·acos(1 − tol/R).
 * @example arcSegments(2, Math.PI, 0.005) // 22
 */
export function arcSegments(radiusMm: number, sweepRad: number, toleranceMm = CHORD_TOLERANCE_MM): number {
  if (!(radiusMm > 0) || !(toleranceMm > 0)) throw new Error(`arcSegments: radius ${radiusMm} mm and tolerance ${toleranceMm} mm must be positive`);
  const maxStep = toleranceMm >= radiusMm ? Math.PI / 2 : 2 * Math.acos(1 - toleranceMm / radiusMm);
  return Math.max(1, Math.ceil(Math.abs(sweepRad) / Math.min(maxStep, Math.PI / 2) - 1e-9));
}

/**
 * Points of an arc, both ends included: centre `c`, radius `radiusMm`, from
 * angle `startRad` sweeping `sweepRad` (positive = counter-clockwise),
 * chords within `toleranceMm` of the arc (vertices on the arc).
 * @example arcPoints([0, 0], 1, 0, Math.PI / 2, 0.01) // [[1, 0], …, [0, 1]]
 */
export function arcPoints(c: Vec2, radiusMm: number, startRad: number, sweepRad: number, toleranceMm = CHORD_TOLERANCE_MM): Vec2[] {
  const n = arcSegments(radiusMm, sweepRad, toleranceMm);
  const out: Vec2[] = [];
  for (let i = 0; i <= n; i++) {
    const a = startRad + (sweepRad * i) / n;
    out.push([c[0] + radiusMm * Math.cos(a), c[1] + radiusMm * Math.sin(a)]);
  }
  return out;
}
