import { relievedSlot, relieveTabRoots } from '../sheet/cornerRelief.ts';
import type { Path, RoundedRect, Vec2 } from '../types.ts';

/**
 * Joinery of flat-pack parts, shared by the polar stand (`flatStand`) and
 * the equatorial stand: nominal slots cut with corner relief for a round
 * tool, T-bone relief at the tab roots along a straight edge, rectangles.
 */

/** A closed path through `points`. */
export const path = (points: readonly Vec2[]): Path => ({ kind: 'path', points, closed: true });

/** A nominal slot: centre, unit axis along the tab's length, length and width (tab + 2 · clearance). */
export interface NominalSlot {
  readonly centre: Vec2;
  readonly axis: Vec2;
  readonly lengthMm: number;
  readonly widthMm: number;
}

/** The cut-out of an axis-aligned nominal slot, relieved for the tool (dog-bones or round ends), clockwise as SheetPart's inner paths are. */
export function slotCut(slot: NominalSlot, toolRadiusMm: number, toleranceMm: number): Path {
  const along = Math.abs(slot.axis[0]) > 0.5;
  const rect: RoundedRect = { kind: 'rect', cx: slot.centre[0], cy: slot.centre[1], widthMm: along ? slot.lengthMm : slot.widthMm, heightMm: along ? slot.widthMm : slot.lengthMm, cornerRadiusMm: 0 };
  const p = relievedSlot(rect, toolRadiusMm, toleranceMm).path;
  return { ...p, points: [...p.points].reverse() };
}

/**
 * T-bone relief at the tab roots along a straight edge of a counter-clockwise
 * outline that runs through `on` with direction `dir` (material on its left):
 * the outline is turned so the edge lies level with the material above it,
 * relieved as the gnomon's tab roots are (relieveTabRoots), and turned back.
 */
export function relieveAlong(outline: readonly Vec2[], on: Vec2, dir: Vec2, toolRadiusMm: number, toleranceMm: number): Vec2[] {
  if (!(toolRadiusMm > 0)) return [...outline];
  // Rotate by −angle(dir): the edge runs along +x, the material (left of dir) above it.
  const c = dir[0];
  const s = -dir[1];
  const rot = ([x, y]: Vec2): Vec2 => [x * c - y * s, x * s + y * c];
  const back = ([x, y]: Vec2): Vec2 => [x * c + y * s, -x * s + y * c];
  const turned = outline.map(rot);
  const z = rot(on)[1];
  // Snap the edge's corners onto one level (they are collinear only to rounding).
  const snapped = turned.map(([x, y]): Vec2 => [x, Math.abs(y - z) < 1e-7 ? z : y]);
  return relieveTabRoots(snapped, toolRadiusMm, z, toleranceMm).map((p, i) => {
    const k = snapped.indexOf(p);
    return k >= 0 ? outline[k] : back(p);
  });
}

/** Index of the corner equal to `p` (to 1 nm) in an outline. */
export function indexOf(outline: readonly Vec2[], p: Vec2): number {
  const i = outline.findIndex((q) => Math.abs(q[0] - p[0]) < 1e-6 && Math.abs(q[1] - p[1]) < 1e-6);
  if (i < 0) throw new Error(`standJoinery: corner (${p[0]}, ${p[1]}) lost in the relieved outline`);
  return i;
}

/** A counter-clockwise rectangle from its lower-left corner. */
export function rectPath(w: number, h: number): Path {
  return path([[0, 0], [w, 0], [w, h], [0, h]]);
}


/**
 * The cut-out of a nominal slot along any unit axis: the axis-aligned slot
 * (its length along x) relieved as `slotCut` does, turned about its centre
 * onto the axis. For the axis-aligned slots of `flatStand` use `slotCut`.
 */
export function turnedSlotCut(slot: NominalSlot, toolRadiusMm: number, toleranceMm: number): Path {
  const [cx, cy] = slot.centre;
  const [c, s] = slot.axis;
  const flat = slotCut({ ...slot, axis: [1, 0] }, toolRadiusMm, toleranceMm);
  return { ...flat, points: flat.points.map(([x, y]): Vec2 => [cx + (x - cx) * c - (y - cy) * s, cy + (x - cx) * s + (y - cy) * c]) };
}

/**
 * The two slots a cross part (foot, seat rail) takes the cheeks' tabs
 * through: `cheekOffsetMm` either side of its middle, across its width,
 * each half that width long plus the clearance at each end, the sheet plus
 * the clearance each side wide.
 * @param axisY the tab's direction across the part: +1 or −1
 * @example cheekTabSlots(200, 40, 60, 6, 0.1, 1)[0].centre // [40, 20]
 */
export function cheekTabSlots(partLengthMm: number, partWidthMm: number, cheekOffsetMm: number, thicknessMm: number, clearanceMm: number, axisY: 1 | -1): NominalSlot[] {
  return [-1, 1].map((s): NominalSlot => ({ centre: [partLengthMm / 2 + s * cheekOffsetMm, partWidthMm / 2], axis: [0, axisY], lengthMm: partWidthMm / 2 + 2 * clearanceMm, widthMm: thicknessMm + 2 * clearanceMm }));
}

/**
 * A tab standing out of an outline's edge from root `p` to root `q`: the
 * four corners p, p + depth·n, q + depth·n, q (n the unit outward normal).
 * @example tabCorners([0, 0], [10, 0], 6, [0, 1]) // [[0, 0], [0, 6], [10, 6], [10, 0]]
 */
export function tabCorners(p: Vec2, q: Vec2, depthMm: number, n: Vec2): Vec2[] {
  return [p, [p[0] + depthMm * n[0], p[1] + depthMm * n[1]], [q[0] + depthMm * n[0], q[1] + depthMm * n[1]], q];
}
