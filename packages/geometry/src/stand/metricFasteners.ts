/**
 * Metric screw, nut and washer dimensions used to size the fixings, mm.
 * Values recalled from the standards' tables (memory), common practice for
 * choosing: clearance holes ISO 273 "medium" series; 90° countersunk heads
 * ISO 10642 (head diameter dk and height k, theoretical maximum); prevailing
 * torque (nylon insert) nuts DIN 985 height m; plain washers ISO 7089 outer
 * diameter and thickness; coarse thread pitch ISO 261.
 */
export interface MetricSize {
  /** 'M5' */
  readonly name: string;
  readonly nominalMm: number;
  readonly pitchMm: number;
  /** ISO 273 medium clearance hole */
  readonly clearanceHoleMm: number;
  /** ISO 10642 head diameter and height */
  readonly csHeadMm: number;
  readonly csHeadHeightMm: number;
  /** DIN 985 nylon-insert nut height */
  readonly nutHeightMm: number;
  /** ISO 7089 washer outer diameter and thickness */
  readonly washerOdMm: number;
  readonly washerMm: number;
}

const row = (name: string, d: number, p: number, hole: number, dk: number, k: number, m: number, od: number, h: number): MetricSize => ({
  name,
  nominalMm: d,
  pitchMm: p,
  clearanceHoleMm: hole,
  csHeadMm: dk,
  csHeadHeightMm: k,
  nutHeightMm: m,
  washerOdMm: od,
  washerMm: h,
});

/** Smallest first. */
export const METRIC_SIZES: readonly MetricSize[] = [
  row('M3', 3, 0.5, 3.4, 6.72, 1.86, 4.0, 7, 0.5),
  row('M4', 4, 0.7, 4.5, 8.96, 2.48, 5.0, 9, 0.8),
  row('M5', 5, 0.8, 5.5, 11.2, 3.1, 5.0, 10, 1.0),
  row('M6', 6, 1.0, 6.6, 13.44, 3.72, 6.0, 12, 1.6),
  row('M8', 8, 1.25, 9.0, 17.92, 4.96, 8.0, 16, 1.6),
  row('M10', 10, 1.5, 11.0, 22.4, 6.2, 10.0, 20, 2.0),
  row('M12', 12, 1.75, 13.5, 26.88, 7.44, 12.0, 24, 2.5),
];

/** Preferred screw lengths, mm (ISO 888 series, memory). */
export const SCREW_LENGTHS_MM: readonly number[] = [6, 8, 10, 12, 16, 20, 25, 30, 35, 40, 45, 50, 55, 60, 65, 70, 75, 80, 90, 100, 110, 120, 130, 140, 150];

/**
 * The largest metric size whose ISO 273 medium clearance hole is no wider
 * than `holeMm` (a 5.5 mm hole takes M5), or null when even M3 does not pass.
 * @example screwForHole(5.5).name // 'M5'
 */
export function screwForHole(holeMm: number): MetricSize | null {
  let best: MetricSize | null = null;
  for (const s of METRIC_SIZES) if (s.clearanceHoleMm <= holeMm + 1e-9) best = s;
  return best;
}

/** The shortest preferred length of at least `mm` (or `mm` rounded up to 10 mm beyond the table). */
export function preferredLength(mm: number): number {
  return SCREW_LENGTHS_MM.find((l) => l >= mm - 1e-9) ?? Math.ceil(mm / 10) * 10;
}
