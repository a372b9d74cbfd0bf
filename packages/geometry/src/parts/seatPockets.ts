import type { DialLayout } from '../polar/layoutDial.ts';
import { faceToWedge } from './dialParts.ts';
import type { HeatSetInsert } from './heatSetInsert.ts';
import { INSERT_POCKET_EXTRA_MM } from './heatSetInsert.ts';
import type { Vec3 } from './mesh.ts';
import type { WedgePart } from './wedgeSolid.ts';

/** A blind round pocket into the wedge's seat, for one heat-set insert. */
export interface SeatPocket {
  /** centre of the pocket's mouth on the seat surface, wedge frame, mm */
  readonly mouthMm: Vec3;
  /** unit vector into the wedge along the pocket (minus the seat normal) */
  readonly axis: Vec3;
  readonly diameterMm: number;
  readonly depthMm: number;
  /** the plate hole it serves, plate coordinates, mm */
  readonly plateHoleMm: readonly [number, number];
}

/**
 * One insert pocket under each plate mounting hole, where that hole lands
 * on the seat as assembled: the hole's centre on the plate's underside
 * (plate coordinates, z = 0 below the face) mapped into the wedge frame by
 * faceToWedge (the plate on the seat against the lip), so plate hole and
 * pocket share one axis. The pocket runs along the seat normal, as deep as
 * the insert plus INSERT_POCKET_EXTRA_MM.
 *
 * @example seatPockets(layout, wedge, insertForHole(5.5)!)[0].mouthMm
 */
export function seatPockets(layout: DialLayout, wedge: WedgePart, insert: HeatSetInsert): SeatPocket[] {
  const toWedge = faceToWedge(layout, wedge);
  const { substyleX, faceOriginY, thicknessMm } = layout.plate;
  const n = wedge.seatNormal;
  const axis: Vec3 = [-n[0], -n[1], -n[2]];
  return layout.plate.holes.map((h) => ({
    mouthMm: toWedge([h.cx - substyleX, h.cy - faceOriginY, -thicknessMm]),
    axis,
    diameterMm: insert.holeDiameterMm,
    depthMm: insert.lengthMm + INSERT_POCKET_EXTRA_MM,
    plateHoleMm: [h.cx, h.cy] as const,
  }));
}
