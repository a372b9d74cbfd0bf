import {
  bodySolid,
  filamentUse,
  fitsBed,
  fitToBed,
  isFilament,
  materialDensity,
  partMass,
  printedPlate,
  printedWedge,
  sheetPlateVolumeMm3,
  SpecError,
  totalMass,
  dialGnomon,
  dialWedge,
  gnomonOnPlate,
  mapMesh,
  meshBounds,
  meshVolumeMm3,
  partsPlan,
  validateMesh,
  type Mesh,
  type PartMass,
  type PartsPlan,
  type SplitPart,
  type WedgePart,
} from '@umbrafab/geometry';
import { stlHeader, toGnomonDxf, toStl } from '@umbrafab/fabricate';
import { utf8, type Producer } from './outputTypes.ts';
import type { OutputFile } from '../writeFilesAtomic.ts';

/** Volume and bounding box of a written part, as report.json gives them. */
function figures(mesh: Mesh): { volumeMm3: number; bbox: { minMm: readonly number[]; maxMm: readonly number[] }; facets: number } {
  const b = meshBounds(mesh);
  return { volumeMm3: meshVolumeMm3(mesh), bbox: { minMm: b.min, maxMm: b.max }, facets: mesh.triangles.length };
}

/** File name of piece i of n of a split part: plate.stl → plate-1-of-2.stl. */
function pieceName(file: string, i: number, n: number): string {
  return file.replace(/\.stl$/, `-${i}-of-${n}.stl`);
}

const bedText = (plan: PartsPlan) => `${plan.print.bed.widthMm} x ${plan.print.bed.depthMm} x ${plan.print.bed.heightMm} mm`;

/**
 * The STL files of a printed part: the whole part when it fits the bed,
 * else one file per piece (and a console line saying so); with the report's
 * `pieces` section for a split part.
 */
function printedFiles(
  file: string,
  mesh: Mesh,
  split: SplitPart | null,
  header: string,
  plan: PartsPlan,
  notes: string[],
): { files: OutputFile[]; split: Record<string, unknown> | null } {
  if (split === null) return { files: [{ name: file, bytes: toStl(mesh, { header: stlHeader([header]) }) }], split: null };
  const n = split.pieces.length;
  const names = split.pieces.map((p) => pieceName(file, p.index, n));
  const b = meshBounds(mesh);
  notes.push(
    `${file}: ${(b.max[0] - b.min[0]).toFixed(1)} x ${(b.max[1] - b.min[1]).toFixed(1)} x ${(b.max[2] - b.min[2]).toFixed(1)} mm does not fit the ${bedText(plan)} print bed: cut into ${n} pieces (${names.join(', ')}) joined by ${split.keys} dovetail keys; glue the keys`,
  );
  const files = split.pieces.map((p, k) => ({ name: names[k], bytes: toStl(p.mesh, { header: stlHeader([`${header}, piece ${p.index} of ${n}`]) }) }));
  const sum = split.pieces.reduce((s, p) => s + p.volumeMm3, 0);
  return {
    files,
    split: {
      bedMm: plan.print.bed,
      xCutsMm: split.plan.xCutsMm,
      yCutsMm: split.plan.yCutsMm,
      dovetailKeys: split.keys,
      keyClearancePerSideMm: split.clearanceMm,
      wholeVolumeMm3: split.wholeVolumeMm3,
      keyGapVolumeMm3: split.gapVolumeMm3,
      piecesVolumeMm3: sum,
      pieces: split.pieces.map((p, k) => ({ file: names[k], cell: p.cell, ...figures(p.mesh) })),
    },
  };
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
 * - gnomon.dxf: the same outline in x, y, kerf-compensated (toGnomonDxf).
 * - wedge.stl: base on z = 0, seat rising toward +y = the elevated pole
 *   (true north in the northern hemisphere, true south in the southern),
 *   the meridian arrow pointing +y.
 * - body.stl: plate coordinates (origin at the plate's lower-left corner,
 *   underside on z = 0), or the wedge's frame when the wedge is fused on.
 */
export const partsOutputs: Producer = async ({ spec, layout, drawing }) => {
  const plan = partsPlan(layout);
  const printing = spec.process.method === 'print';
  const notes: string[] = [];
  const masses: PartMass[] = [];
  const filament = plan.print.filament;
  const filamentOf = (part: string, volumeMm3: number) => {
    masses.push(partMass(part, volumeMm3, filament));
    return filamentUse(volumeMm3, filament, plan.print.filamentDiameterMm);
  };
  const amounts: Record<string, unknown> = {};
  const alternatives: Record<string, unknown> = {};
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
    const fb = meshBounds(flat);
    if (!fitsBed(fb.max[0] - fb.min[0], fb.max[1] - fb.min[1], fb.max[2] - fb.min[2], plan.print.bed)) {
      throw new SpecError(
        'parts.print.bed',
        bedText(plan),
        `allowed: a bed that takes the gnomon laid flat (${(fb.max[0] - fb.min[0]).toFixed(1)} x ${(fb.max[1] - fb.min[1]).toFixed(1)} mm), or a gnomon cut from sheet or other stock`,
        'the gnomon is not split: a joint in the fin would bend or shift the style that casts the shadow',
      );
    }
    files.push({
      name: 'gnomon.stl',
      bytes: toStl(flat, { header: stlHeader([`umbrafab gnomon h=${g.heightMm} t=${g.thicknessMm} L=${(2 * halfL).toFixed(1)} mm, ${g.tabs.length} tabs, laid flat`, spec.name]) }),
    });
    parts.gnomon = { ...gnomonReport, ...figures(flat) };
  } else {
    parts.gnomon = gnomonReport;
  }
  // The gnomon: printed (separate, process print), else cut from the plate's sheet or other stock of its material.
  const gnomonVolume = meshVolumeMm3(gnomon.mesh);
  if (plan.files.includes('gnomon.stl') && (printing || plan.gnomonFrom === 'separate') && !plan.files.includes('gnomon.dxf')) {
    amounts.gnomon = { file: 'gnomon.stl', ...filamentOf('gnomon', gnomonVolume) };
  } else {
    masses.push(partMass('gnomon', gnomonVolume, spec.plate.material));
  }

  // The plate: printed for process print (plate.stl), else cut from sheet (plate.dxf).
  if (plan.files.includes('plate.stl')) {
    const { plate, split } = await printedPlate(layout, drawing, plan);
    const out = printedFiles('plate.stl', plate.mesh, split, `umbrafab plate ${layout.plate.widthMm}x${layout.plate.lengthMm}x${layout.plate.thicknessMm} mm, grooves ${plate.grooveDepthMm} mm, face up | ${spec.name}`, plan, notes);
    files.push(...out.files);
    parts.plate = { ...figures(plate.mesh), grooveDepthMm: plate.grooveDepthMm, areasMm2: plate.areasMm2, ...(out.split ? { split: out.split } : {}) };
    amounts.plate = { file: out.files.map((f) => f.name), ...filamentOf('plate', plate.volumeMm3) };
  } else {
    const material = printing && !isFilament(spec.plate.material) ? filament : spec.plate.material;
    masses.push(partMass('plate', sheetPlateVolumeMm3(drawing, layout.plate.thicknessMm), material));
  }
  if (plan.files.includes('gnomon.dxf')) {
    files.push({ name: 'gnomon.dxf', bytes: utf8(toGnomonDxf({ profile: gnomon.profile, styleHeightMm: gnomon.styleHeightMm }, { kerfMm: spec.process.kerf })) });
    parts.gnomonDxf = { kerfMm: spec.process.kerf, offsetMm: spec.process.kerf / 2, layers: ['CUT_PROFILE', 'REFERENCE_NO_CUT'] };
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
  if (wedge !== null && plan.files.includes('wedge.stl') && printing) {
    // Print: the hollow wedge with insert pockets, split to the bed if need be.
    const pw = await printedWedge(layout, plan);
    notes.push(...pw.notes);
    const s = pw.shell;
    const out = printedFiles('wedge.stl', s.mesh, pw.split, `umbrafab wedge ${latText}, arrow/+y to ${pole}, shell ${s.wallMm} mm | ${spec.name}`, plan, notes);
    files.push(...out.files);
    Object.assign(wedgeReport, { baseMm: pw.baseMm, backShelfMm: pw.backShelfMm, footprintMm: pw.solid.footprint, toeLengthMm: pw.solid.toeLengthMm });
    parts.wedge = {
      ...figures(s.mesh),
      shell: {
        wallMm: s.wallMm,
        ribSpacingMm: plan.print.ribSpacingMm,
        ribXsMm: s.ribXsMm,
        hollowCells: s.cells,
        drainHolesMm: s.drainHoles,
        solidVolumeMm3: s.solidVolumeMm3,
        volumeMm3: s.volumeMm3,
        savingPercent: 100 * s.savingFraction,
      },
      inserts:
        pw.insert === null
          ? null
          : {
              kind: 'heat-set threaded insert',
              thread: pw.insert.thread,
              holeDiameterMm: pw.insert.holeDiameterMm,
              insertLengthMm: pw.insert.lengthMm,
              pocketDepthMm: pw.pockets[0]?.depthMm ?? null,
              pockets: pw.pockets.map((p) => ({ plateHoleMm: p.plateHoleMm, seatMouthMm: p.mouthMm, axis: p.axis })),
            },
      ...(out.split ? { split: out.split } : {}),
    };
    amounts.wedge = { file: out.files.map((f) => f.name), ...filamentOf('wedge', s.volumeMm3) };
  } else if (wedge !== null && plan.files.includes('wedge.stl')) {
    files.push({
      name: 'wedge.stl',
      bytes: toStl(wedge.mesh, { header: stlHeader([`umbrafab wedge ${latText}, arrow/+y to ${pole}, seat ${plan.wedge.seatWidthMm.toFixed(1)}x${plan.wedge.seatLengthMm.toFixed(1)} mm`, spec.name]) }),
    });
    parts.wedge = figures(wedge.mesh);
    amounts.wedge = { file: 'wedge.stl', ...filamentOf('wedge', meshVolumeMm3(wedge.mesh)) };
  }

  if (plan.files.includes('body.stl')) {
    const body = await bodySolid(layout, drawing, plan, plan.body.withWedge ? wedge : null);
    // A body on its wedge is not split (a cut would run through the tilted plate); a flat one is, clear of the fin.
    const fin = { y0: layout.plate.faceOriginY + g.y0Mm, y1: layout.plate.faceOriginY + g.y1Mm, x: layout.plate.substyleX, t: g.thicknessMm };
    const key = 8 + 2;
    const split = await fitToBed('body.stl', body.mesh, plan, body.withWedge
      ? { x: [[-Infinity, Infinity]], y: [[-Infinity, Infinity]] }
      : {
          x: [[fin.x - fin.t / 2 - key, fin.x + fin.t / 2 + 2], ...drawing.holes.map((h): [number, number] => [h.cx - h.radiusMm - key, h.cx + h.radiusMm + 2])],
          y: [[fin.y0 - key, fin.y1 + 2], ...drawing.holes.map((h): [number, number] => [h.cy - h.radiusMm - key, h.cy + h.radiusMm + 2])],
        });
    const out = printedFiles('body.stl', body.mesh, split, `umbrafab body, grooves ${body.grooveDepthMm} mm${body.withWedge ? `, wedge ${latText} -> ${pole}` : ''} | ${spec.name}`, plan, notes);
    files.push(...out.files);
    parts.body = { ...figures(body.mesh), grooveDepthMm: body.grooveDepthMm, withWedge: body.withWedge, ...(out.split ? { split: out.split } : {}) };
    // The body replaces plate and gnomon (and the wedge when fused): an alternative, kept out of the total.
    const bodyMass = partMass('body', body.volumeMm3, filament);
    alternatives.body = { ...bodyMass, massKg: bodyMass.massG / 1000, replaces: body.withWedge ? ['plate', 'gnomon', 'wedge'] : ['plate', 'gnomon'] };
    amounts.body = { file: out.files.map((f) => f.name), ...filamentUse(body.volumeMm3, filament, plan.print.filamentDiameterMm) };
  }

  // Weights and amounts: every part's mass from its material's density, filament for the printed ones.
  const total = totalMass(masses);
  const used = [...new Set(masses.map((m) => m.material))];
  const weights = {
    basis: 'volume x density; printed parts as modelled (walls, ribs and plate solid at 100 % infill): an upper bound, sparse infill in thick walls prints lighter',
    densities: Object.fromEntries(used.map((m) => [m, materialDensity(m)])),
    parts: masses.map((m) => ({ ...m, massKg: m.massG / 1000 })),
    ...(Object.keys(alternatives).length > 0 ? { alternatives } : {}),
    filament: { material: filament, diameterMm: plan.print.filamentDiameterMm, parts: amounts },
    totalMassG: total.massG,
    totalMassKg: total.massKg,
  };
  return { files, report: { wedge: wedgeReport, parts, weights }, notes };
};
