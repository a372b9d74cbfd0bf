import type { PlanarLayout, PlanarMark } from '../planar/layoutPlanar.ts';
import type { Vec2 } from '../types.ts';
import { faceSegments } from './faceSegments.ts';
import { centreLine } from './marksFromPlate.ts';
import { nearestPairs } from './nearestPairs.ts';
import { MARK_LAYERS, MATCH_RADIUS_MM, noLineFor, type PlateLine } from './plateLine.ts';

/** What `planarMarksFromPlate` found. */
export interface PlanarPlateMarks {
  /** the layout's engraved marks, each at the position the drawing gives it */
  readonly marks: readonly PlanarMark[];
  /** mark lines in the drawing that no mark claimed (date lines among them), face coordinates of their middle */
  readonly unmatched: readonly Vec2[];
}

/**
 * The marks of a horizontal, wall, meridian or equatorial plate as drawn in
 * its plate.dxf, matched to the layout's marks as `marksFromPlate` does for
 * the polar plate: centre-lines on the score / mark-centre layers (or closed
 * etch outlines when there are none) move to face coordinates
 * (x − plate.substyleX, y − plate.faceOriginY); each layout mark takes the
 * nearest line (middle to middle plus end to end, either way round, within
 * MATCH_RADIUS_MM), nearest pairs first. A planar hour line may run any way
 * across the face, so its ends are put back in the layout's order (root end
 * first). The mark keeps its label, hour angle and casting edge.
 *
 * @throws SpecError naming --plate and the mark when a mark has no line in the drawing
 * @example planarMarksFromPlate(layoutPlanar(spec), readPlateDxf('plate.dxf').lines).marks
 */
export function planarMarksFromPlate(layout: PlanarLayout, lines: readonly PlateLine[]): PlanarPlateMarks {
  const segs = faceSegments(lines, layout.plate, (l) => (l.layer === MARK_LAYERS.etch ? centreLine(l) : ends(l.points)));
  const dist = (p: Vec2, q: Vec2) => Math.hypot(p[0] - q[0], p[1] - q[1]);
  const mid = (a: Vec2, b: Vec2): Vec2 => [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
  const engraved = layout.marks.filter((m) => !m.underGnomon);
  const pairs: { i: number; j: number; d: number; flip: boolean }[] = [];
  engraved.forEach((m, i) => {
    segs.forEach(([a, b], j) => {
      const same = dist(a, m.a) + dist(b, m.b);
      const swapped = dist(b, m.a) + dist(a, m.b);
      const d = dist(mid(a, b), mid(m.a, m.b)) + Math.min(same, swapped);
      if (d <= MATCH_RADIUS_MM) pairs.push({ i, j, d, flip: swapped < same });
    });
  });
  const { chosen, usedLines: usedLine } = nearestPairs(pairs);
  const marks = engraved.map((m, i): PlanarMark => {
    const c = chosen.get(i);
    if (c === undefined) {
      throw noLineFor(`${m.label} ${m.edge}`, `line ${m.label} ${m.edge} (face x ${m.a[0].toFixed(3)} .. ${m.b[0].toFixed(3)} mm, y ${m.a[1].toFixed(3)} .. ${m.b[1].toFixed(3)} mm) has no line in the drawing`);
    }
    const [a, b] = segs[c.j];
    return c.flip ? { ...m, a: b, b: a } : { ...m, a, b };
  });
  const unmatched = segs.filter((_, j) => !usedLine.has(j)).map(([a, b]) => mid(a, b));
  return { marks, unmatched };
}

/** A drawn polyline's two ends: its first and last point (a mark line is one straight segment). */
function ends(points: readonly Vec2[]): readonly [Vec2, Vec2] | null {
  return points.length < 2 ? null : [points[0], points[points.length - 1]];
}
