import type { Mesh, Vec3 } from '../parts/mesh.ts';
import { addPlanarFace, addPoint, finishMesh, newDraft } from '../parts/meshDraft.ts';
import { extrudeProfileX } from '../parts/extrudeProfileX.ts';
import { dropCollinear, shoelaceArea } from '../parts/ring2d.ts';
import { validateMesh } from '../parts/validateMesh.ts';
import type { Vec2 } from '../types.ts';
import type { PlanarLayout } from './layoutPlanar.ts';

/** Sides of the polygon standing for an equatorial dial's round rod (even, so its shadow band is centred on the axis). */
export const ROD_SIDES = 32;

/** The gnomon of a planar face as a solid, in the face frame of the layout (x across, y along the substyle, z out of the face), mm. */
export interface PlanarGnomonPart {
  readonly kind: 'fin' | 'rod';
  readonly mesh: Mesh;
  /** fin: the side outline in (y, z) with its tabs below z = 0 (for gnomon.dxf); rod: its side view */
  readonly profile: readonly Vec2[];
  readonly profileAreaMm2: number;
  readonly thicknessMm: number;
  /** how deep the tabs (or the rod) reach below the face, mm */
  readonly belowFaceMm: number;
}

/**
 * The real gnomon of a planar layout, the solid the shadow check casts:
 * - a fin (ψ > 0: a triangle whose style edge rises from the root at the
 *   style height ψ over the substyle; ψ = 0: a rectangle at the style
 *   height), thickness t, with its tabs reaching through the plate
 *   (`plate.thickness`), extruded across x = ±t/2;
 * - a rod for an equatorial face: a 32-sided prism of diameter t square to
 *   the face through its centre, from `belowFaceMm` under it to the height h
 *   (the lower face's rod end is the same length through the plate).
 *
 * @example planarGnomonSolid(layoutPlanar(spec)).mesh.triangles.length
 */
export function planarGnomonSolid(layout: PlanarLayout): PlanarGnomonPart {
  const g = layout.gnomon;
  const t = g.thicknessMm;
  const depth = layout.plate.thicknessMm;
  if (g.kind === 'rod') {
    const draft = newDraft();
    const r = t / 2;
    const ring = (z: number) => Array.from({ length: ROD_SIDES }, (_, k) => {
      const a = (2 * Math.PI * (k + 0.5)) / ROD_SIDES;
      return addPoint(draft, [r * Math.cos(a), r * Math.sin(a), z] as Vec3);
    });
    const lo = ring(-depth - g.heightMm);
    const hi = ring(g.heightMm);
    addPlanarFace(draft, [0, 0, 1], hi);
    addPlanarFace(draft, [0, 0, -1], [...lo].reverse());
    for (let k = 0; k < ROD_SIDES; k++) {
      const k1 = (k + 1) % ROD_SIDES;
      const a = (2 * Math.PI * (k + 1)) / ROD_SIDES;
      addPlanarFace(draft, [Math.cos(a), Math.sin(a), 0], [lo[k], lo[k1], hi[k1], hi[k]]);
    }
    const profile: Vec2[] = [[-r, -depth - g.heightMm], [r, -depth - g.heightMm], [r, g.heightMm], [-r, g.heightMm]];
    return { kind: 'rod', mesh: validateMesh(finishMesh(draft)), profile, profileAreaMm2: shoelaceArea(profile), thicknessMm: t, belowFaceMm: depth + g.heightMm };
  }
  // The fin's outline, counter-clockwise in (y, z): along the bottom (with the tabs), then up the style.
  const [first, ...rest] = g.profile;
  const bottomEnd = rest[0];
  const outline: Vec2[] = [first];
  for (const tab of [...g.tabs].sort((a, b) => a.centerYMm - b.centerYMm)) {
    const y0 = tab.centerYMm - tab.lengthMm / 2;
    const y1 = tab.centerYMm + tab.lengthMm / 2;
    outline.push([y0, 0], [y0, -depth], [y1, -depth], [y1, 0]);
  }
  outline.push(bottomEnd, ...rest.slice(1));
  const profile = dropCollinear(outline);
  const draft = newDraft();
  extrudeProfileX(draft, profile, -t / 2, t / 2);
  return { kind: 'fin', mesh: validateMesh(finishMesh(draft)), profile, profileAreaMm2: shoelaceArea(profile), thicknessMm: t, belowFaceMm: depth };
}
