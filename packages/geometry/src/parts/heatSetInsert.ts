/**
 * Heat-set threaded inserts for printed parts: pressed into a plain hole with
 * a soldering iron, they give a metric thread that takes repeated
 * tightening. Sizes are the common "short" brass inserts sold for 3D prints
 * (hole diameter and insert length from a typical maker's table — memory;
 * check the data sheet of the inserts you buy and adjust the spec if they
 * differ). The screw size is the largest whose ISO 273 medium clearance
 * hole (M3 3.4, M4 4.5, M5 5.5, M6 6.6 mm — memory) the plate hole takes.
 */
export interface HeatSetInsert {
  /** thread, e.g. 'M5' */
  readonly thread: string;
  /** ISO 273 medium-series clearance hole for that thread, mm */
  readonly clearanceHoleMm: number;
  /** hole to melt the insert into, mm */
  readonly holeDiameterMm: number;
  /** insert length, mm */
  readonly lengthMm: number;
}

export const HEAT_SET_INSERTS: readonly HeatSetInsert[] = [
  { thread: 'M3', clearanceHoleMm: 3.4, holeDiameterMm: 4.0, lengthMm: 5.7 },
  { thread: 'M4', clearanceHoleMm: 4.5, holeDiameterMm: 5.6, lengthMm: 8.1 },
  { thread: 'M5', clearanceHoleMm: 5.5, holeDiameterMm: 6.4, lengthMm: 9.5 },
  { thread: 'M6', clearanceHoleMm: 6.6, holeDiameterMm: 8.0, lengthMm: 12.7 },
];

/** Extra pocket depth below the insert, mm: room for the screw's tip and the plastic the insert displaces (common practice: 1–2 mm). */
export const INSERT_POCKET_EXTRA_MM = 2;

/**
 * The insert for a plate hole of the given diameter: the largest thread
 * whose clearance hole fits, or null when the hole is smaller than an M3
 * clearance (no insert then).
 *
 * @example insertForHole(5.5)?.thread // 'M5'
 */
export function insertForHole(holeDiameterMm: number): HeatSetInsert | null {
  let best: HeatSetInsert | null = null;
  for (const ins of HEAT_SET_INSERTS) if (ins.clearanceHoleMm <= holeDiameterMm + 1e-9) best = ins;
  return best;
}
