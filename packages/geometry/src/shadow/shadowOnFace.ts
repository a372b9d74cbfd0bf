import type { DialLayout } from '../polar/layoutDial.ts';
import type { GnomonPart } from '../parts/gnomonSolid.ts';
import type { Vec3 } from '../parts/mesh.ts';
import type { Path, Vec2 } from '../types.ts';
import { projectToFace } from './castShadow.ts';
import { convexHull2d as hull2d } from './convexHull2d.ts';
import { gnomonForLayout } from './gnomonForLayout.ts';

/**
 * The gnomon's shadow on the face for one Sun direction, as closed polygons
 * in face coordinates (mm, counter-clockwise); their union is the shadow.
 * `sunDirectionInDialFrame` points toward the Sun in the dial frame (any
 * length; see `dialFrame`/`toDialFrame`). Returns [] when the Sun is not in
 * front of the face (s_z ≤ 0); whether it is above the horizon is the
 * caller's to test (`SunSample.altitudeRad`, or `isFaceLit`).
 *
 * Method: the part of the gnomon above the face (z ≥ 0) is its fin, an
 * extrusion across x. Read from the mesh, its top at each y is the highest
 * vertex there; between neighbouring y values the cross-section is a
 * trapezoid, so each such strip is a convex prism whose shadow is the convex
 * hull of its 8 projected corners (Andrew's monotone chain: A. M. Andrew,
 * "Another efficient algorithm for convex hulls in two dimensions", Inf.
 * Proc. Letters 9, 1979). A plain fin gives one quadrilateral-to-hexagon;
 * a nodus notch gives one polygon per strip. The tabs lie below the face.
 *
 * @param part the gnomon solid (default: `gnomonForLayout(layout)`)
 * @example shadowOnFace(layout, [-0.7071, 0, 0.7071]) // 09:00 at an equinox (north)
 */
export function shadowOnFace(layout: DialLayout, sunDirectionInDialFrame: Vec3, part: GnomonPart = gnomonForLayout(layout)): readonly Path[] {
  const s = sunDirectionInDialFrame;
  if (!(s.every(Number.isFinite) && s[2] > 0)) return [];
  const P = part.mesh.positions;
  let xMin = Infinity;
  let xMax = -Infinity;
  const top = new Map<number, number>();
  for (const [x, y, z] of P) {
    xMin = Math.min(xMin, x);
    xMax = Math.max(xMax, x);
    if (z > 0) top.set(y, Math.max(top.get(y) ?? 0, z));
  }
  const chain = [...top.entries()].sort((a, b) => a[0] - b[0]);
  const strips = mergeStraight(chain);
  const out: Path[] = [];
  for (let i = 0; i + 1 < strips.length; i++) {
    const [ya, za] = strips[i];
    const [yb, zb] = strips[i + 1];
    const corners: Vec2[] = [];
    for (const x of [xMin, xMax]) {
      for (const [y, z] of [[ya, 0], [ya, za], [yb, 0], [yb, zb]] as const) corners.push(projectToFace([x, y, z], s));
    }
    out.push({ kind: 'path', points: hull2d(corners), closed: true });
  }
  return out;
}

/** Drop top-chain points that lie on the straight line through their neighbours (one strip for a plain fin). */
function mergeStraight(chain: readonly (readonly [number, number])[]): (readonly [number, number])[] {
  const out: (readonly [number, number])[] = [];
  for (const p of chain) {
    while (out.length >= 2) {
      const a = out[out.length - 2];
      const b = out[out.length - 1];
      const cross = (b[0] - a[0]) * (p[1] - a[1]) - (b[1] - a[1]) * (p[0] - a[0]);
      if (Math.abs(cross) > 1e-9) break;
      out.pop();
    }
    out.push(p);
  }
  return out;
}
