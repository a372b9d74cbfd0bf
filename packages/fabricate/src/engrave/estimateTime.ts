import type { AxisTarget, GcodeRecord } from './gcodeRecords.ts';

/**
 * Machining time of a record list, seconds: each G1 move's length over its
 * feed, each G0 move's length over `rapidMmPerMin`. Moves are straight lines
 * at full speed: acceleration, spindle spin-up and tool changes are not
 * counted, so real jobs take somewhat longer (how much depends on the
 * machine's acceleration; typically 10–30 % on a hobby router with many short
 * moves — common practice, memory).
 *
 * Categories: `cutting` = G1 (and G2/G3) with XY motion, ramps included,
 * `plunge` = G1 along Z only, `rapid` = G0 with XY motion, `retract` = G0
 * along Z only, `dwell` = G4.
 */
export interface TimeEstimate {
  readonly cuttingS: number;
  readonly plungeS: number;
  readonly rapidS: number;
  readonly retractS: number;
  readonly dwellS: number;
  readonly totalS: number;
  readonly cuttingMm: number;
  readonly plungeMm: number;
  readonly rapidMm: number;
  readonly retractMm: number;
}

export interface EstimateTimeOptions {
  /** G0 rate, mm/min (the settings' rapidMmPerMin). */
  readonly rapidMmPerMin: number;
  /** Where the machine is when the program starts, mm. Default X0 Y0 Z0. */
  readonly start?: { readonly x: number; readonly y: number; readonly z: number };
}

/**
 * @example estimateTime([{ kind: 'feed', to: { x: 100 }, feedMmPerMin: 600 }], { rapidMmPerMin: 3000 }).totalS // 10
 */
export function estimateTime(records: readonly GcodeRecord[], options: EstimateTimeOptions): TimeEstimate {
  if (!(options.rapidMmPerMin > 0)) throw new Error(`rapidMmPerMin must be > 0 mm/min, got ${options.rapidMmPerMin}`);
  let at = { x: 0, y: 0, z: 0, ...options.start };
  const t = { cuttingS: 0, plungeS: 0, rapidS: 0, retractS: 0, dwellS: 0, cuttingMm: 0, plungeMm: 0, rapidMm: 0, retractMm: 0 };
  const step = (to: AxisTarget): { length: number; xy: boolean } => {
    const next = { x: to.x ?? at.x, y: to.y ?? at.y, z: to.z ?? at.z };
    const xy = next.x !== at.x || next.y !== at.y;
    const length = Math.hypot(next.x - at.x, next.y - at.y, next.z - at.z);
    at = next;
    return { length, xy };
  };
  for (const r of records) {
    if (r.kind === 'feed') {
      const { length, xy } = step(r.to);
      const s = (60 * length) / r.feedMmPerMin;
      if (xy) {
        t.cuttingMm += length;
        t.cuttingS += s;
      } else {
        t.plungeMm += length;
        t.plungeS += s;
      }
    } else if (r.kind === 'arc') {
      // Helix length: the arc's XY length and the Z change, combined.
      const rad = Math.hypot(r.from[0] - r.centre[0], r.from[1] - r.centre[1]);
      const next = { x: r.to.x ?? at.x, y: r.to.y ?? at.y, z: r.to.z ?? at.z };
      const a0 = Math.atan2(at.y - r.centre[1], at.x - r.centre[0]);
      const a1 = Math.atan2(next.y - r.centre[1], next.x - r.centre[0]);
      let sweep = r.clockwise ? a0 - a1 : a1 - a0;
      while (sweep <= 1e-12) sweep += 2 * Math.PI;
      const length = Math.hypot(rad * sweep, next.z - at.z);
      at = next;
      t.cuttingMm += length;
      t.cuttingS += (60 * length) / r.feedMmPerMin;
    } else if (r.kind === 'dwell') {
      t.dwellS += r.seconds;
    } else if (r.kind === 'rapid') {
      const { length, xy } = step(r.to);
      const s = (60 * length) / options.rapidMmPerMin;
      if (xy) {
        t.rapidMm += length;
        t.rapidS += s;
      } else {
        t.retractMm += length;
        t.retractS += s;
      }
    }
  }
  return { ...t, totalS: t.cuttingS + t.plungeS + t.rapidS + t.retractS + t.dwellS };
}

/** '1 h 02 min 05 s' / '3 min 12 s' / '45 s', rounded to the second. */
export function formatDuration(seconds: number): string {
  const total = Math.round(seconds);
  const h = Math.floor(total / 3600);
  const m = Math.floor((total % 3600) / 60);
  const s = total % 60;
  const pad = (n: number): string => String(n).padStart(2, '0');
  if (h > 0) return `${h} h ${pad(m)} min ${pad(s)} s`;
  if (m > 0) return `${m} min ${pad(s)} s`;
  return `${s} s`;
}
