import type { DialLayout } from '../polar/layoutDial.ts';
import { gnomonSolid, type GnomonPart } from '../parts/gnomonSolid.ts';
import type { Mesh } from '../parts/mesh.ts';

/**
 * The gnomon solid of a layout, placed in the face frame: `gnomonSolid` with
 * the layout's gnomon (height, thickness, length y1 − y0, tabs through the
 * plate at their face y, as deep as the plate), then moved along y so that
 * the style runs from `gnomon.y0Mm` to `gnomon.y1Mm`. The mesh is the same
 * solid that gnomon.stl is made from (gnomonSolid builds it in the face frame
 * with the fin centred on y = 0).
 *
 * @example gnomonForLayout(layoutDial(spec)).mesh.positions.length // 8 corners + tab corners
 */
export function gnomonForLayout(layout: DialLayout): GnomonPart {
  const g = layout.gnomon;
  const mid = (g.y0Mm + g.y1Mm) / 2;
  const part = gnomonSolid({
    heightMm: g.heightMm,
    thicknessMm: g.thicknessMm,
    lengthMm: g.y1Mm - g.y0Mm,
    tabs: g.tabs.map((t) => ({ centerYMm: t.centerYMm - mid, lengthMm: t.lengthMm, depthMm: layout.plate.thicknessMm })),
    plateThicknessMm: layout.plate.thicknessMm,
  });
  const mesh: Mesh = { positions: part.mesh.positions.map(([x, y, z]) => [x, y + mid, z] as const), triangles: part.mesh.triangles };
  const profile = part.profile.map(([y, z]) => [y + mid, z] as const);
  return { ...part, mesh, profile, ...(part.nodusMm ? { nodusMm: [part.nodusMm[0], part.nodusMm[1] + mid, part.nodusMm[2]] as const } : {}) };
}
