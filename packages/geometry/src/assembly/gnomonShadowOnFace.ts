import type { Vec3 } from '../parts/mesh.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import { shadowOnFace } from '../shadow/shadowOnFace.ts';
import type { StyleEdge, Vec2 } from '../types.ts';
import { clipPolygonConvex } from './clipPolygon.ts';

/** The gnomon's shadow on the dial face for one sun direction, face coordinates (mm). */
export interface FaceShadow {
  /** the shadow on the plate (clipped to its outline), CCW polygons; empty when the face is unlit */
  readonly polygons: readonly (readonly Vec2[])[];
  /** which style edge casts the shadow's outer edge (west when the sun is east of the meridian plane, docs/design.md §2) */
  readonly style: StyleEdge;
  /** face x of the shadow of that style edge: the line the dial reads, mm (NaN when unlit) */
  readonly edgeXMm: number;
}

/**
 * The gnomon's shadow on the face for a sun direction given in face
 * coordinates (`sunFace`, toward the sun, z along the face normal): the
 * polygons of `shadow/shadowOnFace` (the gnomon.stl mesh, rays to z = 0),
 * clipped to the plate outline, and the line of the casting style edge: the
 * edge at x = ±t/2, height h lands at x = ±t/2 − h·s_x/s_z — for
 * s = (−cos δ sin H, sin δ, cos δ cos H) that is the tan law
 * x = ±t/2 + h·tan H of docs/design.md §2.
 *
 * @param outline the plate outline on the face (convex, CCW)
 */
export function gnomonShadowOnFace(layout: DialLayout, sunFace: Vec3, outline: readonly Vec2[]): FaceShadow {
  const { heightMm: h, thicknessMm: t } = layout.gnomon;
  const [sx, , sz] = sunFace;
  // Face x runs east in the north and west in the south (docs/design.md §2).
  const eastSign = layout.hemisphere === 'north' ? 1 : -1;
  const style: StyleEdge = eastSign * sx > 0 ? 'west' : 'east';
  if (!(sz > 0)) return { polygons: [], style, edgeXMm: NaN };
  // The casting edge is the one away from the sun across the fin.
  const edgeXMm = (sx > 0 ? -t / 2 : t / 2) - (h * sx) / sz;
  const polygons = shadowOnFace(layout, sunFace)
    .map((p) => clipPolygonConvex(p.points, outline))
    .filter((p) => p.length >= 3);
  return { polygons, style, edgeXMm };
}
