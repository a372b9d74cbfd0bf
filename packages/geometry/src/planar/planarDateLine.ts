import { refineByChord, CURVE_CHORD_TOLERANCE_MM } from '../calendar/refineByChord.ts';
import { DEG } from '../guards.ts';
import { observerMeridianAu, topocentricSun } from '../sun/topocentricSun.ts';
import type { Vec2 } from '../types.ts';
import { faceSeesSun } from './faceSeesSun.ts';
import { nodusPoint } from './nodusPoint.ts';
import { nodusShadow } from './nodusShadow.ts';
import type { FinEdge, PlanarFace } from './planarTypes.ts';
import { hourLine } from './hourLine.ts';
import type { PlanarGnomon } from './styleEdgeAnchor.ts';

/** A run of shadow points cast by one edge's nodus. */
export interface NodusTrace {
  readonly edge: FinEdge;
  readonly points: readonly Vec2[];
}

/** Options of `planarSiteDateLine`. */
export interface PlanarSiteDateLineOptions {
  /** the line's declination seen from the Earth's centre, north positive */
  readonly declinationRad: number;
  /** the Sun's distance on the line's date, AU */
  readonly distanceAu: number;
  /** the first hour angles, radians, ascending (refined between them) */
  readonly hourAngles: readonly number[];
  readonly alongStyleMm?: number;
  /** largest distance of the line from a drawn chord, mm (default `CURVE_CHORD_TOLERANCE_MM`, 0.0005) */
  readonly chordToleranceMm?: number;
}

/** Halvings of a first step at most. */
const MAX_HALVINGS = 12;
/**
 * How close to where the face stops showing it (sunset, sunrise, or the Sun
 * leaving the face's plane) a date line is drawn, radians of hour angle:
 * 1e-10 rad, 2e-8°, under 1e-7 mm of shadow for a nodus within 1 m of the face
 * at a finite end (a tenth of a micron against the 0.0005 mm chord tolerance).
 */
const END_WIDTH_RAD = 1e-10;

/**
 * The date line (a conic) of declination δ as the site sees it: the nodus
 * shadow (docs/design.md §8: X = N − s (n · (N − O))/(n · s)), each point
 * from the nodus on the edge that casts at its hour angle (`nodusShadowOf`),
 * with the Sun at δ and each hour angle moved from the
 * Earth's centre to the site (`topocentricSun`: the diurnal parallax, up to
 * 8.8″, a few µm on the face), each step between the given hour angles
 * halved while the line strays more than `chordToleranceMm` from its chord
 * (`refineByChord`), and each step over which the Sun sets, rises, or
 * leaves or reaches the face bisected to that end (`curveEnd`, to
 * `END_WIDTH_RAD`), so the line runs to the last hour angle the face shows
 * it; split into runs wherever the casting edge changes or the Sun leaves
 * the face (`shadowRuns`).
 *
 * @example planarSiteDateLine(face, { thicknessMm: 0, heightMm: 90 }, { declinationRad: 0.409, distanceAu: 1.016, hourAngles: [-1, 0, 1] })
 */
export function planarSiteDateLine(face: PlanarFace, gnomon: PlanarGnomon, options: PlanarSiteDateLineOptions): readonly NodusTrace[] {
  const phi = face.orientation.latitudeRad;
  const observer = observerMeridianAu(phi / DEG, 0);
  const at = (H: number) => {
    const seen = topocentricSun(H, options.declinationRad, options.distanceAu, phi, observer);
    return nodusShadowOf(face, gnomon, { sun: seen.enu, hourAngleRad: seen.hourAngleRad }, options.alongStyleMm);
  };
  const toleranceMm = options.chordToleranceMm ?? CURVE_CHORD_TOLERANCE_MM;
  return shadowRuns(refineByChord(options.hourAngles, at, { toleranceMm, maxHalvings: MAX_HALVINGS, endWidth: END_WIDTH_RAD, sameRun: (a, b) => a.edge === b.edge }));
}

/** One Sun position of a date line or mean-time curve. */
export interface NodusSample {
  readonly sun: readonly [number, number, number];
  readonly hourAngleRad: number;
}

/**
 * The nodus shadow of one Sun position: the point cast by the nodus on the
 * edge that casts at its hour angle (`hourLine`), or null when the face does
 * not see the Sun.
 */
export function nodusShadowOf(face: PlanarFace, gnomon: PlanarGnomon, sample: NodusSample, alongStyleMm?: number): { readonly edge: FinEdge; readonly point: Vec2 } | null {
  const set = faceSeesSun(face, sample.sun) ? hourLine(face, gnomon, sample.hourAngleRad) : null;
  const edge = set?.lines[0]?.edge;
  const X = edge ? nodusShadow(face, nodusPoint(face, gnomon, edge, alongStyleMm), sample.sun) : null;
  return edge && X ? { edge, point: X } : null;
}

/** Shadow points in order (null where the face is dark) split into runs wherever the casting edge changes or the Sun leaves the face; single points dropped. */
export function shadowRuns(shadows: readonly ({ readonly edge: FinEdge; readonly point: Vec2 } | null)[]): readonly NodusTrace[] {
  const runs: NodusTrace[] = [];
  let current: { edge: FinEdge; points: Vec2[] } | null = null;
  for (const x of shadows) {
    if (!x) {
      if (current && current.points.length > 1) runs.push(current);
      current = null;
      continue;
    }
    if (!current || current.edge !== x.edge) {
      if (current && current.points.length > 1) runs.push(current);
      current = { edge: x.edge, points: [] };
    }
    current.points.push(x.point);
  }
  if (current && current.points.length > 1) runs.push(current);
  return runs;
}
