import type { DialLayout } from '../polar/layoutDial.ts';
import type { PlateDrawing } from '../plate/plateDrawing.ts';
import { partsPlan } from '../parts/partsPlan.ts';
import { dialGnomon } from '../parts/dialParts.ts';
import type { Circle, Path, Vec2 } from '../types.ts';
import { CHORD_TOLERANCE_MM } from './arcPoints.ts';
import { relievedSlot, relieveNodusNotch, relieveTabRoots, type SlotRelief } from './cornerRelief.ts';
import { roundedRectPath } from '../outline/roundedRect.ts';
import type { SheetPart } from './sheetPart.ts';
import { standParts } from '../stand/standSheetParts.ts';

/** What every part source reads: the layout, its plate drawing and the resolved options. */
export interface SheetPartContext {
  readonly layout: DialLayout;
  readonly drawing: PlateDrawing;
  /** Radius of the round tool the inside-corner reliefs are made for, mm; 0 = no relief. */
  readonly reliefToolRadiusMm: number;
  /** Largest gap between an arc and its polyline, mm. */
  readonly chordToleranceMm: number;
}

/** One kind of flat part: the parts of it this job needs (none, one, or several). */
export type SheetPartSource = (ctx: SheetPartContext) => readonly SheetPart[];

/**
 * The radius of the tool the inside-corner reliefs are made for: the router
 * tool (process.kerf = tool diameter) with `cutFiles.relief` "auto" or "on",
 * the kerf of another cutting process with "on"; 0 (no relief) otherwise.
 * @example reliefToolRadius(spec) // 1.5875 for a router with a 3.175 mm tool
 */
export function reliefToolRadius(spec: DialLayout['spec']): number {
  const relief = spec.cutFiles.relief;
  if (spec.process.method === 'print' || relief === 'off') return 0;
  if (relief === 'auto' && spec.process.method !== 'router') return 0;
  return spec.process.kerf / 2;
}

/** How a flat part is drawn: its stock, the tool its inside corners are relieved for, the chord tolerance. */
export interface FlatPartOptions {
  readonly material: string;
  readonly thicknessMm: number;
  /** radius of the round tool the inside corners are relieved for, mm; 0 = no relief */
  readonly reliefToolRadiusMm: number;
  readonly chordToleranceMm: number;
}

/**
 * A plate drawing as a flat part (any face type): rounded outline, mounting
 * holes, gnomon slots relieved for the tool, engraved lines and text, and the
 * reference lines.
 * @example plateSheetPart(drawing, { material: 'aluminium', thicknessMm: 3, reliefToolRadiusMm: 0, chordToleranceMm: 0.005 })
 */
export function plateSheetPart(drawing: PlateDrawing, o: FlatPartOptions): SheetPart {
  return {
    name: 'plate',
    material: o.material,
    thicknessMm: o.thicknessMm,
    outer: roundedRectPath(drawing.outline, o.chordToleranceMm),
    inner: [...drawing.holes, ...drawing.slots.map((s) => reverse(relievedSlot(s, o.reliefToolRadiusMm, o.chordToleranceMm).path))],
    lines: drawing.lines,
    text: drawing.text,
    reference: drawing.reference,
    ...(drawing.lowerFace ? { lowerFace: drawing.lowerFace } : {}),
  };
}

/**
 * A gnomon fin's (y, z) profile (counter-clockwise, the face on z = 0, tabs
 * below it) laid flat as a part: style along +x, height along +y, origin at
 * the lower-left corner of the nominal part (x = profile y − min y,
 * y = profile z − min z), T-bone relief at the tab roots and a round nodus
 * notch for the tool (`relieveTabRoots`, `relieveNodusNotch`), and the face
 * line on the reference list.
 * @example finSheetPart(gnomon.profile, { material: 'aluminium', thicknessMm: 3, reliefToolRadiusMm: 1.5875, chordToleranceMm: 0.005 })
 */
export function finSheetPart(profile: readonly Vec2[], o: FlatPartOptions, name = 'gnomon'): SheetPart {
  const y0 = Math.min(...profile.map((p) => p[0]));
  const z0 = Math.min(...profile.map((p) => p[1]));
  const flat = profile.map(([y, z]): Vec2 => [y - y0, z - z0]);
  const faceY = -z0;
  const length = Math.max(...flat.map((p) => p[0]));
  return {
    name,
    material: o.material,
    thicknessMm: o.thicknessMm,
    outer: { kind: 'path', closed: true, points: relieveTabRoots(relieveNodusNotch(flat, o.reliefToolRadiusMm, faceY, o.chordToleranceMm), o.reliefToolRadiusMm, faceY, o.chordToleranceMm) },
    inner: [],
    reference: [{ label: 'face line', path: { kind: 'path', closed: false, points: [[0, faceY], [length, faceY]] } }],
  };
}

/** The dial plate: rounded outline, mounting holes, gnomon slots (relieved for the tool), lines, text and reference. */
export const platePart: SheetPartSource = ({ layout, drawing, reliefToolRadiusMm, chordToleranceMm }) => [
  plateSheetPart(drawing, { material: layout.spec.plate.material, thicknessMm: layout.plate.thicknessMm, reliefToolRadiusMm, chordToleranceMm }),
];

/**
 * The gnomon fin laid flat (finSheetPart), when it is cut (gnomon.dxf),
 * from the plate's stock or from separate stock.
 */
export const gnomonPart: SheetPartSource = ({ layout, reliefToolRadiusMm, chordToleranceMm }) => {
  const plan = partsPlan(layout);
  if (!plan.files.includes('gnomon.dxf')) return [];
  const g = dialGnomon(plan, layout);
  const material = plan.gnomonFrom === 'sheet' ? layout.spec.plate.material : 'separate stock';
  return [finSheetPart(g.profile, { material, thicknessMm: g.thicknessMm, reliefToolRadiusMm, chordToleranceMm })];
};

/**
 * Every kind of flat part, in the order they are listed. Add a part: one
 * source function and one entry here.
 */
export const SHEET_PART_SOURCES: readonly SheetPartSource[] = [platePart, gnomonPart, standParts];

/**
 * The job's flat parts cut from sheet stock, each at nominal size in its own
 * frame (SheetPart): the plate, and the gnomon when it is cut (from the
 * plate's stock, or from separate stock with `parts.gnomonFrom: separate`).
 * Inside corners a round tool cannot reach get their relief here, so every
 * CAM (and umbrafab's own tool paths) that offsets these outlines by the tool
 * radius leaves them at full size.
 *
 * @param options reliefToolRadiusMm (default from the spec: reliefToolRadius),
 *   chordToleranceMm (default spec cutFiles.chordTolerance)
 * @example sheetParts(layout, plateDrawing(layout)).map((p) => p.name) // ['plate', 'gnomon']
 */
export function sheetParts(layout: DialLayout, drawing: PlateDrawing, options: Partial<Pick<SheetPartContext, 'reliefToolRadiusMm' | 'chordToleranceMm'>> = {}): SheetPart[] {
  const ctx: SheetPartContext = {
    layout,
    drawing,
    reliefToolRadiusMm: options.reliefToolRadiusMm ?? reliefToolRadius(layout.spec),
    chordToleranceMm: options.chordToleranceMm ?? layout.spec.cutFiles?.chordTolerance ?? CHORD_TOLERANCE_MM,
  };
  return SHEET_PART_SOURCES.flatMap((source) => source(ctx));
}

/** Which relief each of the plate's slots gets for a tool of radius r (for the report). */
export function slotReliefs(drawing: PlateDrawing, toolRadiusMm: number): SlotRelief[] {
  return drawing.slots.map((s) => relievedSlot(s, toolRadiusMm).relief);
}

function reverse(p: Path): Path {
  return { ...p, points: [...p.points].reverse() };
}

/** The inner features of a part that are circles (holes). */
export function partHoles(part: SheetPart): Circle[] {
  return part.inner.filter((f): f is Circle => f.kind === 'circle');
}
