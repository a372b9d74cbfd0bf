import { SpecError, type SheetPart, type Vec2 } from '@umbrafab/geometry';

/** One feature a round tool must make, with the narrowest opening the tool has to pass. */
export interface CutFeature {
  /** The part it belongs to, e.g. 'plate'. */
  readonly part: string;
  /** What it is, in a shop's words, e.g. 'mounting hole 1 (Ø 5.500 mm)'. */
  readonly feature: string;
  /** The narrowest opening, mm: a hole's diameter, a slot's width, the gap between two tabs. */
  readonly widthMm: number;
}

/**
 * The features of a nominal flat part that a round tool has to pass through:
 * every hole (its diameter), every inner cut-out (the shorter side of its
 * bounding box: the width of an axis-aligned slot), and every notch of the
 * outer profile between two inside corners (the length of the edge joining
 * them: the gap between two gnomon tabs, or between a tab and the nodus).
 * Read the parts before corner relief (sheetParts with reliefToolRadiusMm 0).
 * @example cutFeatures(sheetParts(layout, drawing, { reliefToolRadiusMm: 0 })[0])[0].widthMm // 5.5
 */
export function cutFeatures(part: SheetPart): CutFeature[] {
  const out: CutFeature[] = [];
  let hole = 0;
  let slot = 0;
  for (const f of part.inner) {
    if (f.kind === 'circle') {
      hole++;
      out.push({ part: part.name, feature: `hole ${hole} (Ø ${(2 * f.radiusMm).toFixed(3)} mm)`, widthMm: 2 * f.radiusMm });
    } else {
      slot++;
      const xs = f.points.map((p) => p[0]);
      const ys = f.points.map((p) => p[1]);
      const w = Math.max(...xs) - Math.min(...xs);
      const h = Math.max(...ys) - Math.min(...ys);
      out.push({ part: part.name, feature: `slot ${slot} (${Math.min(w, h).toFixed(3)} × ${Math.max(w, h).toFixed(3)} mm)`, widthMm: Math.min(w, h) });
    }
  }
  const ring = part.outer.points;
  const n = ring.length;
  const reflex = ring.map((p, i) => turn(ring[(i - 1 + n) % n], p, ring[(i + 1) % n]) < 0);
  let notch = 0;
  ring.forEach((p, i) => {
    const q = ring[(i + 1) % n];
    if (reflex[i] && reflex[(i + 1) % n]) {
      notch++;
      out.push({ part: part.name, feature: `gap ${notch} between inside corners of the outline at (${p[0].toFixed(3)}, ${p[1].toFixed(3)}) mm`, widthMm: Math.hypot(q[0] - p[0], q[1] - p[1]) });
    }
  });
  return out;
}

/**
 * A round tool of `toolDiameterMm` (a router bit, a waterjet or laser kerf)
 * must be narrower than every hole, slot and gap it cuts, or the feature
 * comes out oversize or not at all. Never draws or plans a silently shrunk
 * hole: throws a SpecError naming the spec field of the tool, the feature and
 * both sizes (the CLI exits 1).
 *
 * @param field the spec field that sets the tool, default 'process.kerf'
 * @throws SpecError on the narrowest feature that the tool does not fit
 * @example assertToolFits(sheetParts(layout, drawing, { reliefToolRadiusMm: 0 }), 3.175)
 */
export function assertToolFits(parts: readonly SheetPart[], toolDiameterMm: number, field = 'process.kerf'): void {
  const tight = parts
    .flatMap(cutFeatures)
    .filter((f) => !(toolDiameterMm < f.widthMm))
    .sort((a, b) => a.widthMm - b.widthMm)[0];
  if (!tight) return;
  throw new SpecError(
    field,
    toolDiameterMm,
    `allowed: a tool (or kerf) narrower than ${tight.widthMm.toFixed(3)} mm, the narrowest feature it cuts; or make the ${tight.part}'s feature wider`,
    `the ${toolDiameterMm} mm tool is not narrower than the ${tight.part}'s ${tight.feature}, which is ${tight.widthMm.toFixed(3)} mm wide`,
  );
}

function turn(a: Vec2, p: Vec2, b: Vec2): number {
  return (p[0] - a[0]) * (b[1] - p[1]) - (p[1] - a[1]) * (b[0] - p[0]);
}
