import { shoelaceArea } from '../parts/ring2d.ts';
import type { SheetPart } from '../sheet/sheetPart.ts';

/**
 * A flat part's area, mm²: its outer profile minus its cut-outs (holes as
 * true circles, slots by the shoelace formula). Times the thickness it is
 * the part's volume.
 * @example sheetPartAreaMm2({ ..., outer: 100 × 20 rectangle, inner: [] }) // 2000
 */
export function sheetPartAreaMm2(part: SheetPart): number {
  let a = Math.abs(shoelaceArea(part.outer.points));
  for (const f of part.inner) a -= f.kind === 'circle' ? Math.PI * f.radiusMm ** 2 : Math.abs(shoelaceArea(f.points));
  return a;
}
