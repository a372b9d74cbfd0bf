import { SpecError } from '../errors.ts';
import { DEG } from '../guards.ts';
import type { Vec3 } from '../parts/mesh.ts';
import { dot3 } from '../parts/vec3.ts';
import { dateLineEntries } from '../polar/calendarLines.ts';
import { parseClock } from '../spec/parseClock.ts';
import { instantAtHourAngle, sunOnDay, sunTrack, type SunDay, type SunSample } from '../sun/sunTrack.ts';
import type { Vec2 } from '../types.ts';
import { edgeSign } from '../planar/styleEdgeAnchor.ts';
import type { PlanarCurve, PlanarLayout, PlanarMark } from '../planar/layoutPlanar.ts';
import { planarGnomonSolid } from '../planar/planarGnomonSolid.ts';
import type { FinEdge } from '../planar/planarTypes.ts';
import { sunDirectionEnu } from '../planar/sunDirectionEnu.ts';
import { curveFieldOf, insideCurveField } from '../planar/curveField.ts';
import { checkSampling, type SamplingOptions } from './checkSampling.ts';
import { checkPasses, curveSunPositions, marksOverTolerance, worstReachedMark, type CheckSummary, type MarkFailure, type MarkSummary, type WorstMark } from './checkSummary.ts';
import { topocentricSun } from '../sun/topocentricSun.ts';
import { DATE_LINE_TEST_STEP_DEG, insideBox, measureCurve, nearestDay, projectOnFace, type CurveCheck, type CurveSunPosition } from './curveCheck.ts';
import { markErrorSummary, newMarkErrorTally, tallyReached } from './markErrorTally.ts';
import { styleEdges, type Edge3 } from './styleEdges.ts';

/** Rate of the hour angle, rad per second of time (one turn per solar day, as the polar check). */
const HOUR_ANGLE_RAD_PER_S = (2 * Math.PI) / 86_400;

export interface PlanarCheckOptions extends SamplingOptions {
  /** the lines as drawn (default: the layout's marks), e.g. one moved on purpose */
  readonly marks?: readonly PlanarMark[];
  /** the date lines and mean-time curves as drawn (default: the layout's curves), e.g. one moved on purpose */
  readonly curves?: readonly PlanarCurve[];
}

/** A line's year on a planar face: `MarkSummary` (errorMm: the perpendicular distance of the style's shadow from the drawn line) and its fin edge. */
export interface PlanarMarkCheck extends MarkSummary {
  readonly kind: PlanarMark['kind'];
  readonly edge: FinEdge;
}

/** A date line's or mean-time curve's year on a planar face (`measureCurve`, shared with the polar check). */
export type PlanarCurveCheck = CurveCheck;

/** A planar face's check, plain data (check.json); the fields both checks share are `CheckSummary`'s. */
export interface PlanarCheckResult extends CheckSummary {
  readonly faceType: PlanarLayout['faceType'];
  /** an equatorial face: which of the plate's faces this is */
  readonly side?: 'upper' | 'lower';
  /** minutes of sunshine on the face over the simulated days, at the sweep step */
  readonly litMinutes: number;
  readonly gnomon: { readonly kind: 'fin' | 'rod'; readonly styleEdges: number; readonly triangles: number };
  readonly marks: readonly PlanarMarkCheck[];
  readonly worst: (WorstMark & { readonly edge: FinEdge }) | null;
  readonly failures: readonly (MarkFailure & { readonly edge: FinEdge })[];
}

/**
 * Prove a planar face (horizontal, wall, meridian, equatorial) on its real
 * gnomon: the solid of `planarGnomonSolid` (what gnomon.stl / gnomon.dxf
 * make), the real Sun of `sunTrack` (astronomy-engine, topocentric) over the
 * year, day by day:
 * 1. a sweep every `stepMinutes` counts the minutes the face is lit (Sun
 *    above the horizon and in front of the face, n · s > 0);
 * 2. for every drawn line, the instant the Sun's hour angle equals the
 *    line's; its direction turned into the face frame; the style edges
 *    found in the mesh (`styleEdges`: the fin's two top edges; for a rod,
 *    the centre of its top) projected along the rays onto the face; the
 *    error is the perpendicular distance of that shadow from the drawn line
 *    where the shadow overlaps it, and in seconds through the shadow's
 *    speed across the line (the Sun turned by one second of hour angle);
 * 3. date lines: on each line's date, every 0.1° of hour angle, the nodus
 *    (the style's point at `nodusAlongStyleMm` on the mesh edge) cast by
 *    the Sun at the line's own declination seen from the site
 *    (`topocentricSun`: the drawing's claim);
 *    mean-time curves: the real Sun at the curve's clock time on every
 *    simulated day. Each: distance of the shadow from the drawn polyline.
 *
 * @example checkPlanar(layoutPlanar(parseSpec(raw))).pass
 */
export function checkPlanar(layout: PlanarLayout, options: PlanarCheckOptions = {}): PlanarCheckResult {
  const spec = layout.spec;
  const { toleranceMm, stepMinutes, everyDays, refraction, year, track } = checkSampling(spec, options);
  const drawn = options.marks ?? layout.marks.filter((m) => !m.underGnomon);
  if (drawn.length === 0) throw new SpecError('marks', 0, 'allowed: at least one mark to check');
  const face = layout.face;
  const frame = (v: Vec3): Vec3 => [dot3(v, face.right), dot3(v, face.up), dot3(v, face.normal)];
  const part = planarGnomonSolid(layout);
  const found = styleEdges(part.mesh, { fromRoot: true });
  const finSideSign = Math.sign(dot3(face.fin, face.right)) || 1;
  const edgesOf = (edge: FinEdge): readonly Edge3[] => (edgeSign(edge) * finSideSign > 0 ? found.plusX : found.minusX);
  const rodTop = part.kind === 'rod' ? rodTopCentre(part.mesh.positions) : null;
  const nodusOf = (edge: FinEdge): Vec3 | null => (layout.gnomon.nodusAlongStyleMm === null ? null : rodTop ?? nodusOnEdges(edgesOf(edge), layout));

  const acc = drawn.map(() => newMarkErrorTally());
  const hours = drawn.map((m) => m.hourAngleDeg * DEG);
  let litMinutes = 0;
  let sunPositions = 0;
  const stepMs = stepMinutes * 60_000;
  const lit = (s: SunSample, sun: Vec3) => s.enu[2] > 0 && sun[2] > 0;

  for (const day of track.days) {
    for (let tMs = day.startMs; tMs < day.startMs + 86_400_000; tMs += stepMs) {
      const s = sunOnDay(track, day, tMs);
      sunPositions++;
      if (lit(s, frame(s.enu))) litMinutes += stepMinutes;
    }
    drawn.forEach((m, i) => {
      const t = instantAtHourAngle(track, day, hours[i]);
      const s = sunOnDay(track, day, t);
      sunPositions++;
      const sun = frame(s.enu);
      if (!lit(s, sun)) return;
      const a = acc[i];
      a.lit++;
      const cast = rodTop ? rodShadowOnSegment(rodTop, sun, m.a, m.b) : shadowOnSegment(edgesOf(m.edge), sun, m.a, m.b);
      if (!cast) return;
      const moved = frame(turnSun(s.enu, spec.site.latitude * DEG, HOUR_ANGLE_RAD_PER_S));
      const next = rodTop ? rodShadowOnSegment(rodTop, moved, m.a, m.b) : shadowOnSegment(edgesOf(m.edge), moved, m.a, m.b);
      const speed = next ? next.meanOffsetMm - cast.meanOffsetMm : 0;
      const errS = speed !== 0 ? -cast.errorMm / speed : 0;
      tallyReached(a, cast.errorMm, errS, toleranceMm, day.date);
    });
  }

  const marks: PlanarMarkCheck[] = drawn.map((m, i) => {
    const a = acc[i];
    return {
      label: m.label,
      kind: m.kind,
      edge: m.edge,
      hourAngleDeg: m.hourAngleDeg,
      ...markErrorSummary(a),
    };
  });

  const curves = checkCurves(layout, options.curves ?? layout.curves, toleranceMm, track.days, frame, nodusOf, (s) => lit(s, frame(s.enu)), track);
  sunPositions += curveSunPositions(curves);

  const w = worstReachedMark(marks);
  const worst: PlanarCheckResult['worst'] = w && { label: w.label, edge: w.edge, date: w.worstDate, errorMm: w.errorMm.worst, errorS: w.errorS.worst };
  const failures = marksOverTolerance(marks).map((m) => ({ label: m.label, edge: m.edge, errorMm: m.errorMm.worst, date: m.worstDate }));
  return {
    faceType: layout.faceType,
    ...(layout.faceType === 'equatorial' ? { side: layout.spec.face?.side === 'lower' ? ('lower' as const) : ('upper' as const) } : {}),
    year,
    toleranceMm,
    curveToleranceMm: toleranceMm,
    stepMinutes,
    everyDays,
    refraction,
    litMinutes,
    sunPositions,
    gnomon: { kind: part.kind, styleEdges: found.minusX.length + found.plusX.length, triangles: part.mesh.triangles.length },
    method: [
      'Sun: sunTrack (astronomy-engine 2.1.19 apparent equator of date and sidereal time, topocentric on its ellipsoid), horizon frame turned into the face frame (right, up along the substyle, outward normal)',
      refraction === 'none' ? 'refraction: none (geometric Sun)' : "refraction: astronomy-engine Refraction('normal')",
      'instant: topocentric hour angle = the line\'s hour angle (Newton on the track)',
      part.kind === 'rod' ? 'shadow: the centre of the rod mesh\'s top, projected along the rays onto the face' : 'shadow: the style edges found in the fin mesh (planarGnomonSolid), projected along the rays onto the face',
      'error: perpendicular distance of the shadow from the drawn line where they overlap; seconds: that distance over the shadow\'s motion in one second of hour angle',
      `curves: nodus on the mesh's style edge; date lines every 0.1° of hour angle on their date, the Sun at the line's declination seen from the site; mean-time curves with the real Sun at the clock time; distance to the drawn polyline, tolerance ${toleranceMm} mm as for the lines`,
    ],
    marks,
    curves,
    worst,
    failures,
    pass: checkPasses(failures, curves),
  };
}

/** Where the shadow of a set of straight edges lies against a drawn segment. */
interface SegmentShadow {
  /** largest perpendicular distance (signed, +: toward the segment's left) over the overlap, mm */
  readonly errorMm: number;
  /** mean signed offset over the overlap, mm (for the shadow's speed) */
  readonly meanOffsetMm: number;
}

/**
 * Project the edges along the Sun's rays onto z = 0 and measure them
 * against the drawn segment a→b: over the part of the segment that a
 * projected edge overlaps (along the segment), the perpendicular offset at
 * the overlap's two ends (both straight, so the extremes lie there).
 */
export function shadowOnSegment(edges: readonly Edge3[], sun: Vec3, a: Vec2, b: Vec2): SegmentShadow | null {
  if (!(sun[2] > 0)) return null;
  const L = Math.hypot(b[0] - a[0], b[1] - a[1]);
  const d: Vec2 = [(b[0] - a[0]) / L, (b[1] - a[1]) / L];
  const along = (p: Vec2) => (p[0] - a[0]) * d[0] + (p[1] - a[1]) * d[1];
  const across = (p: Vec2) => -(p[0] - a[0]) * d[1] + (p[1] - a[1]) * d[0];
  let worst = 0;
  let any = false;
  let sum = 0;
  let weight = 0;
  for (const [p, q] of edges) {
    const pa = projectOnFace(p, sun);
    const pb = projectOnFace(q, sun);
    const sa = along(pa);
    const sb = along(pb);
    if (Math.abs(sb - sa) < 1e-12) continue;
    const lo = Math.max(Math.min(sa, sb), 0);
    const hi = Math.min(Math.max(sa, sb), L);
    if (!(hi > lo)) continue;
    const ea = across(pa);
    const eb = across(pb);
    const at = (s: number) => ea + ((s - sa) * (eb - ea)) / (sb - sa);
    for (const e of [at(lo), at(hi)]) if (!any || Math.abs(e) > Math.abs(worst)) (worst = e), (any = true);
    sum += ((at(lo) + at(hi)) / 2) * (hi - lo);
    weight += hi - lo;
  }
  return any ? { errorMm: worst, meanOffsetMm: sum / weight } : null;
}

function rodShadowOnSegment(top: Vec3, sun: Vec3, a: Vec2, b: Vec2): SegmentShadow | null {
  if (!(sun[2] > 0)) return null;
  const X = projectOnFace(top, sun);
  const L = Math.hypot(b[0] - a[0], b[1] - a[1]);
  const d: Vec2 = [(b[0] - a[0]) / L, (b[1] - a[1]) / L];
  // The rod's shadow runs from its foot (the face origin) to X; it reaches the line if it is longer than the line's start.
  const reach = X[0] * d[0] + X[1] * d[1];
  if (reach < Math.hypot(a[0], a[1])) return null;
  const e = -(X[0] - a[0]) * d[1] + (X[1] - a[1]) * d[0];
  // Offset at the line's far end, on the ray from the foot through X.
  const eFar = (e * Math.hypot(b[0], b[1])) / Math.max(reach, 1e-9);
  return { errorMm: Math.abs(eFar) > Math.abs(e) ? eFar : e, meanOffsetMm: e };
}

function rodTopCentre(positions: readonly Vec3[]): Vec3 {
  const zTop = Math.max(...positions.map((p) => p[2]));
  const top = positions.filter((p) => Math.abs(p[2] - zTop) < 1e-9);
  return [top.reduce((s, p) => s + p[0], 0) / top.length, top.reduce((s, p) => s + p[1], 0) / top.length, zTop];
}

/** The nodus on the mesh's style edge: the edge point `nodusAlongStyleMm` along the style from its anchor. */
function nodusOnEdges(edges: readonly Edge3[], layout: PlanarLayout): Vec3 | null {
  const L = layout.gnomon.nodusAlongStyleMm;
  if (L === null || edges.length === 0) return null;
  const [p, q] = edges[0];
  const len = Math.hypot(q[0] - p[0], q[1] - p[1], q[2] - p[2]);
  const u: Vec3 = [(q[0] - p[0]) / len, (q[1] - p[1]) / len, (q[2] - p[2]) / len];
  // The anchor: the root (z = 0 end of a rising style) or, with ψ = 0, the point above the face origin (y = 0).
  const rising = Math.abs(u[2]) > 1e-9;
  const s0 = rising ? -p[2] / u[2] : -p[1] / u[1];
  const anchor: Vec3 = [p[0] + s0 * u[0], p[1] + s0 * u[1], p[2] + s0 * u[2]];
  const dir = rising && u[2] < 0 ? -1 : !rising && u[1] * (layout.face.style[0] * layout.face.up[0] + layout.face.style[1] * layout.face.up[1] + layout.face.style[2] * layout.face.up[2]) < 0 ? -1 : 1;
  return [anchor[0] + dir * L * u[0], anchor[1] + dir * L * u[1], anchor[2] + dir * L * u[2]];
}

/** The Sun's direction turned by dH of hour angle about the celestial pole (westward: H grows). */
function turnSun(enu: Vec3, latitudeRad: number, dH: number): Vec3 {
  const p: Vec3 = [0, Math.cos(latitudeRad), Math.sin(latitudeRad)];
  // Rodrigues' rotation by −dH about p (the Sun moves clockwise seen from above the north pole).
  const c = Math.cos(-dH);
  const s = Math.sin(-dH);
  const k = dot3(p, enu) * (1 - c);
  const x: Vec3 = [p[1] * enu[2] - p[2] * enu[1], p[2] * enu[0] - p[0] * enu[2], p[0] * enu[1] - p[1] * enu[0]];
  return [enu[0] * c + x[0] * s + p[0] * k, enu[1] * c + x[1] * s + p[1] * k, enu[2] * c + x[2] * s + p[2] * k];
}

function checkCurves(
  layout: PlanarLayout,
  drawnCurves: readonly PlanarCurve[],
  tol: number,
  days: readonly SunDay[],
  frame: (v: Vec3) => Vec3,
  nodusOf: (edge: FinEdge) => Vec3 | null,
  isLit: (s: SunSample) => boolean,
  track: ReturnType<typeof sunTrack>,
): PlanarCurveCheck[] {
  const spec = layout.spec;
  if (drawnCurves.length === 0) return [];
  const phi = spec.site.latitude * DEG;
  const entries = dateLineEntries(spec);
  const hs = layout.marks.map((m) => m.hourAngleDeg);
  // Inside the drawn field (the layout's own, `curveFieldOf`), where the curves were kept.
  const field = curveFieldOf(layout.marks, layout.faceType === 'equatorial');
  const out: PlanarCurveCheck[] = [];
  const inside = (X: Vec2) => insideCurveField(field, X, 0.5);
  const at = (sunEnu: Vec3, H: number, date: string): CurveSunPosition => ({ sun: frame(sunEnu), later: frame(turnSun(sunEnu, phi, HOUR_ANGLE_RAD_PER_S)), nodus: nodusOf(edgeForHourAngle(layout, H)), date });
  for (const curve of drawnCurves) {
    const positions: CurveSunPosition[] = [];
    if (curve.kind === 'date') {
      const e = entries.find((en) => curve.label === en.label) ?? entries.find((en) => curve.label.startsWith(en.label));
      if (!e) continue;
      const day = nearestDay(days, e.date);
      // Every 0.1° of hour angle across the lines, the Sun at the line's declination seen from the site (what the line claims).
      for (let Hd = Math.min(...hs) + DATE_LINE_TEST_STEP_DEG / 2; Hd <= Math.max(...hs); Hd += DATE_LINE_TEST_STEP_DEG) {
        const seen = topocentricSun(Hd * DEG, e.declinationRad, e.distanceAu, phi, track.observerAu);
        if (!(seen.enu[2] > 0)) continue;
        positions.push(at(seen.enu, seen.hourAngleRad, day.date));
      }
    } else {
      const minutes = parseClock('curve', curve.label.slice(0, 5));
      for (const day of days) {
        const s = sunOnDay(track, day, day.startMs + minutes * 60_000);
        if (!isLit(s)) continue;
        positions.push(at(s.enu, s.hourAngleRad, day.date));
      }
    }
    out.push(measureCurve(curve, positions, inside, tol));
  }
  return out;
}

function edgeForHourAngle(layout: PlanarLayout, H: number): FinEdge {
  const e = sunDirectionEnu(layout.spec.site.latitude * DEG, H, 0);
  return dot3(layout.face.fin, e) < 0 ? 'plusF' : 'minusF';
}


