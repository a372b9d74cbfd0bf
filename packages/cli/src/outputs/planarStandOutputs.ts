import {
  equatorialStand,
  equatorialStandApplies,
  mapMesh,
  pieceRows,
  PRINT_FUSE_MM,
  sheetPartAreaMm2,
  standSolid,
  standUnionSolid,
  type DialSpec,
  type EquatorialFixing,
  type FastenerRow,
  type PlanarLayout,
  type SheetPart,
  type Vec3,
} from '@umbrafab/geometry';
import { assertToolFits, piecesDrawing, stlHeader, toDxf, toStl } from '@umbrafab/fabricate';
import { STAND_PART_LABELS } from './standOutputs.ts';
import { utf8 } from './outputTypes.ts';
import type { OutputFile } from '../writeFilesAtomic.ts';
import { stlFigures, type MeshFigures } from './meshFigures.ts';

/** report.json `stand` of an equatorial face: the stand that holds the plate square to the Earth's axis and the rod on it. */
export interface EquatorialStandSection {
  /** flat-pack (cut from sheet, bolted) or printed (one fused solid) */
  readonly kind: 'flat-pack' | 'printed';
  readonly material: string;
  /** sheet stock thickness, mm */
  readonly thicknessMm: number;
  /** slot clearance over each tab, per side, mm */
  readonly clearancePerSideMm: number;
  /** the face's tilt from level as placed, degrees (90° − |latitude|) */
  readonly faceTiltDeg: number;
  /** the rod's axis as placed, unit vector in the site frame (x east, y north, z up) */
  readonly rodAxisEnu: readonly number[];
  /** the rod's elevation above the horizon as placed, degrees (|latitude|) */
  readonly rodElevationDeg: number;
  /** the face origin (the rod's point on the face) in the site frame, mm */
  readonly faceOriginMm: readonly number[];
  /** overall height above the ground, mm */
  readonly heightMm: number;
  /** the feet's footprint, across and along the meridian, mm */
  readonly footprintMm: { readonly acrossMm: number; readonly alongMm: number };
  /** height of the plate's lowest point above the ground, mm */
  readonly plateLowestMm: number;
  /** distance between the two cheeks, mm */
  readonly cheekSpacingMm: number;
  /** the seat rails under the plate: lower edge (plate frame) and width, mm */
  readonly rails: readonly { readonly lowerEdgeMm: number; readonly widthMm: number }[];
  /** the rod hub: how far behind the face it holds the rod, and its width, mm */
  readonly hub: { readonly depthBehindFaceMm: number; readonly widthMm: number };
  /** each flat part: bounding size, area in mm², its holes and slots */
  readonly parts: readonly { readonly name: string; readonly label: string; readonly quantity: number; readonly sizeMm: readonly number[]; readonly areaMm2: number; readonly holes: number; readonly slots: number }[];
  /** tab-and-slot joints between the parts */
  readonly joints: number;
  /** each plate hole and the rail hole under it */
  readonly fixings: readonly EquatorialFixing[];
  /** what to buy: screws, washers, nuts, set collars, anchors */
  readonly fasteners: readonly FastenerRow[];
  readonly files: {
    /** stand.dxf (sheet processes) */
    readonly dxf?: { readonly pieces: number; readonly layers: readonly string[]; readonly nominal: true };
    /** stand.stl: assembled parts (sheet) or the one printed solid */
    readonly stl?: MeshFigures & { readonly shells: number };
  };
}

/** Shop names of the equatorial stand's parts (stand.dxf labels, report). */
export const EQUATORIAL_STAND_LABELS: Readonly<Record<string, string>> = {
  ...STAND_PART_LABELS,
  'stand-rail-a': 'SEAT RAIL A',
  'stand-rail-b': 'SEAT RAIL B',
  'stand-rail-c': 'SEAT RAIL C',
  'stand-rail-d': 'SEAT RAIL D',
  'stand-hub': 'ROD HUB',
};

const r6 = (x: number) => Math.round(x * 1e6) / 1e6;

/** Whether the build cuts the equatorial stand from sheet (stand.dxf): parts.write "auto" for the cutting processes, or named. */
function standDxfWanted(spec: DialSpec): boolean {
  const write = spec.parts.write;
  return write === 'auto' ? spec.process.method !== 'print' : write.includes('stand.dxf');
}

/**
 * The equatorial stand's flat parts for the job's sheet (sheet.dxf) and
 * router program (cut.ngc), when the build cuts the stand: relieved for the
 * tool as in stand.dxf, or nominal with `reliefToolRadiusMm: 0`. Empty for
 * other faces, a printed stand, or a stand not written.
 */
export function equatorialStandSheetParts(spec: DialSpec, layout: PlanarLayout, options: { readonly reliefToolRadiusMm?: number } = {}): readonly SheetPart[] {
  if (!equatorialStandApplies(layout) || !standDxfWanted(spec)) return [];
  return equatorialStand(layout, options).parts;
}

/**
 * The stand of an equatorial face (`equatorialStand`): for the sheet
 * processes stand.dxf (every piece nominal, CUT_PROFILE and
 * REFERENCE_NO_CUT, after the tool-fit check) and stand.stl as assembled
 * (one closed shell per part, site frame: x east, y north, z up, ground
 * z = 0); for print stand.stl as one solid (`standUnionSolid`, the slots
 * PRINT_FUSE_MM smaller than the tabs so they overlap, and fused). `parts.write` "auto" writes both
 * (print: stand.stl); a list writes the stand files it names. Its report
 * section: sizes, parts, the plate's fixings on the rails, the fasteners,
 * the rod's axis and the face's tilt as placed. Nothing for other faces,
 * or beyond the latitudes the stand is built for.
 */
export async function planarStandFiles(spec: DialSpec, layout: PlanarLayout): Promise<{ files: OutputFile[]; report?: EquatorialStandSection }> {
  if (!equatorialStandApplies(layout)) return { files: [] };
  const write = spec.parts.write;
  const print = spec.process.method === 'print';
  const wantDxf = standDxfWanted(spec);
  const wantStl = write === 'auto' || write.includes('stand.stl');
  if (!wantDxf && !wantStl) return { files: [] };
  const stand = equatorialStand(layout);
  if (!print) assertToolFits(equatorialStand(layout, { reliefToolRadiusMm: 0 }).parts, spec.process.kerf);
  const files: OutputFile[] = [];
  const lat = spec.site.latitude;
  const d = stand.dims;
  const latText = `${Math.abs(lat).toFixed(2)} deg ${lat >= 0 ? 'N' : 'S'}`;
  const out: { dxf?: EquatorialStandSection['files']['dxf']; stl?: EquatorialStandSection['files']['stl'] } = {};
  if (wantDxf) {
    const pieces = pieceRows(stand.parts);
    const notes = [
      `stand: TRUE SIZE (nominal) cut profiles, ${pieces.length} pieces. Apply the machine's own kerf or tool offset (${spec.process.method}, kerf ${spec.process.kerf} mm).`,
      `stock: ${d.material} ${d.thicknessMm} mm. Slots are the tabs + ${d.clearanceMm} mm each side. Only CUT_PROFILE cuts; REFERENCE_NO_CUT is off and never cut.`,
    ];
    files.push({ name: 'stand.dxf', bytes: utf8(toDxf(piecesDrawing(stand.parts, pieces, new Map(Object.entries(EQUATORIAL_STAND_LABELS)), notes))) });
    out.dxf = { pieces: pieces.length, layers: ['CUT_PROFILE', 'REFERENCE_NO_CUT'], nominal: true };
  }
  if (wantStl) {
    // The printed solid's feet are PRINT_FUSE_MM thicker below too: lift it back onto z = 0.
    const mesh = print
      ? mapMesh(await standUnionSolid(equatorialStand(layout, { clearanceMm: -PRINT_FUSE_MM, reliefToolRadiusMm: 0 })), ([x, y, z]) => [x, y, z + PRINT_FUSE_MM])
      : await standSolid(stand);
    const shells = print ? 1 : stand.instances.length;
    files.push({ name: 'stand.stl', bytes: toStl(mesh, { header: stlHeader([`umbrafab equatorial stand ${latText}, x east y north z up, ${print ? 'one printed solid' : `${shells} parts as assembled`}`, spec.name]) }) });
    out.stl = stlFigures(mesh, shells);
  }
  const tiltDeg = (Math.acos(Math.min(1, Math.abs(stand.plate.normal[2]))) * 180) / Math.PI;
  return {
    files,
    report: {
      kind: print ? 'printed' : 'flat-pack',
      material: d.material,
      thicknessMm: d.thicknessMm,
      clearancePerSideMm: d.clearanceMm,
      faceTiltDeg: r6(tiltDeg),
      rodAxisEnu: stand.rodAxis.map(r6),
      rodElevationDeg: r6((Math.asin(Math.abs(stand.rodAxis[2])) * 180) / Math.PI),
      faceOriginMm: stand.faceOriginMm.map(r6),
      heightMm: r6(d.heightMm),
      footprintMm: { acrossMm: r6(d.footprintMm.acrossMm), alongMm: r6(d.footprintMm.alongMm) },
      plateLowestMm: r6(d.plateLowestMm),
      cheekSpacingMm: r6(d.cheekSpacingMm),
      rails: d.rails,
      hub: { depthBehindFaceMm: d.hubDepthMm, widthMm: d.hubWidthMm },
      parts: stand.parts.map((p) => {
        const xs = p.outer.points.map((q) => q[0]);
        const ys = p.outer.points.map((q) => q[1]);
        return {
          name: p.name,
          label: EQUATORIAL_STAND_LABELS[p.name] ?? p.name,
          quantity: p.quantity ?? 1,
          sizeMm: [r6(Math.max(...xs) - Math.min(...xs)), r6(Math.max(...ys) - Math.min(...ys))],
          areaMm2: r6(sheetPartAreaMm2(p)),
          holes: p.inner.filter((f) => f.kind === 'circle').length,
          slots: p.inner.filter((f) => f.kind === 'path').length,
        };
      }),
      joints: stand.joints.length,
      fixings: stand.fixings,
      fasteners: stand.fasteners,
      files: out,
    },
  };
}
