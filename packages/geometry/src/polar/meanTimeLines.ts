import { meanTimeCurve } from '../calendar/meanTimeCurve.ts';
import { CURVE_CHORD_TOLERANCE_MM } from '../calendar/refineByChord.ts';
import type { FacePolyline } from '../calendar/types.ts';
import { SpecError } from '../errors.ts';
import { longitudeDifferenceDeg } from '../sun/longitudeCorrectionMin.ts';
import { formatClock, parseClock } from '../spec/parseClock.ts';
import { clipPolyline } from './clipPolyline.ts';
import type { DialLayout } from './layoutDial.ts';
import { markField, nodusFootY } from './markField.ts';

/** One figure-of-eight mean-time curve on the face. */
export interface MeanTimeLine {
  /** standard (zone) clock time 'HH:MM' the curve stands for */
  readonly clockTime: string;
  /** polylines in face coordinates (y from the face origin, as for the marks), clipped to the mark field, mm */
  readonly polylines: readonly FacePolyline[];
}

/** Days between the first samples of a mean-time curve, before refinement (as on the planar faces). */
const STEP_DAYS = 2;
/** The equation of time moves a curve by at most about 4.2° of hour angle (16.5 min, common practice). */
const EOT_SPAN_DEG = 4.5;

/**
 * Mean-time (figure-of-eight) curves for every whole hour of `hours.from` …
 * `hours.to` in standard clock time (docs/design.md §3): the nodus shadow at
 * H = 15°·(T − 12 h) + (λ − λs) + E/4 min·° through `calendar.year`, with
 * the Sun seen from the site (the diurnal parallax, as the check's real Sun),
 * from `meanTimeCurve`: every 2 days from 1 January to 1 January of the
 * next year, each step halved while the curve strays more than
 * `CURVE_CHORD_TOLERANCE_MM` (0.0005 mm) from its chord; moved to the nodus
 * foot and clipped to the mark field.
 * Hours whose curve would reach |H| ≥ 89° are left out. Empty unless
 * `dial.meanTimeCurves` is true.
 *
 * @throws SpecError naming `dial.meanTimeCurves` without a nodus
 * @example meanTimeLines(layout).map((c) => c.clockTime) // ['08:00', …, '16:00']
 */
export function meanTimeLines(layout: DialLayout): readonly MeanTimeLine[] {
  const { spec } = layout;
  if (!spec.dial.meanTimeCurves) return [];
  if (!spec.gnomon.nodus) {
    throw new SpecError('dial.meanTimeCurves', true, 'allowed: false unless gnomon.nodus is true (the curves are read off the nodus shadow)');
  }
  const ny = nodusFootY(layout);
  const field = markField(layout);
  const from = Math.ceil(parseClock('hours.from', spec.hours.from) / 60) * 60;
  const to = parseClock('hours.to', spec.hours.to);
  const lonDiff = longitudeDifferenceDeg(spec.site.longitude, layout.time.standardMeridianDeg);
  const out: MeanTimeLine[] = [];
  for (let m = from; m <= to; m += 60) {
    if (Math.abs(15 * (m / 60 - 12) + lonDiff) + EOT_SPAN_DEG >= 89) continue;
    const curve = meanTimeCurve({
      clockTime: formatClock(m),
      year: spec.calendar.year,
      heightMm: layout.gnomon.heightMm,
      thicknessMm: layout.gnomon.thicknessMm,
      longitudeDeg: spec.site.longitude,
      standardMeridianDeg: layout.time.standardMeridianDeg,
      hemisphere: layout.hemisphere,
      stepDays: STEP_DAYS,
      maxHourAngleDeg: 89,
      latitudeDeg: spec.site.latitude,
      chordToleranceMm: CURVE_CHORD_TOLERANCE_MM,
    });
    const polylines = curve.polylines.flatMap((p) => clipPolyline(p.map(([x, y]) => [x, y + ny] as const), field));
    if (polylines.length > 0) out.push({ clockTime: formatClock(m), polylines });
  }
  return out;
}
