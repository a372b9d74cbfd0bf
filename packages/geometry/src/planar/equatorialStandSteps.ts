import { jointFixing } from '../install/assemblyGuide.ts';
import { compassSentence } from './compassSentence.ts';
import { equatorialStand } from './equatorialStand.ts';
import type { PlanarLayout } from './layoutPlanar.ts';
import { METRIC_SIZES } from '../stand/metricFasteners.ts';
import type { Vec2 } from '../types.ts';

const f1 = (x: number) => x.toFixed(1);
const f2 = (x: number) => x.toFixed(2);

/**
 * The installation steps of an equatorial face on its stand
 * (`equatorialStand`), common practice for flat-pack stands and equatorial
 * dials: assemble (or print) the stand, fix the plate on its seat rails
 * with the fasteners listed, fit the rod through the plate, the rail and
 * the hub with a set collar each side of the hub, level the base, turn the
 * cheeks onto the true meridian (true, not magnetic: the WMM2025
 * declination, then the noon shadow), anchor. The angles are the layout's:
 * the face tilts 90° − |φ|, the rod rises |φ| toward the elevated pole.
 */
export function equatorialStandSteps(layout: PlanarLayout): string[] {
  const spec = layout.spec;
  const stand = equatorialStand(layout);
  const d = stand.dims;
  const lat = spec.site.latitude;
  const pole = lat >= 0 ? 'north' : 'south';
  const eqWard = lat >= 0 ? 'south' : 'north';
  const upper = spec.face?.side !== 'lower';
  const both = layout.lowerFace !== undefined;
  const rod = layout.gnomon;
  const rails = d.rails.length;
  const screws = stand.fasteners.find((f) => f.use === 'plate to seat rails');
  const anchors = stand.fasteners.find((f) => f.use === 'feet to the ground');
  const print = spec.process.method === 'print';
  const steps: string[] = [];
  steps.push(
    print
      ? `Print stand.stl standing on its feet, with supports under the seat rails and the rod hub; clean the holes to size with a drill.`
      : `Deburr every cut edge of the stand (stand.dxf). Slide the ROD HUB's two end tabs into the sloping slots of the two CHEEKS from between them, so the hub joins the cheeks, then stand the cheeks in the two FEET's slots, their lower tabs down. Lay the ${rails} SEAT RAILS on the cheeks' seat edges, the cheeks' tabs through the rails' slots: RAIL A at the plate's lower edge, ${both ? `the last at its upper edge (no rail runs under the rod: the lower face's lines lie there)` : `the rail with the rod's hole at the hub's end`}. Check with a try square that the cheeks stand upright and the rails sit square across them, then ${jointFixing(d.material)}.`,
  );
  steps.push(
    screws
      ? `${both ? `Lay the plate on the rails, upper face up, lower face down on the rails` : upper ? 'Lay the plate on the rails, engraved face up' : 'Hold the plate against the rails from below, engraved face down (toward the ground and the ' + eqWard + 'ern sky)'}, its lower edge (by the title) flush with RAIL A's lower edge and its sides flush with the rails' ends: its ${screws.count} holes fall on the rails' holes. Fit the ${screws.size} × ${screws.lengthMm} mm screws from the ${both ? 'upper face' : 'face'}${screws.countersink === 'none' ? '' : ` (countersink the plate's holes ${screws.countersink} first)`}, a washer and a nylon-insert nut behind each rail. ${fixingsClear(layout, stand)}`
      : `The plate has no mounting holes (holes.count 0): bond it to the rails with an exterior adhesive suited to both materials, its lower edge flush with RAIL A's lower edge.`,
  );
  steps.push(
    both
      ? `Push the rod (${f1(rod.thicknessMm)} mm diameter, ${f1(2 * rod.heightMm + layout.plate.thicknessMm)} mm long) through the plate's centre hole and the hub's hole until ${f1(rod.heightMm)} mm stands out of the upper face, and as much out of the lower face: each end is the gnomon of its face. Lock it with the two set collars, one against each face of the hub. The plate's hole and the hub's hole hold it square to the plate, along the Earth's axis.`
      : `Push the rod (${f1(rod.thicknessMm)} mm diameter, ${f1(2 * rod.heightMm + layout.plate.thicknessMm)} mm long) through the plate's centre hole, the rail under it and the hub's hole until ${f1(rod.heightMm)} mm stands out of the engraved face; lock it with the two set collars, one against each face of the hub. The plate's hole and the hub's hole hold it square to the face, along the Earth's axis.`,
  );
  steps.push(`Set the stand where it will stay, on a firm, level base (a concrete pad or a paving slab bedded on mortar). Shim under the feet until a spirit level laid across each foot and along the feet reads level; a digital level on the face then reads ${f2(d.faceTiltDeg)}° (90° − |latitude|) and along the rod ${f2(90 - d.faceTiltDeg)}°.`);
  steps.push(`Turn the whole stand until the cheeks lie in the true meridian (true ${pole}, not magnetic: ${compassSentence(layout)}), the rod's upper end pointing up toward true ${pole}, at the celestial ${pole} pole, and the plate's upper edge toward the ${eqWard}. Refine at local apparent noon (the longitude correction and the equation of time in report.json, time): then the rod's shadow falls on the 12 line.`);
  steps.push(`${anchors ? `Mark and drill through the feet's ${anchors.count} holes and fit the ${anchors.size} ground anchors (${anchors.lengthMm} mm or as the anchor maker's data require for your ground); ` : 'Fix the feet to the base as local codes require; '}tighten the anchors and then the plate screws, evenly. Check the level, the tilt and the noon shadow once more.`);
  return steps;
}

/**
 * Where the screws' heads and washers (and with both faces the rails) sit
 * against the engraving: the least distance from a washer's rim to any
 * engraved line or stroke of either face, measured on the layout (each face
 * in its own frame: the holes are the same in both), and how far the rails
 * stay from the lower face's engraving.
 */
function fixingsClear(layout: PlanarLayout, stand: ReturnType<typeof equatorialStand>): string {
  const washer = stand.fasteners.find((f) => f.item.startsWith('plain washer'));
  const washerOd = washer ? (METRIC_SIZES.find((s) => s.name === washer.size)?.washerOdMm ?? 0) : 0;
  const holes = layout.plate.holes.filter((h) => !(Math.abs(h.cx - layout.plate.substyleX) < 1e-9 && Math.abs(h.cy - layout.plate.faceOriginY) < 1e-9));
  const faces = [layout, ...(layout.lowerFace ? [layout.lowerFace] : [])];
  let gap = Infinity;
  for (const f of faces) {
    const { substyleX: ox, faceOriginY: oy } = f.plate;
    const segs: [Vec2, Vec2, number][] = [
      ...f.marks.filter((m) => !m.underGnomon).map((m): [Vec2, Vec2, number] => [m.a, m.b, m.widthMm]),
      ...[...f.numerals, ...f.title].flatMap((t) => t.strokes.flatMap((s) => s.points.slice(1).map((p, i): [Vec2, Vec2, number] => [s.points[i], p, t.strokeWidthMm]))),
    ];
    for (const h of holes) for (const [a, b, w] of segs) gap = Math.min(gap, segmentDistanceMm([h.cx - ox, h.cy - oy], a, b) - w / 2 - washerOd / 2);
  }
  const heads = `The pan heads and washers sit in the plate's border, their rims at least ${f1(gap)} mm clear of every engraved line${layout.lowerFace ? ' of both faces' : ''}.`;
  if (!layout.lowerFace) return heads;
  const engravedY = layout.lowerFace.marks.flatMap((m) => [m.a[1], m.b[1]]).concat([...layout.lowerFace.numerals, ...layout.lowerFace.title].flatMap((t) => t.strokes.flatMap((s) => s.points.map((p) => p[1]))));
  const oy = layout.plate.faceOriginY;
  const rails = stand.dims.rails;
  const lowGap = Math.min(...engravedY) + oy - (rails[0].lowerEdgeMm + rails[0].widthMm);
  const highGap = rails[rails.length - 1].lowerEdgeMm - (Math.max(...engravedY) + oy);
  return `${heads} The rails cover only the lower face's border: its engraving starts ${f1(lowGap)} mm above RAIL A and ends ${f1(highGap)} mm below the last rail.`;
}

/** Distance from p to the segment a–b, mm. */
function segmentDistanceMm(p: Vec2, a: Vec2, b: Vec2): number {
  const [dx, dy] = [b[0] - a[0], b[1] - a[1]];
  const L2 = dx * dx + dy * dy;
  const t = L2 > 0 ? Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / L2)) : 0;
  return Math.hypot(p[0] - a[0] - t * dx, p[1] - a[1] - t * dy);
}
