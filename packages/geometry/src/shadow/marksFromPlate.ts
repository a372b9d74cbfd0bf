import { SpecError } from '../errors.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import type { Vec2 } from '../types.ts';
import type { DrawnMark } from './drawnMarks.ts';
import { CUT_LAYER_NAMES } from '../plate/cutLayerNames.ts';

/** A polyline read from a plate drawing (DXF), plate coordinates (origin at the plate's lower-left corner), mm. */
export interface PlateLine {
  readonly layer: string;
  readonly points: readonly Vec2[];
  readonly closed: boolean;
}

/**
 * Layers that carry the marks in plate.dxf: score centre-lines, the
 * centre-lines kept beside etch outlines, or (drawings of earlier versions)
 * one closed 4-corner etch outline per mark.
 */
export const MARK_LAYERS = { score: CUT_LAYER_NAMES.score, centres: CUT_LAYER_NAMES.markCentres, etch: CUT_LAYER_NAMES.etch } as const;

/** Farthest a drawn line may sit from its mark's layout position and still be taken for it, mm. */
export const MATCH_RADIUS_MM = 5;

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
  const oy = layout.plate.faceOriginY;
  // A drawing with centre-lines (scored, or kept beside its etch outlines) is read by its centre-lines alone.
  const hasCentres = lines.some((l) => l.layer === MARK_LAYERS.centres || l.layer === MARK_LAYERS.score);
  const segs = lines
    .filter((l) => l.layer === MARK_LAYERS.score || l.layer === MARK_LAYERS.centres || (!hasCentres && l.layer === MARK_LAYERS.etch && l.closed))
    .map((l) => centreLine(l))
    .filter((s): s is readonly [Vec2, Vec2] => s !== null)
    .map(([a, b]) => [[a[0] - ox, a[1] - oy] as Vec2, [b[0] - ox, b[1] - oy] as Vec2] as const);
  const mid = (a: Vec2, b: Vec2): Vec2 => [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
  const pairs: { i: number; j: number; d: number }[] = [];
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
  pairs.sort((p, q) => p.d - q.d || p.i - q.i || p.j - q.j);
  const markOf = new Map<number, number>();
  const usedLine = new Set<number>();
  for (const p of pairs) {
    if (markOf.has(p.i) || usedLine.has(p.j)) continue;
    markOf.set(p.i, p.j);
    usedLine.add(p.j);
  }
  const drawn: DrawnMark[] = engraved.map((m, i) => {
    const j = markOf.get(i);
    if (j === undefined) {
      throw new SpecError(
        '--plate',
        `${m.label} ${m.style}`,
        `allowed: a drawing with a line on ${MARK_LAYERS.score}, ${MARK_LAYERS.centres} or ${MARK_LAYERS.etch} within ${MATCH_RADIUS_MM} mm of every mark of this spec`,
        `mark ${m.label} ${m.style} (face x ${m.xMm.toFixed(3)} mm, plate x ${(m.xMm + ox).toFixed(3)} mm) has no line in the drawing`,
      );
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
