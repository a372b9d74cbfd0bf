import {
  bodySolid,
  dialGnomon,
  dialWedge,
  gnomonOnPlate,
  mapMesh,
  meshBounds,
  meshVolumeMm3,
  partsPlan,
  validateMesh,
  type Mesh,
  type WedgePart,
} from '@umbrafab/geometry';
import { stlHeader, toStl } from '@umbrafab/fabricate';
import { cutPartFiles, cutParts } from './cutParts.ts';
import { utf8, type Producer } from './outputTypes.ts';
import type { OutputFile } from '../writeFilesAtomic.ts';

/** Volume and bounding box of a written part, as report.json gives them. */
function figures(mesh: Mesh): { volumeMm3: number; bbox: { minMm: readonly number[]; maxMm: readonly number[] }; facets: number } {
  const b = meshBounds(mesh);
  return { volumeMm3: meshVolumeMm3(mesh), bbox: { minMm: b.min, maxMm: b.max }, facets: mesh.triangles.length };
}

/**
 * The parts of `umbrafab build`: gnomon.stl / gnomon.dxf,
 * wedge.stl and body.stl as `partsPlan` chooses from the process and
 * `parts.write`, and the report's `wedge` and `parts` sections.
 *
 * Frames of the files (mm):
 * - gnomon.stl: the fin laid flat for printing (no support): style along +x
 *   from x = 0, height along +y with the tab bottoms on y = 0 and the face
 *   line at y = tab depth, thickness along z from 0.
 * - gnomon.dxf: the same outline in x, y, at nominal size with T-bone relief
 *   at the tab roots for a router (sheetParts' gnomon; cutFiles.precompensate
 *   writes gnomon-offset-K mm.dxf instead).
 * - wedge.stl: base on z = 0, seat rising toward +y = the elevated pole
 *   (true north in the northern hemisphere, true south in the southern),
 *   the meridian arrow pointing +y.
 * - body.stl: plate coordinates (origin at the plate's lower-left corner,
 *   underside on z = 0), or the wedge's frame when the wedge is fused on.
 */
export const partsOutputs: Producer = async ({ spec, layout, drawing }) => {
  const plan = partsPlan(layout);
  const gnomon = dialGnomon(plan, layout);
  const g = layout.gnomon;
  const pole = plan.elevatedPole === 'north' ? 'true north' : 'true south';
  const needWedge = plan.files.includes('wedge.stl') || (plan.files.includes('body.stl') && plan.body.withWedge);
  const wedge: WedgePart | null = needWedge ? dialWedge(plan, layout) : null;
  const files: OutputFile[] = [];
  const parts: Record<string, unknown> = {
    files: plan.files,
    gnomonFrom: plan.gnomonFrom,
    tabDepthMm: plan.tabDepthMm,
    fitClearancePerSideMm: plan.clearanceMm,
    slots: layout.plate.slots.map((s, i) => ({
      widthMm: s.widthMm,
      lengthMm: s.heightMm,
      tabWidthMm: g.thicknessMm,
      tabLengthMm: g.tabs[i].lengthMm,
    })),
  };
  const lat = spec.site.latitude;
  const latText = `${Math.abs(lat).toFixed(2)} deg ${lat >= 0 ? 'N' : 'S'}`;

  // Assembled: style edges gnomon height above the face, tab bottoms at the plate's underside.
  const assembled = meshBounds(gnomonOnPlate(gnomon, plan));
  const gnomonReport = {
    ...figures(gnomon.mesh),
    styleHeightAboveFaceMm: assembled.max[2],
    tabBottomBelowFaceMm: -assembled.min[2],
    thicknessMm: gnomon.thicknessMm,
    lengthMm: g.y1Mm - g.y0Mm,
    profileAreaMm2: gnomon.profileAreaMm2,
    ...(gnomon.nodusMm ? { nodusFaceYMm: gnomon.nodusMm[1] + plan.gnomonCentreYMm } : {}),
  };
  if (plan.files.includes('gnomon.stl')) {
    const tab = plan.tabDepthMm;
    const t2 = gnomon.thicknessMm / 2;
    const halfL = (g.y1Mm - g.y0Mm) / 2;
    // (x, y, z) -> (y, z, x) is a rotation (cyclic permutation), so the winding stays outward.
    const flat = validateMesh(mapMesh(gnomon.mesh, ([x, y, z]) => [y + halfL, z + tab, x + t2]));
    files.push({
      name: 'gnomon.stl',
      bytes: toStl(flat, { header: stlHeader([`umbrafab gnomon h=${g.heightMm} t=${g.thicknessMm} L=${(2 * halfL).toFixed(1)} mm, ${g.tabs.length} tabs, laid flat`, spec.name]) }),
    });
    parts.gnomon = { ...gnomonReport, ...figures(flat) };
  } else {
    parts.gnomon = gnomonReport;
  }
  if (plan.files.includes('gnomon.dxf')) {
    const part = cutParts({ spec, layout, drawing }).find((p) => p.name === 'gnomon');
    if (!part) throw new Error('partsOutputs: the sheet parts have no gnomon');
    const cut = await cutPartFiles({ spec, layout, drawing }, part);
    files.push(...cut.files);
    parts.gnomonDxf = cut.report;
  }

  const wedgeReport: Record<string, unknown> = {
    angleDeg: plan.tiltDeg,
    risesToward: pole,
    arrowPointsTo: pole,
  };
  if (wedge !== null) {
    Object.assign(wedgeReport, {
      design: wedge.design,
      seatWidthMm: plan.wedge.seatWidthMm,
      seatLengthMm: plan.wedge.seatLengthMm,
      seatNormal: wedge.seatNormal,
      toeLengthMm: wedge.toeLengthMm,
      footprintMm: wedge.footprint,
      mountingHoles: wedge.holes.length,
    });
  }
  if (wedge !== null && plan.files.includes('wedge.stl')) {
    files.push({
      name: 'wedge.stl',
      bytes: toStl(wedge.mesh, { header: stlHeader([`umbrafab wedge ${latText}, arrow/+y to ${pole}, seat ${plan.wedge.seatWidthMm.toFixed(1)}x${plan.wedge.seatLengthMm.toFixed(1)} mm`, spec.name]) }),
    });
    parts.wedge = figures(wedge.mesh);
  }

  if (plan.files.includes('body.stl')) {
    const body = await bodySolid(layout, drawing, plan, plan.body.withWedge ? wedge : null);
    files.push({
      name: 'body.stl',
      bytes: toStl(body.mesh, { header: stlHeader([`umbrafab body, grooves ${body.grooveDepthMm} mm${body.withWedge ? `, wedge ${latText} -> ${pole}` : ''}`, spec.name]) }),
    });
    parts.body = { ...figures(body.mesh), grooveDepthMm: body.grooveDepthMm, withWedge: body.withWedge };
  }
  return { files, report: { wedge: wedgeReport, parts } };
};
