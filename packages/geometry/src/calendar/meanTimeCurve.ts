import { SpecError } from '../errors.ts';
import { assertPositive, assertRange } from '../guards.ts';
import { equationOfTimeMin } from '../sun/equationOfTimeMin.ts';
import { longitudeDifferenceDeg } from '../sun/longitudeCorrectionMin.ts';
import { parseClock } from '../spec/parseClock.ts';
import { formatIsoDate, MS_PER_DAY } from '../sun/localDate.ts';
import { sunEquatorOfDate } from '../sun/sunEquatorOfDate.ts';
import { observerMeridianAu, topocentricSun } from '../sun/topocentricSun.ts';
import { assertHemisphere, declinationTowardPoleRad } from './declinationTowardPoleRad.ts';
import { refineByChord } from './refineByChord.ts';
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
  /**
   * site latitude φ, degrees: when given, the Sun as seen from the site
   * (`topocentricSun`, the diurnal parallax of up to 8.8″); without it, the
   * Sun seen from the Earth's centre
   */
  readonly latitudeDeg?: number;
  /**
   * when given, each step is halved while the curve's point at its middle
   * lies more than this from the chord, mm (`refineByChord`, at most 12
   * halvings); without it, one sample every `stepDays`
   */
  readonly chordToleranceMm?: number;
}

/** One day's point of the mean-time curve. */
export interface MeanTimeSample {
  /** 'YYYY-MM-DD' */
  readonly date: string;
  /** the instant, UTC */
  readonly dateUtc: Date;
  readonly equationOfTimeMin: number;
  /** hour angle, radians: topocentric with `latitudeDeg`, else geocentric */
  readonly hourAngleRad: number;
  /** declination, north positive, radians: topocentric with `latitudeDeg`, else geocentric */
  readonly declinationRad: number;
  /** which style edge casts the shadow (H < 0: west, morning) */
  readonly style: StyleEdge;
  readonly xMm: number;
  readonly yMm: number;
}

/** A mean-time (figure-of-eight) curve. */
export interface MeanTimeCurve {
  readonly clockTime: string;
  /** the samples in date order, Jan 1 of `year` to Jan 1 of the next (closing the loop), with any refinement points between the days */
  readonly samples: readonly MeanTimeSample[];
  /**
   * the curve as polylines in face coordinates: one when the shadow stays on
   * one style edge (or t = 0), split where it jumps across the gnomon
   */
  readonly polylines: readonly FacePolyline[];
}

/** Halvings of a first step at most (2 days / 2¹² ≈ 42 s of date), as for the planar faces. */
const MAX_HALVINGS = 12;

/** Defaults of `meanTimeCurve`. */
export const MEAN_TIME_CURVE_DEFAULTS = { thicknessMm: 0, stepDays: 1, maxHourAngleDeg: 80 } as const;

/**
 * Path of the nodus shadow at one standard clock time over a year: the
 * figure-of-eight mean-time line (docs/design.md §3). For each day, at the instant
 * T (standard time, i.e. UT + λs/15 h):
 *
 *     H = 15°·(T − 12 h) + (λ − λs) + E/4 min·°
 *
 * with E the equation of time of that instant and δ its declination (with
 * `latitudeDeg`: H and δ of the Sun seen from the site, `topocentricSun`,
 * from astronomy-engine's geocentric place and distance); then, from the
 * style edge that casts the shadow (docs/design.md §2),
 *
 *     x = ±(t/2 + h·|tan H|)      y = −tan δp · √(h² + (|x| − t/2)²) = −h·tan δp / cos H
 *
 * with δp the declination toward the elevated pole, x signed east-positive in
 * the north and mirrored (east on the left) in the south. Whether the Sun is
 * above the horizon is not checked here: the layout does that. With
 * `chordToleranceMm`, the steps between the days are refined on the
 * fractional date (E, δ and r vary smoothly) until each chord lies within
 * that tolerance of the curve (`refineByChord`).
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

  const observer = o.latitudeDeg === undefined ? null : observerMeridianAu(assertRange('site.latitude', o.latitudeDeg, -90, 90, '°'), 0);
  const phi = ((o.latitudeDeg ?? 0) * Math.PI) / 180;
  const offsetMs = clockMin * 60_000 - (lonStd / 15) * 3_600_000;
  const start = Date.UTC(o.year, 0, 1);
  const end = Date.UTC(o.year + 1, 0, 1);
  const days: number[] = [];
  for (let ms = start; ms < end; ms += o.stepDays * MS_PER_DAY) days.push(ms);
  days.push(end);

  const half = t / 2;
  const mirror = hemisphere === 'north' ? 1 : -1;
  const sampleAt = (dayMs: number): { readonly point: FacePoint; readonly sample: MeanTimeSample } => {
    const instant = new Date(Math.round(dayMs + offsetMs));
    const e = equationOfTimeMin(instant);
    const eq = sunEquatorOfDate(instant);
    const hDeg = 15 * (clockMin / 60 - 12) + longitudeDifferenceDeg(lon, lonStd) + e / 4;
    if (!(Math.abs(hDeg) <= maxH)) {
      throw new SpecError('clockTime', o.clockTime, `allowed: a clock time whose hour angle stays within ±${maxH}°`, `got ${JSON.stringify(o.clockTime)}, which is hour angle ${hDeg.toFixed(2)}° on ${formatIsoDate(dayMs)}`);
    }
    const seen = observer ? topocentricSun((hDeg * Math.PI) / 180, eq.declinationRad, eq.distanceAu, phi, observer) : { hourAngleRad: (hDeg * Math.PI) / 180, declinationRad: eq.declinationRad };
    const hRad = seen.hourAngleRad;
    const decl = seen.declinationRad;
    const style: StyleEdge = hRad < 0 ? 'west' : 'east';
    const xEast = (style === 'west' ? -1 : 1) * (half + h * Math.abs(Math.tan(hRad)));
    const xMm = mirror * xEast;
    const yMm = -Math.tan(declinationTowardPoleRad(decl, hemisphere)) * Math.hypot(h, Math.abs(xMm) - half);
    return { point: [xMm, yMm], sample: { date: formatIsoDate(dayMs), dateUtc: instant, equationOfTimeMin: e, hourAngleRad: hRad, declinationRad: decl, style, xMm, yMm } };
  };
  const sampled = o.chordToleranceMm === undefined
    ? days.map(sampleAt)
    : refineByChord(days, sampleAt, { toleranceMm: assertPositive('chordToleranceMm', o.chordToleranceMm), maxHalvings: MAX_HALVINGS, sameRun: (a, b) => t === 0 || a.sample.style === b.sample.style });
  // sampleAt never returns null, so neither does the refinement.
  const samples = sampled.map((s) => (s as NonNullable<typeof s>).sample);

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
