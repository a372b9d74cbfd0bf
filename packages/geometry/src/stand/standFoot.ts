import type { SheetPart } from '../sheet/sheetPart.ts';
import type { Circle, Path } from '../types.ts';
import { cheekTabSlots, rectPath, slotCut, type NominalSlot } from './standJoinery.ts';

/** What a stand's foot is cut to. */
export interface StandFootSize {
  readonly material: string;
  readonly thicknessMm: number;
  readonly clearanceMm: number;
  /** across the meridian, mm */
  readonly lengthMm: number;
  /** along the meridian, mm */
  readonly widthMm: number;
  /** each cheek's mid-plane from the foot's middle, mm */
  readonly cheekOffsetMm: number;
  /** the ground anchors' holes, each `offsetMm` from the middle, or null for none */
  readonly anchors: { readonly offsetMm: number; readonly diameterMm: number } | null;
}

/**
 * A stand's foot (two of them, on the ground across the meridian): a
 * rectangle slotted for the cheeks' lower tabs (`cheekTabSlots`), drilled
 * for the ground anchors outboard of the cheeks; the polar and the
 * equatorial stand alike.
 * @example standFoot({ material: 'aluminium', thicknessMm: 6, clearanceMm: 0.1, lengthMm: 200, widthMm: 40, cheekOffsetMm: 60, anchors: null }, 0, 0.01).part.name // 'stand-foot'
 */
export function standFoot(size: StandFootSize, toolRadiusMm: number, toleranceMm: number): { readonly part: SheetPart; readonly slots: readonly NominalSlot[] } {
  const { lengthMm: Lf, widthMm: fb } = size;
  const slots = cheekTabSlots(Lf, fb, size.cheekOffsetMm, size.thicknessMm, size.clearanceMm, 1);
  const inner: (Path | Circle)[] = slots.map((sl) => slotCut(sl, toolRadiusMm, toleranceMm));
  if (size.anchors) for (const s of [-1, 1]) inner.push({ kind: 'circle', cx: Lf / 2 + s * size.anchors.offsetMm, cy: fb / 2, radiusMm: size.anchors.diameterMm / 2 });
  return { part: { name: 'stand-foot', material: size.material, thicknessMm: size.thicknessMm, quantity: 2, outer: rectPath(Lf, fb), inner }, slots };
}
