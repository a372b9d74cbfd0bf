import type { DialLayout } from '../polar/layoutDial.ts';
import type { Vec2 } from '../types.ts';

/** One plate-to-stand fixing: the same point in the plate drawing and on the seat. */
export interface MountingFixing {
  /** 1-based, in the plate's hole order */
  readonly index: number;
  /** hole centre in plate coordinates (plate.dxf: origin at the lower-left corner), mm */
  readonly plateMm: Vec2;
  /**
   * the same centre on the seat, mm: x across from the seat's centre line
   * (plate x − width/2), y up the slope from the plate's lower (equator-ward)
   * edge — the frame any stand or wedge seat uses, whatever its build
   */
  readonly seatMm: Vec2;
  /** nominal hole diameter, mm (as in the plate) */
  readonly diameterMm: number;
}

/**
 * The plate-to-stand fixings: the one source of truth for where the plate's
 * mounting holes are and where whatever carries the plate (the flat-pack
 * stand's seat rails, a printed wedge's nut or insert pockets) must have its
 * own. Read from the layout's holes, so the plate drawing and the stand can
 * never disagree.
 *
 * @example mountingFixings(layoutDial(spec)).map((f) => f.seatMm) // [[-108.5, 10], [108.5, 10], …]
 */
export function mountingFixings(layout: DialLayout): MountingFixing[] {
  const w = layout.plate.widthMm;
  return layout.plate.holes.map((h, i) => ({
    index: i + 1,
    plateMm: [h.cx, h.cy],
    seatMm: [h.cx - w / 2, h.cy],
    diameterMm: 2 * h.radiusMm,
  }));
}
