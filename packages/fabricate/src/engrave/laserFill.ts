import { chordSag, manifoldEngine, shoelaceArea, strokeUnion, type Circle, type RoundedRect, type Stroke } from '@umbrafab/geometry';
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

/** A core thinner than twice this (mm) is a sliver of the offsets, not left unburned. */
const SLIVER_MM = 1e-4;

/** How many of a region's longest edges hasPointDeeperThan tries a point beside. */
const DEEP_TRIES = 8;

/**
 * Whether some point of a region (its rings as the engine returns them:
 * the region to the left of every edge) lies farther than `depth` from
 * every edge. Then the region moved in by depth/3 with mitred joins (limit
 * 2) is not empty: that offset moves no point of the outline more than
 * twice the distance, so it never sweeps over the point. Tries the points
 * 4/3·depth inside the middles of the longest edges; false when none of
 * them shows it (the region may still be deep enough).
 */
function hasPointDeeperThan(rings: readonly (readonly [number, number][])[], depth: number): boolean {
  const edges: { ring: readonly [number, number][]; i: number; len: number }[] = [];
  for (const ring of rings) {
    for (let i = 0; i < ring.length; i++) {
      const [ax, ay] = ring[i];
      const [bx, by] = ring[(i + 1) % ring.length];
      edges.push({ ring, i, len: Math.hypot(bx - ax, by - ay) });
    }
  }
  edges.sort((a, b) => b.len - a.len);
  return edges.slice(0, DEEP_TRIES).some(({ ring, i, len }) => {
    if (!(len > 0)) return false;
    const [ax, ay] = ring[i];
    const [bx, by] = ring[(i + 1) % ring.length];
    const step = (4 / 3) * depth;
    const x = (ax + bx) / 2 - ((by - ay) / len) * step;
    const y = (ay + by) / 2 + ((bx - ax) / len) * step;
    return windingNumber(rings, x, y) > 0 && rings.every((r) => r.every((p, j) => chordSag(p, [x, y], r[(j + 1) % r.length]) > depth));
  });
}

/** The winding number of a set of rings about (x, y). */
function windingNumber(rings: readonly (readonly [number, number][])[], x: number, y: number): number {
  let w = 0;
  for (const r of rings) {
    for (let j = 0; j < r.length; j++) {
      const [ax, ay] = r[j];
      const [bx, by] = r[(j + 1) % r.length];
      const side = (bx - ax) * (y - ay) - (x - ax) * (by - ay);
      if (ay <= y && by > y && side > 0) w += 1;
      else if (ay > y && by <= y && side < 0) w -= 1;
    }
  }
  return w;
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
  const union = await strokeUnion(wide, o.chordToleranceMm);
  if (!union) return { passes, scored, regions: 0, rings: 0, filledAreaMm2: 0, beamMm: o.beamMm, intervalMm: o.intervalMm };
  const { CrossSection } = await manifoldEngine();
  const owned: { delete(): void }[] = [];
  const keep = <T extends { delete(): void }>(x: T): T => {
    owned.push(x);
    return x;
  };
  try {
    const cuts: Poly[] = [...o.holes.map((h) => circlePoly(h, o.chordToleranceMm)), ...o.slots.map(rectPoly)];
    let region = keep(union);
    if (cuts.length > 0) region = keep(region.subtract(keep(new CrossSection(cuts, 'Positive'))));
    const filledAreaMm2 = region.area();
    const segments = roundSegments(o.beamMm, o.chordToleranceMm);
    const half = o.beamMm / 2;
    // Concentric levels O_k = region moved in by beamMm/2 + k·intervalMm, until empty.
    const levels: InstanceType<typeof CrossSection>[] = [];
    const levelRings: [number, number][][][] = [];
    for (let k = 0; k < 100000; k += 1) {
      const level = keep(region.offset(-(half + k * o.intervalMm), JOIN, 2, segments));
      if (level.isEmpty()) break;
      levels.push(level);
      levelRings.push(level.toPolygons());
    }
    // Regions: those of the first level (the region moved in by half a beam; none when that
    // is empty), one per outer ring (counter-clockwise; holes run clockwise).
    const regions = levels.length > 0 ? levelRings[0].filter((r) => shoelaceArea(r) > 0).length : 0;
    let rings = 0;
    const ringPasses = (polys: readonly [number, number][][], label: string): void => {
      for (const poly of polys) {
        if (poly.length < 3) continue;
        passes.push({ points: poly.map((p): Vec2 => [p[0], p[1]]), closed: true, operation: 'fill', label });
        rings += 1;
      }
    };
    levels.forEach((level, k) => {
      ringPasses(levelRings[k], `fill ring ${k + 1}`);
      // The part of this level deeper than half a beam that the next ring's beam does not reach.
      const next = levels[k + 1];
      const deep = keep(level.offset(-half, JOIN, 2, segments));
      const core = next ? keep(deep.subtract(keep(next.offset(half, JOIN, 2, segments)))) : deep;
      // Traced unless it is only slivers (nothing left once moved in by SLIVER_MM); the offset
      // is asked only when no point of the core shows it plainly holds more.
      const corePolys = core.toPolygons();
      if (hasPointDeeperThan(corePolys, 3 * SLIVER_MM) || !keep(core.offset(-SLIVER_MM, JOIN, 2, segments)).isEmpty()) {
        ringPasses(corePolys, `fill core after ring ${k + 1}`);
      }
    });
    return { passes, scored, regions, rings, filledAreaMm2, beamMm: o.beamMm, intervalMm: o.intervalMm };
  } finally {
    for (const x of owned) x.delete();
  }
}
