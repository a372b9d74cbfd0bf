import { SpecError } from '../errors.ts';
import type { PlateDrawing } from '../plate/plateDrawing.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import { dialWedge } from './dialParts.ts';
import { insertForHole, type HeatSetInsert } from './heatSetInsert.ts';
import type { Mesh } from './mesh.ts';
import { meshBounds } from './meshBounds.ts';
import type { PartsPlan } from './partsPlan.ts';
import { plateSolid, type PlatePart } from './plateSolid.ts';
import { seatPockets, type SeatPocket } from './seatPockets.ts';
import { DOVETAIL_KEY, fitsBed, planBedCuts, splitForBed, type BedSize, type ForbiddenBands, type SplitPart } from './splitForBed.ts';
import { wedgeShell, type SolidBand, type WedgeShellPart } from './wedgeShell.ts';
import type { WedgePart } from './wedgeSolid.ts';

/** Free stock kept between a cut (or its key) and a hole, slot or pocket, mm. */
export const CUT_CLEAR_MM = 2;
/** Least plastic under an insert pocket, mm. */
const POCKET_FLOOR_MM = 2;

const bedText = (bed: BedSize) => `${bed.widthMm} x ${bed.depthMm} x ${bed.heightMm} mm`;

/**
 * Fit a printed part to the bed: null when it fits whole (as modelled, or a
 * quarter turn about z), else its split (planBedCuts, splitForBed). A part
 * no split can serve is a SpecError on parts.print.bed saying why.
 */
export async function fitToBed(name: string, mesh: Mesh, plan: PartsPlan, forbidden: ForbiddenBands): Promise<SplitPart | null> {
  const bed = plan.print.bed;
  const b = meshBounds(mesh);
  const [dx, dy, dz] = [0, 1, 2].map((k) => b.max[k] - b.min[k]);
  if (fitsBed(dx, dy, dz, bed)) return null;
  const cuts = planBedCuts(b, bed, forbidden);
  if (!cuts.ok) {
    throw new SpecError('parts.print.bed', bedText(bed), `allowed: a bed that takes ${name} (${dx.toFixed(1)} x ${dy.toFixed(1)} x ${dz.toFixed(1)} mm) or the pieces it can be cut into`, `${name} cannot be split to fit: ${cuts.reason}`);
  }
  return splitForBed(mesh, cuts.plan, plan.clearanceMm);
}

/** Bands a cut must avoid round a circle (centre c, radius r) along one axis, allowing for the key on the cut's + side. */
function bandAround(c: number, r: number): [number, number] {
  return [c - r - DOVETAIL_KEY.depthMm - CUT_CLEAR_MM, c + r + CUT_CLEAR_MM];
}

/**
 * The printed plate (plateSolid) and, when it does not fit the bed, its
 * pieces: cuts stay clear of the mounting holes and the gnomon slots (and
 * the fin's line: a cut along the style would split the fin's seat).
 */
export async function printedPlate(layout: DialLayout, drawing: PlateDrawing, plan: PartsPlan): Promise<{ readonly plate: PlatePart; readonly split: SplitPart | null }> {
  const plate = await plateSolid(layout, drawing, plan.body.grooveDepthMm);
  const slotsX = drawing.slots.map((s) => bandAround(s.cx, s.widthMm / 2));
  // A cut may cross a groove but must not run along one (it would leave a sliver of plastic).
  const alongX: [number, number][] = [];
  const alongY: [number, number][] = [];
  for (const line of drawing.lines) {
    const xs = line.path.points.map((p) => p[0]);
    const ys = line.path.points.map((p) => p[1]);
    const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
    const m = line.widthMm / 2 + 1;
    if (x1 - x0 < 3) alongX.push([x0 - m, x1 + m]);
    if (y1 - y0 < 3) alongY.push([y0 - m, y1 + m]);
  }
  const forbidden: ForbiddenBands = {
    x: [...drawing.holes.map((h) => bandAround(h.cx, h.radiusMm)), ...slotsX, ...alongX],
    y: [...drawing.holes.map((h) => bandAround(h.cy, h.radiusMm)), ...drawing.slots.map((s) => bandAround(s.cy, s.heightMm / 2)), ...alongY],
  };
  return { plate, split: await fitToBed('plate.stl', plate.mesh, plan, forbidden) };
}

/** The printed wedge: the solid it comes from, the shell as written, its pockets and split. */
export interface PrintedWedge {
  /** the solid wedge as built for print (base and back shelf as adjusted below) */
  readonly solid: WedgePart;
  readonly shell: WedgeShellPart;
  readonly insert: HeatSetInsert | null;
  readonly pockets: readonly SeatPocket[];
  readonly split: SplitPart | null;
  /** what was changed from the spec's wedge to hold the inserts, for the console and report */
  readonly notes: readonly string[];
  readonly baseMm: number;
  readonly backShelfMm: number;
}

/**
 * The latitude wedge for process print (issue: "the wedge as a shell"):
 * 1. pockets for heat-set inserts under the plate holes (seatPockets), with
 *    the insert for the plate's hole size (insertForHole); where a pocket
 *    would break through the underside the base is thickened, and where it
 *    would break out of the back a level shelf is added behind the seat;
 * 2. the cuts, if the wedge does not fit the bed, clear of the pockets, the
 *    ground holes and the arrow;
 * 3. the shell (wedgeShell) with solid bands where the dovetails run;
 * 4. the pieces (splitForBed).
 */
export async function printedWedge(layout: DialLayout, plan: PartsPlan): Promise<PrintedWedge> {
  const pr = plan.print;
  const wall = pr.shellWallMm;
  let solid = dialWedge(plan, layout);
  const insert = pr.inserts ? insertForHole(layout.spec.holes.diameter) : null;
  const notes: string[] = [];
  let baseMm = plan.wedge.minBaseMm;
  let backShelfMm = 0;
  let pockets: SeatPocket[] = [];
  if (insert !== null && layout.plate.holes.length > 0) {
    pockets = seatPockets(layout, solid, insert);
    const a = solid.tiltRad;
    const floor = Math.max(wall, POCKET_FLOOR_MM);
    const r = insert.holeDiameterMm / 2 + wall;
    // Lowest point of each pocket (its floor disc is tilted by a) and farthest +y point, with the boss wall round it.
    const lowest = Math.min(...pockets.map((p) => p.mouthMm[2] - (p.depthMm + wall) * Math.cos(a) - r * Math.sin(a)));
    const farthest = Math.max(...pockets.map((p) => p.mouthMm[1] + (p.depthMm + wall) * Math.sin(a) + r * Math.cos(a)));
    const raise = Math.ceil(Math.max(0, floor - lowest) * 10) / 10;
    const shelf = Math.ceil(Math.max(0, farthest + floor - solid.footprint.yMaxMm) * 10) / 10;
    if (raise > 0 || shelf > 0) {
      baseMm = plan.wedge.minBaseMm + raise;
      backShelfMm = shelf;
      solid = dialWedge({ ...plan, wedge: { ...plan.wedge, minBaseMm: baseMm, backShelfMm: shelf } }, layout);
      pockets = seatPockets(layout, solid, insert);
      if (raise > 0) notes.push(`wedge.stl: base thickened from ${plan.wedge.minBaseMm} to ${baseMm} mm so the ${insert.thread} insert pockets keep ${floor} mm of plastic under them`);
      if (shelf > 0) notes.push(`wedge.stl: a ${shelf} mm shelf added behind the seat so the upper ${insert.thread} insert pockets keep ${floor} mm of plastic behind them`);
    }
  } else if (pr.inserts && layout.plate.holes.length > 0) {
    notes.push(`wedge.stl: no insert pockets: the plate holes (${layout.spec.holes.diameter} mm) are smaller than an M3 clearance hole (3.4 mm)`);
  }

  // Cuts clear of the pockets' bosses, the ground holes and the arrow.
  const d = DOVETAIL_KEY.depthMm;
  const rb = insert !== null ? insert.holeDiameterMm / 2 + wall : 0;
  const a = solid.tiltRad;
  const forbidden: ForbiddenBands = {
    x: [
      ...pockets.map((p) => bandAround(p.mouthMm[0], rb)),
      ...solid.holes.map((h) => bandAround(h.xMm, h.topRadiusMm)),
      ...(solid.arrowOutline ? [bandAround(0, Math.max(...solid.arrowOutline.map((q) => Math.abs(q[0]))))] : []),
    ],
    y: [
      ...pockets.map((p): [number, number] => [p.mouthMm[1] - rb - d - CUT_CLEAR_MM, p.mouthMm[1] + (p.depthMm + wall) * Math.sin(a) + rb + CUT_CLEAR_MM]),
      ...solid.holes.map((h) => bandAround(h.yMm, h.topRadiusMm)),
    ],
  };
  const b = meshBounds(solid.mesh);
  const fits = fitsBed(b.max[0] - b.min[0], b.max[1] - b.min[1], b.max[2] - b.min[2], pr.bed);
  let bands: SolidBand[] = [];
  let cutsPlan = null;
  if (!fits) {
    const cuts = planBedCuts(b, pr.bed, forbidden);
    if (!cuts.ok) {
      const [dx, dy, dz] = [0, 1, 2].map((k) => b.max[k] - b.min[k]);
      throw new SpecError('parts.print.bed', bedText(pr.bed), `allowed: a bed that takes wedge.stl (${dx.toFixed(1)} x ${dy.toFixed(1)} x ${dz.toFixed(1)} mm) or the pieces it can be cut into; or a flat-pack stand from a sheet process`, `wedge.stl cannot be split to fit: ${cuts.reason}`);
    }
    cutsPlan = cuts.plan;
    const m = plan.clearanceMm + Math.max(wall, 1) + 1;
    bands = [
      ...cuts.plan.xCutsMm.map((x): SolidBand => ({ axis: 'x', fromMm: x - m, toMm: x + d + m })),
      ...cuts.plan.yCutsMm.map((y): SolidBand => ({ axis: 'y', fromMm: y - m, toMm: y + d + m })),
    ];
  }
  const shell = await wedgeShell(solid, { wallMm: wall, ribSpacingMm: pr.ribSpacingMm, pockets, solidBands: bands });
  const split = cutsPlan !== null ? await splitForBed(shell.mesh, cutsPlan, plan.clearanceMm) : null;
  return { solid, shell, insert, pockets, split, notes, baseMm, backShelfMm };
}
