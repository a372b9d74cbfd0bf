import { DEG } from '../guards.ts';
import { lineHourAngleDeg } from '../clock/lineHourAngle.ts';
import { equationOfTimeMin } from '../sun/equationOfTimeMin.ts';
import { MS_PER_DAY } from '../sun/localDate.ts';
import { sunEquatorOfDate } from '../sun/sunEquatorOfDate.ts';
import { observerMeridianAu, topocentricSun } from '../sun/topocentricSun.ts';
import { CURVE_CHORD_TOLERANCE_MM, refineByChord } from '../calendar/refineByChord.ts';
import { nodusShadowOf, shadowRuns, type NodusTrace } from './planarDateLine.ts';
import type { PlanarFace } from './planarTypes.ts';
import type { PlanarGnomon } from './styleEdgeAnchor.ts';

/** Options of `planarMeanTimeCurve`. */
export interface PlanarMeanTimeOptions {
  /** standard clock time, minutes after midnight (no daylight saving) */
  readonly clockMinutes: number;
  readonly year: number;
  /** λ − λs, degrees: the standard-time shift of the hour angle */
  readonly shiftDeg: number;
  /** the zone's standard meridian λs, degrees east (sets the UTC instant of the clock time) */
  readonly standardMeridianDeg: number;
  /** days between the first samples, before refinement (default 2) */
  readonly stepDays?: number;
  /** largest distance of the true curve from a drawn chord, mm (default 0.0005: half the 0.001 mm the check holds every curve to) */
  readonly chordToleranceMm?: number;
  readonly alongStyleMm?: number;
}

/** Defaults of `planarMeanTimeCurve`. */
export const PLANAR_MEAN_TIME_DEFAULTS = { stepDays: 2, chordToleranceMm: CURVE_CHORD_TOLERANCE_MM } as const;

/** Halvings of a first step at most (2 days / 2¹² ≈ 42 s of date). */
const MAX_HALVINGS = 12;

/**
 * The mean-time (figure-of-eight) curve of one standard clock time on any
 * planar face (docs/design.md §3, §8): at that clock time T on each date,
 * H = 15°·(T − 12 h) + (λ − λs) + E/4 min·° with E the equation of time and
 * δ, r the Sun's declination and distance of that instant (astronomy-engine,
 * via `equationOfTimeMin` and `sunEquatorOfDate`), turned into the Sun seen
 * from the site (`topocentricSun`: the diurnal parallax, up to 8.8″, moves
 * the shadow by a few µm, as the real Sun does), then the nodus shadow,
 * split where the Sun leaves the face or the casting edge changes.
 *
 * Sampling: every `stepDays` from 1 January at T to 1 January of the next
 * year at T (the loop closes), each step halved while the curve's point at
 * the step's middle lies more than `chordToleranceMm` from the chord (at
 * most 12 halvings, `refineByChord`). Between the days the same formulas run on the
 * fractional date (E, δ and r vary smoothly), so each chord follows the
 * curve the real shadow draws day by day.
 *
 * @example planarMeanTimeCurve(face, gnomon, { clockMinutes: 720, year: 2027, shiftDeg: 0, standardMeridianDeg: 0 })[0].points.length
 */
export function planarMeanTimeCurve(face: PlanarFace, gnomon: PlanarGnomon, options: PlanarMeanTimeOptions): readonly NodusTrace[] {
  const o = { ...PLANAR_MEAN_TIME_DEFAULTS, ...options };
  const phi = face.orientation.latitudeRad;
  const observer = observerMeridianAu(phi / DEG, 0);
  const lineDeg = lineHourAngleDeg(o.clockMinutes, o.shiftDeg);
  const shadowAt = (ms: number) => {
    const instant = new Date(Math.round(ms));
    const eq = sunEquatorOfDate(instant);
    const hGeo = (lineDeg + equationOfTimeMin(instant) / 4) * DEG;
    const topo = topocentricSun(hGeo, eq.declinationRad, eq.distanceAu, phi, observer);
    return nodusShadowOf(face, gnomon, { sun: topo.enu, hourAngleRad: topo.hourAngleRad }, o.alongStyleMm);
  };
  const offsetMs = o.clockMinutes * 60_000 - (o.standardMeridianDeg / 15) * 3_600_000;
  const start = Date.UTC(o.year, 0, 1) + offsetMs;
  const end = Date.UTC(o.year + 1, 0, 1) + offsetMs;
  const times: number[] = [];
  for (let ms = start; ms < end; ms += o.stepDays * MS_PER_DAY) times.push(ms);
  times.push(end);

  return shadowRuns(refineByChord(times, shadowAt, { toleranceMm: o.chordToleranceMm, maxHalvings: MAX_HALVINGS, sameRun: (a, b) => a.edge === b.edge }));
}
