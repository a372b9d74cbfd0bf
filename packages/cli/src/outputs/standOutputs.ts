import {
  fastenerTable,
  flatStand,
  meshBounds,
  meshVolumeMm3,
  mountingFixings,
  partsPlan,
  pieceRows,
  sheetPartAreaMm2,
  standSolid,
  wedgeFastenerRows,
  type SizedStand,
} from '@umbrafab/geometry';
import { stlHeader, toPartsDxf, toStl } from '@umbrafab/fabricate';
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

/** The report's view of a stand: sizes, parts, joints (for reports and the installation sheet). */
export function standReport(stand: SizedStand): Record<string, unknown> {
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
        sizeMm: [Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys)],
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
export const standOutputs: Producer = async ({ spec, layout }) => {
  const plan = partsPlan(layout);
  const files: OutputFile[] = [];
  const fixings = mountingFixings(layout).map((f) => ({ index: f.index, plateMm: f.plateMm, seatMm: f.seatMm, diameterMm: f.diameterMm }));
  const wantDxf = plan.files.includes('stand.dxf');
  const wantStl = plan.files.includes('stand.stl');
  if (!wantDxf && !wantStl) {
    return { files, report: { fixings, fasteners: plan.files.includes('wedge.stl') ? wedgeFastenerRows(layout) : [] } };
  }
  const stand = flatStand(layout);
  const pole = layout.hemisphere === 'north' ? 'true north' : 'true south';
  const lat = spec.site.latitude;
  const latText = `${Math.abs(lat).toFixed(2)} deg ${lat >= 0 ? 'N' : 'S'}`;
  const standFiles: Record<string, unknown> = {};
  if (wantDxf) {
    const pieces = pieceRows(stand.parts);
    files.push({ name: 'stand.dxf', bytes: utf8(toPartsDxf(stand.parts, pieces, new Map(Object.entries(STAND_PART_LABELS)))) });
    standFiles.dxf = { pieces: pieces.length, layers: ['CUT_PROFILE', 'REFERENCE_NO_CUT'], nominal: true };
  }
  if (wantStl) {
    const mesh = await standSolid(stand);
    const b = meshBounds(mesh);
    files.push({ name: 'stand.stl', bytes: toStl(mesh, { header: stlHeader([`umbrafab stand ${latText}, +y to ${pole}, ${stand.instances.length} parts as assembled`, spec.name]) }) });
    standFiles.stl = { volumeMm3: meshVolumeMm3(mesh), facets: mesh.triangles.length, shells: stand.instances.length, bbox: { minMm: b.min, maxMm: b.max } };
  }
  return { files, report: { stand: { ...standReport(stand), risesToward: pole, files: standFiles }, fixings, fasteners: fastenerTable(layout, stand) } };
};
