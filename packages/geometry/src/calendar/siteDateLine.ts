import { DEG, assertFinite, assertPositive, assertRange } from '../guards.ts';
import { observerMeridianAu, topocentricSun } from '../sun/topocentricSun.ts';
import { assertHemisphere, declinationTowardPoleRad } from './declinationTowardPoleRad.ts';
import { CURVE_CHORD_TOLERANCE_MM, refineByChord } from './refineByChord.ts';
import type { FacePoint, FacePolyline, Hemisphere } from './types.ts';

/** The two branches of a date line, one per style edge. */
export interface DateLineBranches {
  /** morning branch: shadow of the nodus on the west style edge */
  readonly west: FacePolyline;
  /** afternoon branch: shadow of the nodus on the east style edge */
  readonly east: FacePolyline;
}

/** Options of `siteDateLine` (lengths mm, angles radians unless named Deg). */
export interface SiteDateLineOptions {
  /** the line's declination as seen from the Earth's centre (the date's), north positive */
  readonly declinationRad: number;
  /** the Sun's distance on that date, AU */
  readonly distanceAu: number;
  /** site latitude, degrees: where the Sun is seen from */
  readonly latitudeDeg: number;
  /** nodus height above the style edge, mm */
  readonly heightMm: number;
  /** gnomon thickness t, mm: the styles sit at x = ±t/2 */
  readonly thicknessMm: number;
  readonly hemisphere: Hemisphere;
  /** each branch runs from the meridian to this |hour angle| (geocentric), < π/2 */
  readonly maxHourAngleRad: number;
  /** largest distance of the curve from a drawn chord, mm (default `CURVE_CHORD_TOLERANCE_MM`, 0.0005) */
  readonly chordToleranceMm?: number;
}

/** First step of hour angle between samples, before refinement. */
const FIRST_STEP_RAD = 1 * DEG;
/** Halvings of a first step at most (1° / 2¹² ≈ 0.9″). */
const MAX_HALVINGS = 12;

/**
 * The date line of a nodus on a polar face as the site sees it: for the
 * Sun at the line's declination δ (geocentric) and distance r, at hour
 * angles H from the meridian out to `maxHourAngleRad` on each side, the Sun
 * moved to the site (`topocentricSun`: the diurnal parallax, up to 8.8″,
 * which shifts the line by a few µm), then the nodus shadow from the style
 * edge that casts it (docs/design.md §2):
 *
 *     x = ±(t/2 + h·|tan H′|)      y = −h·tan δp′ / cos H′
 *
 * with H′, δ′ the topocentric hour angle and declination and δp′ measured
 * toward the elevated pole; x east-positive in the north, mirrored in the
 * south. Without the parallax this is the handbook hyperbola
 * y = −tan δp · √(h² + (|x| − t/2)²) (docs/design.md §2). Sampled every 1°
 * of H, each step halved while the curve's point at its middle lies more
 * than `chordToleranceMm` from the chord (`refineByChord`). Each branch is
 * listed by increasing face x, y from the nodus foot; not clipped.
 *
 * @example siteDateLine({ declinationRad: 0.409, distanceAu: 1.016, latitudeDeg: 47, heightMm: 60, thicknessMm: 3, hemisphere: 'north', maxHourAngleRad: 1 }).east[0] // ≈ [1.5, −26.0]
 */
export function siteDateLine(options: SiteDateLineOptions): DateLineBranches {
  const delta = assertRange('declinationRad', options.declinationRad, -Math.PI / 2 + 1e-9, Math.PI / 2 - 1e-9, ' rad');
  const r = assertPositive('distanceAu', options.distanceAu);
  const lat = assertRange('site.latitude', options.latitudeDeg, -90, 90, '°');
  const h = assertPositive('heightMm', options.heightMm);
  const half = assertRange('thicknessMm', options.thicknessMm, 0, Number.MAX_VALUE, ' mm') / 2;
  const hemisphere = assertHemisphere(options.hemisphere);
  const hMax = assertRange('maxHourAngleRad', assertFinite('maxHourAngleRad', options.maxHourAngleRad), 0, 89.9 * DEG, ' rad');
  const tol = assertPositive('chordToleranceMm', options.chordToleranceMm ?? CURVE_CHORD_TOLERANCE_MM);
  const observer = observerMeridianAu(lat, 0);
  const mirror = hemisphere === 'north' ? 1 : -1;

  const branch = (side: -1 | 1): FacePolyline => {
    const at = (H: number): { readonly point: FacePoint } => {
      const seen = topocentricSun(H, delta, r, lat * DEG, observer);
      const xEast = side * (half + h * Math.abs(Math.tan(seen.hourAngleRad)));
      const y = (-h * Math.tan(declinationTowardPoleRad(seen.declinationRad, hemisphere))) / Math.cos(seen.hourAngleRad);
      return { point: [mirror * xEast, y] };
    };
    const n = Math.max(1, Math.ceil(hMax / FIRST_STEP_RAD));
    const params = Array.from({ length: n + 1 }, (_, k) => (side * hMax * k) / n);
    const pts = refineByChord(params, at, { toleranceMm: tol, maxHalvings: MAX_HALVINGS }).map((s) => (s as NonNullable<typeof s>).point);
    return pts[0][0] > pts[pts.length - 1][0] ? pts.reverse() : pts;
  };
  // West: the morning (H < 0) branch, cast by the west style edge.
  return { west: branch(-1), east: branch(1) };
}
