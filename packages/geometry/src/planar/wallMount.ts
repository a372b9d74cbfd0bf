import { ANCHOR_EMBED_MM, type FastenerRow } from '../stand/fastenerTable.ts';
import { preferredLength, screwForHole, SCREW_LENGTHS_MM, type MetricSize } from '../stand/metricFasteners.ts';
import type { SheetPart } from '../sheet/sheetPart.ts';
import type { Circle, Path, Vec2 } from '../types.ts';
import { clipPolyline } from '../polar/clipPolyline.ts';
import type { PlanarLayout } from './layoutPlanar.ts';

/** Rim of the wall mount beyond the dial plate on every side, mm: room for the wall anchors (common practice: anchors well clear of the plate's own fixings). */
export const WALL_MOUNT_RIM_MM = 30;
/** Wall anchor hole, mm: clearance for a 6 mm screw into a wall plug (ISO 273 medium, M6). */
export const WALL_ANCHOR_HOLE_MM = 6.6;

/** Stock a thread can be tapped into and hold outdoors (common practice: metals; plastics, timber and stone take inserts or plugs instead). */
const TAPPABLE = new Set(['aluminium', 'brass', 'stainless', 'steel']);
/** Fewest whole threads engaged in a tapped sheet for a light fixing (common practice for thin sheet: three). */
export const MIN_THREADS_ENGAGED = 3;

/**
 * How the dial plate holds on its mount:
 * - `tapped`: machine screws into threads tapped in a metal mount, no
 *   longer than plate + mount so that no tip stands proud of the mount's
 *   back (it lies flat on the wall), with at least MIN_THREADS_ENGAGED
 *   threads in the mount;
 * - `through`: the mount's dial holes are clearance holes like the plate's,
 *   and each screw goes through plate and mount into a wall plug set behind
 *   it (a mount that cannot hold a thread, or too thin for enough of one).
 */
export type MountDialFixing = 'tapped' | 'through';

/** One dial-plate-to-mount fixing: the same centre in the plate drawing and on the mount. */
export interface WallMountFixing {
  readonly index: number;
  /** in plate.dxf's frame (origin the plate's lower-left corner), mm */
  readonly plateMm: Vec2;
  /** in mount.dxf's frame (origin the mount's lower-left corner), mm */
  readonly mountMm: Vec2;
  /** the plate's hole, mm */
  readonly plateHoleMm: number;
  /** the mount's hole, mm: tapped, the tap drill of the screw the plate's hole takes (nominal − pitch), tapped through; through, the plate's clearance hole */
  readonly mountHoleMm: number;
}

/** The backing plate a wall face is fixed to: plain data, every length mm. */
export interface WallMount {
  readonly part: SheetPart;
  /** where the dial plate's lower-left corner sits on the mount */
  readonly plateAtMm: Vec2;
  readonly fixings: readonly WallMountFixing[];
  /** how the dial plate holds on the mount (`MountDialFixing`) */
  readonly dialFixing: MountDialFixing;
  /** tapped: the length of thread in the mount, mm (screw length − plate thickness); through: null */
  readonly threadEngagementMm: number | null;
  /** wall anchor hole centres, mount frame */
  readonly anchors: readonly Vec2[];
  readonly fasteners: readonly FastenerRow[];
}

/**
 * The mounting plate of a wall face (vertical, declining/reclining, or
 * meridian): a flat plate of the dial plate's stock, WALL_MOUNT_RIM_MM larger
 * on every side, fixed to the wall first through four anchor holes in its
 * rim, the dial plate then screwed to it through its own holes at the same
 * centres (read from the layout, so the two never disagree): into tapped
 * holes, or through into wall plugs (`MountDialFixing`). Its reference layer carries the dial plate's outline, the
 * substyle through the root and the plumb and level lines through the root,
 * for marking it on the wall. Null for faces that do not hang on a wall, or
 * a plate with no holes.
 *
 * @example wallMount(layoutPlanar(spec))?.anchors.length // 4
 */
export function wallMount(layout: PlanarLayout): WallMount | null {
  if (layout.faceType !== 'vertical' && layout.faceType !== 'meridian') return null;
  const { plate } = layout;
  if (plate.holes.length === 0) return null;
  const screw = screwForHole(2 * plate.holes[0].radiusMm);
  if (screw === null) return null;
  const R = WALL_MOUNT_RIM_MM;
  const W = plate.widthMm + 2 * R;
  const L = plate.lengthMm + 2 * R;
  const t = plate.thicknessMm;
  const tappedLength = layout.spec.process.method !== 'print' && TAPPABLE.has(layout.spec.plate.material) ? tappedScrewLength(screw, t) : null;
  const tap = screw.nominalMm - screw.pitchMm;
  const fixings: WallMountFixing[] = plate.holes.map((h, i) => ({
    index: i + 1,
    plateMm: [h.cx, h.cy],
    mountMm: [h.cx + R, h.cy + R],
    plateHoleMm: 2 * h.radiusMm,
    mountHoleMm: tappedLength === null ? 2 * h.radiusMm : tap,
  }));
  const a = R / 2;
  const anchors: Vec2[] = [[a, a], [W - a, a], [W - a, L - a], [a, L - a]];
  const circle = ([cx, cy]: Vec2, d: number): Circle => ({ kind: 'circle', cx, cy, radiusMm: d / 2 });
  const path = (points: Vec2[], closed = false): Path => ({ kind: 'path', points, closed });
  const root: Vec2 = [plate.substyleX + R, plate.faceOriginY + R];
  const turn = layout.faceType === 'vertical' ? (layout.plateTurnDeg * Math.PI) / 180 : 0;
  // The plumb line's direction in the plate frame (as planarPlateDrawing draws it), and the level line square to it.
  const up: Vec2 = [-Math.sin(turn), Math.cos(turn)];
  const span = Math.hypot(W, L) / 2;
  const through = (d: Vec2): Vec2[] => [[root[0] - d[0] * span, root[1] - d[1] * span], [root[0] + d[0] * span, root[1] + d[1] * span]];
  const box = { xMinMm: 0, xMaxMm: W, yMinMm: 0, yMaxMm: L };
  const reference = [
    { label: 'dial plate outline', path: path([[R, R], [R + plate.widthMm, R], [R + plate.widthMm, R + plate.lengthMm], [R, R + plate.lengthMm]], true) },
    { label: 'substyle', path: path([[root[0], R], [root[0], R + plate.lengthMm]]) },
    ...clipPolyline(through(up), box).map((p) => ({ label: 'plumb line', path: path(p) })),
    ...clipPolyline(through([up[1], -up[0]]), box).map((p) => ({ label: 'level line', path: path(p) })),
  ];
  const part: SheetPart = {
    name: 'mount',
    material: layout.spec.plate.material,
    thicknessMm: plate.thicknessMm,
    outer: path([[0, 0], [W, 0], [W, L], [0, L]], true),
    inner: [...fixings.map((f) => circle(f.mountMm, f.mountHoleMm)), ...anchors.map((p) => circle(p, WALL_ANCHOR_HOLE_MM))],
    reference,
  };
  const dialRow: FastenerRow =
    tappedLength !== null
      ? {
          use: 'dial plate to mount',
          item: `pan-head machine screw ISO 7045, stainless A4, into the mount's holes tapped ${screw.name} (tap drill Ø ${tap.toFixed(1)} mm; ${(tappedLength - t).toFixed(1)} mm of thread in the mount, the tip inside it)`,
          size: screw.name,
          lengthMm: tappedLength,
          count: fixings.length,
          countersink: 'none',
        }
      : {
          use: 'dial plate through the mount to the wall',
          item: `pan-head wood or anchor screw, stainless, through plate and mount into a wall plug (timber: straight in)`,
          // a wood or anchor screw is sized by its diameter, not a metric thread
          size: `Ø ${screw.nominalMm.toFixed(1)}`,
          lengthMm: preferredLength(2 * t + ANCHOR_EMBED_MM),
          count: fixings.length,
          countersink: 'none',
        };
  const fasteners: FastenerRow[] = [
    dialRow,
    {
      use: 'mount to the wall',
      item: 'wall plug and stainless screw with washer (masonry: plug and screw sized for the wall; timber: coach screw)',
      size: 'M6',
      lengthMm: preferredLength(t + ANCHOR_EMBED_MM),
      count: anchors.length,
      countersink: 'none',
    },
  ];
  return { part, plateAtMm: [R, R], fixings, dialFixing: tappedLength === null ? 'through' : 'tapped', threadEngagementMm: tappedLength === null ? null : tappedLength - t, anchors, fasteners };
}

/**
 * The longest preferred machine-screw length that clamps a plate of `t`
 * onto a mount of `t` without its tip passing the mount's back (≤ 2t), with
 * at least MIN_THREADS_ENGAGED threads in the mount; null when none fits.
 *
 * @example tappedScrewLength(M5, 3) // 6: 3 mm of thread, 3.75 threads of 0.8 mm
 */
export function tappedScrewLength(screw: MetricSize, t: number): number | null {
  const fits = SCREW_LENGTHS_MM.filter((l) => l <= 2 * t + 1e-9 && l - t >= MIN_THREADS_ENGAGED * screw.pitchMm - 1e-9);
  return fits.length > 0 ? fits[fits.length - 1] : null;
}
