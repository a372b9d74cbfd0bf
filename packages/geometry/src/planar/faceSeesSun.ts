import type { Vec3 } from '../parts/mesh.ts';
import { dot3 } from '../parts/vec3.ts';
import type { PlanarFace } from './planarTypes.ts';
import { sunDirectionEnu } from './sunDirectionEnu.ts';
import { OBLIQUITY_J2000_RAD } from '../calendar/obliquity.ts';

/** The lit test of docs/design.md §8: the Sun in front of the face (n · s > 0) and above the horizon (s_z > 0). */
export function faceSeesSun(face: PlanarFace, sun: Vec3, marginRad = 0): boolean {
  const m = Math.sin(marginRad);
  return dot3(face.normal, sun) > m && sun[2] > m;
}

/** Grazing light this close to the face or the horizon does not count when listing the hours (1e-9 rad: rounding, not sunlight). */
const GRAZING_RAD = 1e-9;

/** The declinations over which a face can be lit at one hour angle. */
export interface LitDeclinations {
  readonly minRad: number;
  readonly maxRad: number;
}

/** Declination samples across the year's range (±ε): a 0.02° grid. */
const DECLINATION_SAMPLES = 2345;

/**
 * The range of declinations, within the year's ±ε (ε the obliquity, IAU 2006
 * at J2000), at which the face sees the Sun at hour angle H — the Sun's path
 * over the year reduced to one hour angle (docs/design.md §8: a declining wall sees
 * the Sun part of the day only). Both tests are linear in (cos δ, sin δ),
 * so the lit set at one H is an interval; it is found on a 0.02° grid.
 * Returns null when the face never sees the Sun at H.
 */
export function litDeclinations(face: PlanarFace, hourAngleRad: number, obliquityRad: number = OBLIQUITY_J2000_RAD): LitDeclinations | null {
  let lo = Infinity;
  let hi = -Infinity;
  const phi = face.orientation.latitudeRad;
  for (let i = 0; i < DECLINATION_SAMPLES; i++) {
    const d = -obliquityRad + (2 * obliquityRad * i) / (DECLINATION_SAMPLES - 1);
    if (faceSeesSun(face, sunDirectionEnu(phi, hourAngleRad, d), GRAZING_RAD)) {
      lo = Math.min(lo, d);
      hi = Math.max(hi, d);
    }
  }
  return lo <= hi ? { minRad: lo, maxRad: hi } : null;
}
