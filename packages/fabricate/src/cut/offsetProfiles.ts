import { arcSegments, manifoldEngine, type Circle, type Path, type SheetPart, type Vec2 } from '@umbrafab/geometry';
import type { CutProfiles } from './cutDrawing.ts';

/**
 * Kerf compensation (docs/design.md §5, common practice): the path a beam,
 * jet or tool of width `kerfMm` must follow so the part comes out at its
 * nominal size. The outer profile grows by kerf/2 (round corners, the arc
 * the cutter turns around a sharp corner), holes shrink by kerf/2 (a circle
 * of radius r − kerf/2, exact), every other inner cut-out shrinks by kerf/2
 * (Clipper2's offset through manifold-3d's CrossSection, round joins; chords
 * within `chordToleranceMm`). Straight edges move by exactly kerf/2.
 *
 * @throws Error when a feature vanishes (check assertToolFits first, which names the spec field)
 * @example (await offsetProfiles(part, 0.15, 0.005)).offsetMm // 0.075
 */
export async function offsetProfiles(part: SheetPart, kerfMm: number, chordToleranceMm: number): Promise<CutProfiles> {
  const k = kerfMm / 2;
  if (!(k > 0)) return { outer: [part.outer.points], inner: part.inner, offsetMm: 0 };
  const { CrossSection } = await manifoldEngine();
  const segments = Math.max(8, arcSegments(k, 2 * Math.PI, chordToleranceMm));
  const offset = (ring: readonly Vec2[], d: number): Vec2[][] => {
    const ccw = signedArea(ring) > 0 ? ring : [...ring].reverse();
    const cs = new CrossSection([ccw.map(([x, y]): [number, number] => [x, y])], 'Positive');
    const moved = cs.offset(d, 'Round', 2, segments);
    try {
      return moved.toPolygons().map((r) => r.map(([x, y]): Vec2 => [x, y]));
    } finally {
      cs.delete();
      moved.delete();
    }
  };
  const outer = offset(part.outer.points, k).filter((r) => signedArea(r) > 0);
  const inner: (Path | Circle)[] = [];
  // A kerf too wide for a feature is refused before this as a SpecError on
  // process.kerf (process/assertToolFits.ts), so the two throws below are bugs.
  for (const f of part.inner) {
    if (f.kind === 'circle') {
      if (!(f.radiusMm > k)) throw new Error(`offsetProfiles: a ${2 * f.radiusMm} mm hole vanishes under a ${kerfMm} mm kerf`);
      inner.push({ ...f, radiusMm: f.radiusMm - k });
      continue;
    }
    const rings = offset(f.points, -k);
    if (rings.length === 0) throw new Error(`offsetProfiles: an inner cut-out vanishes under a ${kerfMm} mm kerf`);
    // Inner cut-outs stay clockwise, as in the nominal part.
    for (const r of rings) inner.push({ kind: 'path', closed: true, points: signedArea(r) > 0 ? [...r].reverse() : r });
  }
  return { outer, inner, offsetMm: k };
}

function signedArea(ring: readonly Vec2[]): number {
  let a = 0;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) a += ring[j][0] * ring[i][1] - ring[i][0] * ring[j][1];
  return a / 2;
}
