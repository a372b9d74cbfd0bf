import { DEG } from '../guards.ts';
import type { Vec3 } from '../parts/mesh.ts';
import { calendarLines } from '../polar/calendarLines.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import { markField, nodusFootY } from '../polar/markField.ts';
import { castingEdge } from '../polar/markOffset.ts';
import { meanTimeLines } from '../polar/meanTimeLines.ts';
import { parseClock } from '../spec/parseClock.ts';
import { instantAtHourAngle, sunOnDay, type SunTrack } from '../sun/sunTrack.ts';
import { topocentricSun } from '../sun/topocentricSun.ts';
import type { StyleEdge, Vec2 } from '../types.ts';
import { DATE_LINE_TEST_STEP_DEG, insideBox, measureCurve, nearestDay, type CurveCheck, type CurveSunPosition, type DrawnCurve } from './curveCheck.ts';
import { toDialFrame, type DialFrame } from './dialFrame.ts';
import type { Edge3 } from './styleEdges.ts';

/** What the polar curve check runs with. */
export interface PolarCurveSetting {
  readonly track: SunTrack;
  /** the installed dial frame */
  readonly frame: DialFrame;
  /** the gnomon mesh's top style edges that cast on each side */
  readonly edgesOf: (style: StyleEdge) => readonly Edge3[];
  /** face y of the nodus on the gnomon mesh (its notch), or null for none */
  readonly nodusYMm: number | null;
  readonly toleranceMm: number;
}

/** The layout's own date lines and mean-time curves as drawn (face coordinates: date lines moved from the nodus foot). */
export function drawnCurvesFromLayout(layout: DialLayout): DrawnCurve[] {
  const dateLines = calendarLines(layout);
  const ny = dateLines.length > 0 ? nodusFootY(layout) : 0;
  return [
    ...dateLines.map((l): DrawnCurve => ({ label: l.label, kind: 'date', paths: l.branches.map((b) => b.map(([x, y]): Vec2 => [x, y + ny])) })),
    ...meanTimeLines(layout).map((c): DrawnCurve => ({ label: `${c.clockTime} mean time`, kind: 'meanTime', paths: c.polylines })),
  ];
}

/**
 * The polar check of the drawn date lines and mean-time curves, each
 * measured by `measureCurve` (shared with the planar check) against the
 * shadow of the nodus on the real gnomon (the point of the casting style
 * edge of the mesh at the notch's y), in the installed dial frame:
 * - a date line: on its date, every 0.1° of hour angle across the marks,
 *   the Sun at the line's declination seen from the site
 *   (`topocentricSun` with the day's distance: what the line claims);
 * - a mean-time curve: the real Sun (`sunOnDay`) at the curve's standard
 *   clock time on every simulated day.
 * A curve whose label names no line of the layout is left out.
 *
 * @example checkPolarCurves(layout, drawnCurvesFromLayout(layout), setting).map((c) => c.worstMm)
 */
export function checkPolarCurves(layout: DialLayout, curves: readonly DrawnCurve[], g: PolarCurveSetting): CurveCheck[] {
  if (curves.length === 0 || g.nodusYMm === null) return [];
  const field = markField(layout);
  const inside = (X: Vec2) => insideBox(field, X, 0.5);
  const lines = calendarLines(layout);
  const nodusOf = (H: number): Vec3 | null => nodusOnStyle(g.edgesOf(castingEdge(H)), g.nodusYMm as number);
  const hs = layout.marks.map((m) => m.hourAngleDeg);
  const out: CurveCheck[] = [];
  for (const curve of curves) {
    const positions: CurveSunPosition[] = [];
    if (curve.kind === 'date') {
      const line = lines.find((l) => l.label === curve.label);
      if (!line) continue;
      const day = nearestDay(g.track.days, line.dates[0]);
      const distanceAu = sunOnDay(g.track, day, instantAtHourAngle(g.track, day, 0)).distanceAu;
      const seen = (H: number) => topocentricSun(H, line.declinationDeg * DEG, distanceAu, g.track.latitudeDeg * DEG, g.track.observerAu);
      for (let Hd = Math.min(...hs) + DATE_LINE_TEST_STEP_DEG / 2; Hd <= Math.max(...hs); Hd += DATE_LINE_TEST_STEP_DEG) {
        const s = seen(Hd * DEG);
        if (!(s.enu[2] > 0)) continue;
        positions.push({ sun: toDialFrame(g.frame, s.enu), later: toDialFrame(g.frame, seen(Hd * DEG + HOUR_ANGLE_RAD_PER_S).enu), nodus: nodusOf(s.hourAngleRad), date: day.date });
      }
    } else {
      const minutes = parseClock('curve', curve.label.slice(0, 5));
      for (const day of g.track.days) {
        const t = day.startMs + minutes * 60_000;
        const s = sunOnDay(g.track, day, t);
        if (!(s.enu[2] > 0)) continue;
        positions.push({ sun: toDialFrame(g.frame, s.enu), later: toDialFrame(g.frame, sunOnDay(g.track, day, t + 1000).enu), nodus: nodusOf(s.hourAngleRad), date: day.date });
      }
    }
    out.push(measureCurve(curve, positions, inside, g.toleranceMm));
  }
  return out;
}

/** Mean rate of the Sun's hour angle, radians per second (360° per solar day). */
const HOUR_ANGLE_RAD_PER_S = (2 * Math.PI) / 86_400;

/** The point of a style edge (a straight mesh edge along y) at face y, or null when the side has no edge along y. */
function nodusOnStyle(edges: readonly Edge3[], y: number): Vec3 | null {
  const e = edges.find(([p, q]) => Math.abs(q[1] - p[1]) > 1e-9);
  if (!e) return null;
  const [p, q] = e;
  const u = (y - p[1]) / (q[1] - p[1]);
  return [p[0] + u * (q[0] - p[0]), y, p[2] + u * (q[2] - p[2])];
}
