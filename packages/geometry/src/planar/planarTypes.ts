import type { Vec3 } from '../parts/mesh.ts';
import type { Vec2 } from '../types.ts';

/**
 * The kinds of planar dial (our names). Every one is a plane with a style
 * parallel to the Earth's axis (docs/design.md §8):
 * - `polar`: the face parallel to the axis, tilted by |latitude| (the default);
 * - `horizontal`: a level face (garden dial);
 * - `vertical`: a wall, facing the equator-ward horizon turned by the wall's
 *   declination, optionally reclined (leaning back) or inclined (forward);
 * - `meridian`: a vertical face looking due east or due west;
 * - `equatorial`: the face perpendicular to the axis, upper and lower faces.
 */
export type PlanarDialType = 'polar' | 'horizontal' | 'vertical' | 'meridian' | 'equatorial';

/** How a face is set up at the site: plain data, angles in radians. */
export interface FaceOrientation {
  readonly type: PlanarDialType;
  /** geodetic latitude φ, radians, north positive */
  readonly latitudeRad: number;
  /**
   * vertical only: the wall's declination D, radians. Sign convention (ours):
   * 0 = the wall faces due south in the northern hemisphere (due north in
   * the southern one: the equator-ward horizon), positive when the wall's
   * normal turns toward the WEST (a wall facing south-west declines +45°),
   * negative toward the east; ±π faces the pole-ward horizon.
   */
  readonly declinationRad?: number;
  /**
   * vertical only: reclination R, radians: positive when the top of the face
   * leans back away from the viewer (the normal tilts up by R), negative when
   * it leans forward (inclining). Default 0.
   */
  readonly reclinationRad?: number;
  /** meridian only: which horizon the face looks at */
  readonly facing?: 'east' | 'west';
  /** equatorial only: the face toward the elevated pole (sunlit in local summer) or the other one */
  readonly side?: 'upper' | 'lower';
}

/** Which of the fin's two style edges: the one at root + (t/2)·f or at root − (t/2)·f, with f = unit(n × p). */
export type FinEdge = 'plusF' | 'minusF';

/**
 * A face and its style, every vector a unit vector in the site's horizon
 * frame (x east, y north, z up; docs/design.md §8).
 */
export interface PlanarFace {
  readonly orientation: FaceOrientation;
  /** outward face normal n (toward the sky side) */
  readonly normal: Vec3;
  /** the celestial pole axis p = (0, cos φ, sin φ) (north) */
  readonly pole: Vec3;
  /**
   * the style's direction: ±p, the sense that leaves the face (d · n > 0);
   * for a face parallel to the axis (ψ = 0) the elevated pole's sense
   */
  readonly style: Vec3;
  /** style height ψ: the angle between style and face, radians (sin ψ = |p · n|) */
  readonly styleHeightRad: number;
  /** unit substyle: the style's projection on the face, d − (d · n) n (for ψ = π/2 the drawing's "down" by convention) */
  readonly substyle: Vec3;
  /** H₀, the hour angle whose hour line lies on the substyle, radians (−π…π) */
  readonly substyleHourAngleRad: number;
  /** f = unit(n × p): in the face, across the fin (for ψ = π/2 the drawing's right) */
  readonly fin: Vec3;
  /** the face drawing's axes: right and up in the face plane (right = up × n) */
  readonly right: Vec3;
  readonly up: Vec3;
}

/** A straight line in face-drawing coordinates (mm): a point and a unit direction. */
export interface FaceLine {
  readonly point: Vec2;
  readonly direction: Vec2;
}
