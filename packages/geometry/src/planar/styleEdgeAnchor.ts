import type { Vec3 } from '../parts/mesh.ts';
import type { FinEdge, PlanarFace } from './planarTypes.ts';

/** The gnomon as the face sees it: a fin of thickness t (a rod of diameter t on an equatorial face). */
export interface PlanarGnomon {
  /** fin thickness (rod diameter), mm */
  readonly thicknessMm: number;
  /** for a face parallel to the axis (ψ = 0): the style's height above the face, mm; otherwise the style tip's height */
  readonly heightMm: number;
}

/** ψ below this counts as a face parallel to the axis (polar, meridian). */
export const PARALLEL_STYLE_RAD = 1e-9;
/**
 * ψ above π/2 minus this counts as a face perpendicular to the axis
 * (equatorial): the gnomon is a rod. Not tighter: ψ = asin |p · n| is
 * ill-conditioned near 1, where one rounding step of |p · n| moves ψ by
 * about 1.5e-8 rad (an equatorial face at 55° or 70° fell on the fin side).
 */
export const PERPENDICULAR_STYLE_RAD = 1e-6;

export function isParallelFace(face: PlanarFace): boolean {
  return face.styleHeightRad < PARALLEL_STYLE_RAD;
}

export function isEquatorialFace(face: PlanarFace): boolean {
  return face.styleHeightRad > Math.PI / 2 - PERPENDICULAR_STYLE_RAD;
}

/** +1 for the edge at root + (t/2) f, −1 for root − (t/2) f. */
export function edgeSign(edge: FinEdge): 1 | -1 {
  return edge === 'plusF' ? 1 : -1;
}

/**
 * A point of a fin's style edge, relative to the face origin, in the horizon
 * frame (docs/design.md §8): the fin stands on the substyle, perpendicular to the
 * face, so its two style edges are lines parallel to p through
 * root ± (t/2)·f, f = unit(n × p). With ψ > 0 that point is the edge's root
 * (on the face, the origin being the middle root); with ψ = 0 it is the
 * edge's point above the face origin, at the style height h along n. A rod on
 * an equatorial face has a single axis through the origin.
 */
export function styleEdgeAnchor(face: PlanarFace, gnomon: PlanarGnomon, edge: FinEdge): Vec3 {
  if (isEquatorialFace(face)) return [0, 0, 0];
  const k = (edgeSign(edge) * gnomon.thicknessMm) / 2;
  const f = face.fin;
  const h = isParallelFace(face) ? gnomon.heightMm : 0;
  const n = face.normal;
  return [k * f[0] + h * n[0], k * f[1] + h * n[1], k * f[2] + h * n[2]];
}
