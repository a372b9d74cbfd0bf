import { DEG } from '../guards.ts';
import type { Vec3 } from '../parts/mesh.ts';

/**
 * The dial's face frame as installed, three unit vectors in the site's
 * horizon frame (x east, y north, z up; "ENU"):
 * - `y` along the style, toward the elevated pole, rising at the tilt angle;
 * - `z` the outward face normal (in the vertical plane of the style, upward);
 * - `x = y × z`, the face-drawing x (right-positive seen face-on with the
 *   pole-ward end up): east in the northern hemisphere, west in the southern
 *   one (docs/design.md §2), so the frame is right-handed in both.
 */
export interface DialFrame {
  readonly x: Vec3;
  readonly y: Vec3;
  readonly z: Vec3;
}

/** How the plate is set up at the site. */
export interface DialInstallation {
  /** site latitude, degrees, north positive (geodetic: the local vertical) */
  readonly latitudeDeg: number;
  /** tilt error, degrees: the plate stands at |latitude| + this from the horizontal (positive = steeper); default 0 */
  readonly tiltErrorDeg?: number;
  /** azimuth error, degrees: the style points this far clockwise (seen from above) from the true meridian; default 0 */
  readonly azimuthErrorDeg?: number;
}

/**
 * The installed dial frame. An ideal polar dial has its face tilted by
 * |latitude| from the horizontal, rising toward the elevated pole, with the
 * style in the true meridian (docs/design.md §2, §4), so the style is parallel to the
 * Earth's axis. With style azimuth A (0° north, 180° south, plus the azimuth
 * error) and elevation τ (|latitude| plus the tilt error):
 *
 *     y = (sin A cos τ, cos A cos τ, sin τ)
 *     z = (−sin A sin τ, −cos A sin τ, cos τ)
 *     x = y × z
 *
 * @example dialFrame({ latitudeDeg: 50 }).z // ≈ [0, −0.766, 0.643]: toward the equator on the meridian
 */
export function dialFrame(installation: DialInstallation): DialFrame {
  const lat = installation.latitudeDeg;
  const tau = (Math.abs(lat) + (installation.tiltErrorDeg ?? 0)) * DEG;
  const A = ((lat >= 0 ? 0 : 180) + (installation.azimuthErrorDeg ?? 0)) * DEG;
  const sA = Math.sin(A);
  const cA = Math.cos(A);
  const sT = Math.sin(tau);
  const cT = Math.cos(tau);
  const y: Vec3 = [sA * cT, cA * cT, sT];
  const z: Vec3 = [-sA * sT, -cA * sT, cT];
  const x: Vec3 = [y[1] * z[2] - y[2] * z[1], y[2] * z[0] - y[0] * z[2], y[0] * z[1] - y[1] * z[0]];
  return { x, y, z };
}

/** A horizon-frame (ENU) vector expressed in the dial frame. */
export function toDialFrame(frame: DialFrame, enu: Vec3): Vec3 {
  const { x, y, z } = frame;
  return [x[0] * enu[0] + x[1] * enu[1] + x[2] * enu[2], y[0] * enu[0] + y[1] * enu[1] + y[2] * enu[2], z[0] * enu[0] + z[1] * enu[1] + z[2] * enu[2]];
}
