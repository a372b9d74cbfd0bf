import type { CrossSection, ManifoldToplevel } from 'manifold-3d';
import { manifoldEngine } from '../parts/manifoldEngine.ts';
import type { DrawnLine, DrawnText } from '../plate/plateDrawing.ts';
import { arcSegments, CHORD_TOLERANCE_MM } from '../sheet/arcPoints.ts';
import type { Vec2 } from '../types.ts';

/** One engraved stroke: a centre-line traced at a width. */
export interface Stroke {
  readonly points: readonly Vec2[];
  readonly closed: boolean;
  readonly widthMm: number;
  /** butt: the stroke ends square at its end points (hour marks, date lines); round: a pen's round cap (single-stroke text). Joins are always round. */
  readonly caps: 'butt' | 'round';
}

/** One connected region of the union: its outer ring (counter-clockwise) and its holes (clockwise), mm. */
export interface OutlineRegion {
  readonly outer: readonly Vec2[];
  readonly holes: readonly (readonly Vec2[])[];
}

/** The union of a set of strokes, as closed outlines. */
export interface StrokeOutlines {
  readonly regions: readonly OutlineRegion[];
  /** Closed outlines (outer rings and holes): the pierces a waterjet makes to etch them. */
  readonly rings: number;
  readonly areaMm2: number;
  readonly chordToleranceMm: number;
}

/**
 * The strokes of a plate drawing's engraving: every mark and curve at its
 * width with square ends (a mark is exactly as long as drawn) and round
 * joins, every text stroke at its stroke width with round caps and joins.
 * @example drawingStrokes(drawing.lines, drawing.text).length
 */
export function drawingStrokes(lines: readonly DrawnLine[], text: readonly DrawnText[]): Stroke[] {
  return [
    ...lines.map((l): Stroke => ({ points: l.path.points, closed: l.path.closed, widthMm: l.widthMm, caps: 'butt' })),
    ...text.flatMap((b) => b.strokes.map((s): Stroke => ({ points: s.points, closed: s.closed, widthMm: b.strokeWidthMm, caps: 'round' }))),
  ];
}

/**
 * The area every stroke covers, as closed outlines (the union of the
 * strokes at their widths): one outer ring per connected region and its
 * holes, no two overlapping, round joins and caps as chords whose vertices
 * lie on the arc, none farther than `chordToleranceMm` from it. What a
 * waterjet etches or a fill laser fills.
 *
 * Each stroke becomes overlapping pieces (a rectangle per segment, a disc
 * per round join or cap); the union is Clipper2's (A. Johnson,
 * https://github.com/AngusJohnson/Clipper2) through manifold-3d's
 * CrossSection, positive fill rule.
 *
 * @param chordToleranceMm default 0.005 mm
 * @example (await strokeOutlines(drawingStrokes(d.lines, d.text))).rings
 */
export async function strokeOutlines(strokes: readonly Stroke[], chordToleranceMm = CHORD_TOLERANCE_MM): Promise<StrokeOutlines> {
  const union = await strokeUnion(strokes, chordToleranceMm);
  if (!union) return { regions: [], rings: 0, areaMm2: 0, chordToleranceMm };
  try {
    const parts = union.decompose();
    const regions: OutlineRegion[] = [];
    try {
      for (const part of parts) {
        const rings = part.toPolygons().flatMap((r) => splitPinches(r.map(([x, y]): Vec2 => [x, y])));
        const outers = rings.filter((r) => signedArea(r) > 0);
        const holes = rings.filter((r) => !(signedArea(r) > 0));
        for (const outer of outers) {
          regions.push({ outer, holes: holes.filter((h) => outers.length === 1 || containsRing(outer, h)) });
        }
      }
    } finally {
      for (const p of parts) p.delete();
    }
    // A fixed order (lowest, then leftmost first point of each region), whatever the engine's.
    regions.sort((a, b) => minKey(a.outer) - minKey(b.outer));
    return {
      regions: regions.map(canonicalRegion),
      rings: regions.reduce((n, r) => n + 1 + r.holes.length, 0),
      areaMm2: union.area(),
      chordToleranceMm,
    };
  } finally {
    union.delete();
  }
}

/**
 * The union of the strokes (as strokeOutlines) left in the polygon engine,
 * for a caller that goes on with more offsets and booleans (a laser fill):
 * it skips reading the rings out and handing them back in. Null when no
 * stroke covers any area; otherwise the caller deletes it.
 */
export async function strokeUnion(strokes: readonly Stroke[], chordToleranceMm = CHORD_TOLERANCE_MM): Promise<CrossSection | null> {
  const { CrossSection } = await manifoldEngine();
  const pieces = strokePolygons(strokes, chordToleranceMm, CrossSection);
  return pieces.length === 0 ? null : new CrossSection(pieces, 'Positive');
}

/**
 * The overlapping counter-clockwise polygons whose union (positive fill
 * rule) is the strokes' area: strokeOutlines' input to the polygon engine,
 * exposed to measure other engines on the same data (scripts/bench-etch.ts).
 */
export function strokePolygons(strokes: readonly Stroke[], chordToleranceMm: number, CrossSection: ManifoldToplevel['CrossSection']): [number, number][][] {
  const pieces: [number, number][][] = [];
  for (const s of strokes) {
    const own = strokePieces(s, chordToleranceMm);
    const [startBox, endBox] = s.caps === 'butt' && !s.closed ? capOverhangs(s) : [null, null];
    if (!startBox && !endBox) {
      pieces.push(...own.map((p) => p.poly));
      continue;
    }
    // Joins near a square end may bulge past it: cut the pieces near that end off square
    // (only those: the other end of a nearly closed curve may lie right beside it).
    const zone = 2 * s.widthMm;
    const total = own.reduce((m, p) => Math.max(m, p.hi), 0);
    for (const p of own) {
      const cuts = [p.lo < zone ? startBox : null, p.hi > total - zone ? endBox : null].filter((b): b is [number, number][] => b !== null);
      if (cuts.length === 0) {
        pieces.push(p.poly);
        continue;
      }
      const piece = new CrossSection([p.poly], 'Positive');
      const trimmed = piece.subtract(cuts);
      try {
        pieces.push(...trimmed.toPolygons().map((r) => r.map(([x, y]): [number, number] => [x, y])));
      } finally {
        piece.delete();
        trimmed.delete();
      }
    }
  }
  return pieces;
}

/** How far a join wedge's arc runs past each segment end, radians. */
const WEDGE_OVERLAP_RAD = 0.05;

/** A piece of a stroke and where along the stroke it lies (arc length from the start, mm). */
interface StrokePiece {
  readonly poly: [number, number][];
  readonly lo: number;
  readonly hi: number;
}

/** The overlapping pieces whose union is one stroke (counter-clockwise). */
function strokePieces(s: Stroke, tol: number): StrokePiece[] {
  const r = s.widthMm / 2;
  const pts = s.points.filter((p, i) => i === 0 || p[0] !== s.points[i - 1][0] || p[1] !== s.points[i - 1][1]);
  if (!(r > 0) || pts.length === 0) return [];
  if (pts.length === 1) return [{ poly: disc(pts[0], r, tol), lo: 0, hi: 0 }];
  const out: StrokePiece[] = [];
  const n = pts.length;
  const at: number[] = [0];
  for (let i = 1; i <= n; i++) at.push(at[i - 1] + Math.hypot(pts[i % n][0] - pts[i - 1][0], pts[i % n][1] - pts[i - 1][1]));
  const segs = s.closed ? n : n - 1;
  for (let i = 0; i < segs; i++) {
    const a = pts[i];
    const b = pts[(i + 1) % n];
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
    if (!(len > 0)) continue;
    const nx = (-(b[1] - a[1]) / len) * r;
    const ny = ((b[0] - a[0]) / len) * r;
    const poly: [number, number][] = [
      [a[0] - nx, a[1] - ny],
      [b[0] - nx, b[1] - ny],
      [b[0] + nx, b[1] + ny],
      [a[0] + nx, a[1] + ny],
    ];
    out.push({ poly, lo: at[i], hi: at[i + 1] });
  }
  pts.forEach((p, i) => {
    const end = !s.closed && (i === 0 || i === n - 1);
    if (end) {
      if (s.caps === 'round') out.push({ poly: disc(p, r, tol), lo: at[i], hi: at[i] });
      return;
    }
    const a = pts[(i - 1 + n) % n];
    const b = pts[(i + 1) % n];
    // Beside segments at least r long the rectangles cover the inside of the turn: the
    // outside wedge completes the join. Beside shorter ones, the whole disc.
    if (Math.hypot(p[0] - a[0], p[1] - a[1]) >= r && Math.hypot(b[0] - p[0], b[1] - p[1]) >= r) {
      const wedge = joinWedge(a, p, b, r, tol);
      if (wedge) out.push({ poly: wedge, lo: at[i], hi: at[i] });
    } else {
      out.push({ poly: disc(p, r, tol), lo: at[i], hi: at[i] });
    }
  });
  return out;
}

/**
 * The round join at p between segments a→p and p→b: the circular sector on
 * the outside of the turn that the two segment rectangles leave open
 * (apex p, radius r, angle = the turn), counter-clockwise; null when the
 * path runs straight on.
 */
function joinWedge(a: Vec2, p: Vec2, b: Vec2, r: number, tol: number): [number, number][] | null {
  const d1x = p[0] - a[0];
  const d1y = p[1] - a[1];
  const d2x = b[0] - p[0];
  const d2y = b[1] - p[1];
  const turn = Math.atan2(d1x * d2y - d1y * d2x, d1x * d2x + d1y * d2y);
  if (!(Math.abs(turn) > 1e-12)) return null;
  // Outside of a left turn is the right side: start from the right normal of a→p and sweep the turn.
  const side = turn > 0 ? -1 : 1;
  // The arc overshoots the two segment ends by WEDGE_OVERLAP_RAD and its apex sits r/4 inside the
  // turn, so the wedge overlaps both rectangles instead of meeting them edge to edge (no slivers);
  // every point of it stays within r of p, inside the stroke.
  const over = WEDGE_OVERLAP_RAD * Math.sign(turn);
  const start = Math.atan2(d1x * side, -d1y * side) - over;
  const sweep = turn + 2 * over;
  const m = Math.max(1, arcSegments(r, Math.abs(sweep), tol));
  const arc: [number, number][] = [];
  for (let k = 0; k <= m; k++) {
    const t = start + (sweep * k) / m;
    arc.push([p[0] + r * Math.cos(t), p[1] + r * Math.sin(t)]);
  }
  const mid = start + sweep / 2;
  const apex: [number, number] = [p[0] - (r / 4) * Math.cos(mid), p[1] - (r / 4) * Math.sin(mid)];
  const poly: [number, number][] = [apex, ...arc];
  return turn > 0 ? poly : poly.reverse();
}

/**
 * For a square-ended stroke, at each end whose end segment is shorter than
 * half the width (where a join's disc may reach past the end), a box beyond
 * that end, square to the end segment, to cut the overhang away: [start, end],
 * null where none is needed.
 */
function capOverhangs(s: Stroke): [[number, number][] | null, [number, number][] | null] {
  const r = s.widthMm / 2;
  const pts = s.points.filter((p, i) => i === 0 || p[0] !== s.points[i - 1][0] || p[1] !== s.points[i - 1][1]);
  if (pts.length < 3) return [null, null];
  const box = (e: Vec2, q: Vec2): [number, number][] | null => {
    const len = Math.hypot(e[0] - q[0], e[1] - q[1]);
    if (len >= r) return null;
    const ux = (e[0] - q[0]) / len;
    const uy = (e[1] - q[1]) / len;
    const w = 2 * r;
    // corners e + s·u + t·n for s in [0, 2r], t in [−2r, 2r], counter-clockwise
    const at = (sv: number, tv: number): [number, number] => [e[0] + sv * ux - tv * uy, e[1] + sv * uy + tv * ux];
    return [at(0, -w), at(w, -w), at(w, w), at(0, w)];
  };
  return [box(pts[0], pts[1]), box(pts[pts.length - 1], pts[pts.length - 2])];
}

/** A disc as a counter-clockwise polygon with its vertices on the circle, chords within tol. */
function disc(c: Vec2, r: number, tol: number): [number, number][] {
  const n = Math.max(8, arcSegments(r, 2 * Math.PI, tol));
  return Array.from({ length: n }, (_, k): [number, number] => [c[0] + r * Math.cos((2 * Math.PI * k) / n), c[1] + r * Math.sin((2 * Math.PI * k) / n)]);
}

/**
 * Clipper2 may return a ring that touches itself at a vertex (a hole
 * pinched onto its outline, or two lobes meeting at a point). Split it there
 * into simple rings, as the OGC simple-features rules want (a hole may touch
 * its outline at one point; a ring may not touch itself).
 */
function splitPinches(ring: Vec2[]): Vec2[][] {
  const seen = new Map<string, number>();
  for (let j = 0; j < ring.length; j++) {
    const key = `${ring[j][0]},${ring[j][1]}`;
    const i = seen.get(key);
    if (i !== undefined) {
      return [...splitPinches(ring.slice(i, j)), ...splitPinches([...ring.slice(j), ...ring.slice(0, i)])];
    }
    seen.set(key, j);
  }
  return [ring];
}

/** Whether hole ring h lies inside outer ring o (even-odd test of the middle of an edge of h off o's vertices). */
function containsRing(o: readonly Vec2[], h: readonly Vec2[]): boolean {
  const p: Vec2 = [(h[0][0] + h[1][0]) / 2, (h[0][1] + h[1][1]) / 2];
  let c = false;
  for (let i = 0, j = o.length - 1; i < o.length; j = i++) {
    const [xi, yi] = o[i];
    const [xj, yj] = o[j];
    if (yi > p[1] !== yj > p[1] && p[0] < ((xj - xi) * (p[1] - yi)) / (yj - yi) + xi) c = !c;
  }
  return c;
}

function signedArea(ring: readonly Vec2[]): number {
  let a = 0;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) a += ring[j][0] * ring[i][1] - ring[i][0] * ring[j][1];
  return a / 2;
}

function minKey(ring: readonly Vec2[]): number {
  let best = Infinity;
  for (const p of ring) best = Math.min(best, p[1] * 1e6 + p[0]);
  return best;
}

/** Start each ring at its lowest-then-leftmost vertex, so equal unions give equal files. */
function canonicalRegion(r: OutlineRegion): OutlineRegion {
  const start = (ring: readonly Vec2[]) => {
    let k = 0;
    ring.forEach((p, i) => {
      const q = ring[k];
      if (p[1] < q[1] || (p[1] === q[1] && p[0] < q[0])) k = i;
    });
    return [...ring.slice(k), ...ring.slice(0, k)];
  };
  return { outer: start(r.outer), holes: r.holes.map(start).sort((a, b) => minKey(a) - minKey(b)) };
}
