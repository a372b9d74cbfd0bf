import type { DialLayout } from '../polar/layoutDial.ts';
import { dialGnomon } from '../parts/dialParts.ts';
import type { GnomonPart } from '../parts/gnomonSolid.ts';
import type { Mesh } from '../parts/mesh.ts';
import { partsPlan } from '../parts/partsPlan.ts';

/**
 * The gnomon solid of a layout, placed in the face frame: the very part
 * gnomon.stl is written from (`dialGnomon(partsPlan(layout), layout)`: the
 * fin with its tabs and any nodus notch, face z = 0, style edges at the
 * gnomon height, y centred on the fin), moved along y by the plan's
 * `gnomonCentreYMm` so that fin y becomes face y. (gnomon.stl then lays the
 * same mesh flat for printing; that rotation does not change its shape.)
 *
 * @example gnomonForLayout(layoutDial(spec)).mesh
 */
export function gnomonForLayout(layout: DialLayout): GnomonPart {
  const plan = partsPlan(layout);
  const part = dialGnomon(plan, layout);
  const dy = plan.gnomonCentreYMm;
  const mesh: Mesh = { positions: part.mesh.positions.map(([x, y, z]) => [x, y + dy, z] as const), triangles: part.mesh.triangles };
  const profile = part.profile.map(([y, z]) => [y + dy, z] as const);
  return { ...part, mesh, profile, ...(part.nodusMm ? { nodusMm: [part.nodusMm[0], part.nodusMm[1] + dy, part.nodusMm[2]] as const } : {}) };
}
