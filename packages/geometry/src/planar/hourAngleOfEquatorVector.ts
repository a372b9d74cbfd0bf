import type { Vec3 } from '../parts/mesh.ts';

/**
 * The hour angle of a direction v in the celestial equator's plane, in the
 * horizon frame at latitude φ: the H with s(H, 0) ∥ v, where
 * s(H, 0) = (−sin H, −sin φ cos H, cos φ cos H) (docs/design.md §8), so
 * sin H ∝ −v_x and cos H ∝ v · (0, −sin φ, cos φ). Result in −π…π.
 */
export function hourAngleOfEquatorVector(latitudeRad: number, v: Vec3): number {
  const c = -Math.sin(latitudeRad) * v[1] + Math.cos(latitudeRad) * v[2];
  return Math.atan2(-v[0], c);
}
