import type { DialLayout } from '../polar/layoutDial.ts';
import type { Vec2 } from '../types.ts';
import type { DrawnMark } from './drawnMarks.ts';
import { faceSegments } from './faceSegments.ts';
import { nearestPairs, type CandidatePair } from './nearestPairs.ts';
import { MARK_LAYERS, MATCH_RADIUS_MM, noLineFor, type PlateLine } from './plateLine.ts';

export { MARK_LAYERS, MATCH_RADIUS_MM, type PlateLine } from './plateLine.ts';

/** What `marksFromPlate` found. */
export interface PlateMarks {
  readonly drawn: readonly DrawnMark[];
  /** mark lines in the drawing that no mark of the layout claimed, face coordinates of their middle */
  readonly unmatched: readonly Vec2[];
}

/**
 * The marks as drawn in a plate drawing, matched to the layout's marks.
 *
 * Lines on LINE_SCORE are centre-lines (their two extreme points along y are
 * the ends); closed outlines on LINE_ETCH_OUTLINE are a mark of some width,
 * whose centre-line runs through the middle of its short sides. Each is moved
 * to face coordinates (x − plate.substyleX, y − plate.faceOriginY) and given
 * to the layout mark whose drawn line is nearest (middle to middle, within
 * MATCH_RADIUS_MM), each line to one mark at most, nearest pairs first. The
 * mark keeps its label, hour angle and casting style; its position is the
 * drawing's.
 *
 * @throws SpecError naming the mark when a layout mark has no line in the drawing
 * @example marksFromPlate(layout, readPlateDxf('plate.dxf').lines).drawn[0].a
 */
export function marksFromPlate(layout: DialLayout, lines: readonly PlateLine[]): PlateMarks {
  const ox = layout.plate.substyleX;
  const segs = faceSegments(lines, layout.plate, centreLine);
  const mid = (a: Vec2, b: Vec2): Vec2 => [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
  const pairs: CandidatePair[] = [];
  // Lines under the fin (the noon band) are not drawn, so they are not looked for.
  const engraved = layout.marks.filter((m) => !m.underGnomon);
  engraved.forEach((m, i) => {
    const mm = mid([m.xMm, m.y0Mm], [m.xMm, m.y1Mm]);
    segs.forEach(([a, b], j) => {
      const sm = mid(a, b);
      const d = Math.hypot(sm[0] - mm[0], sm[1] - mm[1]) + Math.abs(a[1] - m.y0Mm) + Math.abs(b[1] - m.y1Mm);
      if (d <= MATCH_RADIUS_MM) pairs.push({ i, j, d });
    });
  });
  const { chosen, usedLines: usedLine } = nearestPairs(pairs);
  const drawn: DrawnMark[] = engraved.map((m, i) => {
    const j = chosen.get(i)?.j;
    if (j === undefined) {
      throw noLineFor(`${m.label} ${m.style}`, `mark ${m.label} ${m.style} (face x ${m.xMm.toFixed(3)} mm, plate x ${(m.xMm + ox).toFixed(3)} mm) has no line in the drawing`);
    }
    const [a, b] = segs[j];
    return { mark: m, a, b };
  });
  const unmatched = segs.filter((_, j) => !usedLine.has(j)).map(([a, b]) => mid(a, b));
  return { drawn, unmatched };
}

/** The centre-line of a mark line, ordered by y: a score polyline's extreme points, an etch outline's short-side middles. */
export function centreLine(line: PlateLine): readonly [Vec2, Vec2] | null {
  const pts = line.points;
  if (pts.length < 2) return null;
  if (line.layer === MARK_LAYERS.etch) {
    if (pts.length !== 4) return null;
    // segmentOutline order: a−n, b−n, b+n, a+n: the short sides are (3,0) and (1,2).
    const sides: [Vec2, Vec2][] = [0, 1, 2, 3].map((k) => [pts[k], pts[(k + 1) % 4]]);
    const len = (s: [Vec2, Vec2]) => Math.hypot(s[1][0] - s[0][0], s[1][1] - s[0][1]);
    const shortest = [...sides].sort((p, q) => len(p) - len(q)).slice(0, 2);
    const ends = shortest.map(([p, q]): Vec2 => [(p[0] + q[0]) / 2, (p[1] + q[1]) / 2]).sort((p, q) => p[1] - q[1]);
    return [ends[0], ends[1]];
  }
  const sorted = [...pts].sort((p, q) => p[1] - q[1]);
  return [sorted[0], sorted[sorted.length - 1]];
}
