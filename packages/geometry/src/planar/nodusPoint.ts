import type { Vec3 } from '../parts/mesh.ts';
import type { FinEdge, PlanarFace } from './planarTypes.ts';
import { isEquatorialFace, isParallelFace, styleEdgeAnchor, type PlanarGnomon } from './styleEdgeAnchor.ts';

/**
 * The nodus on one style edge, relative to the face origin (horizon frame):
 * the edge's anchor moved along the style by `alongStyleMm`. Defaults: ψ > 0,
 * the style's tip (h / sin ψ from the root, h the tip's height); ψ = 0, the
 * point above the face origin (the nodus foot, as on the polar plate); an
 * equatorial rod, its tip h above the face.
 */
export function nodusPoint(face: PlanarFace, gnomon: PlanarGnomon, edge: FinEdge, alongStyleMm?: number): Vec3 {
  const A = styleEdgeAnchor(face, gnomon, edge);
  const L = alongStyleMm ?? (isParallelFace(face) ? 0 : isEquatorialFace(face) ? gnomon.heightMm : gnomon.heightMm / Math.sin(face.styleHeightRad));
  const d = face.style;
  return [A[0] + L * d[0], A[1] + L * d[1], A[2] + L * d[2]];
}
