import { chordSag } from '../calendar/refineByChord.ts';
import { SpecError } from '../errors.ts';
import type { Vec2 } from '../types.ts';
import type { DrawnCurve } from './curveCheck.ts';
import { nearestPairs } from './nearestPairs.ts';
import { MARK_LAYERS, MATCH_RADIUS_MM, type PlateLine } from './plateLine.ts';

/** What `curvesFromPlate` found. */
export interface PlateCurves<C extends DrawnCurve> {
  /** the layout's curves, each with the drawing's polylines in place of its own; null when the drawing has no curve centre-lines at all */
  readonly curves: readonly C[] | null;
  /** the drawing's lines the curves took (the rest are left for the marks) */
  readonly taken: ReadonlySet<PlateLine>;
}

/** Vertices of a layout piece compared with a drawn polyline (evenly spread, both ends included). */
const PROBES = 24;

/**
 * The date lines and mean-time curves as drawn in a plate drawing, matched
 * to the layout's: every polyline of three or more points on the score or
 * mark-centre layer, moved to face coordinates (x − plate.substyleX,
 * y − plate.faceOriginY), is a candidate; each piece (run) of a layout curve
 * takes the candidate nearest to it (the larger of the farthest of 24 of the
 * piece's vertices from the candidate and the farther end to end distance,
 * within MATCH_RADIUS_MM), each candidate one piece at most, nearest pairs
 * first. The curve keeps its label and kind (what it claims); its polylines
 * are the drawing's. Shared by the polar and planar `check --plate`.
 *
 * A drawing with no such polylines at all (an etched plate, whose curves are
 * outlines only) gives `curves: null`: the caller checks the layout's.
 *
 * @throws SpecError naming --plate and the curve when a piece of a layout curve has no line in a drawing that has curve lines
 * @example curvesFromPlate(drawnCurvesFromLayout(layout), readPlateDxf('plate.dxf').lines, layout.plate).curves
 */
export function curvesFromPlate<C extends DrawnCurve>(layoutCurves: readonly C[], lines: readonly PlateLine[], plate: { readonly substyleX: number; readonly faceOriginY: number }): PlateCurves<C> {
  const candidates = lines.filter((l) => (l.layer === MARK_LAYERS.score || l.layer === MARK_LAYERS.centres) && l.points.length >= 3);
  if (layoutCurves.length === 0 || candidates.length === 0) return { curves: layoutCurves.length === 0 ? layoutCurves : null, taken: new Set() };
  const face = candidates.map((l) => l.points.map(([x, y]): Vec2 => [x - plate.substyleX, y - plate.faceOriginY]));
  const pieces = layoutCurves.flatMap((c, ci) => c.paths.map((p) => ({ ci, p })));
  const pairs: { i: number; j: number; d: number }[] = [];
  pieces.forEach(({ p }, i) => {
    face.forEach((q, j) => {
      // The drawing may run a piece either way round.
      const ends = Math.min(Math.max(dist(p[0], q[0]), dist(p[p.length - 1], q[q.length - 1])), Math.max(dist(p[0], q[q.length - 1]), dist(p[p.length - 1], q[0])));
      if (ends > MATCH_RADIUS_MM) return;
      let far = 0;
      for (let k = 0; k < PROBES && far <= MATCH_RADIUS_MM; k++) far = Math.max(far, distanceToPolyline(p[Math.round((k * (p.length - 1)) / (PROBES - 1))], q));
      const d = Math.max(far, ends);
      if (d <= MATCH_RADIUS_MM) pairs.push({ i, j, d });
    });
  });
  const { chosen } = nearestPairs(pairs);
  const paths = layoutCurves.map((): Vec2[][] => []);
  pieces.forEach(({ ci, p }, i) => {
    const j = chosen.get(i)?.j;
    if (j === undefined) {
      const c = layoutCurves[ci];
      throw new SpecError('--plate', c.label, `allowed: a drawing with a polyline on ${MARK_LAYERS.score} or ${MARK_LAYERS.centres} within ${MATCH_RADIUS_MM} mm of every piece of every date line and mean-time curve of this spec`, `${c.kind === 'date' ? 'date line' : 'curve'} ${c.label} (a piece from face x ${p[0][0].toFixed(3)}, y ${p[0][1].toFixed(3)} mm) has no line in the drawing`);
    }
    paths[ci].push(face[j]);
  });
  const taken = new Set([...chosen.values()].map((c) => candidates[c.j]));
  return { curves: layoutCurves.map((c, ci) => ({ ...c, paths: paths[ci] })), taken };
}

function dist(p: Vec2, q: Vec2): number {
  return Math.hypot(p[0] - q[0], p[1] - q[1]);
}

function distanceToPolyline(X: Vec2, q: readonly Vec2[]): number {
  let best = Infinity;
  for (let i = 0; i + 1 < q.length; i++) best = Math.min(best, chordSag(q[i], X, q[i + 1]));
  return best;
}
