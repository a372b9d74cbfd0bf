import { manifoldEngine, strokeOutlines, type Circle, type RoundedRect, type Stroke } from '@umbrafab/geometry';
import type { EngraveJob, EngraveOperation, Vec2 } from './engraveInput.ts';
import { roundSegments } from './toolCentrePaths.ts';

/**
 * Laser fill: what a beam of width `beamMm` traces so that a line drawn
 * `w` wide comes out `w` wide. Lines no wider than the beam are scored
 * along their centre (one pass). The wider ones are first merged into the
 * union of every stroke at its width (strokeOutlines: one outline per
 * connected region, so where strokes overlap, at crossings and inside a
 * numeral, the beam burns once), minus the holes and gnomon slots (no beam
 * over a through-cut), then filled with concentric passes: the outline
 * moved in by beamMm/2 (the beam's edge then runs on the drawn edge), and
 * again every `intervalMm` until nothing is left. Where a region is too
 * thin for the next ring, the strip the last ring misses (no wider than the
 * beam) is traced round its edge too, so no core is left unburned.
 * Offsets and booleans are Clipper2's (A. Johnson,
 * https://github.com/AngusJohnson/Clipper2) through manifold-3d's CrossSection.
 */

/** One laser pass: a polyline traced with the beam on. */
export interface LaserPass {
  readonly points: readonly Vec2[];
  readonly closed: boolean;
  readonly operation: EngraveOperation | 'fill';
  readonly label: string;
}

export interface LaserFillOptions {
  /** Width of the burned line the beam leaves, mm. */
  readonly beamMm: number;
  /** Distance between concentric passes, mm (at most beamMm, so the passes meet). */
  readonly intervalMm: number;
  /** Largest gap between a curve and its polyline, mm. */
  readonly chordToleranceMm: number;
  /** Through-cuts the beam must not cross. */
  readonly holes: readonly Circle[];
  readonly slots: readonly RoundedRect[];
}

export interface LaserFill {
  readonly passes: readonly LaserPass[];
  /** Lines scored along their centre (no wider than the beam). */
  readonly scored: number;
  /** Connected regions filled, rings traced (concentric and core). */
  readonly regions: number;
  readonly rings: number;
  /** Area of the filled outlines, mm² (the union of the wide strokes, less the through-cuts). */
  readonly filledAreaMm2: number;
  readonly beamMm: number;
  readonly intervalMm: number;
}

type Poly = [number, number][];

// Mitred joins (limit 2): the inward offsets keep the outline's corners and add no arc vertices, so fewer, shorter passes.
const JOIN = 'Miter' as const;

function circlePoly(c: Circle, toleranceMm: number): Poly {
  const n = roundSegments(c.radiusMm, toleranceMm);
  return Array.from({ length: n }, (_, k): [number, number] => [c.cx + c.radiusMm * Math.cos((2 * Math.PI * k) / n), c.cy + c.radiusMm * Math.sin((2 * Math.PI * k) / n)]);
}

function rectPoly(r: RoundedRect): Poly {
  // The full rectangle (as clipToPlate clips): a rounded slot corner then ends a fill a hair early, never late.
  const x0 = r.cx - r.widthMm / 2;
  const x1 = r.cx + r.widthMm / 2;
  const y0 = r.cy - r.heightMm / 2;
  const y1 = r.cy + r.heightMm / 2;
  return [[x0, y0], [x1, y0], [x1, y1], [x0, y1]];
}

/**
 * The laser passes of a job (see the file comment). Deterministic: the same
 * job gives the same passes in the same order.
 *
 * @example (await laserFillPasses(job, { beamMm: 0.15, intervalMm: 0.15, chordToleranceMm: 0.005, holes: [], slots: [] })).rings
 */
export async function laserFillPasses(job: EngraveJob, o: LaserFillOptions): Promise<LaserFill> {
  // parseSpec refuses an interval wider than the beam first (engrave.laserFillIntervalMm)
  if (!(o.beamMm > 0) || !(o.intervalMm > 0) || o.intervalMm > o.beamMm + 1e-12) {
    throw new Error(`laser fill needs 0 < intervalMm <= beamMm, got interval ${o.intervalMm} mm, beam ${o.beamMm} mm`);
  }
  const passes: LaserPass[] = [];
  const wide: Stroke[] = [];
  let scored = 0;
  for (const p of job.paths) {
    if (p.widthMm <= o.beamMm + 1e-9) {
      passes.push({ points: p.points, closed: p.closed, operation: p.operation, label: `${p.label} (scored: no wider than the beam)` });
      scored += 1;
    } else wide.push({ points: p.points, closed: p.closed, widthMm: p.widthMm, caps: p.operation === 'text' ? 'round' : 'butt' });
  }
  if (wide.length === 0) return { passes, scored, regions: 0, rings: 0, filledAreaMm2: 0, beamMm: o.beamMm, intervalMm: o.intervalMm };
  const union = await strokeOutlines(wide, o.chordToleranceMm);
  const { CrossSection } = await manifoldEngine();
  const owned: { delete(): void }[] = [];
  const keep = <T extends { delete(): void }>(x: T): T => {
    owned.push(x);
    return x;
  };
  try {
    const contours: Poly[] = union.regions.flatMap((r) => [r.outer, ...r.holes].map((ring) => ring.map((p): [number, number] => [p[0], p[1]])));
    const cuts: Poly[] = [...o.holes.map((h) => circlePoly(h, o.chordToleranceMm)), ...o.slots.map(rectPoly)];
    let region = keep(new CrossSection(contours, 'Positive'));
    if (cuts.length > 0) region = keep(region.subtract(keep(new CrossSection(cuts, 'Positive'))));
    const filledAreaMm2 = region.area();
    const segments = roundSegments(o.beamMm, o.chordToleranceMm);
    const half = o.beamMm / 2;
    // Concentric levels O_k = region moved in by beamMm/2 + k·intervalMm, until empty.
    const levels: InstanceType<typeof CrossSection>[] = [];
    for (let k = 0; k < 100000; k += 1) {
      const level = keep(region.offset(-(half + k * o.intervalMm), JOIN, 2, segments));
      if (level.isEmpty()) break;
      levels.push(level);
    }
    // Regions: those of the first level (the region moved in by half a beam; none when that is empty).
    const pieces = levels.length > 0 ? levels[0].decompose() : [];
    const regions = pieces.length;
    pieces.forEach((piece) => piece.delete());
    let rings = 0;
    const ringPasses = (section: InstanceType<typeof CrossSection>, label: string): void => {
      for (const poly of section.toPolygons()) {
        if (poly.length < 3) continue;
        passes.push({ points: poly.map((p): Vec2 => [p[0], p[1]]), closed: true, operation: 'fill', label });
        rings += 1;
      }
    };
    levels.forEach((level, k) => {
      ringPasses(level, `fill ring ${k + 1}`);
      // The part of this level deeper than half a beam that the next ring's beam does not reach.
      const next = levels[k + 1];
      const deep = keep(level.offset(-half, JOIN, 2, segments));
      const core = next ? keep(deep.subtract(keep(next.offset(half, JOIN, 2, segments)))) : deep;
      const slivers = keep(core.offset(-1e-4, JOIN, 2, segments));
      if (!slivers.isEmpty()) ringPasses(core, `fill core after ring ${k + 1}`);
    });
    return { passes, scored, regions, rings, filledAreaMm2, beamMm: o.beamMm, intervalMm: o.intervalMm };
  } finally {
    for (const x of owned) x.delete();
  }
}
