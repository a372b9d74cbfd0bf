import type { DialLayout } from '../polar/layoutDial.ts';
import { preferredLength, screwForHole, type MetricSize } from './metricFasteners.ts';
import type { SizedStand } from './flatStand.ts';

/** One line of the fastener table (report.json `fasteners`, install.md). */
export interface FastenerRow {
  /** what it fixes, in a fitter's words */
  readonly use: string;
  /** the part to buy, e.g. 'pan-head machine screw ISO 7045, stainless A4' */
  readonly item: string;
  /** metric size, e.g. 'M5' */
  readonly size: string;
  /** length to buy, mm (screws: under the head, or overall for a countersunk head), or null where it does not apply */
  readonly lengthMm: number | null;
  readonly count: number;
  /** 'none', or the countersink to cut (90°, its diameter on the face) */
  readonly countersink: string;
}

/** Least stock kept under a countersunk head's cone, mm (common practice: never countersink a sheet right through). */
export const COUNTERSINK_LAND_MM = 0.3;
/** Extra diameter of a countersink over the screw head, mm (the head then sits just below the face; common practice). */
export const COUNTERSINK_OVERSIZE_MM = 0.4;
/** Threads left beyond a nut, in pitches (common practice: two full threads). */
export const THREADS_BEYOND_NUT = 2;
/** Depth a ground anchor reaches into concrete, mm, as a first figure (typical for M6–M10 through-bolt anchors, common practice; the anchor maker's data rules). */
export const ANCHOR_EMBED_MM = 45;

/** Length to buy for a bolt through `clampMm` of stock with a washer and nut, rounded up to a preferred length. */
function boltLength(s: MetricSize, clampMm: number): number {
  return preferredLength(clampMm + s.washerMm + s.nutHeightMm + THREADS_BEYOND_NUT * s.pitchMm);
}

/**
 * The plate's screws into seat rails of `railThicknessMm`: one per plate
 * hole (ISO 273 medium clearance), countersunk (ISO 10642, the plate's holes
 * countersunk 90° to the head + COUNTERSINK_OVERSIZE_MM) when the plate
 * takes the head with COUNTERSINK_LAND_MM to spare, else a low pan head
 * (ISO 7045); a washer and a nylon-insert nut under each rail. Stainless
 * outdoors. Shared by the polar and the equatorial stands.
 *
 * @example seatRailScrewRows(METRIC_SIZES[2], 4, 5.5, 3, 3)[0].lengthMm // 16
 */
export function seatRailScrewRows(s: MetricSize, count: number, holeDiaMm: number, plateThicknessMm: number, railThicknessMm: number): FastenerRow[] {
  const Tp = plateThicknessMm;
  const sink = Tp >= s.csHeadHeightMm + COUNTERSINK_LAND_MM;
  return [
    {
      use: 'plate to seat rails',
      item: `${sink ? 'countersunk machine screw ISO 10642' : 'pan-head machine screw ISO 7045'}, stainless A4${holeDiaMm < s.clearanceHoleMm - 1e-9 ? ` (first drill the plate's and rails' Ø ${holeDiaMm.toFixed(1)} mm holes out to Ø ${s.clearanceHoleMm} mm)` : ''}`,
      size: s.name,
      lengthMm: boltLength(s, Tp + railThicknessMm),
      count,
      countersink: sink ? `90° to Ø ${(s.csHeadMm + COUNTERSINK_OVERSIZE_MM).toFixed(1)} mm on the face` : 'none',
    },
    { use: 'under each seat rail', item: 'plain washer ISO 7089, stainless A4', size: s.name, lengthMm: null, count, countersink: 'none' },
    { use: 'under each seat rail', item: 'nylon-insert lock nut DIN 985, stainless A4', size: s.name, lengthMm: null, count, countersink: 'none' },
  ];
}

/**
 * The fastener table of a dial on its flat-pack stand:
 * - plate to seat rails: one screw per plate hole (size from the hole,
 *   ISO 273 medium clearance), through the plate and the rail, a washer
 *   and a nylon-insert nut under the rail; countersunk (ISO 10642, the
 *   plate's holes countersunk 90° to the head + COUNTERSINK_OVERSIZE_MM)
 *   when the plate is thick enough to take the head with COUNTERSINK_LAND_MM
 *   to spare, else a low pan head (ISO 7045) on the face;
 * - ground anchors through the feet (size from stand.anchorDiameter), their
 *   length for concrete with ANCHOR_EMBED_MM embedment as a first figure.
 * Stainless steel outdoors; no solar math, only the layout's holes and the
 * stand's sizes.
 *
 * @example fastenerTable(layout, flatStand(layout))[0].size // 'M5'
 */
export function fastenerTable(layout: DialLayout, stand: SizedStand): FastenerRow[] {
  const z = stand.sizing;
  const rows: FastenerRow[] = [];
  const holes = layout.plate.holes;
  const s = z.screw;
  if (s && holes.length > 0) rows.push(...seatRailScrewRows(s, holes.length, 2 * holes[0].radiusMm, z.plateThicknessMm, z.thicknessMm));
  const a = z.anchor;
  const count = layout.spec.stand.anchors;
  if (a && count > 0) rows.push(groundAnchorRow(a, count, z.thicknessMm));
  return rows;
}

/** Ground anchors through a stand's feet of `footThicknessMm` (concrete: ANCHOR_EMBED_MM embedment as a first figure). */
export function groundAnchorRow(a: MetricSize, count: number, footThicknessMm: number): FastenerRow {
  return {
    use: 'feet to the ground',
    item: 'ground anchor (concrete: through-bolt anchor; timber: coach screw), stainless, with washer',
    size: a.name,
    lengthMm: preferredLength(footThicknessMm + a.washerMm + a.nutHeightMm + ANCHOR_EMBED_MM),
    count,
    countersink: 'none',
  };
}

/** The same table for a printed wedge: its mounting holes through the toe into the ground (parts.wedge). */
export function wedgeFastenerRows(layout: DialLayout): FastenerRow[] {
  const w = layout.spec.parts.wedge;
  const s = screwForHole(w.holeDiameter);
  if (w.holes === 0 || s === null) return [];
  return [
    {
      use: 'wedge toe to the ground',
      item: w.countersink > 0 ? 'countersunk wood or anchor screw, stainless' : 'pan-head wood or anchor screw, stainless',
      size: s.name,
      lengthMm: preferredLength(w.base + ANCHOR_EMBED_MM),
      count: w.holes,
      countersink: w.countersink > 0 ? `90° to Ø ${w.countersink.toFixed(1)} mm (moulded in the wedge)` : 'none',
    },
  ];
}
