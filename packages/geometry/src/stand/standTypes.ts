import type { Vec3 } from '../parts/mesh.ts';
import type { SheetPart } from '../sheet/sheetPart.ts';
import type { Vec2 } from '../types.ts';

/**
 * Plain-data types of the flat-pack stand.
 *
 * Stand frame (mm): x across the meridian (the plate's x − width/2), y along
 * the meridian toward the elevated pole (the caller maps +y to true north in
 * the north, true south in the south), z up; the ground is z = 0 and y = 0
 * is the front (equator-ward) end of the cheeks.
 */

/**
 * Where one flat part lies in the stand frame: its drawing point (x, y) and
 * a depth w across its thickness go to origin + x·e1 + y·e2 + w·normal, with
 * w from −thickness/2 to +thickness/2 (the drawing is the mid-plane) and
 * normal = e1 × e2 (a rotation: the drawn face, "front", looks along normal).
 */
export interface PartPlacement {
  readonly origin: Vec3;
  readonly e1: Vec3;
  readonly e2: Vec3;
  readonly normal: Vec3;
}

/** One part of the assembled stand: which drawn part, and where it lies. */
export interface StandInstance {
  /** 'cheek-1', 'foot-front', 'rail-1', … */
  readonly id: string;
  /** the SheetPart's name */
  readonly part: string;
  readonly placement: PartPlacement;
}

/**
 * A tab of one part through a slot of another.
 * - tab: four consecutive corners of the tab part's outer profile starting at
 *   `vertex`: root r0, tip t0, tip t1, root r1 (r0→r1 the shoulder, r0→t0 the
 *   way the tab points, |r0 t0| its depth);
 * - slot: the cut-out inner[`inner`] of the slotted part (with its corner
 *   relief), made for the nominal rectangle given here in the slotted part's
 *   drawing: its centre, the unit axis the tab's r0→r1 runs along, its length
 *   (tab length + 2 · clearance) and width (sheet thickness + 2 · clearance);
 * - entersFrom: the side of the slotted part the tab comes in from, its drawn
 *   face ('front', so the tab points along −normal) or the other ('back').
 */
export interface StandJoint {
  readonly tab: { readonly instance: string; readonly vertex: number };
  readonly slot: {
    readonly instance: string;
    readonly inner: number;
    readonly centre: Vec2;
    readonly axis: Vec2;
    readonly lengthMm: number;
    readonly widthMm: number;
  };
  readonly entersFrom: 'front' | 'back';
}

/** Sizes the stand was built to, mm and radians, for reports and the installation sheet. */
export interface StandDimensions {
  readonly material: string;
  readonly thicknessMm: number;
  readonly clearanceMm: number;
  readonly tiltRad: number;
  /** distance of each cheek's mid-plane from the centre line */
  readonly cheekOffsetMm: number;
  /** seat rails along the slope: lower edge from the plate's lower edge, and width */
  readonly rails: readonly { readonly lowerEdgeMm: number; readonly widthMm: number }[];
  readonly footWidthMm: number;
  readonly footLengthMm: number;
  /** anchor hole centres' distance from the centre line (0 without anchors) */
  readonly anchorOffsetMm: number;
  /** the cheeks' height above the feet at the plate's lower end */
  readonly lowEndMm: number;
  /** the cheeks' length on the ground and the part of it in front of the seat */
  readonly footprintLengthMm: number;
  readonly toeMm: number;
  /** overall height (the top of the upper seat rail's back edge) */
  readonly heightMm: number;
}

/** What every flat-pack stand is (the polar `FlatStand`, the `EquatorialStand`): its drawn parts, where each goes, how they join. */
export interface JoinedStand {
  readonly parts: readonly SheetPart[];
  /** the parts' intended placements, in the stand's own frame (each stand names it) */
  readonly instances: readonly StandInstance[];
  readonly joints: readonly StandJoint[];
}

/** The flat-pack stand of a polar dial (stand frame: x across, y toward the pole, z up): its parts, placements and joints, and its sizes. */
export interface FlatStand extends JoinedStand {
  readonly dims: StandDimensions;
  /**
   * the seat (the plate's underside): the point under the plate's lower-left
   * corner, and the plate's x and y directions and face normal on it
   */
  readonly seat: PartPlacement;
  readonly footprint: { readonly xMinMm: number; readonly xMaxMm: number; readonly yMinMm: number; readonly yMaxMm: number };
}
