import { equationOfTimeMin } from '../sun/equationOfTimeMin.ts';
import { MS_PER_DAY } from '../sun/localDate.ts';
import { sunDeclinationRad } from '../sun/sunDeclinationRad.ts';
import { DEG } from '../guards.ts';
import { nodusTraces, type NodusTrace } from './planarDateLine.ts';
import type { PlanarFace } from './planarTypes.ts';
import type { PlanarGnomon } from './styleEdgeAnchor.ts';
import { sunDirectionEnu } from './sunDirectionEnu.ts';
import { lineHourAngleDeg } from '../clock/lineHourAngle.ts';

/** Options of `planarMeanTimeCurve`. */
export interface PlanarMeanTimeOptions {
  /** standard clock time, minutes after midnight (no daylight saving) */
  readonly clockMinutes: number;
  readonly year: number;
  /** λ − λs, degrees: the standard-time shift of the hour angle */
  readonly shiftDeg: number;
  /** the zone's standard meridian λs, degrees east (sets the UTC instant of the clock time) */
  readonly standardMeridianDeg: number;
  /** days between samples (default 1) */
  readonly stepDays?: number;
  readonly alongStyleMm?: number;
}

/**
 * The mean-time (figure-of-eight) curve of one standard clock time on any
 * planar face (DESIGN §3, §8): for each day, at that clock time,
 * H = 15°·(T − 12 h) + (λ − λs) + E/4 min·° with E the equation of time and
 * δ the declination of that instant (astronomy-engine, via
 * `equationOfTimeMin` and `sunDeclinationRad`), then the nodus shadow, split
 * where the Sun leaves the face or the casting edge changes.
 */
export function planarMeanTimeCurve(face: PlanarFace, gnomon: PlanarGnomon, o: PlanarMeanTimeOptions): readonly NodusTrace[] {
  const step = o.stepDays ?? 1;
  const start = Date.UTC(o.year, 0, 1);
  const end = Date.UTC(o.year + 1, 0, 1);
  const phi = face.orientation.latitudeRad;
  const samples = [];
  for (let ms = start; ms <= end; ms += step * MS_PER_DAY) {
    const instant = new Date(Math.round(ms + o.clockMinutes * 60_000 - (o.standardMeridianDeg / 15) * 3_600_000));
    const H = (lineHourAngleDeg(o.clockMinutes, o.shiftDeg) + equationOfTimeMin(instant) / 4) * DEG;
    samples.push({ sun: sunDirectionEnu(phi, H, sunDeclinationRad(instant)), hourAngleRad: H });
  }
  return nodusTraces(face, gnomon, samples, o.alongStyleMm);
}
