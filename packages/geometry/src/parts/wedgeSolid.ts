import type { Mesh, Vec2, Vec3 } from './mesh.ts';
import { extrudeProfileX } from './extrudeProfileX.ts';
import { addPlanarFace, addPoint, finishMesh, newDraft, type MeshDraft } from './meshDraft.ts';
import { assertFinite, assertInteger, assertNonNegative, assertPositive } from '../guards.ts';
import { SpecError } from '../errors.ts';
import { shoelaceArea } from './ring2d.ts';
import { cross3, dot3, sub3 } from './vec3.ts';

/** Countersink of a mounting hole, widening upward to the toe's top. */
export interface WedgeCountersink {
  /** diameter at the top surface, mm (more than the hole's) */
  readonly diameterMm: number;
  /** included cone angle, degrees (90° suits ISO 10642 flat-head screws — memory) */
  readonly angleDeg: number;
}

export interface WedgeHoles {
  /** number of vertical mounting holes, even: they come in pairs either side of the meridian arrow */
  readonly count: number;
  /** bore diameter, mm (4.5 mm is the ISO 273 medium clearance for M4 — memory) */
  readonly diameterMm: number;
  readonly countersink: WedgeCountersink | null;
  /**
   * sides of the polygon standing for each circle; the polygon circumscribes
   * the nominal circle so a screw of that diameter still passes
   */
  readonly segments: number;
}

/** Meridian arrow recessed into the toe's top, pointing +y (toward the elevated pole). */
export interface WedgeArrow {
  readonly lengthMm: number;
  readonly shaftWidthMm: number;
  readonly headWidthMm: number;
  readonly headLengthMm: number;
  /** depth of the flat-bottomed recess, mm */
  readonly depthMm: number;
}

export interface WedgeOptions {
  /** site latitude in degrees; only |latitudeDeg| matters (the seat tilt), at most 89 */
  readonly latitudeDeg: number;
  /** seat width across the meridian (x), mm; also the width of the whole wedge */
  readonly seatWidthMm: number;
  /** seat length measured along the slope, mm */
  readonly seatLengthMm: number;
  /** thickness of the toe slab and of the thin end of the wedge, mm */
  readonly minBaseMm: number;
  /** height of the locating lip above the seat, perpendicular to it, mm */
  readonly lipMm: number;
  /** thickness of that lip along the slope, mm */
  readonly lipWidthMm: number;
  /**
   * height above the seat of what the seat carries (plate thickness plus
   * gnomon height), mm: the footprint is made long enough that all of it
   * lies above the footprint, so its centre of mass cannot tip the stand
   */
  readonly payloadHeightMm: number;
  /** least material around holes and arrow, and stability margin, mm */
  readonly wallMm: number;
  readonly holes: WedgeHoles;
  readonly arrow: WedgeArrow | null;
  /**
   * a flat shelf behind the seat's upper edge, mm (0 for none): the back
   * moves this far toward +y and its top stays level with the seat's upper
   * edge, so pockets near that edge keep material behind them
   */
  readonly backShelfMm: number;
}

/** Defaults: a 100 × 150 mm seat, 5 mm base, 2 × 3 mm lip, two countersunk M4 holes, a 12 mm arrow. */
export const WEDGE_DEFAULTS: WedgeOptions = {
  latitudeDeg: 45,
  seatWidthMm: 100,
  seatLengthMm: 150,
  minBaseMm: 5,
  lipMm: 2,
  lipWidthMm: 3,
  payloadHeightMm: 25,
  backShelfMm: 0,
  wallMm: 3,
  holes: { count: 2, diameterMm: 4.5, countersink: { diameterMm: 9, angleDeg: 90 }, segments: 32 },
  arrow: { lengthMm: 12, shaftWidthMm: 1.6, headWidthMm: 5, headLengthMm: 4, depthMm: 0.6 },
};

/** Largest printable tilt, degrees. */
export const WEDGE_MAX_TILT_DEG = 89;
/** Smallest seat side, mm: below this the stand carries no useful plate. */
export const WEDGE_MIN_SEAT_MM = 20;
/** Thinnest printable wall: two 0.4 mm extrusion widths (common practice). */
export const WEDGE_MIN_WALL_MM = 0.8;
/** Below this tilt the wedge is described as a slab (design label only). */
export const WEDGE_SLAB_BELOW_DEG = 5;

/** A mounting hole as built, for drawings and checks. */
export interface WedgeHole {
  /** centre on the ground, mm */
  readonly xMm: number;
  readonly yMm: number;
  /** radius of the circle the bore polygon circumscribes, mm */
  readonly boreRadiusMm: number;
  /** radius at the top (countersink) or the bore radius, mm */
  readonly topRadiusMm: number;
  /** depth of the countersink cone, mm (0 without countersink) */
  readonly countersinkDepthMm: number;
}

/** The printable latitude wedge as plain data. */
export interface WedgePart {
  readonly kind: 'wedge';
  readonly mesh: Mesh;
  /** 'slab' below 5° tilt, 'stand' above — same construction, a label for reports */
  readonly design: 'slab' | 'stand';
  readonly tiltRad: number;
  /** the (y, z) cross-section that was extruded over x, counter-clockwise, mm */
  readonly profile: readonly Vec2[];
  readonly profileAreaMm2: number;
  /** seat rectangle: lower-left, lower-right, upper-right, upper-left (x from −W/2 to +W/2) */
  readonly seatCorners: readonly [Vec3, Vec3, Vec3, Vec3];
  /** outward unit normal of the seat: (0, −sin tilt, cos tilt) */
  readonly seatNormal: Vec3;
  /** length of the toe in front of the lip foot (y < 0), mm */
  readonly toeLengthMm: number;
  readonly footprint: { readonly xMinMm: number; readonly xMaxMm: number; readonly yMinMm: number; readonly yMaxMm: number };
  readonly holes: readonly WedgeHole[];
  /** arrow outline on the toe top (x, y), CCW, or null */
  readonly arrowOutline: readonly Vec2[] | null;
}

/**
 * Build the latitude wedge: a stand whose base lies on z = 0 (level ground)
 * and whose seat is inclined at |latitude| to the horizontal, rising toward
 * +y (toward the elevated pole; the caller maps +y to north or south).
 *
 * Frame: x across the meridian (the wedge spans x ∈ [−W/2, W/2]), y along
 * the meridian, z up; the origin is on the ground below the foot of the lip.
 *
 * Construction (one closed polyhedron, no boolean operation):
 * - a (y, z) cross-section extruded over the full width: a toe slab of
 *   thickness minBase in front (y < 0), the locating lip standing
 *   perpendicular to the seat at its lower edge (its overhang filled down to
 *   the toe by a vertical face, so nothing faces downward), the seat of
 *   length seatLength along the slope, and a vertical back at
 *   y = (lipWidth + seatLength)·cos(tilt) (moved back by backShelf, with a
 *   level shelf at the seat's upper edge, when that is set). At 0° this is a flat slab of
 *   thickness minBase with a lip; at high tilt a tall stand whose toe grows
 *   (payloadHeight·sin(tilt) − lipWidth·cos(tilt) + wall) so that the seat and
 *   everything standing on it lies over the footprint.
 * - countersunk mounting holes through the toe and a flat-bottomed meridian
 *   arrow recess in the toe top, built directly: the bottom and the toe-top
 *   faces are polygons with holes (ear-clipped after bridging), joined to
 *   polygonal bore walls, countersink cones and the recess walls and floor.
 * Every face is planar and shares its corners, so the mesh has no T-junction.
 * Printed as modelled (base on the bed) it needs no support: the seat, lip
 * and countersinks face upward, the rest is vertical. The body is solid; the
 * slicer's infill hollows it.
 *
 * @param options merged over WEDGE_DEFAULTS (holes and arrow merged one level deep)
 * @example wedgeSolid({ latitudeDeg: 51.5 }).mesh
 */
export function wedgeSolid(options: WedgeInput = {}): WedgePart {
  const o = mergeWedgeOptions(options);
  const tiltDeg = checkTiltAndSizes(o);
  const hole = mountingHoleShape(o.holes, o.minBaseMm);
  checkArrow(o.arrow, o.minBaseMm);

  const a = (tiltDeg * Math.PI) / 180;
  const sinA = Math.sin(a);
  const cosA = Math.cos(a);
  const W = o.seatWidthMm;
  const toe = toeLayout(o, hole, sinA, cosA);
  const section = crossSection(o, toe.lengthMm, sinA, cosA);
  const holeXs = holeCentresX(o, hole);

  // Points go into the draft in this order: hole rings, arrow recess, extruded profile.
  const draft = newDraft();
  const bores = addMountingHoles(draft, holeXs, toe.centreYMm, hole, o.minBaseMm);
  const recess = o.arrow === null ? null : addArrowRecess(draft, o.arrow, toe.centreYMm, o.minBaseMm);
  const toeTopRings = recess === null ? bores.topRings : [...bores.topRings, recess.topRing];
  extrudeProfileX(draft, section.profile, -W / 2, W / 2, { [BOTTOM_WALL]: bores.bottomRings, [section.toeTopWall]: toeTopRings });

  const corner = (x: number, p: Vec2): Vec3 => [x, p[0], p[1]];
  const { seatLower: P0, seatUpper: P1 } = section;
  return {
    kind: 'wedge',
    mesh: finishMesh(draft),
    design: tiltDeg < WEDGE_SLAB_BELOW_DEG ? 'slab' : 'stand',
    tiltRad: a,
    profile: section.profile,
    profileAreaMm2: shoelaceArea(section.profile),
    seatCorners: [corner(-W / 2, P0), corner(W / 2, P0), corner(W / 2, P1), corner(-W / 2, P1)],
    seatNormal: [0, -sinA, cosA],
    toeLengthMm: toe.lengthMm,
    footprint: { xMinMm: -W / 2, xMaxMm: W / 2, yMinMm: -toe.lengthMm, yMaxMm: section.yBackMm },
    holes: bores.holes,
    arrowOutline: recess === null ? null : recess.outline,
  };
}

/** What wedgeSolid takes: WedgeOptions, any field left out, holes and arrow in part. */
type WedgeInput = Partial<Omit<WedgeOptions, 'holes' | 'arrow'>> & {
  readonly holes?: Partial<WedgeHoles>;
  readonly arrow?: Partial<WedgeArrow> | null;
};

/** The options merged over WEDGE_DEFAULTS, holes and arrow one level deep (arrow: null keeps none). */
function mergeWedgeOptions(options: WedgeInput): WedgeOptions {
  return {
    ...WEDGE_DEFAULTS,
    ...options,
    holes: { ...WEDGE_DEFAULTS.holes, ...(options.holes ?? {}) },
    arrow: options.arrow === null ? null : { ...(WEDGE_DEFAULTS.arrow as WedgeArrow), ...(options.arrow ?? {}) },
  };
}

/** Refuse a tilt, seat or wall that does not print; returns the tilt |latitude|, degrees. */
function checkTiltAndSizes(o: WedgeOptions): number {
  assertFinite('wedge.latitudeDeg', o.latitudeDeg);
  const tiltDeg = Math.abs(o.latitudeDeg);
  if (tiltDeg > WEDGE_MAX_TILT_DEG) {
    throw new SpecError('wedge.latitudeDeg', o.latitudeDeg, `allowed: |latitude| at most ${WEDGE_MAX_TILT_DEG}° for a printable wedge (the seat would be vertical)`);
  }
  for (const field of ['seatWidthMm', 'seatLengthMm'] as const) {
    assertFinite(`wedge.${field}`, o[field]);
    if (!(o[field] >= WEDGE_MIN_SEAT_MM)) {
      throw new SpecError(`wedge.${field}`, o[field], `allowed: at least ${WEDGE_MIN_SEAT_MM} mm (the seat's smallest side)`);
    }
  }
  for (const field of ['minBaseMm', 'lipMm', 'lipWidthMm', 'wallMm'] as const) {
    assertFinite(`wedge.${field}`, o[field]);
    if (!(o[field] >= WEDGE_MIN_WALL_MM)) {
      throw new SpecError(`wedge.${field}`, o[field], `allowed: at least ${WEDGE_MIN_WALL_MM} mm (thinner does not print)`);
    }
  }
  assertNonNegative('wedge.payloadHeightMm', o.payloadHeightMm);
  return tiltDeg;
}

/** A mounting hole's shape as built: its count and polygon, bore and top radii, countersink depth. */
interface MountingHoleShape {
  readonly count: number;
  readonly segments: number;
  /** circumscribed polygon: vertex radius / nominal radius */
  readonly polygonFactor: number;
  readonly boreR: number;
  readonly topR: number;
  readonly csDepth: number;
}

/** The holes' radii and countersink depth, refusing a count, bore or countersink the toe cannot take. */
function mountingHoleShape(holes: WedgeHoles, base: number): MountingHoleShape {
  assertInteger('wedge.holes.count', holes.count, 0, 64);
  if (holes.count % 2 !== 0) {
    throw new SpecError('wedge.holes.count', holes.count, 'allowed: an even number (pairs either side of the meridian arrow)');
  }
  assertInteger('wedge.holes.segments', holes.segments, 8, 256);
  let boreR = 0;
  let topR = 0;
  let csDepth = 0;
  if (holes.count > 0) {
    assertPositive('wedge.holes.diameterMm', holes.diameterMm);
    boreR = holes.diameterMm / 2;
    topR = boreR;
    if (holes.countersink !== null) {
      topR = holes.countersink.diameterMm / 2;
      csDepth = countersinkDepth(holes, holes.countersink, base);
    }
  }
  const polygonFactor = 1 / Math.cos(Math.PI / holes.segments);
  return { count: holes.count, segments: holes.segments, polygonFactor, boreR, topR, csDepth };
}

/** Depth of the countersink cone, mm, refusing one wider than the bore allows or deeper than the toe. */
function countersinkDepth(holes: WedgeHoles, cs: WedgeCountersink, base: number): number {
  assertFinite('wedge.holes.countersink.diameterMm', cs.diameterMm);
  if (!(cs.diameterMm > holes.diameterMm)) {
    throw new SpecError('wedge.holes.countersink.diameterMm', cs.diameterMm, `allowed: more than wedge.holes.diameterMm = ${holes.diameterMm} mm`);
  }
  assertFinite('wedge.holes.countersink.angleDeg', cs.angleDeg);
  if (!(cs.angleDeg >= 60 && cs.angleDeg <= 120)) {
    throw new SpecError('wedge.holes.countersink.angleDeg', cs.angleDeg, 'allowed: 60° to 120°');
  }
  // Cone depth from the radii and half the included angle.
  const csDepth = (cs.diameterMm / 2 - holes.diameterMm / 2) / Math.tan((cs.angleDeg * Math.PI) / 360);
  if (!(csDepth < base - WEDGE_MIN_WALL_MM)) {
    throw new SpecError(
      'wedge.holes.countersink',
      cs,
      `allowed: a countersink leaving at least ${WEDGE_MIN_WALL_MM} mm of straight bore in minBaseMm = ${base} mm`,
      `its depth ${csDepth.toFixed(3)} mm is too deep`,
    );
  }
  return csDepth;
}

/** Refuse a meridian arrow whose head, shaft or depth does not fit (null: no arrow). */
function checkArrow(arrow: WedgeArrow | null, base: number): void {
  if (arrow === null) return;
  for (const f of ['lengthMm', 'shaftWidthMm', 'headWidthMm', 'headLengthMm', 'depthMm'] as const) assertPositive(`wedge.arrow.${f}`, arrow[f]);
  if (!(arrow.headLengthMm < arrow.lengthMm)) {
    throw new SpecError('wedge.arrow.headLengthMm', arrow.headLengthMm, `allowed: less than wedge.arrow.lengthMm = ${arrow.lengthMm} mm`);
  }
  if (!(arrow.shaftWidthMm < arrow.headWidthMm)) {
    throw new SpecError('wedge.arrow.shaftWidthMm', arrow.shaftWidthMm, `allowed: less than wedge.arrow.headWidthMm = ${arrow.headWidthMm} mm`);
  }
  if (!(arrow.depthMm <= base - WEDGE_MIN_WALL_MM)) {
    throw new SpecError('wedge.arrow.depthMm', arrow.depthMm, `allowed: at most ${base - WEDGE_MIN_WALL_MM} mm (leaving ${WEDGE_MIN_WALL_MM} mm of the ${base} mm toe)`);
  }
}

/**
 * The toe's length, mm: room for the holes and arrow, and a footprint
 * reaching in front of the payload's lowest front corner (seat lower edge
 * raised by payloadHeight along the normal); and the centre line of its
 * free top (y), where holes and arrow sit.
 */
function toeLayout(o: WedgeOptions, hole: MountingHoleShape, sinA: number, cosA: number): { readonly lengthMm: number; readonly centreYMm: number } {
  const featureDepth = Math.max(hole.count > 0 ? 2 * hole.topR * hole.polygonFactor : 0, o.arrow !== null ? o.arrow.lengthMm : 0) + 2 * o.wallMm;
  const lipFrontY = -o.lipMm * sinA;
  const toe = Math.max(-lipFrontY + featureDepth, o.payloadHeightMm * sinA - o.lipWidthMm * cosA + o.wallMm);
  return { lengthMm: toe, centreYMm: (-toe + lipFrontY) / 2 };
}

/** Profile wall of the bottom face (the edge from the toe's front to the back along z = 0). */
const BOTTOM_WALL = 0;

/**
 * The (y, z) cross-section, counter-clockwise: toe, back (with its shelf),
 * seat, lip; with the seat's edges, the back's y and which profile wall is
 * the toe's free top.
 */
function crossSection(o: WedgeOptions, toe: number, sinA: number, cosA: number) {
  const base = o.minBaseMm;
  const lw = o.lipWidthMm;
  const lipH = o.lipMm;
  const u: Vec2 = [cosA, sinA]; // up the slope
  const nrm: Vec2 = [-sinA, cosA]; // seat normal
  const F: Vec2 = [0, base]; // lip foot
  const P0: Vec2 = [F[0] + lw * u[0], F[1] + lw * u[1]]; // seat lower edge
  const P1: Vec2 = [P0[0] + o.seatLengthMm * u[0], P0[1] + o.seatLengthMm * u[1]]; // seat upper edge
  const L1: Vec2 = [P0[0] + lipH * nrm[0], P0[1] + lipH * nrm[1]];
  const L2: Vec2 = [F[0] + lipH * nrm[0], F[1] + lipH * nrm[1]];
  const G: Vec2 = [L2[0], base];
  assertNonNegative('wedge.backShelfMm', o.backShelfMm);
  const shelf = o.backShelfMm;
  const yBack = P1[0] + shelf;
  const profile: Vec2[] = shelf > 0 ? [[-toe, 0], [yBack, 0], [yBack, P1[1]], P1, P0, L1, L2, G, [-toe, base]] : [[-toe, 0], [yBack, 0], P1, P0, L1, L2, G, [-toe, base]];
  return { profile, seatLower: P0, seatUpper: P1, yBackMm: yBack, toeTopWall: shelf > 0 ? 7 : 6 };
}

/** Hole centres across the meridian (x), ascending: pairs symmetric about x = 0, outside the arrow; refuses holes that do not fit. */
function holeCentresX(o: WedgeOptions, hole: MountingHoleShape): number[] {
  const holeXs: number[] = [];
  if (hole.count === 0) return holeXs;
  const W = o.seatWidthMm;
  const perSide = hole.count / 2;
  const rv = hole.topR * hole.polygonFactor;
  const xInner = (o.arrow !== null ? o.arrow.headWidthMm / 2 : 0) + o.wallMm + rv;
  const xOuter = W / 2 - o.wallMm - rv;
  const step = perSide > 1 ? (xOuter - xInner) / (perSide - 1) : 0;
  if (xOuter < xInner || (perSide > 1 && step < 2 * rv + o.wallMm)) {
    throw new SpecError(
      'wedge.holes.count',
      hole.count,
      `allowed: as many holes as fit across seatWidthMm = ${W} mm with wallMm = ${o.wallMm} mm`,
      `${hole.count} holes of ${(2 * hole.topR).toFixed(2)} mm do not fit`,
    );
  }
  for (let j = 0; j < perSide; j++) {
    const x = xOuter - j * step;
    holeXs.push(-x, x);
  }
  holeXs.sort((p, q) => p - q);
  return holeXs;
}

/**
 * Each hole's bore wall and countersink cone into the draft; returns the
 * rings to open in the bottom and in the toe's top, and the holes as built.
 */
function addMountingHoles(draft: MeshDraft, holeXs: readonly number[], yc: number, hole: MountingHoleShape, base: number) {
  const { boreR, topR, csDepth, polygonFactor } = hole;
  const N = hole.segments;
  const bottomRings: number[][] = [];
  const topRings: number[][] = [];
  const holes: WedgeHole[] = [];
  for (const hx of holeXs) {
    const ring = (r: number, z: number): number[] =>
      Array.from({ length: N }, (_, k) => {
        const t = (2 * Math.PI * k) / N;
        return addPoint(draft, [hx + r * polygonFactor * Math.cos(t), yc + r * polygonFactor * Math.sin(t), z]);
      });
    const bottom = ring(boreR, 0);
    const top = csDepth > 0 ? ring(topR, base) : null;
    const neck = csDepth > 0 ? ring(boreR, base - csDepth) : ring(boreR, base);
    const axis = (z: number): Vec3 => [hx, yc, z];
    bandFacing(draft, bottom, neck, axis);
    if (top) bandFacing(draft, neck, top, axis);
    bottomRings.push(bottom);
    topRings.push(top ?? neck);
    holes.push({ xMm: hx, yMm: yc, boreRadiusMm: boreR, topRadiusMm: topR, countersinkDepthMm: csDepth });
  }
  return { bottomRings, topRings, holes };
}

/** The meridian arrow's recess (walls and floor) into the draft; returns its outline (x, y, CCW) and its ring in the toe's top. */
function addArrowRecess(draft: MeshDraft, arrow: WedgeArrow, yc: number, base: number): { readonly outline: Vec2[]; readonly topRing: number[] } {
  const yTail = yc - arrow.lengthMm / 2;
  const yTip = yc + arrow.lengthMm / 2;
  const yNeck = yTip - arrow.headLengthMm;
  const s = arrow.shaftWidthMm / 2;
  const hw = arrow.headWidthMm / 2;
  const outline: Vec2[] = [[-s, yTail], [s, yTail], [s, yNeck], [hw, yNeck], [0, yTip], [-hw, yNeck], [-s, yNeck]];
  const top = outline.map(([x, y]) => addPoint(draft, [x, y, base]));
  const floor = outline.map(([x, y]) => addPoint(draft, [x, y, base - arrow.depthMm]));
  for (let k = 0; k < outline.length; k++) {
    const k1 = (k + 1) % outline.length;
    const dx = outline[k1][0] - outline[k][0];
    const dy = outline[k1][1] - outline[k][1];
    // The recess wall faces into the recess: the left side of a CCW outline edge.
    addPlanarFace(draft, [-dy, dx, 0], [top[k], floor[k], floor[k1], top[k1]]);
  }
  addPlanarFace(draft, [0, 0, 1], floor);
  return { outline, topRing: top };
}

/**
 * Join two rings of equal size (a closed band, e.g. a bore wall or a
 * countersink cone) with one flat quad per segment, each facing the axis
 * (into the hole), since the hole is outside the solid.
 */
function bandFacing(draft: MeshDraft, lower: readonly number[], upper: readonly number[], axisAt: (z: number) => Vec3): void {
  const n = lower.length;
  for (let k = 0; k < n; k++) {
    const k1 = (k + 1) % n;
    const quad = [lower[k], lower[k1], upper[k1], upper[k]];
    const [p0, p1, , p3] = quad.map((i) => draft.positions[i]);
    let normal = cross3(sub3(p1, p0), sub3(p3, p0));
    const mid: Vec3 = [(p1[0] + p3[0]) / 2, (p1[1] + p3[1]) / 2, (p1[2] + p3[2]) / 2];
    if (dot3(normal, sub3(axisAt(mid[2]), mid)) < 0) normal = [-normal[0], -normal[1], -normal[2]];
    addPlanarFace(draft, normal, quad);
  }
}
