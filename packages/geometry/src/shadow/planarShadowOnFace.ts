import type { Vec3 } from '../parts/mesh.ts';
import { dot3 } from '../parts/vec3.ts';
import type { PlanarLayout } from '../planar/layoutPlanar.ts';
import { ROD_SIDES } from '../planar/planarGnomonSolid.ts';
import type { Path, Vec2 } from '../types.ts';
import { projectToFace } from './castShadow.ts';
import { convexHull2d } from './convexHull2d.ts';

/**
 * A direction of the horizon frame (x east, y north, z up) in a planar
 * face's frame: x right, y up the drawing (along the substyle), z out of
 * the face — the frame of its marks and of `planarGnomonSolid`.
 * @example planarFaceVector(layoutPlanar(spec), [0, 0, 1]) // the zenith as seen from the face
 */
export function planarFaceVector(layout: PlanarLayout, enu: Vec3): Vec3 {
  const f = layout.face;
  return [dot3(enu, f.right), dot3(enu, f.up), dot3(enu, f.normal)];
}

/**
 * The gnomon's shadow on a horizontal, wall, meridian or equatorial face
 * for one Sun direction, as closed polygons in face coordinates (mm,
 * counter-clockwise); their union is the shadow. `sunFace` points toward
 * the Sun in the face frame (`planarFaceVector`); [] when the Sun is not in
 * front of the face (z ≤ 0). Whether it is above the horizon is the
 * caller's to test.
 *
 * The solid is the one `planarGnomonSolid` builds, above the face:
 * - a fin: its outline `layout.gnomon.profile` (u along y, v height),
 *   extruded across x = ±t/2. Cut at every corner's u, each strip is a
 *   trapezoid between the outline's lowest and highest edge there, so a
 *   convex prism whose shadow is the convex hull of its 8 projected
 *   corners (as `shadowOnFace` does for the polar fin); a nodus notch gives
 *   one polygon per strip;
 * - an equatorial rod: a ROD_SIDES-gon of diameter t square to the face,
 *   from the face to its height h: the hull of both ends' projected corners.
 *
 * @example planarShadowOnFace(layout, planarFaceVector(layout, sunDirectionEnu(lat, H, decl)))
 */
export function planarShadowOnFace(layout: PlanarLayout, sunFace: Vec3): readonly Path[] {
  const s = sunFace;
  if (!(s.every(Number.isFinite) && s[2] > 0)) return [];
  const g = layout.gnomon;
  const half = g.thicknessMm / 2;
  const shadow = (corners: readonly Vec3[]): Path => ({ kind: 'path', points: convexHull2d(corners.map((p) => projectToFace(p, s))), closed: true });
  if (g.kind === 'rod') {
    // The same corners as the rod's mesh (planarGnomonSolid), at the face and at the top.
    const ring = Array.from({ length: ROD_SIDES }, (_, k): Vec2 => {
      const a = (2 * Math.PI * (k + 0.5)) / ROD_SIDES;
      return [half * Math.cos(a), half * Math.sin(a)];
    });
    return [shadow([...ring.map(([x, y]): Vec3 => [x, y, 0]), ...ring.map(([x, y]): Vec3 => [x, y, g.heightMm])])];
  }
  const outline = g.profile;
  const us = [...new Set(outline.map(([u]) => u))].sort((a, b) => a - b);
  const out: Path[] = [];
  for (let i = 0; i + 1 < us.length; i++) {
    const [ua, ub] = [us[i], us[i + 1]];
    const mid = (ua + ub) / 2;
    // The outline's edges across this strip, each as its height at ua and ub.
    const across: [number, number][] = [];
    for (let k = 0; k < outline.length; k++) {
      const [p, q] = [outline[k], outline[(k + 1) % outline.length]];
      if (p[0] === q[0] || mid < Math.min(p[0], q[0]) || mid > Math.max(p[0], q[0])) continue;
      const at = (u: number) => p[1] + ((q[1] - p[1]) * (u - p[0])) / (q[0] - p[0]);
      across.push([Math.max(0, at(ua)), Math.max(0, at(ub))]);
    }
    if (across.length < 2) continue;
    const byMid = across.sort((a, b) => a[0] + a[1] - (b[0] + b[1]));
    const [lo, hi] = [byMid[0], byMid[byMid.length - 1]];
    if (hi[0] - lo[0] <= 1e-12 && hi[1] - lo[1] <= 1e-12) continue;
    const corners: Vec3[] = [];
    for (const x of [-half, half]) corners.push([x, ua, lo[0]], [x, ua, hi[0]], [x, ub, lo[1]], [x, ub, hi[1]]);
    out.push(shadow(corners));
  }
  return out;
}
