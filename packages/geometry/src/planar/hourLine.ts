import type { Vec3 } from '../parts/mesh.ts';
import { cross3, dot3, length3 } from '../parts/vec3.ts';
import type { Vec2 } from '../types.ts';
import { toFaceXY } from './faceCoordinates.ts';
import type { FaceLine, FinEdge, PlanarFace } from './planarTypes.ts';
import { isEquatorialFace, isParallelFace, styleEdgeAnchor, type PlanarGnomon } from './styleEdgeAnchor.ts';
import { sunDirectionEnu } from './sunDirectionEnu.ts';

/** One style edge's hour line. */
export interface EdgeHourLine {
  /** the casting edge ('plusF' for an equatorial rod's single axis) */
  readonly edge: FinEdge;
  /**
   * the line in drawing coordinates: for ψ > 0 `point` is the edge's root and
   * `direction` points from it along the shadow; for ψ = 0 `point` is the
   * shadow of the edge's point above the face origin and `direction` runs
   * along the substyle toward the elevated pole
   */
  readonly line: FaceLine;
}

/** Hour lines of one hour angle: one edge, both at H₀ (the noon band of a polar dial), the axis of a rod. */
export interface HourLineSet {
  readonly hourAngleRad: number;
  readonly lines: readonly EdgeHourLine[];
}

/**
 * The hour line(s) of hour angle H by the general method (docs/design.md §8): the
 * hour plane holds the style edge (direction p, through its anchor A) and
 * the Sun's direction at the equator s(H, 0); its normal m = p × s(H, 0); the
 * line on the face runs along n × m. With ψ > 0 it passes through the edge's
 * root (A itself); with ψ = 0 through A's shadow A − s (n · A)/(n · s), which
 * lies h·(n − s/(n · s)) from the edge's foot, the handbook h · tan(H − H₀).
 *
 * The casting edge of a thick fin is the one on the shadow's side: the edge
 * σ with σ f · s(H, 0) < 0 (a polar dial's west style in the morning); at H₀
 * (f · s = 0) both edges bound the noon band. Returns null where the line
 * cannot be drawn: ψ = 0 and the Sun grazing the face at the equinox
 * (n · s(H, 0) ≤ 1e-9, the line at infinity).
 *
 * @example hourLine(planarFace({ type: 'horizontal', latitudeRad: 0.9 }), { thicknessMm: 0, heightMm: 80 }, Math.PI / 4)
 */
export function hourLine(face: PlanarFace, gnomon: PlanarGnomon, hourAngleRad: number): HourLineSet | null {
  const e = sunDirectionEnu(face.orientation.latitudeRad, hourAngleRad, 0);
  const n = face.normal;
  const ne = dot3(n, e);
  const parallel = isParallelFace(face);
  if (parallel && !(ne > 1e-9)) return null;
  const fe = dot3(face.fin, e);
  const edges: FinEdge[] = isEquatorialFace(face) || gnomon.thicknessMm === 0
    ? ['plusF']
    : Math.abs(fe) < 1e-12 ? ['minusF', 'plusF'] : [fe < 0 ? 'plusF' : 'minusF'];
  const lines = edges.map((edge): EdgeHourLine => {
    const A = styleEdgeAnchor(face, gnomon, edge);
    if (parallel) {
      const k = dot3(n, A) / ne;
      const X: Vec3 = [A[0] - k * e[0], A[1] - k * e[1], A[2] - k * e[2]];
      return { edge, line: { point: toFaceXY(face, X), direction: unit2(toFaceXY(face, face.style)) } };
    }
    const m = cross3(face.pole, e);
    let u = cross3(n, m);
    // Orient along the shadow: away from the Sun's hour direction (u · s(H,0) < 0).
    if (dot3(u, e) > 0) u = [-u[0], -u[1], -u[2]];
    const len = length3(u);
    return { edge, line: { point: toFaceXY(face, A), direction: unit2(toFaceXY(face, [u[0] / len, u[1] / len, u[2] / len])) } };
  });
  return { hourAngleRad, lines };
}

function unit2(v: Vec2): Vec2 {
  const l = Math.hypot(v[0], v[1]);
  return [v[0] / l, v[1] / l];
}
