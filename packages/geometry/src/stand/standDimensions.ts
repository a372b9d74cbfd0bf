import { SpecError } from '../errors.ts';
import { DEG } from '../guards.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import { METRIC_SIZES, screwForHole, type MetricSize } from './metricFasteners.ts';
import type { StandDimensions } from './standTypes.ts';
import { WEDGE_MAX_TILT_DEG } from '../parts/wedgeSolid.ts';
import { RELIEF_OVERSIZE_MM } from '../sheet/cornerRelief.ts';
import { reliefToolRadius } from '../sheet/sheetParts.ts';

/** Least width of a seat rail along the slope, mm (room for a slot and a hole). */
export const RAIL_MIN_WIDTH_MM = 16;
/** Least width of a foot along the meridian, mm. */
export const FOOT_MIN_WIDTH_MM = 30;
/** Free stock kept between a washer or nut and a neighbouring cheek, mm. */
export const SPANNER_ROOM_MM = 2;
/**
 * Stability of a free-standing stand: its footprint along the meridian is
 * at least this fraction of its height (a judgement, common practice for
 * tall objects; the ground anchors hold it against wind and knocks).
 */
export const FOOTPRINT_PER_HEIGHT = 0.6;
/** Shortest toe worth cutting, mm. */
export const TOE_MIN_MM = 10;

/** The stand's sizes with the fasteners they were chosen for. */
export interface StandSizing extends StandDimensions {
  readonly plateWidthMm: number;
  readonly plateLengthMm: number;
  readonly plateThicknessMm: number;
  /** the plate screws' size (from the plate's hole diameter), or null without holes */
  readonly screw: MetricSize | null;
  /** the ground anchors' size (from stand.anchorDiameter), or null without anchors */
  readonly anchor: MetricSize | null;
  readonly anchorDiameterMm: number;
  /** how far a plate screw, its washer and nut reach below a seat rail, mm */
  readonly screwBelowRailMm: number;
  /** least width of a tabbed edge for a tab of half its width and the tool's root reliefs beside it, mm (0 without relief) */
  readonly reliefRoomMm: number;
}

/**
 * The slot checks every flat-pack stand shares, as SpecErrors naming the
 * field: a clearance per side `c` of half the sheet thickness `T` or more,
 * a router tool wider than a slot (T + 2c).
 */
export function assertStandSlots(spec: DialLayout['spec'], T: number, c: number): void {
  if (!(2 * c < T)) {
    throw new SpecError('process.clearance', c, `allowed: less than ${T / 2} mm per side, half the stand's sheet thickness (stand.thickness ${T} mm)`, 'the slots of the stand would be more than twice as wide as its tabs');
  }
  if (spec.process.method === 'router' && spec.process.kerf > T + 2 * c + 1e-9) {
    throw new SpecError('process.kerf', spec.process.kerf, `allowed: a router tool no wider than the stand's slots, ${(T + 2 * c).toFixed(3)} mm (stand.thickness + 2 × process.clearance)`, 'the tool could not cut the stand\'s slots');
  }
}

/**
 * Size the flat-pack stand for a layout: sheet (stand.material and
 * stand.thickness, by default the plate's), clearance per side
 * (process.clearance), tilt = |latitude|; seat rails under the plate's hole
 * rows (the lowest flush with the plate's lower edge, the highest with its
 * upper edge, a middle rail under a middle row), each at least
 * max(2 · holes.inset, RAIL_MIN_WIDTH_MM) wide; the two cheeks inboard of
 * the hole columns by a washer radius, half a cheek and SPANNER_ROOM_MM; feet
 * long enough to carry the anchors outboard of the cheeks; a toe in front
 * when the run alone would make the footprint shorter than
 * FOOTPRINT_PER_HEIGHT of the height (by TOE_MIN_MM or more).
 *
 * Bad combinations are SpecErrors naming the field: a clearance not less
 * than half the sheet thickness, a router tool wider than a slot, a plate
 * too narrow for two cheeks and a cross member, an anchor hole no metric
 * anchor passes, and cheeks too low for the nuts under the seat rails.
 */
export function standDimensions(layout: DialLayout): StandSizing {
  const spec = layout.spec;
  const st = spec.stand;
  const T = st.thickness ?? spec.plate.thickness;
  const material = st.material ?? spec.plate.material;
  const c = spec.process.clearance;
  const phi = Math.abs(spec.site.latitude) * DEG;
  const W = layout.plate.widthMm;
  const L = layout.plate.lengthMm;
  const Tp = layout.plate.thicknessMm;

  if (Math.abs(spec.site.latitude) > WEDGE_MAX_TILT_DEG) {
    throw new SpecError('site.latitude', spec.site.latitude, `allowed: a latitude of at most ${WEDGE_MAX_TILT_DEG}° north or south`, `got ${spec.site.latitude}, so the latitude wedge cannot be made (its seat would stand vertical)`);
  }
  assertStandSlots(spec, T, c);

  const holes = layout.plate.holes;
  const holeDia = holes.length > 0 ? 2 * holes[0].radiusMm : 0;
  // A hole narrower than M3's clearance hole is drilled out to it (the fastener table says so).
  const screw = holes.length > 0 ? (screwForHole(holeDia) ?? METRIC_SIZES[0]) : null;
  const anchor = st.anchors > 0 ? screwForHole(st.anchorDiameter) : null;
  if (st.anchors > 0 && anchor === null) {
    throw new SpecError('stand.anchorDiameter', st.anchorDiameter, 'allowed: at least 3.4 mm (the ISO 273 clearance hole of an M3 anchor), or stand.anchors: 0');
  }

  // Seat rails: under every hole row, plus the plate's two ends.
  const inset = spec.holes.inset;
  // Each tab is half its rail's (or foot's) width, centred: the quarter left at
  // each side must hold a tab-root relief (2 ρ) for a router's tool.
  const tool = reliefToolRadius(spec);
  const reliefRoom = tool > 0 ? 4 * (2 * (tool + RELIEF_OVERSIZE_MM) + 0.5) : 0;
  const b = Math.max(2 * inset, RAIL_MIN_WIDTH_MM, holeDia + 10, reliefRoom);
  const rows = [...new Set(holes.map((h) => h.cy))].sort((p, q) => p - q);
  const rails: { lowerEdgeMm: number; widthMm: number }[] = [{ lowerEdgeMm: 0, widthMm: b }];
  for (const y of rows) {
    if (y + holeDia / 2 <= b || y - holeDia / 2 >= L - b) continue; // on an end rail
    rails.push({ lowerEdgeMm: y - b / 2, widthMm: b });
  }
  rails.push({ lowerEdgeMm: L - b, widthMm: b });
  if (!(L - b > b)) {
    throw new SpecError('plate.length', spec.plate.length, `allowed: a plate longer than two seat rails, ${(2 * b).toFixed(1)} mm`, `the ${L.toFixed(1)} mm plate is too short for the stand`);
  }

  const washer = screw?.washerOdMm ?? 10;
  const edgeToCheek = (holes.length > 0 ? Math.min(...holes.map((h) => h.cx)) : inset) + washer / 2 + T / 2 + SPANNER_ROOM_MM;
  const xc = W / 2 - edgeToCheek;
  if (!(xc > T + 10)) {
    throw new SpecError('plate.width', spec.plate.width, `allowed: a plate wider than ${(2 * (edgeToCheek + T + 10)).toFixed(1)} mm for the stand's two cheeks and cross member`, `the cheeks would sit ${(2 * xc).toFixed(1)} mm apart`);
  }

  const screwBelowRailMm = screw ? screw.washerMm + screw.nutHeightMm + 2 * screw.pitchMm : 0;
  if (!(st.lowEnd >= screwBelowRailMm + 5)) {
    throw new SpecError('stand.lowEnd', st.lowEnd, `allowed: at least ${Math.ceil(screwBelowRailMm + 5)} mm: the ${screw?.name} nuts hang ${screwBelowRailMm.toFixed(1)} mm below the seat rails`);
  }

  const d = st.anchorDiameter;
  const aWasher = anchor?.washerOdMm ?? 0;
  const fb = Math.max(FOOT_MIN_WIDTH_MM, 4 * d, reliefRoom);
  const anchorOffsetMm = anchor ? xc + T / 2 + Math.max(aWasher / 2, d) + SPANNER_ROOM_MM : 0;
  const footLengthMm = anchor ? 2 * (anchorOffsetMm + Math.max(1.5 * d, aWasher / 2 + SPANNER_ROOM_MM)) : 2 * (xc + T / 2 + 10);

  const vA = T + st.lowEnd;
  const run = L * Math.cos(phi);
  const heightMm = vA + L * Math.sin(phi) + T * Math.cos(phi);
  let footprintLengthMm = Math.max(run, FOOTPRINT_PER_HEIGHT * heightMm, 2 * fb + 20);
  // A toe of a few millimetres would be a needless step in the cheek: below TOE_MIN_MM the run alone does.
  if (footprintLengthMm - run < TOE_MIN_MM && run >= 2 * fb + 20) footprintLengthMm = run;
  return {
    material,
    thicknessMm: T,
    clearanceMm: c,
    tiltRad: phi,
    cheekOffsetMm: xc,
    rails,
    footWidthMm: fb,
    footLengthMm,
    anchorOffsetMm,
    lowEndMm: st.lowEnd,
    footprintLengthMm,
    toeMm: footprintLengthMm - run,
    heightMm,
    plateWidthMm: W,
    plateLengthMm: L,
    plateThicknessMm: Tp,
    screw,
    anchor,
    anchorDiameterMm: d,
    screwBelowRailMm,
    reliefRoomMm: reliefRoom,
  };
}
