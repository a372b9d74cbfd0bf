import type { Vec2 } from './mesh.ts';
import { addPlanarFace, addPoint, type MeshDraft } from './meshDraft.ts';

/** Ring indices of an extruded profile, for attaching holes to its faces. */
export interface ExtrudedProfile {
  /** index of profile corner k on the x = xMin side */
  readonly low: readonly number[];
  /** index of profile corner k on the x = xMax side */
  readonly high: readonly number[];
}

/**
 * Extrude a simple (y, z) profile polygon along x from xMin to xMax into a
 * closed prism inside `draft`: two side faces (the profile, ear-clipped)
 * and one flat wall per profile edge. Holes can be cut into chosen walls:
 * `wallHoles[k]` lists index rings (already in the draft, lying in the plane
 * of wall k, the wall between profile corners k and k + 1) whose inside is
 * open; the caller closes them with its own surfaces.
 * The profile must be counter-clockwise in (y, z) (interior on the left).
 */
export function extrudeProfileX(
  draft: MeshDraft,
  profile: readonly Vec2[],
  xMin: number,
  xMax: number,
  wallHoles: Readonly<Record<number, readonly (readonly number[])[]>> = {},
): ExtrudedProfile {
  const low = profile.map(([y, z]) => addPoint(draft, [xMin, y, z]));
  const high = profile.map(([y, z]) => addPoint(draft, [xMax, y, z]));
  addPlanarFace(draft, [1, 0, 0], high);
  addPlanarFace(draft, [-1, 0, 0], low);
  const n = profile.length;
  for (let k = 0; k < n; k++) {
    const k1 = (k + 1) % n;
    const dy = profile[k1][0] - profile[k][0];
    const dz = profile[k1][1] - profile[k][1];
    // Outward normal of a CCW edge in (y, z) is its right-hand side (dz, −dy).
    addPlanarFace(draft, [0, dz, -dy], [low[k], high[k], high[k1], low[k1]], wallHoles[k] ?? []);
  }
  return { low, high };
}
