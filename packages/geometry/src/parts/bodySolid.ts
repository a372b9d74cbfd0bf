import type { Manifold } from 'manifold-3d';
import { SpecError } from '../errors.ts';
import type { PlateDrawing } from '../plate/plateDrawing.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import { gnomonSolid } from './gnomonSolid.ts';
import { manifoldScope } from './manifoldScope.ts';
import { manifoldFromMesh, meshFromManifold } from './manifoldMesh.ts';
import type { Mesh } from './mesh.ts';
import { meshVolumeMm3 } from './meshVolumeMm3.ts';
import type { PartsPlan } from './partsPlan.ts';
import { validateMesh } from './validateMesh.ts';
import type { WedgePart } from './wedgeSolid.ts';
import { contours, groovedPlate } from './groovedPlate.ts';

/** Overlap of the plate into the wedge's seat and lip when they are fused, mm (below any printer's resolution). */
const FUSE_OVERLAP_MM = 0.01;

/** The one-piece dial as plain data. */
export interface BodyPart {
  readonly kind: 'body';
  /** closed mesh: plate coordinates (origin at the plate's lower-left corner, z up from its underside), or the wedge frame with the wedge */
  readonly mesh: Mesh;
  readonly withWedge: boolean;
  readonly grooveDepthMm: number;
  /** areas of the 2D sections that were extruded, mm² (for closed-form volume checks) */
  readonly areasMm2: {
    /** plate outline minus mounting holes */
    readonly plate: number;
    /** union of all line grooves, numerals and text */
    readonly grooves: number;
    /** part of the fin's footprint that lies over a groove */
    readonly finOverGrooves: number;
  };
  /** volume of the fused fin alone (from its groove-floor foot to the style), mm³ */
  readonly finVolumeMm3: number;
  readonly volumeMm3: number;
}

/**
 * The whole dial as one printable solid (manifold-3d booleans, DEPS.md):
 * - the plate: its outline (rounded corners) minus the mounting holes,
 *   extruded to the plate thickness, underside on z = 0;
 * - every engraved line of the drawing (marks and any curves) cut in as a
 *   groove of its own width with square ends, and the numerals and title
 *   recessed: each single-stroke polyline widened to its stroke width with
 *   round joins and caps; all grooves `grooveDepth` deep (flat floor);
 * - the gnomon fin fused on: centre plane on the substyle, from the layout's
 *   y0 to y1, its foot at the groove floor (so grooves never undercut it) and
 *   its style edges exactly gnomon height above the face; the nodus notch
 *   if the plan has one; no tabs (nothing to locate);
 * - with `plan.body.withWedge`, the latitude wedge fused under the plate,
 *   the plate laid on the seat against the lip (see faceToWedge); the
 *   result is then in the wedge's frame (base on z = 0).
 * The result comes straight from manifold's mesh, corners welded, and is
 * checked with validateMesh; no repair.
 *
 * @example (await bodySolid(layout, drawing, partsPlan(layout), null)).volumeMm3
 */
export async function bodySolid(layout: DialLayout, drawing: PlateDrawing, plan: PartsPlan, wedge: WedgePart | null): Promise<BodyPart> {
  const T = layout.plate.thicknessMm;
  const d = plan.body.grooveDepthMm;
  if (!(d <= T / 2)) {
    throw new SpecError('parts.grooveDepth', d, `allowed: at most half the plate thickness (${T / 2} mm) so the body keeps its strength`);
  }
  if (plan.body.withWedge && wedge === null) throw new Error('bodySolid: plan.body.withWedge needs the wedge part');
  return manifoldScope(async (wasm, keep) => {
    const { CrossSection, Manifold } = wasm;
    const { plateSection, grooveSection, grooved } = groovedPlate(wasm, keep, drawing, T, d, false);
    const g = plan.gnomon;
    const fin = gnomonSolid({ ...g, heightMm: g.heightMm + d, tabs: [] });
    const dx = layout.plate.substyleX;
    const dy = layout.plate.faceOriginY + plan.gnomonCentreYMm;
    const finMesh: Mesh = { positions: fin.mesh.positions.map(([x, y, z]) => [x + dx, y + dy, z + T - d] as const), triangles: fin.mesh.triangles };
    const finFoot = keep(new CrossSection(contours([[[dx - g.thicknessMm / 2, dy - g.lengthMm / 2], [dx + g.thicknessMm / 2, dy - g.lengthMm / 2], [dx + g.thicknessMm / 2, dy + g.lengthMm / 2], [dx - g.thicknessMm / 2, dy + g.lengthMm / 2]]])));
    const finOverGrooves = keep(CrossSection.intersection(finFoot, grooveSection)).area();

    let body: Manifold = keep(Manifold.union(grooved, keep(manifoldFromMesh(wasm, finMesh))));
    if (plan.body.withWedge && wedge !== null) {
      // Sink the plate FUSE_OVERLAP_MM into the seat and the lip: a definite
      // overlap instead of coplanar contact, whose rounding would leave slivers.
      const [, y0, z0] = wedge.seatCorners[0];
      const a = wedge.tiltRad;
      const e = FUSE_OVERLAP_MM;
      const shift: [number, number, number] = [-layout.plate.widthMm / 2, y0 - e * Math.cos(a) + e * Math.sin(a), z0 - e * Math.sin(a) - e * Math.cos(a)];
      const placed = keep(keep(body.rotate([(a * 180) / Math.PI, 0, 0])).translate(shift));
      body = keep(Manifold.union(placed, keep(manifoldFromMesh(wasm, wedge.mesh))));
    }
    const status = body.status();
    if (status !== 'NoError') throw new Error(`bodySolid: manifold-3d reports ${status}`);
    const mesh = validateMesh(meshFromManifold(body));
    return {
      kind: 'body',
      mesh,
      withWedge: plan.body.withWedge,
      grooveDepthMm: d,
      areasMm2: { plate: plateSection.area(), grooves: grooveSection.area(), finOverGrooves },
      finVolumeMm3: meshVolumeMm3(finMesh),
      volumeMm3: meshVolumeMm3(mesh),
    };
  });
}
