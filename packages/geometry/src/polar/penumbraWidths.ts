import { penumbraWidthFactor } from '../calendar/penumbraWidth.ts';
import { DEG } from '../guards.ts';
import type { Mark } from '../types.ts';

/** A widened mark keeps at most this fraction of the distance to its nearest neighbour. */
export const PENUMBRA_NEIGHBOUR_FRACTION = 0.5;

/**
 * Mark widths that follow the shadow's blur (docs/design.md §3): the penumbra across
 * a line grows as 1/cos² H, so a width w·(1/cos² H) covers the same span of
 * time at every hour angle as w does at noon. A mark never grows past half
 * the distance to its nearest neighbour (it never shrinks below w).
 * @example penumbraMarkWidths(marks)[0].widthMm // 0.8 / cos²(−60°) = 3.2 for an 08:00 mark
 */
export function penumbraMarkWidths(marks: readonly Mark[]): Mark[] {
  const xs = marks.map((m) => m.xMm);
  return marks.map((m, i) => {
    const wanted = m.widthMm * penumbraWidthFactor(m.hourAngleDeg * DEG);
    let nearest = Infinity;
    xs.forEach((x, j) => {
      const d = Math.abs(x - m.xMm);
      if (j !== i && d > 1e-9) nearest = Math.min(nearest, d);
    });
    const cap = Math.max(m.widthMm, PENUMBRA_NEIGHBOUR_FRACTION * nearest);
    return { ...m, widthMm: Math.min(wanted, cap) };
  });
}
