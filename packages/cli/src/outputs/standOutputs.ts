import {
  fastenerTable,
  flatStand,
  mountingFixings,
  partsPlan,
  pieceRows,
  sheetPartAreaMm2,
  standSolid,
  wedgeFastenerRows,
  type FastenerRow,
  type SizedStand,
} from '@umbrafab/geometry';
import { piecesDrawing, stlHeader, toDxf, toStl } from '@umbrafab/fabricate';
import { stlFigures } from './meshFigures.ts';
import { utf8, type Producer } from './outputTypes.ts';
import type { OutputFile } from '../writeFilesAtomic.ts';

/** Shop names of the stand's parts, used as DXF labels and in the report. */
export const STAND_PART_LABELS: Readonly<Record<string, string>> = {
  'stand-cheek': 'CHEEK',
  'stand-foot': 'FOOT',
  'stand-rail': 'SEAT RAIL',
  'stand-rail-a': 'SEAT RAIL A',
  'stand-rail-b': 'SEAT RAIL B',
  'stand-rail-c': 'SEAT RAIL C',
  'stand-cross': 'CROSS MEMBER',
};

/** report.json sections of the stand producer. */
export interface StandSections {
  /** the plate's mounting holes: the one list the stand's (or a wedge's) own holes follow */
  readonly fixings: readonly FixingSection[];
  /** screws, washers, nuts and ground anchors to buy */
  readonly fasteners: readonly FastenerRow[];
  /** the flat-pack stand, when it is built (laser, waterjet, router) */
  readonly stand?: StandSection;
}

/** One plate-to-stand fixing. */
export interface FixingSection {
  readonly index: number;
  /** hole centre in plate.dxf coordinates, mm */
  readonly plateMm: readonly [number, number];
  /** the same centre on the seat: x from the seat's centre line, y up the slope from the plate's lower edge, mm */
  readonly seatMm: readonly [number, number];
  readonly diameterMm: number;
}

/** One drawn part of the stand. */
export interface StandPartSection {
  readonly name: string;
  /** the shop's name for it, as labelled in stand.dxf */
  readonly label: string;
  readonly quantity: number;
  readonly material: string;
  readonly thicknessMm: number;
  /** bounding box of the flat part, mm */
  readonly sizeMm: readonly number[];
  /** outer profile minus holes and slots, mm² */
  readonly areaMm2: number;
  /** area × thickness, mm³ (one piece) */
  readonly volumeMm3: number;
  readonly holes: number;
  readonly slots: number;
}

/** The flat-pack stand: sizes, parts, joints and files. */
export interface StandSection {
  readonly material: string;
  readonly thicknessMm: number;
  /** the seat's tilt = |latitude|, degrees */
  readonly seatAngleDeg: number;
  readonly clearancePerSideMm: number;
  /** overall height above the ground, mm */
  readonly heightMm: number;
  readonly footprintMm: { readonly acrossMm: number; readonly alongMm: number };
  readonly lowEndMm: number;
  readonly toeMm: number;
  /** between the cheeks' mid-planes, mm */
  readonly cheekSpacingMm: number;
  /** the seat rails along the slope from the plate's lower edge, mm */
  readonly rails: readonly { readonly lowerEdgeMm: number; readonly widthMm: number }[];
  readonly parts: readonly StandPartSection[];
  /** tab-and-slot joints */
  readonly joints: number;
  /** 'true north' or 'true south': the elevated pole */
  readonly risesToward: string;
  readonly files: {
    readonly dxf?: { readonly pieces: number; readonly layers: readonly string[]; readonly nominal: boolean };
    readonly stl?: { readonly volumeMm3: number; readonly facets: number; readonly shells: number; readonly bbox: { readonly minMm: readonly number[]; readonly maxMm: readonly number[] } };
  };
}

/** The report's view of a stand: sizes, parts, joints (for reports and the installation sheet). */
export function standReport(stand: SizedStand): Omit<StandSection, 'risesToward' | 'files'> {
  const d = stand.dims;
  return {
    material: d.material,
    thicknessMm: d.thicknessMm,
    seatAngleDeg: (d.tiltRad * 180) / Math.PI,
    clearancePerSideMm: d.clearanceMm,
    heightMm: d.heightMm,
    footprintMm: { acrossMm: d.footLengthMm, alongMm: d.footprintLengthMm },
    lowEndMm: d.lowEndMm,
    toeMm: d.toeMm,
    cheekSpacingMm: 2 * d.cheekOffsetMm,
    rails: d.rails,
    parts: stand.parts.map((p) => {
      const area = sheetPartAreaMm2(p);
      const xs = p.outer.points.map((q) => q[0]);
      const ys = p.outer.points.map((q) => q[1]);
      return {
        name: p.name,
        label: STAND_PART_LABELS[p.name] ?? p.name,
        quantity: p.quantity ?? 1,
        material: p.material,
        thicknessMm: p.thicknessMm,
        sizeMm: [Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys)] as readonly number[],
        areaMm2: area,
        volumeMm3: area * p.thicknessMm,
        holes: p.inner.filter((f) => f.kind === 'circle').length,
        slots: p.inner.filter((f) => f.kind === 'path').length,
      };
    }),
    joints: stand.joints.length,
  };
}

/**
 * The flat-pack stand of `umbrafab build` for the sheet processes:
 * stand.dxf (every piece to cut, nominal, CUT_PROFILE and
 * REFERENCE_NO_CUT, relieved for a router's tool) and stand.stl (the stand
 * as assembled: one closed shell per part, ground z = 0, +y toward the
 * elevated pole), as `partsPlan` chooses them; the report's `stand`,
 * `fixings` (the plate's holes in plate and seat coordinates) and
 * `fasteners` (the table of screws, nuts, washers and anchors) sections.
 * For a printed wedge the fastener table lists its ground screws.
 */
export const standOutputs: Producer<StandSections> = async ({ spec, layout }) => {
  const plan = partsPlan(layout);
  const files: OutputFile[] = [];
  const fixings: FixingSection[] = mountingFixings(layout).map((f) => ({ index: f.index, plateMm: [f.plateMm[0], f.plateMm[1]], seatMm: [f.seatMm[0], f.seatMm[1]], diameterMm: f.diameterMm }));
  const wantDxf = plan.files.includes('stand.dxf');
  const wantStl = plan.files.includes('stand.stl');
  if (!wantDxf && !wantStl) {
    return { files, report: { fixings, fasteners: plan.files.includes('wedge.stl') ? wedgeFastenerRows(layout) : [] } };
  }
  const stand = flatStand(layout);
  const pole = layout.hemisphere === 'north' ? 'true north' : 'true south';
  const lat = spec.site.latitude;
  const latText = `${Math.abs(lat).toFixed(2)} deg ${lat >= 0 ? 'N' : 'S'}`;
  const standFiles: { dxf?: NonNullable<StandSection['files']['dxf']>; stl?: NonNullable<StandSection['files']['stl']> } = {};
  if (wantDxf) {
    const pieces = pieceRows(stand.parts);
    const notes = [
      `stand: TRUE SIZE (nominal) cut profiles, ${pieces.length} pieces. Apply the machine's own kerf or tool offset (${spec.process.method}, kerf ${spec.process.kerf} mm).`,
      `stock: ${stand.dims.material} ${stand.dims.thicknessMm} mm. Slots are the tabs + ${stand.dims.clearanceMm} mm each side. Only CUT_PROFILE cuts; REFERENCE_NO_CUT is off and never cut.`,
    ];
    files.push({ name: 'stand.dxf', bytes: utf8(toDxf(piecesDrawing(stand.parts, pieces, new Map(Object.entries(STAND_PART_LABELS)), notes))) });
    standFiles.dxf = { pieces: pieces.length, layers: ['CUT_PROFILE', 'REFERENCE_NO_CUT'], nominal: true };
  }
  if (wantStl) {
    const mesh = await standSolid(stand);
    files.push({ name: 'stand.stl', bytes: toStl(mesh, { header: stlHeader([`umbrafab stand ${latText}, +y to ${pole}, ${stand.instances.length} parts as assembled`, spec.name]) }) });
    standFiles.stl = stlFigures(mesh, stand.instances.length);
  }
  return { files, report: { stand: { ...standReport(stand), risesToward: pole, files: standFiles }, fixings, fasteners: fastenerTable(layout, stand) } };
};
