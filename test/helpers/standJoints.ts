import type { FlatStand, PlacedPiece, Vec2 } from '@umbrafab/geometry';

/** One tab-and-slot joint in a parts DXF's coordinates, as test/helpers/stand_joint_fit.py reads it. */
export interface DxfJoint {
  readonly r0: Vec2;
  readonly r1: Vec2;
  readonly out: Vec2;
  readonly slotCentre: Vec2;
  readonly slotAxis: Vec2;
  readonly tabThickness: number;
  readonly slottedThickness: number;
  readonly nominalLength: number;
}

/**
 * A stand's joints moved into its pieces drawing (stand.dxf): each tab's
 * root corners r0, r1 and outward direction from the tab part's outline at
 * the joint's vertex, the slot's centre and axis from the slotted part,
 * both shifted by the first copy's offset in `pieces`.
 */
export function jointsInDxf(stand: Pick<FlatStand, 'parts' | 'instances' | 'joints'>, pieces: readonly PlacedPiece[]): DxfJoint[] {
  const offset = (instance: string): Vec2 => {
    const part = stand.instances.find((i) => i.id === instance)!.part;
    return pieces.find((p) => p.part === part && p.copy === 1)!.offsetMm;
  };
  const partOf = (instance: string) => stand.parts.find((p) => p.name === stand.instances.find((i) => i.id === instance)!.part)!;
  return stand.joints.map((j) => {
    const ring = partOf(j.tab.instance).outer.points;
    const [r0, t0, , r1] = [0, 1, 2, 3].map((k) => ring[(j.tab.vertex + k) % ring.length]);
    const o = offset(j.tab.instance);
    const so = offset(j.slot.instance);
    const d = Math.hypot(t0[0] - r0[0], t0[1] - r0[1]);
    return {
      r0: [r0[0] + o[0], r0[1] + o[1]],
      r1: [r1[0] + o[0], r1[1] + o[1]],
      out: [(t0[0] - r0[0]) / d, (t0[1] - r0[1]) / d],
      slotCentre: [j.slot.centre[0] + so[0], j.slot.centre[1] + so[1]],
      slotAxis: j.slot.axis,
      tabThickness: partOf(j.tab.instance).thicknessMm,
      slottedThickness: partOf(j.slot.instance).thicknessMm,
      nominalLength: Math.hypot(r1[0] - r0[0], r1[1] - r0[1]),
    };
  });
}
