import { SpecError } from '../errors.ts';
import { DEG } from '../guards.ts';
import type { Vec3 } from '../parts/mesh.ts';
import { cross3, dot3 } from '../parts/vec3.ts';
import { CHORD_TOLERANCE_MM } from '../sheet/arcPoints.ts';
import { RELIEF_OVERSIZE_MM } from '../sheet/cornerRelief.ts';
import type { SheetPart } from '../sheet/sheetPart.ts';
import { reliefToolRadius } from '../sheet/sheetParts.ts';
import { groundAnchorRow, seatRailScrewRows, type FastenerRow } from '../stand/fastenerTable.ts';
import { METRIC_SIZES, screwForHole } from '../stand/metricFasteners.ts';
import { assertStandSlots, FOOT_MIN_WIDTH_MM, FOOTPRINT_PER_HEIGHT, RAIL_MIN_WIDTH_MM, SPANNER_ROOM_MM } from '../stand/standDimensions.ts';
import { crossMemberOutline } from '../stand/crossMember.ts';
import { standFoot } from '../stand/standFoot.ts';
import { cheekTabSlots, indexOf, path, rectPath, relieveAlong, slotCut, tabCorners, turnedSlotCut, type NominalSlot } from '../stand/standJoinery.ts';
import type { JoinedStand, PartPlacement, StandInstance, StandJoint } from '../stand/standTypes.ts';
import type { Circle, Path, Vec2 } from '../types.ts';
import type { DialSpec } from '../spec/schema.ts';
import type { PlanarLayout } from './layoutPlanar.ts';

/**
 * Free length of rod on each side of the hub for a set collar, mm: a DIN 705
 * adjusting ring for a 6 mm shaft is 8 mm wide (memory), plus 2 mm to spare.
 */
export const COLLAR_ROOM_MM = 10;
/** Least width of the hub along the slope, mm (room for the rod's hole and the tabs' reliefs). */
export const HUB_MIN_WIDTH_MM = 30;
/** Highest |latitude| the equatorial stand is built for, degrees: beyond it the face lies within 15° of level and a lower face's stand would overhang far. */
export const EQUATORIAL_STAND_MAX_LATITUDE_DEG = 75;

/** Options of `equatorialStand`. */
export interface EquatorialStandOptions {
  /** radius of the round tool the inside corners are relieved for, mm (default reliefToolRadius(spec)); 0 = none */
  readonly reliefToolRadiusMm: number;
  /** largest gap between an arc and its polyline, mm (default cutFiles.chordTolerance) */
  readonly chordToleranceMm: number;
  /** slot clearance per side, mm (default process.clearance; −PRINT_FUSE_MM for the printed solid, whose parts overlap and fuse) */
  readonly clearanceMm: number;
}

/** One plate hole and the seat rail hole under it. */
export interface EquatorialFixing {
  readonly index: number;
  /** plate.dxf frame, mm */
  readonly plateMm: Vec2;
  /** which rail (1-based, from the plate's lower edge) and the hole in that rail's own drawing, mm */
  readonly rail: number;
  readonly railMm: Vec2;
  readonly diameterMm: number;
}

/**
 * The equatorial stand: its flat parts, where each lies, how they join
 * (`JoinedStand`; its placements in the site frame: x east, y north, z up,
 * mm, the ground z = 0), and the plate and rod on it.
 */
export interface EquatorialStand extends JoinedStand {
  /** where the plate lies: drawing (plate.dxf x, y) and depth w from the face (w = 0 the engraved face, −thickness its back) along the face normal */
  readonly plate: PartPlacement;
  /** the face origin (the rod's axis on the engraved face), site frame, mm */
  readonly faceOriginMm: Vec3;
  /** the rod's axis: a unit vector, the style's sense (out of the engraved face) */
  readonly rodAxis: Vec3;
  readonly fixings: readonly EquatorialFixing[];
  readonly fasteners: readonly FastenerRow[];
  readonly dims: {
    readonly material: string;
    readonly thicknessMm: number;
    readonly clearanceMm: number;
    /** the face's tilt from the horizontal, 90° − |latitude| */
    readonly faceTiltDeg: number;
    readonly cheekSpacingMm: number;
    readonly rails: readonly { readonly lowerEdgeMm: number; readonly widthMm: number }[];
    /** the hub's mid-plane below the engraved face, and its width along the slope, mm */
    readonly hubDepthMm: number;
    readonly hubWidthMm: number;
    readonly heightMm: number;
    readonly footprintMm: { readonly acrossMm: number; readonly alongMm: number };
    /** the plate's lowest corner above the ground, mm */
    readonly plateLowestMm: number;
  };
}

/**
 * A flat-pack stand for an equatorial face, cut from sheet by any shop
 * (laser, waterjet, router; the same parts, with no clearance, make the
 * printed solid): the plate rests with its face square to the Earth's
 * axis, tilted 90° − |φ| from the horizontal, and the rod passes through
 * the plate's centre hole and a hub below it along that axis. Parts, all
 * nominal (no kerf), joined by tabs one sheet deep through slots of the tab
 * plus the clearance each side (the joinery of `flatStand`):
 * - two **cheeks** in the meridian planes, their seat edge along the face's
 *   slope (tabs up through the seat rails), with two foot tabs below and a
 *   slot along the slope for the hub's end tabs;
 * - two **feet** across the meridian, slotted for the cheeks, drilled for the
 *   ground anchors outboard of the cheeks;
 * - **seat rails** under the plate's hole rows, drilled at the plate's own
 *   hole centres and, for the rail under the centre hole, at the rod's hole;
 * - one **hub** parallel to the plate between the cheeks, COLLAR_ROOM_MM from
 *   the rod's far end, drilled at the rod's hole centre: plate hole and hub
 *   hole hold the rod square to the face (two set collars on it, one each
 *   side of the hub).
 * Everything lies on the side of the plate that is never lit when the face
 * is (the back, n · (X − O) ≤ −plate thickness), so the stand cannot shadow
 * the face: for a point X of the face lit by a sun direction s (n · s > 0),
 * every point of the ray X + t s, t > 0, lies in front of the face. For an
 * upper face the cheeks stand under the plate; for a lower face (which
 * looks down toward the equator-ward sky) they lean over its back from
 * feet on the pole-ward side.
 *
 * Site frame: x east, y north, z up, the ground z = 0; each part's drawing
 * point (x, y) and depth w go to origin + x·e1 + y·e2 + w·normal.
 *
 * @throws SpecError naming the field: a latitude beyond
 *   EQUATORIAL_STAND_MAX_LATITUDE_DEG, a clearance of half the sheet or more,
 *   a router tool wider than a slot, a plate too narrow for the cheeks, a rod
 *   too short for the hub and its collars, stand.lowEnd too low for the nuts
 * @example equatorialStand(layoutPlanar(spec)).parts.map((p) => p.name) // ['stand-cheek', 'stand-foot', 'stand-rail-a', 'stand-rail-b', 'stand-hub']
 */
export function equatorialStand(layout: PlanarLayout, options: Partial<EquatorialStandOptions> = {}): EquatorialStand {
  const spec = layout.spec;
  if (layout.faceType !== 'equatorial') throw new Error(`equatorialStand: a ${layout.faceType} face`);
  const st = spec.stand;
  const T = st.thickness ?? spec.plate.thickness;
  const material = st.material ?? spec.plate.material;
  const c = options.clearanceMm ?? spec.process.clearance;
  const tool = options.reliefToolRadiusMm ?? reliefToolRadius(spec);
  const tol = options.chordToleranceMm ?? spec.cutFiles?.chordTolerance ?? CHORD_TOLERANCE_MM;
  const lat = spec.site.latitude;
  if (Math.abs(lat) > EQUATORIAL_STAND_MAX_LATITUDE_DEG) {
    throw new SpecError('site.latitude', lat, `allowed: at most ${EQUATORIAL_STAND_MAX_LATITUDE_DEG}° north or south for an equatorial face's stand`, 'the face would lie within 15° of level');
  }
  assertStandSlots(spec, T, c);

  const plate = layout.plate;
  const W = plate.widthMm;
  const L = plate.lengthMm;
  const Tp = plate.thicknessMm;
  const xR = plate.substyleX;
  const yR = plate.faceOriginY;
  const rod = layout.gnomon;
  const rodHole = plate.holes.find((h) => Math.abs(h.cx - xR) < 1e-9 && Math.abs(h.cy - yR) < 1e-9);
  if (!rodHole) throw new Error('equatorialStand: the plate has no centre hole for the rod');
  const rr = rodHole.radiusMm;
  const corner = plate.holes.filter((h) => h !== rodHole);
  const holeDia = corner.length > 0 ? 2 * corner[0].radiusMm : 0;
  const screw = corner.length > 0 ? (screwForHole(holeDia) ?? METRIC_SIZES[0]) : null;
  const anchor = st.anchors > 0 ? screwForHole(st.anchorDiameter) : null;
  if (st.anchors > 0 && anchor === null) {
    throw new SpecError('stand.anchorDiameter', st.anchorDiameter, 'allowed: at least 3.4 mm (the ISO 273 clearance hole of an M3 anchor), or stand.anchors: 0');
  }
  const reliefRoom = reliefRoomMm(tool);

  // ---- seat rails: the plate's hole rows (the end rails flush with its edges), the rod's hole inside one
  const b = equatorialSeatRailWidthMm(spec, tool);
  const spans: [number, number][] = [[0, b]];
  for (const y of [...new Set(corner.map((h) => h.cy))].sort((p, q) => p - q)) {
    if (y + holeDia / 2 <= b || y - holeDia / 2 >= L - b) continue;
    spans.push([y - b / 2, y + b / 2]);
  }
  spans.push([L - b, L]);
  const rodSpan: [number, number] = [Math.max(0, yR - rr - 3), Math.min(L, yR + rr + 3)];
  const hit = spans.find(([lo, hi]) => lo < rodSpan[1] && hi > rodSpan[0]);
  // With both faces engraved no rail runs under the rod's row, across the lower face: the plate's hole and the hub's hold the rod.
  const bothFaces = spec.face?.side === 'both';
  if (hit && bothFaces) throw new Error('equatorialStand: a seat rail reaches the rod on a plate engraved on both faces (layoutPlanar keeps the rod inside the border)');
  if (hit) {
    hit[0] = Math.min(hit[0], rodSpan[0]);
    hit[1] = Math.max(hit[1], rodSpan[1]);
  } else if (!bothFaces) spans.push([Math.max(0, yR - b / 2), Math.min(L, yR + b / 2)]);
  spans.sort((p, q) => p[0] - q[0]);
  const merged: [number, number][] = [];
  for (const s of spans) {
    const last = merged[merged.length - 1];
    if (last && s[0] < last[1] + 5) last[1] = Math.max(last[1], s[1]);
    else merged.push([s[0], s[1]]);
  }
  const rails = merged.map(([lo, hi]) => ({ lowerEdgeMm: lo, widthMm: hi - lo }));

  // ---- cheeks: inboard of the hole columns by a washer radius, half a cheek and spanner room
  const washer = screw?.washerOdMm ?? 10;
  const edgeToCheek = (corner.length > 0 ? Math.min(...corner.map((h) => Math.min(h.cx, W - h.cx))) : spec.holes.inset) + washer / 2 + T / 2 + SPANNER_ROOM_MM;
  const xc = W / 2 - edgeToCheek;
  const rodRoom = Math.abs(xR - W / 2) + COLLAR_ROOM_MM + T / 2;
  if (!(xc > T + 10 && xc > rodRoom)) {
    throw new SpecError('plate.width', spec.plate.width, `allowed: a plate wider than ${(2 * (edgeToCheek + Math.max(T + 10, rodRoom))).toFixed(1)} mm for the stand's two cheeks with the rod and its collars between them`, `the cheeks would sit ${(2 * xc).toFixed(1)} mm apart`);
  }

  // ---- hub: parallel to the plate, COLLAR_ROOM_MM short of the rod's far end
  const belowFace = Tp + rod.heightMm; // planarGnomonSolid's rod reaches this far behind the face
  const wS = Tp + T; // depth of the cheeks' seat edge behind the face
  const wH = belowFace - COLLAR_ROOM_MM - T / 2;
  if (!(wH - T / 2 - wS >= COLLAR_ROOM_MM - 1e-9)) {
    throw new SpecError('gnomon.height', spec.gnomon.height, `allowed: at least ${(2 * COLLAR_ROOM_MM + 2 * T).toFixed(1)} mm for an equatorial face on its stand`, 'the rod must reach through the seat rail and the hub with room for a set collar each side of the hub');
  }
  const hw = Math.max(HUB_MIN_WIDTH_MM, 2 * rr + 20, reliefRoom);

  const screwBelowRail = screw ? screw.washerMm + screw.nutHeightMm + 2 * screw.pitchMm : 0;
  if (!(st.lowEnd >= screwBelowRail + 5)) {
    throw new SpecError('stand.lowEnd', st.lowEnd, `allowed: at least ${Math.ceil(screwBelowRail + 5)} mm: the ${screw?.name} nuts hang ${screwBelowRail.toFixed(1)} mm below the seat rails`);
  }

  // ---- the meridian section (u toward the equator, v up), face origin at (0, 0)
  const upper = layout.spec.face?.side !== 'lower';
  const tilt = Math.PI / 2 - Math.abs(lat) * DEG;
  const a: Vec2 = [Math.cos(tilt), Math.sin(tilt)]; // up the face
  const n2: Vec2 = upper ? [-Math.sin(tilt), Math.cos(tilt)] : [Math.sin(tilt), -Math.cos(tilt)]; // out of the engraved face
  const m: Vec2 = [-n2[0], -n2[1]]; // behind the plate
  const at = (y: number, w: number): Vec2 => [(y - yR) * a[0] + w * m[0], (y - yR) * a[1] + w * m[1]]; // plate y, depth w behind the face
  const S = (y: number) => at(y, wS);
  const yTop = Math.max(L, yR + hw / 2 + T);
  const hubFar = wH + T / 2 + c;
  const D = hubFar - wS + Math.max(T, 5);
  const ST = S(yTop);
  const B2 = at(yTop, wS + D);
  const hubCorners = [at(yR - hw / 2, wH - T / 2), at(yR + hw / 2, wH - T / 2), at(yR - hw / 2, wH + T / 2), at(yR + hw / 2, wH + T / 2)];
  const rodEnds = [at(yR, belowFace), at(yR, -rod.heightMm)];
  const lowEnd = upper ? S(0) : at(0, 0);
  // The ground: the plate's low end stand.lowEnd above the feet, lower when the rod's ends, the hub or the band need it.
  const vFoot = Math.min(lowEnd[1] - st.lowEnd, ...rodEnds.map((p) => p[1] - 10), ...hubCorners.map((p) => p[1] - 5), B2[1] - 5);
  const vG = vFoot - T;
  const fb = Math.max(FOOT_MIN_WIDTH_MM, 4 * st.anchorDiameter, reliefRoom);
  const top = Math.max(ST[1], B2[1], at(L, 0)[1], at(yTop, 0)[1]);
  const heightMm = top - vG;
  const needRun = Math.max(FOOTPRINT_PER_HEIGHT * heightMm, 2 * fb + 20);
  const onFoot = (u: number): Vec2 => [u, vFoot];
  // The outline, counter-clockwise; the seat's tab roots and tabs between.
  const outer: Vec2[] = [];
  const footTabRoot: Vec2[] = [];
  const railTabRoot: Vec2[] = new Array(rails.length);
  const pushFeet = (u0: number, u1: number): [number, number] => {
    const centres = [u0 + fb / 2, u1 - fb / 2];
    outer.push(onFoot(u0));
    for (const u of centres) {
      footTabRoot.push(onFoot(u - fb / 4));
      outer.push(onFoot(u - fb / 4), [u - fb / 4, vG], [u + fb / 4, vG], onFoot(u + fb / 4));
    }
    outer.push(onFoot(u1));
    return [centres[0], centres[1]];
  };
  const railTab = (k: number, ascending: boolean) => {
    const r = rails[k];
    const sc = r.lowerEdgeMm + r.widthMm / 2;
    const [p, q] = ascending ? [S(sc - r.widthMm / 4), S(sc + r.widthMm / 4)] : [S(sc + r.widthMm / 4), S(sc - r.widthMm / 4)];
    railTabRoot[k] = p;
    outer.push(...tabCorners(p, q, T, n2));
  };
  let footU: [number, number];
  let seatStart: Vec2;
  let seatDir: Vec2;
  if (upper) {
    // Under the plate: plumb below the seat's low end, out to (at least) the band's foot toward the equator.
    const S0 = S(0);
    const u1 = Math.max(B2[0], S0[0] + needRun);
    footU = pushFeet(S0[0], u1);
    outer.push(B2, ST);
    for (let k = rails.length - 1; k >= 0; k--) railTab(k, false);
    outer.push(S0);
    seatStart = S0;
    seatDir = [-a[0], -a[1]];
  } else {
    // Over the plate's back: the seat line carried down to the feet, a band of depth D behind the hub, a leg to the pole-ward foot.
    const G: Vec2 = [S(0)[0] - ((S(0)[1] - vFoot) / a[1]) * a[0], vFoot];
    const B3 = at(Math.min(yR - hw / 2 - T, yTop - 2 * T), wS + D);
    const overhang = Math.max(ST[0], at(L, 0)[0], at(yTop, 0)[0]) - G[0];
    // The feet end where the seat line meets the ground, so they too stay behind the plate's plane.
    const u1 = G[0] - T / Math.tan(tilt);
    const u0 = Math.min(B3[0], u1 - Math.max(needRun, overhang));
    footU = pushFeet(u0, u1);
    if (G[0] - u1 > 1e-9) outer.push(G);
    for (let k = 0; k < rails.length; k++) railTab(k, true);
    outer.push(ST, B2, B3);
    seatStart = G;
    seatDir = a;
  }
  const uMin = Math.min(...outer.map((p) => p[0]));
  const local = (p: Vec2): Vec2 => [p[0] - uMin, p[1] - vG];
  const hubSlot: NominalSlot = { centre: local(at(yR, wH)), axis: a, lengthMm: hw / 2 + 2 * c, widthMm: T + 2 * c };
  const drawn = outer.map(local);
  const cheekOutline = relieveAlong(relieveAlong(drawn, local(onFoot(0)), [1, 0], tool, tol), local(seatStart), seatDir, tool, tol);
  const cheek: SheetPart = { name: 'stand-cheek', material, thicknessMm: T, quantity: 2, outer: path(cheekOutline), inner: [turnedSlotCut(hubSlot, tool, tol)] };
  const footTabVertex = footTabRoot.map((p) => indexOf(cheekOutline, local(p)));
  const railTabVertex = railTabRoot.map((p) => indexOf(cheekOutline, local(p)));

  // ---- feet, as the polar stand's: anchors outboard of the cheeks
  const aWasher = anchor?.washerOdMm ?? 0;
  const anchorOffset = anchor ? xc + T / 2 + Math.max(aWasher / 2, st.anchorDiameter) + SPANNER_ROOM_MM : 0;
  const Lf = anchor ? 2 * (anchorOffset + Math.max(1.5 * st.anchorDiameter, aWasher / 2 + SPANNER_ROOM_MM)) : 2 * (xc + T / 2 + 10);
  const anchors = anchor ? { offsetMm: anchorOffset, diameterMm: st.anchorDiameter } : null;
  const { part: foot, slots: footSlots } = standFoot({ material, thicknessMm: T, clearanceMm: c, lengthMm: Lf, widthMm: fb, cheekOffsetMm: xc, anchors }, tool, tol);

  // ---- seat rails, drilled at the plate's holes (the rod's too)
  const fixings: EquatorialFixing[] = [];
  const railSlots = rails.map((r) => cheekTabSlots(W, r.widthMm, xc, T, c, upper ? -1 : 1));
  const railParts = rails.map((r, k): SheetPart => {
    const inner: (Path | Circle)[] = railSlots[k].map((sl) => slotCut(sl, tool, tol));
    for (const h of plate.holes) {
      const y = h.cy - r.lowerEdgeMm;
      if (!(y > 0 && y < r.widthMm)) continue;
      inner.push({ kind: 'circle', cx: h.cx, cy: y, radiusMm: h.radiusMm });
      if (h !== rodHole) fixings.push({ index: plate.holes.indexOf(h) + 1, plateMm: [h.cx, h.cy], rail: k + 1, railMm: [h.cx, y], diameterMm: 2 * h.radiusMm });
    }
    return { name: `stand-rail-${String.fromCharCode(97 + k)}`, material, thicknessMm: T, outer: rectPath(W, r.widthMm), inner };
  });
  fixings.sort((p, q) => p.index - q.index);

  // ---- hub: body between the cheeks' inner faces, end tabs through their slots, the rod's hole
  const { outline: hubOutline, tabVertex: hubTabVertex } = crossMemberOutline(xc, T, hw, tool, tol);
  const xH0 = W / 2 - xc - T / 2;
  const hub: SheetPart = { name: 'stand-hub', material, thicknessMm: T, outer: path(hubOutline), inner: [{ kind: 'circle', cx: xR - xH0, cy: hw / 2, radiusMm: rr }] };

  // ---- placements, site frame
  const face = layout.face;
  const n = face.normal;
  const right = face.right;
  const upV = face.up;
  const e = lat >= 0 ? 1 : -1;
  const g: Vec3 = [0, -e, 0]; // horizontal, toward the equator
  const Z: Vec3 = [0, 0, 1];
  const add = (...vs: [number, Vec3][]): Vec3 => [0, 1, 2].map((i) => vs.reduce((s, [k, v]) => s + k * v[i], 0)) as unknown as Vec3;
  // A point of the meridian section (u, v) at plate x.
  const site = (p: Vec2, x: number): Vec3 => add([p[0] - uMin, g], [p[1] - vG, Z], [x - W / 2, right]);
  const F = site([0, 0], xR);
  const place = (origin: Vec3, e1: Vec3, e2: Vec3): PartPlacement => ({ origin, e1, e2, normal: cross3(e1, e2) });
  const footE2 = cross3(Z, right);
  const sameWay = dot3(footE2, g) > 0;
  const cheekNormal = cross3(g, Z);
  const hubFromFront = dot3(cheekNormal, right) > 0;
  const atFace = (x: number, y: number, w: number): Vec3 => add([1, F], [x - xR, right], [y - yR, upV], [-w, n]);
  const instances: StandInstance[] = [
    { id: 'cheek-1', part: cheek.name, placement: place(site([uMin, vG], W / 2 - xc), g, Z) },
    { id: 'cheek-2', part: cheek.name, placement: place(site([uMin, vG], W / 2 + xc), g, Z) },
    ...footU.map((u, k): StandInstance => ({
      id: k === 0 ? 'foot-1' : 'foot-2',
      part: foot.name,
      placement: place(add([1, site([u + (sameWay ? -fb / 2 : fb / 2), vG + T / 2], W / 2)], [-Lf / 2, right]), right, footE2),
    })),
    ...rails.map((r, k): StandInstance => ({ id: `rail-${k + 1}`, part: railParts[k].name, placement: place(atFace(0, r.lowerEdgeMm, Tp + T / 2), right, upV) })),
    { id: 'hub', part: hub.name, placement: place(atFace(xH0, yR - hw / 2, wH), right, upV) },
  ];

  const joints: StandJoint[] = [];
  for (const [i, cheekId] of ['cheek-1', 'cheek-2'].entries()) {
    footTabVertex.forEach((v, k) => joints.push({ tab: { instance: cheekId, vertex: v }, slot: { instance: `foot-${k + 1}`, inner: i, ...footSlots[i] }, entersFrom: 'front' }));
    rails.forEach((_, k) => joints.push({ tab: { instance: cheekId, vertex: railTabVertex[k] }, slot: { instance: `rail-${k + 1}`, inner: i, ...railSlots[k][i] }, entersFrom: 'back' }));
  }
  joints.push({ tab: { instance: 'hub', vertex: hubTabVertex[0] }, slot: { instance: 'cheek-1', inner: 0, ...hubSlot, axis: [-a[0], -a[1]] }, entersFrom: hubFromFront ? 'front' : 'back' });
  joints.push({ tab: { instance: 'hub', vertex: hubTabVertex[1] }, slot: { instance: 'cheek-2', inner: 0, ...hubSlot }, entersFrom: hubFromFront ? 'back' : 'front' });

  const fasteners: FastenerRow[] = [];
  if (screw && corner.length > 0) fasteners.push(...seatRailScrewRows(screw, fixings.length, holeDia, Tp, T));
  fasteners.push({ use: 'rod on each side of the hub', item: `set collar (adjusting ring DIN 705 with its set screw), stainless, bore Ø ${rod.thicknessMm.toFixed(1)} mm`, size: `Ø ${rod.thicknessMm.toFixed(1)}`, lengthMm: null, count: 2, countersink: 'none' });
  if (anchor && st.anchors > 0) fasteners.push(groundAnchorRow(anchor, st.anchors, T));

  const plateLowest = Math.min(...[0, L].flatMap((y) => [0, -Tp].map((w) => at(y, w)[1]))) - vG;
  const uMax = Math.max(...outer.map((p) => p[0]));
  return {
    parts: [cheek, foot, ...railParts, hub],
    instances,
    joints,
    plate: place(atFace(0, 0, 0), right, upV),
    faceOriginMm: F,
    rodAxis: face.style,
    fixings,
    fasteners,
    dims: {
      material,
      thicknessMm: T,
      clearanceMm: c,
      faceTiltDeg: tilt / DEG,
      cheekSpacingMm: 2 * xc,
      rails,
      hubDepthMm: wH,
      hubWidthMm: hw,
      heightMm,
      footprintMm: { acrossMm: Lf, alongMm: uMax - uMin },
      plateLowestMm: plateLowest,
    },
  };
}

/** Room along a joint for a relieved tab and slot, mm: four reliefs of the round tool and 0.5 mm each. */
function reliefRoomMm(toolRadiusMm: number): number {
  return toolRadiusMm > 0 ? 4 * (2 * (toolRadiusMm + RELIEF_OVERSIZE_MM) + 0.5) : 0;
}

/**
 * Width of the equatorial stand's seat rails, mm: twice the holes' inset,
 * RAIL_MIN_WIDTH_MM, the hole + 10 mm and room for the relieved tabs,
 * whichever is most. With both faces engraved the plate's border is at
 * least this wide (`layoutPlanar`), so the end rails stay off the lower
 * face's engraving.
 */
export function equatorialSeatRailWidthMm(spec: DialSpec, reliefToolRadiusMm = reliefToolRadius(spec)): number {
  const holeDia = spec.holes.count > 0 ? spec.holes.diameter : 0;
  return Math.max(2 * spec.holes.inset, RAIL_MIN_WIDTH_MM, holeDia + 10, reliefRoomMm(reliefToolRadiusMm));
}

/** Whether `equatorialStand` is built for a layout: an equatorial face within EQUATORIAL_STAND_MAX_LATITUDE_DEG. */
export function equatorialStandApplies(layout: PlanarLayout): boolean {
  return layout.faceType === 'equatorial' && Math.abs(layout.spec.site.latitude) <= EQUATORIAL_STAND_MAX_LATITUDE_DEG;
}
