import type { Vec3 } from '../parts/mesh.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import type { SheetPart } from '../sheet/sheetPart.ts';
import { CHORD_TOLERANCE_MM } from '../sheet/arcPoints.ts';
import { reliefToolRadius } from '../sheet/sheetParts.ts';
import type { Circle, Path, Vec2 } from '../types.ts';
import { crossMemberOutline } from './crossMember.ts';
import { standFoot } from './standFoot.ts';
import { cheekTabSlots, indexOf, path, rectPath, relieveAlong, slotCut, tabCorners, type NominalSlot } from './standJoinery.ts';
import { mountingFixings } from './mountingFixings.ts';
import { standDimensions, type StandSizing } from './standDimensions.ts';
import type { FlatStand, PartPlacement, StandInstance, StandJoint } from './standTypes.ts';

/** The flat-pack stand and the sizes it was built to. */
export interface SizedStand extends FlatStand {
  readonly sizing: StandSizing;
}

/** Options of `flatStand`. */
export interface FlatStandOptions {
  /** radius of the round tool the inside corners are relieved for, mm (default: reliefToolRadius(spec), the router's tool radius); 0 = none */
  readonly reliefToolRadiusMm: number;
  /** largest gap between an arc and its polyline, mm (default cutFiles.chordTolerance) */
  readonly chordToleranceMm: number;
}

/**
 * The flat-pack latitude stand for the sheet processes (laser, waterjet,
 * router), every part drawn at nominal size as a SheetPart (no kerf: the
 * writers compensate; no dog-bones: the router writer adds them):
 * - two identical **cheeks** standing in the meridian plane, their top edge
 *   rising at |latitude| toward the elevated pole, with tabs down into the
 *   feet and tabs up through the seat rails, and one slot for the cross
 *   member;
 * - two **feet** on the ground across the meridian, slotted for the cheeks'
 *   lower tabs, with the ground-anchor holes outboard of the cheeks;
 * - **seat rails** lying in the seat plane under the plate's hole rows (the
 *   lowest flush with the plate's lower edge, the highest with its upper
 *   edge), slotted for the cheeks' upper tabs and drilled at the plate's
 *   own hole centres (`mountingFixings`: one source of truth);
 * - one **cross member** between the cheeks, its end tabs through the cheeks'
 *   slots, keeping them square and parallel.
 * Every tab is the stand's sheet thickness deep, so it ends flush with the
 * far face of its slotted part; every slot is the tab plus process.clearance
 * on each side. Sizes: `standDimensions`.
 *
 * The parts' intended placements (`instances`, stand frame of standTypes.ts)
 * agree with the joints: placing each part by its tab in its mate's slot
 * gives the same stand (test/standAssembly.test.ts checks it).
 *
 * @example flatStand(layoutDial(spec)).parts.map((p) => p.name) // ['stand-cheek', 'stand-foot', 'stand-rail', 'stand-cross']
 */
export function flatStand(layout: DialLayout, options: Partial<FlatStandOptions> = {}): SizedStand {
  const z = standDimensions(layout);
  const tool = options.reliefToolRadiusMm ?? reliefToolRadius(layout.spec);
  const tol = options.chordToleranceMm ?? layout.spec.cutFiles?.chordTolerance ?? CHORD_TOLERANCE_MM;
  const T = z.thicknessMm;
  const c = z.clearanceMm;
  const phi = z.tiltRad;
  const W = z.plateWidthMm;
  const L = z.plateLengthMm;
  const xc = z.cheekOffsetMm;
  const fb = z.footWidthMm;
  const cos = Math.cos(phi);
  const sin = Math.sin(phi);
  const material = z.material;

  // ---- cheek, in its own (u, v) = (stand y, stand z) drawing
  const uA = z.toeMm;
  const vA = T + z.lowEndMm;
  const uB = uA + L * cos;
  const vB = vA + L * sin;
  const seatLine = (s: number): Vec2 => [uA + s * cos, vA + s * sin];
  const n2: Vec2 = [-sin, cos]; // the seat's normal in the cheek's plane
  // The high end: square to the seat for a depth D below it (no acute spike, and
  // room for the last tab's relief), then plumb down to the foot line.
  const D = Math.min(Math.max(2 * T, 8), (vB - T) / 2);
  const B2: Vec2 = [uB + D * sin, vB - D * cos];
  const uEnd = B2[0];
  const footCentres = [fb / 2, uEnd - fb / 2];
  const footTab = fb / 2;
  const outer: Vec2[] = [[0, T]];
  const footTabRoot: Vec2[] = [];
  for (const u of footCentres) {
    footTabRoot.push([u - footTab / 2, T]);
    outer.push([u - footTab / 2, T], [u - footTab / 2, 0], [u + footTab / 2, 0], [u + footTab / 2, T]);
  }
  outer.push([uEnd, T], B2, [uB, vB]);
  const railTabRoot: Vec2[] = new Array(z.rails.length);
  for (let k = z.rails.length - 1; k >= 0; k--) {
    const r = z.rails[k];
    const sc = r.lowerEdgeMm + r.widthMm / 2;
    const half = r.widthMm / 4;
    const hi = seatLine(sc + half);
    const lo = seatLine(sc - half);
    railTabRoot[k] = hi;
    outer.push(...tabCorners(hi, lo, T, n2));
  }
  // A toe steps down by one sheet thickness from the seat's lower corner, so
  // that corner stays convex and the first seat tab keeps its relief room.
  if (uA > 1e-9) outer.push([uA, vA], [uA, vA - T], [0, vA - T]);
  else outer.push([0, vA]);

  // The cross member: at the middle of the run when it has room there, else in the middle of the toe.
  const slotHalf = T / 2 + c;
  const roomInRun = L * cos / 2 >= slotHalf + 2 * T;
  const us = roomInRun ? uA + (L * cos) / 2 : uA / 2;
  const topAt = (u: number) => (u <= uA ? vA - T : vA + (u - uA) * Math.tan(phi));
  const bandTop = Math.min(topAt(us - slotHalf), roomInRun ? Infinity : vA - T);
  const H = bandTop - T;
  // The cross member's height (its tabs are half that): half the cheek's there, more when a router's reliefs need the room.
  const hs = Math.max(H / 2, Math.min(z.reliefRoomMm, 0.8 * H));
  const vsc = T + H / 2; // slot centre height
  const crossTab = hs / 2;
  const crossSlot: NominalSlot = { centre: [us, vsc], axis: [0, 1], lengthMm: crossTab + 2 * c, widthMm: T + 2 * c };
  // Inside corners relieved for a round tool: the tab roots along the foot line and along the seat line.
  const cheekOutline = relieveAlong(relieveAlong(outer, [0, T], [1, 0], tool, tol), seatLine(0), [-cos, -sin], tool, tol);
  const footTabVertex = footTabRoot.map((p) => indexOf(cheekOutline, p));
  const railTabVertex = railTabRoot.map((p) => indexOf(cheekOutline, p));
  const cheek: SheetPart = {
    name: 'stand-cheek',
    material,
    thicknessMm: T,
    quantity: 2,
    outer: path(cheekOutline),
    inner: [slotCut(crossSlot, tool, tol)],
  };

  // ---- feet
  const Lf = z.footLengthMm;
  const anchors = z.anchor ? { offsetMm: z.anchorOffsetMm, diameterMm: z.anchorDiameterMm } : null;
  const { part: foot, slots: footSlots } = standFoot({ material, thicknessMm: T, clearanceMm: c, lengthMm: Lf, widthMm: fb, cheekOffsetMm: xc, anchors }, tool, tol);

  // ---- seat rails, drilled at the plate's own hole centres
  const fixings = mountingFixings(layout);
  const railSlots = z.rails.map((r) => cheekTabSlots(W, r.widthMm, xc, T, c, -1));
  const railParts = z.rails.map((r, k): SheetPart => {
    const inner: (Path | Circle)[] = railSlots[k].map((sl) => slotCut(sl, tool, tol));
    for (const f of fixings) {
      const y = f.plateMm[1] - r.lowerEdgeMm;
      if (y > 0 && y < r.widthMm) inner.push({ kind: 'circle', cx: f.plateMm[0], cy: y, radiusMm: f.diameterMm / 2 });
    }
    return { name: 'stand-rail', material, thicknessMm: T, outer: rectPath(W, r.widthMm), inner };
  });
  // Identical rails are one part with a quantity ('stand-rail'); different ones are 'stand-rail-a', 'stand-rail-b', …
  const keys = railParts.map((p) => JSON.stringify([p.outer, p.inner]));
  const unique = [...new Set(keys)];
  const railName = (key: string) => (unique.length === 1 ? 'stand-rail' : `stand-rail-${String.fromCharCode(97 + unique.indexOf(key))}`);
  const rails: SheetPart[] = unique.map((key) => {
    const count = keys.filter((k) => k === key).length;
    return { ...railParts[keys.indexOf(key)], name: railName(key), ...(count > 1 ? { quantity: count } : {}) };
  });
  const railPartName = keys.map(railName);

  // ---- cross member: body between the cheeks' inner faces, tabs through them
  const { outline: crossOutline, tabVertex: crossTabVertex } = crossMemberOutline(xc, T, hs, tool, tol);
  const cross: SheetPart = { name: 'stand-cross', material, thicknessMm: T, outer: path(crossOutline), inner: [] };

  // ---- intended placements (stand frame: x across, y toward the pole, z up)
  const X: Vec3 = [1, 0, 0];
  const Y: Vec3 = [0, 1, 0];
  const Z: Vec3 = [0, 0, 1];
  const up: Vec3 = [0, cos, sin];
  const nrm: Vec3 = [0, -sin, cos];
  const place = (origin: Vec3, e1: Vec3, e2: Vec3, normal: Vec3): PartPlacement => ({ origin, e1, e2, normal });
  const instances: StandInstance[] = [
    { id: 'cheek-1', part: cheek.name, placement: place([-xc, 0, 0], Y, Z, X) },
    { id: 'cheek-2', part: cheek.name, placement: place([xc, 0, 0], Y, Z, X) },
    { id: 'foot-front', part: foot.name, placement: place([-Lf / 2, 0, T / 2], X, Y, Z) },
    { id: 'foot-rear', part: foot.name, placement: place([-Lf / 2, uEnd - fb, T / 2], X, Y, Z) },
    ...z.rails.map((r, k): StandInstance => {
      const [u, v] = seatLine(r.lowerEdgeMm);
      return { id: `rail-${k + 1}`, part: railPartName[k], placement: place([-W / 2, u + (T / 2) * n2[0], v + (T / 2) * n2[1]], X, up, nrm) };
    }),
    { id: 'cross', part: cross.name, placement: place([-xc - T / 2, us, vsc - hs / 2], X, Z, [0, -1, 0]) },
  ];
  const joints: StandJoint[] = [];
  for (const [i, cheekId] of ['cheek-1', 'cheek-2'].entries()) {
    joints.push({ tab: { instance: cheekId, vertex: footTabVertex[0] }, slot: { instance: 'foot-front', inner: i, ...footSlots[i] }, entersFrom: 'front' });
    joints.push({ tab: { instance: cheekId, vertex: footTabVertex[1] }, slot: { instance: 'foot-rear', inner: i, ...footSlots[i] }, entersFrom: 'front' });
    z.rails.forEach((_, k) => joints.push({ tab: { instance: cheekId, vertex: railTabVertex[k] }, slot: { instance: `rail-${k + 1}`, inner: i, ...railSlots[k][i] }, entersFrom: 'back' }));
  }
  // The cross member's −x end tab runs down (r0→r1 = −z), its +x end tab up.
  joints.push({ tab: { instance: 'cross', vertex: crossTabVertex[0] }, slot: { instance: 'cheek-1', inner: 0, ...crossSlot, axis: [0, -1] }, entersFrom: 'front' });
  joints.push({ tab: { instance: 'cross', vertex: crossTabVertex[1] }, slot: { instance: 'cheek-2', inner: 0, ...crossSlot }, entersFrom: 'back' });

  const [su, sv] = seatLine(0);
  const seat = place([-W / 2, su + T * n2[0], sv + T * n2[1]], X, up, nrm);
  const halfX = Math.max(Lf, W) / 2;
  return {
    parts: [cheek, foot, ...rails, cross],
    instances,
    joints,
    dims: {
      material,
      thicknessMm: T,
      clearanceMm: c,
      tiltRad: phi,
      cheekOffsetMm: xc,
      rails: z.rails,
      footWidthMm: fb,
      footLengthMm: Lf,
      anchorOffsetMm: z.anchorOffsetMm,
      lowEndMm: z.lowEndMm,
      footprintLengthMm: uEnd,
      toeMm: z.toeMm,
      heightMm: z.heightMm,
    },
    seat,
    footprint: { xMinMm: -halfX, xMaxMm: halfX, yMinMm: 0, yMaxMm: uEnd },
    sizing: z,
  };
}
