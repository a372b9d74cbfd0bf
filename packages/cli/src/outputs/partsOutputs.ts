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
import { cutPartFiles, cutParts, type CutFileSection } from './cutParts.ts';
import { utf8, type Producer } from './outputTypes.ts';
import type { OutputFile } from '../writeFilesAtomic.ts';

/** The report.json sections of the parts: the stand's geometry and every part file's figures. */
export interface PartsSections {
  readonly wedge: WedgeSection;
  readonly parts: PartsSection;
}

/** Volume, bounding box and facet count of a part's mesh as written (its file's frame), mm³ and mm. */
export interface MeshFigures {
  readonly volumeMm3: number;
  readonly bbox: { readonly minMm: readonly number[]; readonly maxMm: readonly number[] };
  readonly facets: number;
}

/** The latitude wedge: its tilt and which way it rises; its geometry when it is built. */
export interface WedgeSection {
  /** the seat's tilt from the horizontal = |latitude|, degrees */
  readonly angleDeg: number;
  /** 'true north' or 'true south': the elevated pole */
  readonly risesToward: string;
  readonly arrowPointsTo: string;
  /** 'slab' below 5° tilt, 'stand' above */
  readonly design?: 'slab' | 'stand';
  readonly seatWidthMm?: number;
  readonly seatLengthMm?: number;
  /** outward unit normal of the seat, wedge frame (x across, y toward the pole, z up) */
  readonly seatNormal?: readonly number[];
  readonly toeLengthMm?: number;
  /** the wedge's footprint on the ground, wedge frame, mm */
  readonly footprintMm?: { readonly xMinMm: number; readonly xMaxMm: number; readonly yMinMm: number; readonly yMaxMm: number };
  readonly mountingHoles?: number;
}

/** The parts plan and the figures of each part file written. */
export interface PartsSection {
  /** part files written */
  readonly files: readonly string[];
  /** 'sheet': the gnomon is cut from the plate's stock; 'separate': its own stock or printed */
  readonly gnomonFrom: string;
  /** depth of the tabs below the face, mm */
  readonly tabDepthMm: number;
  /** fit clearance per side of a tab in its slot, mm */
  readonly fitClearancePerSideMm: number;
  /** each slot with the tab it takes, mm */
  readonly slots: readonly { readonly widthMm: number; readonly lengthMm: number; readonly tabWidthMm: number; readonly tabLengthMm: number }[];
  readonly gnomon: MeshFigures & {
    /** the style edges' height above the face when assembled, mm */
    readonly styleHeightAboveFaceMm: number;
    /** the tab bottoms' depth below the face when assembled, mm */
    readonly tabBottomBelowFaceMm: number;
    readonly thicknessMm: number;
    /** length of the style, mm */
    readonly lengthMm: number;
    /** area of the fin's side profile, mm² (volume = area × thickness) */
    readonly profileAreaMm2: number;
    /** face y of the nodus, mm (with a nodus) */
    readonly nodusFaceYMm?: number;
  };
  /** gnomon.dxf, when written */
  readonly gnomonDxf?: CutFileSection;
  /** wedge.stl, when written */
  readonly wedge?: MeshFigures;
  /** body.stl, when written */
  readonly body?: MeshFigures & { readonly grooveDepthMm: number; readonly withWedge: boolean };
}

/** A section under construction: its fields may be set one by one. */
type Writable<T> = { -readonly [K in keyof T]: T[K] };

/** Volume and bounding box of a written part, as report.json gives them. */
function figures(mesh: Mesh): MeshFigures {
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
export const partsOutputs: Producer<PartsSections> = async ({ spec, layout, drawing }) => {
  const plan = partsPlan(layout);
  const gnomon = dialGnomon(plan, layout);
  const g = layout.gnomon;
  const pole = plan.elevatedPole === 'north' ? 'true north' : 'true south';
  const needWedge = plan.files.includes('wedge.stl') || (plan.files.includes('body.stl') && plan.body.withWedge);
  const wedge: WedgePart | null = needWedge ? dialWedge(plan, layout) : null;
  const files: OutputFile[] = [];
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
  const parts: Writable<PartsSection> = {
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
    gnomon: gnomonReport,
  };
  const lat = spec.site.latitude;
  const latText = `${Math.abs(lat).toFixed(2)} deg ${lat >= 0 ? 'N' : 'S'}`;

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
  }
  if (plan.files.includes('gnomon.dxf')) {
    const part = cutParts({ spec, layout, drawing }).find((p) => p.name === 'gnomon');
    if (!part) throw new Error('partsOutputs: the sheet parts have no gnomon');
    const cut = await cutPartFiles({ spec, drawing }, part);
    files.push(...cut.files);
    parts.gnomonDxf = cut.report;
  }

  const wedgeReport: WedgeSection = {
    angleDeg: plan.tiltDeg,
    risesToward: pole,
    arrowPointsTo: pole,
    ...(wedge === null
      ? {}
      : {
          design: wedge.design,
          seatWidthMm: plan.wedge.seatWidthMm,
          seatLengthMm: plan.wedge.seatLengthMm,
          seatNormal: wedge.seatNormal,
          toeLengthMm: wedge.toeLengthMm,
          footprintMm: wedge.footprint,
          mountingHoles: wedge.holes.length,
        }),
  };
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
