import { ANCHOR_EMBED_MM, THREADS_BEYOND_NUT, type FastenerRow } from '../stand/fastenerTable.ts';
import { preferredLength, screwForHole, type MetricSize } from '../stand/metricFasteners.ts';
import type { PlanarLayout } from './layoutPlanar.ts';

/**
 * Free height between the pillar top and the plate's underside on the
 * levelling nuts, mm (common practice: room for a nut and a washer with a few
 * millimetres to take up an uneven top, and for rain to run off under the
 * plate).
 */
export const PILLAR_LEVELLING_GAP_MM = 12;

/** How a horizontal plate is fixed to the top of its pillar: plain data, mm. */
export interface PillarFixing {
  /** the stud size, from the plate's corner holes (ISO 273 medium clearance) */
  readonly size: string;
  readonly studCount: number;
  /** stud length to cut or buy, mm */
  readonly studLengthMm: number;
  /** depth the stud goes into the pillar, mm (a first figure; the resin maker's data rule) */
  readonly embedMm: number;
  /** pillar top to the plate's underside, mm */
  readonly levellingGapMm: number;
  /** the plate's hole centres, mm from its lower-left corner: the marks to drill in the pillar */
  readonly holesMm: readonly (readonly [number, number])[];
  readonly fasteners: readonly FastenerRow[];
}

/**
 * The pillar fixing of a horizontal face (common practice for dials on
 * stone or concrete pillars): one stainless threaded stud per corner hole,
 * set in injection resin ANCHOR_EMBED_MM into the pillar; a levelling nut and
 * washer under the plate at PILLAR_LEVELLING_GAP_MM, a washer and a
 * nylon-insert nut over it, two threads beyond. The stud size is the largest
 * whose clearance hole the plate's holes take. Null for other faces or a
 * plate with no holes (or holes too small for M3): nothing to fix through.
 *
 * @example pillarFixing(layoutPlanar(gardenSpec))?.studLengthMm // 70 (M5, 3 mm plate)
 */
export function pillarFixing(layout: PlanarLayout): PillarFixing | null {
  const holes = layout.plate.holes;
  if (layout.faceType !== 'horizontal' || holes.length === 0) return null;
  const s = screwForHole(2 * holes[0].radiusMm);
  if (s === null) return null;
  const length = studLength(s, layout.plate.thicknessMm);
  const n = holes.length;
  const fasteners: FastenerRow[] = [
    {
      use: 'plate to pillar',
      item: 'threaded stud (studding cut to length), stainless A4, set in injection resin for stone or concrete',
      size: s.name,
      lengthMm: length,
      count: n,
      countersink: 'none',
    },
    { use: 'levelling, under the plate', item: 'hex nut ISO 4032, stainless A4', size: s.name, lengthMm: null, count: n, countersink: 'none' },
    { use: 'under and over the plate', item: 'plain washer ISO 7089, stainless A4', size: s.name, lengthMm: null, count: 2 * n, countersink: 'none' },
    { use: 'over the plate', item: 'nylon-insert lock nut DIN 985, stainless A4', size: s.name, lengthMm: null, count: n, countersink: 'none' },
  ];
  return {
    size: s.name,
    studCount: n,
    studLengthMm: length,
    embedMm: ANCHOR_EMBED_MM,
    levellingGapMm: PILLAR_LEVELLING_GAP_MM,
    holesMm: holes.map((c) => [c.cx, c.cy] as const),
    fasteners,
  };
}

/** Embedment + levelling gap + plate + washer + nut + THREADS_BEYOND_NUT pitches, up to a preferred length. */
function studLength(s: MetricSize, plateThicknessMm: number): number {
  return preferredLength(ANCHOR_EMBED_MM + PILLAR_LEVELLING_GAP_MM + plateThicknessMm + s.washerMm + s.nutHeightMm + THREADS_BEYOND_NUT * s.pitchMm);
}
