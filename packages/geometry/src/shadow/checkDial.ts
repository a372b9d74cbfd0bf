import { SpecError } from '../errors.ts';
import { DEG } from '../guards.ts';
import { penumbraWidthMm } from '../calendar/penumbraWidth.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import { eastToFaceX } from '../polar/markOffset.ts';
import type { Vec3 } from '../parts/mesh.ts';
import { SUN_RADIUS_KM } from '../sun/sunAngularRadiusRad.ts';
import type { MarkKind, StyleEdge } from '../types.ts';
import { shadowOnLine } from './castShadow.ts';
import { dialFrame, toDialFrame, type DialFrame } from './dialFrame.ts';
import type { CurveCheck, DrawnCurve } from './curveCheck.ts';
import { drawnMarksFromLayout, type DrawnMark } from './drawnMarks.ts';
import { gnomonForLayout } from './gnomonForLayout.ts';
import { checkPolarCurves, drawnCurvesFromLayout } from './polarCurveCheck.ts';
import { checkSampling, type SamplingOptions } from './checkSampling.ts';
import { checkPasses, curveSunPositions, marksOverTolerance, worstReachedMark, type CheckSummary, type MarkFailure, type MarkSummary, type WorstMark } from './checkSummary.ts';
import { markErrorSummary, newMarkErrorTally, tallyReached, type MarkErrorTally, type WorstMean } from './markErrorTally.ts';
import { styleEdges, type Edge3 } from './styleEdges.ts';
import { instantAtHourAngle, sunOnDay, type RefractionModel, type SunDay, type SunSample, type SunTrack } from '../sun/sunTrack.ts';
import { KM_PER_AU } from 'astronomy-engine';

/**
 * Mean rate of the true Sun's hour angle, radians per second: 360° per
 * apparent solar day of 86 400 s (the apparent day differs from it by at most
 * about 30 s, i.e. 0.035 %: the equation of time's daily change, docs/design.md §3).
 */
const HOUR_ANGLE_RAD_PER_S = (2 * Math.PI) / 86_400;

/** Options of `checkDial`; every one defaults from the layout's spec (`check:` section). */
export interface CheckOptions extends SamplingOptions {
  /** installed tilt − |latitude|, degrees (default spec.check.tiltError, 0) */
  readonly tiltErrorDeg?: number;
  /** installed style azimuth − true meridian, degrees clockwise from above (default spec.check.azimuthError, 0) */
  readonly azimuthErrorDeg?: number;
  /** the marks as drawn (default: the layout's own marks), e.g. read back from plate.dxf by `marksFromPlate` */
  readonly drawn?: readonly DrawnMark[];
  /** where the drawn marks came from, for the report (default 'layout') */
  readonly source?: 'layout' | 'plate';
  /** the date lines and mean-time curves as drawn (default: the layout's, `drawnCurvesFromLayout`), e.g. read back from plate.dxf by `curvesFromPlate` */
  readonly curves?: readonly DrawnCurve[];
  /** where the drawn curves came from, for the report (default 'layout') */
  readonly curveSource?: 'layout' | 'plate';
}

export interface Range {
  readonly min: number;
  readonly max: number;
}

/** The year's result for one mark: `MarkSummary` (errorMm: shadow x − mark x; errorS: through dx/dH) and what only the polar check measures. */
export interface MarkCheck extends MarkSummary {
  readonly kind: MarkKind;
  readonly style: StyleEdge;
  /** x of the drawn line at its middle, face coordinates, mm */
  readonly xMm: number;
  /** penumbra width across the line, mm, over the lit days (2hα / (cos δ cos² H), docs/design.md §3) */
  readonly penumbraMm: Range;
  /**
   * standard clock time when the real Sun is at this mark's hour angle, minus
   * the mark's label, minutes: for a standard-time dial this is the
   * equation-of-time offset (−E); for a solar dial it adds 4·(λs − λ)
   */
  readonly clockOffsetMin: Range;
  /** how much a 1° steeper tilt shifts the time the shadow reaches this mark, minutes (+: later) */
  readonly tiltShiftMinPerDeg: WorstMean;
  /** how much a 1° clockwise azimuth error shifts it, minutes (+: later) */
  readonly azimuthShiftMinPerDeg: WorstMean;
  /** shadow x − mark x per simulated day, mm; null when unlit or not reached */
  readonly errorsMm: readonly (number | null)[];
}

/** One simulated day. */
export interface CheckDay {
  readonly date: string;
  /** topocentric declination at local apparent noon, degrees */
  readonly declinationDeg: number;
  /** equation of time at local apparent noon, minutes */
  readonly equationOfTimeMin: number;
  /** minutes of the sweep (between the first and last mark's hour angle) with the face in sunlight */
  readonly litMinutes: number;
}

/** A mark whose shadow falls beyond the tolerance on some day (its worst day). */
export interface CheckFailure extends MarkFailure {
  readonly style: StyleEdge;
  readonly errorS: number;
  readonly daysOverTolerance: number;
}

/** The whole check, plain data (check.json is this, rounded); the fields both checks share are `CheckSummary`'s. */
export interface CheckResult extends CheckSummary {
  readonly site: { readonly latitudeDeg: number; readonly longitudeDeg: number; readonly timezone: string };
  readonly hemisphere: 'north' | 'south';
  readonly reads: 'solar' | 'standard';
  readonly source: 'layout' | 'plate';
  /** where the date lines and mean-time curves measured came from */
  readonly curveSource: 'layout' | 'plate';
  readonly tiltErrorDeg: number;
  readonly azimuthErrorDeg: number;
  readonly gnomon: { readonly heightMm: number; readonly thicknessMm: number; readonly styleEdges: number };
  /** astronomy-engine calls behind the track */
  readonly ephemerisCalls: number;
  readonly days: readonly CheckDay[];
  readonly marks: readonly MarkCheck[];
  readonly worst: (WorstMark & { readonly style: StyleEdge }) | null;
  readonly failures: readonly CheckFailure[];
  /** the date lines and mean-time curves measured by `checkPolarCurves` */
  readonly curves: readonly CurveCheck[];
}

/**
 * Prove a dial: run the real Sun over the real gnomon for a year and measure,
 * mark by mark and day by day, how far the shadow falls from the line.
 *
 * For every simulated local day (calendar.year) and every mark:
 * 1. the instant the real Sun's topocentric hour angle equals the mark's
 *    (`instantAtHourAngle` on the `sunTrack`, seeded from the day's sweep);
 * 2. the Sun's direction there (horizon coordinates, refraction as asked),
 *    turned into the installed dial frame (`dialFrame` with the tilt and
 *    azimuth errors);
 * 3. lit test: the Sun's centre above the horizon AND in front of the face;
 * 4. the casting style edges, found in the mesh of `gnomonForLayout` (the
 *    solid written to gnomon.stl; at full height, so a nodus notch's flanks
 *    are left out), projected along the rays onto the face
 *    (`shadowOnLine`): error = shadow x − drawn x over the mark's y-range;
 * 5. that error in seconds of time through dx/dH = h / cos² H;
 * 6. the same with the plate 1° steeper and turned 1° clockwise: the
 *    installation tolerance in minutes per degree.
 * The sweep samples every `stepMinutes` between the first and the last
 * mark's hour angle (the face's lit minutes, and the seeds of step 1).
 * With a nodus, every drawn date line and mean-time curve is measured too
 * (`checkPolarCurves`: the nodus on the mesh's style edge, the distance of
 * its shadow from the drawn polyline, in mm and seconds), held to the
 * marks' tolerance.
 *
 * @example checkDial(layoutDial(parseSpec(raw))).pass
 */
export function checkDial(layout: DialLayout, options: CheckOptions = {}): CheckResult {
  const settings = checkSettings(layout, options);
  const caster = castingStyle(layout);
  const frames = checkFrames(layout.spec.site.latitude, settings.tiltErrorDeg, settings.azimuthErrorDeg);
  const run = runDays(layout, settings, caster, frames);
  const marks = settings.drawn.map((d, i) => markCheck(d, run.acc[i]));
  const curves = checkPolarCurves(layout, settings.curves, { track: settings.track, frame: frames.frame, edgesOf: caster.edgesOf, nodusYMm: caster.part.nodusMm?.[1] ?? null, toleranceMm: settings.toleranceMm });
  return assembleResult(layout, settings, caster, run, marks, curves);
}

/** What one check runs with: the sampling over the spec's defaults, the installation errors and the drawn marks. */
interface CheckSettings extends ReturnType<typeof checkSampling> {
  readonly tiltErrorDeg: number;
  readonly azimuthErrorDeg: number;
  readonly drawn: readonly DrawnMark[];
  readonly curves: readonly DrawnCurve[];
  readonly source: 'layout' | 'plate';
  readonly curveSource: 'layout' | 'plate';
}

/** Gather the marks and settings: options over the spec's `check:` section; no marks at all is a SpecError. */
function checkSettings(layout: DialLayout, options: CheckOptions): CheckSettings {
  const sampling = checkSampling(layout.spec, options);
  const c = layout.spec.check;
  const tiltErrorDeg = options.tiltErrorDeg ?? c.tiltError;
  const azimuthErrorDeg = options.azimuthErrorDeg ?? c.azimuthError;
  const drawn = options.drawn ?? drawnMarksFromLayout(layout);
  if (drawn.length === 0) throw new SpecError('marks', 0, 'allowed: at least one mark to check');
  return { ...sampling, tiltErrorDeg, azimuthErrorDeg, drawn, curves: options.curves ?? drawnCurvesFromLayout(layout), source: options.source ?? 'layout', curveSource: options.curveSource ?? 'layout' };
}

/** The gnomon that casts the shadow: its part, the style height h (mm) and its top style edges on each side. */
interface CastingStyle {
  readonly part: ReturnType<typeof gnomonForLayout>;
  readonly h: number;
  readonly edges: { readonly minusX: readonly Edge3[]; readonly plusX: readonly Edge3[] };
  /** the edges that cast a mark's line, by the mark's style side */
  readonly edgesOf: (style: StyleEdge) => readonly Edge3[];
}

/** Build the casting style from the gnomon mesh: only the straight style at full height reads the hours. */
function castingStyle(layout: DialLayout): CastingStyle {
  const part = gnomonForLayout(layout);
  // The hour lines read the straight style at full height; a nodus notch's
  // flanks (lower, sloping) are left out: they are meant to mark the date.
  const { h, edges } = topStyleEdges(part.mesh);
  const edgesOf = (style: StyleEdge): readonly Edge3[] => (eastToFaceX(style === 'east' ? 1 : -1, layout.hemisphere) > 0 ? edges.plusX : edges.minusX);
  return { part, h, edges, edgesOf };
}

/** The installed dial frame, and the same frame 1° steeper and 1° turned clockwise (the installation tolerances). */
interface CheckFrames {
  readonly frame: DialFrame;
  readonly frameTilt: DialFrame;
  readonly frameAz: DialFrame;
}

/** The three dial frames a check projects the Sun into. */
function checkFrames(lat: number, tiltErrorDeg: number, azimuthErrorDeg: number): CheckFrames {
  return {
    frame: dialFrame({ latitudeDeg: lat, tiltErrorDeg, azimuthErrorDeg }),
    frameTilt: dialFrame({ latitudeDeg: lat, tiltErrorDeg: tiltErrorDeg + 1, azimuthErrorDeg }),
    frameAz: dialFrame({ latitudeDeg: lat, tiltErrorDeg, azimuthErrorDeg: azimuthErrorDeg + 1 }),
  };
}

/** What the run over the year leaves: one accumulator per drawn mark, the days and the Sun positions computed. */
interface DaysRun {
  readonly acc: readonly Accumulator[];
  readonly days: readonly CheckDay[];
  readonly sunPositions: number;
}

/** Run the days: each day's sweep, then every mark measured at its own instant. */
function runDays(layout: DialLayout, settings: CheckSettings, caster: CastingStyle, frames: CheckFrames): DaysRun {
  const { drawn, track, stepMinutes } = settings;
  const hours = drawn.map((d) => d.mark.hourAngleDeg * DEG);
  const hMin = Math.min(...hours);
  const hMax = Math.max(...hours);
  const stepMs = stepMinutes * 60_000;
  const acc = drawn.map(() => newAccumulator());
  const days: CheckDay[] = [];
  let sunPositions = 0;
  const scoring: Scoring = { caster, frames, toleranceMm: settings.toleranceMm, hemiSign: layout.hemisphere === 'north' ? 1 : -1 };

  for (const day of track.days) {
    const sweep = sweepDay(track, day, hMin, hMax, stepMs, frames.frame);
    sunPositions += sweep.hourAnglesRad.length;
    days.push(checkDay(track, day, sweep.litSamples * stepMinutes));
    drawn.forEach((d, i) => {
      const H = hours[i];
      const t = instantAtHourAngle(track, day, H, seedFromSweep(sweep.hourAnglesRad, H, sweep.t0, stepMs));
      sunPositions++;
      scoreMarkOnDay(acc[i], scoring, { d, H, day, t, s: sunOnDay(track, day, t) });
    });
  }
  return { acc, days, sunPositions };
}

/** One day's sweep: every stepMinutes from the first mark's hour angle to the last, and how many samples light the face. */
function sweepDay(track: SunTrack, day: SunDay, hMin: number, hMax: number, stepMs: number, frame: DialFrame): { t0: number; hourAnglesRad: Float64Array; litSamples: number } {
  const t0 = instantAtHourAngle(track, day, hMin);
  const t1 = instantAtHourAngle(track, day, hMax);
  const n = Math.floor((t1 - t0) / stepMs + 1e-9) + 1;
  const hourAnglesRad = new Float64Array(n);
  let litSamples = 0;
  for (let k = 0; k < n; k++) {
    const s = sunOnDay(track, day, t0 + k * stepMs);
    hourAnglesRad[k] = s.hourAngleRad;
    if (isFaceLit(s, toDialFrame(frame, s.enu))) litSamples++;
  }
  return { t0, hourAnglesRad, litSamples };
}

/** A simulated day's record: declination and equation of time at local apparent noon, and its lit minutes. */
function checkDay(track: SunTrack, day: SunDay, litMinutes: number): CheckDay {
  const noon = sunOnDay(track, day, instantAtHourAngle(track, day, 0));
  return { date: day.date, declinationDeg: noon.declinationRad / DEG, equationOfTimeMin: noon.equationOfTimeMin, litMinutes };
}

/** What scoring needs besides the mark and day: the casting style, the frames, the tolerance (mm) and the hemisphere's sign. */
interface Scoring {
  readonly caster: CastingStyle;
  readonly frames: CheckFrames;
  readonly toleranceMm: number;
  readonly hemiSign: number;
}

/** One mark on one day: the drawn mark, its hour angle H (rad), the instant t (UTC ms) and the Sun there. */
interface MarkDay {
  readonly d: DrawnMark;
  readonly H: number;
  readonly day: SunDay;
  readonly t: number;
  readonly s: SunSample;
}

/** Score a mark on a day into its accumulator: lit test, penumbra, clock offset, shadow error and the installation shifts. */
function scoreMarkOnDay(a: Accumulator, g: Scoring, m: MarkDay): void {
  const { d, H, t, day, s } = m;
  const { caster } = g;
  const h = caster.h;
  const sun = toDialFrame(g.frames.frame, s.enu);
  if (!isFaceLit(s, sun)) {
    a.errors.push(null);
    return;
  }
  a.lit++;
  const penumbra = penumbraWidthMm({ heightMm: h, hourAngleRad: H, declinationRad: s.declinationRad, sunRadiusRad: Math.asin(SUN_RADIUS_KM / (s.distanceAu * KM_PER_AU)) });
  a.penumbra = widen(a.penumbra, penumbra);
  a.clock = widen(a.clock, (t - day.startMs) / 60_000 - d.mark.minutes);
  const cast = shadowOnLine(caster.edgesOf(d.mark.style), sun, d.a, d.b);
  if (!cast) {
    a.errors.push(null);
    return;
  }
  // Face-x speed of the shadow: dx/dH = h / cos² H (tan law), signed by hemisphere.
  const speedMmPerS = (g.hemiSign * h * HOUR_ANGLE_RAD_PER_S) / Math.cos(H) ** 2;
  const errS = -cast.errorMm / speedMmPerS;
  a.errors.push(cast.errorMm);
  tallyReached(a, cast.errorMm, errS, g.toleranceMm, day.date);
  scoreInstallShifts(a, g, m, cast.shadowXMm, speedMmPerS);
}

/** The installation tolerances on a reached day: how far the shadow's time moves with the plate 1° steeper and 1° turned clockwise. */
function scoreInstallShifts(a: Accumulator, g: Scoring, m: MarkDay, shadowXMm: number, speedMmPerS: number): void {
  const { d, s } = m;
  for (const [f, w] of [[g.frames.frameTilt, a.tilt], [g.frames.frameAz, a.az]] as const) {
    const moved = shadowOnLine(g.caster.edgesOf(d.mark.style), toDialFrame(f, s.enu), d.a, d.b);
    if (!moved) continue;
    const shiftMin = -(moved.shadowXMm - shadowXMm) / speedMmPerS / 60;
    w.n++;
    w.sumAbs += Math.abs(shiftMin);
    if (Math.abs(shiftMin) > Math.abs(w.worst)) w.worst = shiftMin;
  }
}

/** A mark's year, from its accumulator: worst and mean errors, days over tolerance, ranges and shifts. */
function markCheck(d: DrawnMark, a: Accumulator): MarkCheck {
  return {
    label: d.mark.label,
    kind: d.mark.kind,
    style: d.mark.style,
    hourAngleDeg: d.mark.hourAngleDeg,
    xMm: (d.a[0] + d.b[0]) / 2,
    ...markErrorSummary(a),
    penumbraMm: a.penumbra ?? { min: 0, max: 0 },
    clockOffsetMin: a.clock ?? { min: 0, max: 0 },
    tiltShiftMinPerDeg: { worst: a.tilt.worst, meanAbs: a.tilt.n ? a.tilt.sumAbs / a.tilt.n : 0 },
    azimuthShiftMinPerDeg: { worst: a.az.worst, meanAbs: a.az.n ? a.az.sumAbs / a.az.n : 0 },
    errorsMm: a.errors,
  };
}

/** The single worst (mark, day) over all marks, or null if no mark is ever reached (the first of equals wins). */
function worstOfMarks(marks: readonly MarkCheck[]): CheckResult['worst'] {
  const m = worstReachedMark(marks);
  return m && { label: m.label, style: m.style, date: m.worstDate, errorMm: m.errorMm.worst, errorS: m.errorS.worst };
}

/** The marks beyond the tolerance on some day, worst first (then by label). */
function failuresOfMarks(marks: readonly MarkCheck[]): CheckFailure[] {
  return marksOverTolerance(marks).map((m) => ({ label: m.label, style: m.style, date: m.worstDate, errorMm: m.errorMm.worst, errorS: m.errorS.worst, daysOverTolerance: m.daysOverTolerance }));
}

/** Assemble the result: the settings it ran with, the gnomon, the days, the marks, the worst and the failures. */
function assembleResult(layout: DialLayout, settings: CheckSettings, caster: CastingStyle, run: DaysRun, marks: readonly MarkCheck[], curves: readonly CurveCheck[]): CheckResult {
  const { spec } = layout;
  const { edges, part } = caster;
  const failures = failuresOfMarks(marks);
  return {
    year: settings.year,
    site: { latitudeDeg: spec.site.latitude, longitudeDeg: spec.site.longitude, timezone: spec.site.timezone },
    hemisphere: layout.hemisphere,
    reads: layout.time.reads,
    source: settings.source,
    curveSource: settings.curveSource,
    toleranceMm: settings.toleranceMm,
    curveToleranceMm: settings.toleranceMm,
    stepMinutes: settings.stepMinutes,
    everyDays: settings.everyDays,
    refraction: settings.refraction,
    tiltErrorDeg: settings.tiltErrorDeg,
    azimuthErrorDeg: settings.azimuthErrorDeg,
    gnomon: { heightMm: part.styleHeightMm, thicknessMm: part.thicknessMm, styleEdges: edges.minusX.length + edges.plusX.length },
    sunPositions: run.sunPositions + curveSunPositions(curves),
    ephemerisCalls: settings.track.ephemerisCalls,
    method: CHECK_METHOD(settings.refraction, curves.length > 0, settings.toleranceMm),
    days: run.days,
    marks,
    worst: worstOfMarks(marks),
    failures,
    curves,
    pass: checkPasses(failures, curves),
  };
}

/**
 * The lit test: the Sun's centre above the horizon (its altitude as
 * simulated, i.e. with refraction if asked) AND in front of the face (the
 * dial-frame direction has z > 0).
 */
export function isFaceLit(sample: SunSample, sunInDialFrame: Vec3): boolean {
  return sample.enu[2] > 0 && sunInDialFrame[2] > 0;
}

/** The sun's direction in a dial frame at one sample (re-exported helper for front ends). */
export function sunInDialFrame(frame: DialFrame, sample: SunSample): Vec3 {
  return toDialFrame(frame, sample.enu);
}

function CHECK_METHOD(refraction: RefractionModel, withCurves: boolean, toleranceMm: number): string[] {
  const lines = [
    'Sun: astronomy-engine 2.1.19 geocentric apparent RA/Dec of date + Greenwich apparent sidereal time at local standard 00:00, 12:00, 24:00 of each day, interpolated quadratically; topocentric by the observer position on astronomy-engine\'s ellipsoid; horizon frame as astronomy-engine Horizon',
    refraction === 'none' ? 'refraction: none (geometric Sun)' : "refraction: astronomy-engine Refraction('normal')",
    'instant: topocentric hour angle = mark hour angle (Newton on the track)',
    'shadow: style edges found in the gnomon mesh (gnomonForLayout = gnomon.stl), projected along the rays onto the face z = 0',
    'seconds: error / (dx/dH), dx/dH = h / cos² H, hour angle rate 2π per 86 400 s',
  ];
  if (withCurves) {
    lines.push(`curves: nodus on the mesh's casting style edge at the notch; date lines on their date every 0.1° of hour angle with the Sun at the line's declination seen from the site; mean-time curves with the real Sun at the clock time every day; distance to the drawn polyline (seconds: over the shadow's motion in one second), tolerance ${toleranceMm} mm as for the marks`);
  }
  return lines;
}

/** A mark's tally over the days (`MarkErrorTally`) with what only the polar check measures. */
interface Accumulator extends MarkErrorTally {
  penumbra: Range | null;
  clock: Range | null;
  tilt: { n: number; worst: number; sumAbs: number };
  az: { n: number; worst: number; sumAbs: number };
  errors: (number | null)[];
}

function newAccumulator(): Accumulator {
  return { ...newMarkErrorTally(), penumbra: null, clock: null, tilt: { n: 0, worst: 0, sumAbs: 0 }, az: { n: 0, worst: 0, sumAbs: 0 }, errors: [] };
}

function widen(r: Range | null, v: number): Range {
  return r === null ? { min: v, max: v } : { min: Math.min(r.min, v), max: Math.max(r.max, v) };
}

/** Linear interpolation of the instant of hour angle H within the sweep (the hour angle grows monotonically). */
function seedFromSweep(sweepH: Float64Array, H: number, t0: number, stepMs: number): number {
  let lo = 0;
  let hi = sweepH.length - 1;
  if (hi < 1) return t0;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (sweepH[mid] <= H) lo = mid;
    else hi = mid;
  }
  const f = (H - sweepH[lo]) / (sweepH[hi] - sweepH[lo] || 1);
  return t0 + (lo + f) * stepMs;
}

/** The style edges at the gnomon's full height (a nodus notch's lower flanks left out) and that height, mm. */
function topStyleEdges(mesh: Parameters<typeof styleEdges>[0]): { h: number; edges: { minusX: readonly Edge3[]; plusX: readonly Edge3[] } } {
  const found = styleEdges(mesh);
  const h = Math.max(...[...found.minusX, ...found.plusX].flatMap((e) => [e[0][2], e[1][2]]));
  const atTop = (e: Edge3) => Math.abs(e[0][2] - h) < 1e-9 && Math.abs(e[1][2] - h) < 1e-9;
  return { h, edges: { minusX: found.minusX.filter(atTop), plusX: found.plusX.filter(atTop) } };
}
