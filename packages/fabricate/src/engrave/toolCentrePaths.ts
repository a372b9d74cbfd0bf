import { manifoldEngine, shoelaceArea, type Path, type SheetPart, type Vec2 } from '@umbrafab/geometry';

/** One closed tool-centre loop of a cutting program. */
export interface ToolCentreLoop {
  /** 'outer' = a part's outer profile (the tool runs outside it); 'inner' = a cut-out (the tool runs inside it). */
  readonly side: 'outer' | 'inner';
  /** Counter-clockwise tool-centre polygon, mm, in the part's frame. */
  readonly points: readonly Vec2[];
}

/** Polygons in the mutable tuple form manifold-3d's CrossSection takes. */
function contour(points: readonly Vec2[]): [number, number][] {
  return points.map((p) => [p[0], p[1]]);
}

const ccw = (points: readonly Vec2[]): readonly Vec2[] => (shoelaceArea(points) < 0 ? [...points].reverse() : points);

/** Segments per full turn for round joins of radius r within `toleranceMm`: r·(1 − cos(π/n)) ≤ tolerance. */
export function roundSegments(radiusMm: number, toleranceMm: number): number {
  if (!(radiusMm > toleranceMm)) return 8;
  return Math.max(8, Math.ceil(Math.PI / Math.acos(1 - toleranceMm / radiusMm)));
}

/**
 * The tool-centre paths of a flat part for a round tool of radius
 * `toolRadiusMm` (a router bit): the nominal outer profile grown by the
 * radius (round joins at its convex corners), every polygonal cut-out (slot)
 * shrunk by it, so the tool's edge runs exactly on the nominal outline and
 * the part comes out at nominal size. The cutter offset is computed here
 * (no G41/G42 in the program), with Clipper2's offset (A. Johnson,
 * https://github.com/AngusJohnson/Clipper2) through manifold-3d's
 * CrossSection; inside-corner reliefs drawn into the nominal outline
 * (sheetParts) are followed as they are. Holes (circles) are left to the
 * drilling and boring code.
 *
 * @param toleranceMm largest gap between a round join and its polyline, mm
 * @throws Error when a cut-out vanishes (a tool wider than it: check with assertToolFits first)
 * @example (await toolCentrePaths(part, 1.5875, 0.005)).outer.points.length
 */
export async function toolCentrePaths(part: SheetPart, toolRadiusMm: number, toleranceMm: number): Promise<{ readonly outer: ToolCentreLoop; readonly slots: readonly ToolCentreLoop[] }> {
  const { CrossSection } = await manifoldEngine();
  const segments = roundSegments(toolRadiusMm, toleranceMm);
  const offsetOne = (points: readonly Vec2[], delta: number, what: string): Vec2[] => {
    const section = new CrossSection([contour(ccw(points))], 'Positive');
    const grown = section.offset(delta, 'Round', 2, segments);
    try {
      const polys = grown.toPolygons();
      // not expected from a spec: assertToolFits first refuses a tool wider than any hole, slot or notch (process.kerf)
      if (polys.length !== 1) throw new Error(`the tool-centre path of the ${part.name}'s ${what} has ${polys.length} loops, expected 1 (a tool of radius ${toolRadiusMm} mm does not fit it)`);
      return ccw(polys[0].map((p): Vec2 => [p[0], p[1]])) as Vec2[];
    } finally {
      grown.delete();
      section.delete();
    }
  };
  const outer: ToolCentreLoop = { side: 'outer', points: offsetOne(part.outer.points, toolRadiusMm, 'outer profile') };
  const slots = part.inner
    .filter((f): f is Path => f.kind === 'path')
    .map((f, i): ToolCentreLoop => ({ side: 'inner', points: offsetOne(f.points, -toolRadiusMm, `cut-out ${i + 1}`) }));
  return { outer, slots };
}
