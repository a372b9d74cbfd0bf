import type { Vec3 } from '../parts/mesh.ts';
import { shoelaceArea } from '../parts/ring2d.ts';
import { triangulatePolygon } from '../parts/triangulatePolygon.ts';
import { circlePolygon } from '../parts/widenPolyline.ts';
import type { SheetPart } from '../sheet/sheetPart.ts';
import type { Vec2 } from '../types.ts';

/** Sides of the polygon a round hole becomes in a solid (circumscribing the circle, so the bore is never undersize). */
export const HOLE_MESH_SEGMENTS = 24;

/** The rings of a sheet part: outer counter-clockwise, holes clockwise (circles as polygons). */
export function sheetPartRings(part: SheetPart, segments = HOLE_MESH_SEGMENTS): { outer: Vec2[]; holes: Vec2[][] } {
  const orient = (ring: readonly Vec2[], want: 1 | -1): Vec2[] => (Math.sign(shoelaceArea(ring)) === want ? [...ring] : [...ring].reverse());
  const outer = orient(part.outer.points, 1);
  const holes = part.inner.map((h) => orient(h.kind === 'circle' ? circlePolygon([h.cx, h.cy], h.radiusMm, segments) : h.points, -1));
  return { outer, holes };
}

/** A flat face of a part, its own frame, with its outward unit normal. */
export interface PartFacet {
  readonly points: readonly Vec3[];
  readonly normal: Vec3;
}

/**
 * A flat part's faces for drawing (its own frame: the drawing in x, y, the
 * thickness along z from −t/2 to +t/2): the two sides ear-clipped around
 * the holes, and one rectangle per edge of every ring. The normals are the
 * faces' own (±z, or the edge's outward normal), never taken from a
 * triangle's winding, so a sliver triangle along a straight edge with tabs
 * draws as nothing rather than as a wrong shade. Closed solids for files
 * come from `standSolid`.
 */
export function sheetPartFacets(part: SheetPart, segments = HOLE_MESH_SEGMENTS): PartFacet[] {
  const { outer, holes } = sheetPartRings(part, segments);
  const h = part.thicknessMm / 2;
  const all = [...outer, ...holes.flat()];
  const out: PartFacet[] = [];
  for (const [a, b, c] of triangulatePolygon(outer, holes)) {
    const tri = [all[a], all[b], all[c]];
    out.push({ points: tri.map(([x, y]): Vec3 => [x, y, h]), normal: [0, 0, 1] });
    out.push({ points: [...tri].reverse().map(([x, y]): Vec3 => [x, y, -h]), normal: [0, 0, -1] });
  }
  for (const ring of [outer, ...holes]) {
    ring.forEach((p, k) => {
      const q = ring[(k + 1) % ring.length];
      const len = Math.hypot(q[0] - p[0], q[1] - p[1]);
      // The material lies left of a CCW outer ring and of a CW hole ring: outward is the right-hand normal.
      out.push({ points: [[p[0], p[1], -h], [q[0], q[1], -h], [q[0], q[1], h], [p[0], p[1], h]], normal: [(q[1] - p[1]) / len, -(q[0] - p[0]) / len, 0] });
    });
  }
  return out;
}
