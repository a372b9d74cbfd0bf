import { SpecError } from '../errors.ts';
import { assertPositive, assertRange } from '../guards.ts';
import { equationOfTimeMin } from '../sun/equationOfTimeMin.ts';
import { longitudeDifferenceDeg } from '../sun/longitudeCorrectionMin.ts';
import { parseClock } from '../spec/parseClock.ts';
import { formatIsoDate, MS_PER_DAY } from '../sun/localDate.ts';
import { sunDeclinationRad } from '../sun/sunDeclinationRad.ts';
import { assertHemisphere, declinationTowardPoleRad } from './declinationTowardPoleRad.ts';
import type { FacePoint, FacePolyline, Hemisphere, StyleEdge } from './types.ts';

/** Options of `meanTimeCurve` (lengths mm, angles degrees where named Deg). */
export interface MeanTimeCurveOptions {
  /** standard (zone) clock time 'HH:MM' the curve stands for, without daylight saving */
  readonly clockTime: string;
  /** calendar year */
  readonly year: number;
  /** nodus height above the style edge, mm */
  readonly heightMm: number;
  /** gnomon thickness t, mm (default 0) */
  readonly thicknessMm?: number;
  /** site longitude λ, degrees east positive */
  readonly longitudeDeg: number;
  /** the zone's standard meridian λs, degrees east positive (15° × standard offset) */
  readonly standardMeridianDeg: number;
  /** site hemisphere: sets the pole-ward declination and where east lies on the face */
  readonly hemisphere: Hemisphere;
  /** days between samples, integer ≥ 1 (default 1) */
  readonly stepDays?: number;
  /** largest |hour angle| accepted, degrees (default 80: x = 5.7 h); beyond it the call throws */
  readonly maxHourAngleDeg?: number;
}

/** One day's point of the mean-time curve. */
export interface MeanTimeSample {
  /** 'YYYY-MM-DD' */
  readonly date: string;
  /** the instant, UTC */
  readonly dateUtc: Date;
  readonly equationOfTimeMin: number;
  readonly hourAngleRad: number;
  /** geocentric declination, north positive, radians */
  readonly declinationRad: number;
  /** which style edge casts the shadow (H < 0: west, morning) */
  readonly style: StyleEdge;
  readonly xMm: number;
  readonly yMm: number;
}

/** A mean-time (figure-of-eight) curve. */
export interface MeanTimeCurve {
  readonly clockTime: string;
  /** the samples in date order, Jan 1 of `year` to Jan 1 of the next (closing the loop) */
  readonly samples: readonly MeanTimeSample[];
  /**
   * the curve as polylines in face coordinates: one when the shadow stays on
   * one style edge (or t = 0), split where it jumps across the gnomon
   */
  readonly polylines: readonly FacePolyline[];
}

/** Defaults of `meanTimeCurve`. */
export const MEAN_TIME_CURVE_DEFAULTS = { thicknessMm: 0, stepDays: 1, maxHourAngleDeg: 80 } as const;

/**
 * Path of the nodus shadow at one standard clock time over a year: the
 * figure-of-eight mean-time line (docs/design.md §3). For each day, at the instant
 * T (standard time, i.e. UT + λs/15 h):
 *
 *     H = 15°·(T − 12 h) + (λ − λs) + E/4 min·°
 *
 * with E the equation of time of that instant and δ its declination; then,
 * from the style edge that casts the shadow (docs/design.md §2),
 *
 *     x = ±(t/2 + h·|tan H|)      y = −tan δp · √(h² + (|x| − t/2)²) = −h·tan δp / cos H
 *
 * with δp the declination toward the elevated pole, x signed east-positive in
 * the north and mirrored (east on the left) in the south. Whether the Sun is
 * above the horizon is not checked here (no latitude): the layout does that.
 *
 * @throws SpecError naming `clockTime` when |H| exceeds `maxHourAngleDeg` on some day
 * @example meanTimeCurve({clockTime: '12:00', year: 2025, heightMm: 50, longitudeDeg: 0, standardMeridianDeg: 0, hemisphere: 'north'})
 */
export function meanTimeCurve(options: MeanTimeCurveOptions): MeanTimeCurve {
  const o = { ...MEAN_TIME_CURVE_DEFAULTS, ...options };
  const clockMin = parseClock('clockTime', o.clockTime, { seconds: true });
  if (!Number.isInteger(o.year) || o.year < 1700 || o.year > 2300) {
    throw new SpecError('year', o.year, 'allowed: an integer year from 1700 to 2300');
  }
  const h = assertPositive('heightMm', o.heightMm);
  const t = assertRange('thicknessMm', o.thicknessMm, 0, Number.MAX_VALUE, ' mm');
  const lon = assertRange('site.longitude', o.longitudeDeg, -180, 180, '°');
  const lonStd = assertRange('standardMeridianDeg', o.standardMeridianDeg, -180, 225, '°');
  const hemisphere = assertHemisphere(o.hemisphere);
  if (!Number.isInteger(o.stepDays) || o.stepDays < 1 || o.stepDays > 183) {
    throw new SpecError('stepDays', o.stepDays, 'allowed: an integer from 1 to 183');
  }
  const maxH = assertRange('maxHourAngleDeg', o.maxHourAngleDeg, 0, 89.9, '°');

  const start = Date.UTC(o.year, 0, 1);
  const end = Date.UTC(o.year + 1, 0, 1);
  const days: number[] = [];
  for (let ms = start; ms < end; ms += o.stepDays * MS_PER_DAY) days.push(ms);
  days.push(end);

  const half = t / 2;
  const mirror = hemisphere === 'north' ? 1 : -1;
  const samples = days.map((dayMs): MeanTimeSample => {
    const instant = new Date(Math.round(dayMs + clockMin * 60_000 - (lonStd / 15) * 3_600_000));
    const e = equationOfTimeMin(instant);
    const decl = sunDeclinationRad(instant);
    const hDeg = 15 * (clockMin / 60 - 12) + longitudeDifferenceDeg(lon, lonStd) + e / 4;
    if (!(Math.abs(hDeg) <= maxH)) {
      throw new SpecError('clockTime', o.clockTime, `allowed: a clock time whose hour angle stays within ±${maxH}°`, `got ${JSON.stringify(o.clockTime)}, which is hour angle ${hDeg.toFixed(2)}° on ${formatIsoDate(dayMs)}`);
    }
    const hRad = (hDeg * Math.PI) / 180;
    const style: StyleEdge = hRad < 0 ? 'west' : 'east';
    const xEast = (style === 'west' ? -1 : 1) * (half + h * Math.abs(Math.tan(hRad)));
    const xMm = mirror * xEast;
    const yMm = -Math.tan(declinationTowardPoleRad(decl, hemisphere)) * Math.hypot(h, Math.abs(xMm) - half);
    return { date: formatIsoDate(dayMs), dateUtc: instant, equationOfTimeMin: e, hourAngleRad: hRad, declinationRad: decl, style, xMm, yMm };
  });

  const polylines: FacePoint[][] = [];
  let current: FacePoint[] = [];
  samples.forEach((s, i) => {
    if (i > 0 && t > 0 && s.style !== samples[i - 1].style) {
      polylines.push(current);
      current = [];
    }
    current.push([s.xMm, s.yMm]);
  });
  polylines.push(current);
  return { clockTime: o.clockTime, samples, polylines };
}
