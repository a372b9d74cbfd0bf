import { SpecError, type Circle, type PlateDrawing, type RoundedRect } from '@umbrafab/geometry';

/** The cutter's path for every through-cut of the plate, after kerf compensation. */
export interface CutProfiles {
  readonly outline: RoundedRect;
  readonly holes: readonly Circle[];
  readonly slots: readonly RoundedRect[];
  /** Half the kerf, mm: how far each path was moved off the nominal edge. */
  readonly offsetMm: number;
}

/**
 * Kerf compensation (docs/design.md §5, common practice): the beam, jet or tool
 * removes kerf/2 on each side of its path, so the path runs kerf/2 outside an
 * outer profile and kerf/2 inside every hole and slot; the part then comes out
 * at nominal size. Corner radii move with the path (an outer radius grows by
 * kerf/2, an inner one shrinks and never below 0).
 * @example kerfCompensate(drawing, 0.15).outline.widthMm // nominal + 0.15
 */
export function kerfCompensate(drawing: PlateDrawing, kerfMm: number): CutProfiles {
  const k = kerfMm / 2;
  const o = drawing.outline;
  for (const s of drawing.slots) {
    if (s.widthMm <= kerfMm || s.heightMm <= kerfMm) {
      throw new SpecError('process.kerf', kerfMm, `allowed: a kerf narrower than the ${s.widthMm.toFixed(2)} mm gnomon slot`);
    }
  }
  for (const c of drawing.holes) {
    if (c.radiusMm <= k) throw new SpecError('process.kerf', kerfMm, `allowed: a kerf narrower than the ${(2 * c.radiusMm).toFixed(2)} mm mounting holes`);
  }
  return {
    outline: { ...o, widthMm: o.widthMm + 2 * k, heightMm: o.heightMm + 2 * k, cornerRadiusMm: o.cornerRadiusMm + k },
    holes: drawing.holes.map((c) => ({ ...c, radiusMm: c.radiusMm - k })),
    slots: drawing.slots.map((s) => ({ ...s, widthMm: s.widthMm - 2 * k, heightMm: s.heightMm - 2 * k, cornerRadiusMm: Math.max(0, s.cornerRadiusMm - k) })),
    offsetMm: k,
  };
}
