import type { Vec3 } from '../parts/mesh.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import type { StyleEdge, Vec2 } from '../types.ts';
import { clipPolygonConvex, convexHull } from './clipPolygon.ts';

/** The gnomon's shadow on the dial face for one sun direction, face coordinates (mm). */
export interface FaceShadow {
  /** the shadow on the plate (clipped to its outline), CCW; empty when the face is unlit */
  readonly polygon: readonly Vec2[];
  /** which style edge casts the shadow's outer edge (west when the sun is east of the meridian plane, DESIGN §2) */
  readonly style: StyleEdge;
  /** face x of the shadow of that style edge: the line the dial reads, mm */
  readonly edgeXMm: number;
}

/**
 * Shadow of the gnomon fin (x ∈ [−t/2, t/2], y ∈ [y0, y1], 0 ≤ z ≤ h in the
 * face frame) on the face plane z = 0 for a sun direction given in face
 * coordinates (`sunFace`, unit vector toward the sun, z = along the face
 * normal). Each corner P is moved along the ray to the face:
 * P − (P_z / s_z)·s; the fin is a box, so its shadow is the convex hull of its
 * foot and of its top corners' shadows. The style edge at x = ±t/2 lands at
 * x = ±t/2 − h·s_x/s_z — for s = (−cos δ sin H, sin δ, cos δ cos H) that is the
 * tan law x = ±t/2 + h·tan H of DESIGN §2.
 *
 * @param outline the plate outline on the face (convex, CCW), to clip the shadow to
 */
export function gnomonShadowOnFace(layout: DialLayout, sunFace: Vec3, outline: readonly Vec2[]): FaceShadow {
  const { heightMm: h, thicknessMm: t, y0Mm: y0, y1Mm: y1 } = layout.gnomon;
  const [sx, sy, sz] = sunFace;
  // East-west sense of face x: in the south face x runs west (DESIGN §2).
  const eastSign = layout.hemisphere === 'north' ? 1 : -1;
  const sunEast = eastSign * sx > 0;
  const style: StyleEdge = sunEast ? 'west' : 'east';
  // The casting edge is the one away from the sun across the fin.
  const edgeX = (sx > 0 ? -t / 2 : t / 2) - (h * sx) / sz;
  if (!(sz > 0)) return { polygon: [], style, edgeXMm: NaN };
  const foot: Vec2[] = [[-t / 2, y0], [t / 2, y0], [t / 2, y1], [-t / 2, y1]];
  const tops: Vec2[] = foot.map(([x, y]) => [x - (h * sx) / sz, y - (h * sy) / sz]);
  const hull = convexHull([...foot, ...tops]);
  return { polygon: clipPolygonConvex(hull, outline), style, edgeXMm: edgeX };
}
