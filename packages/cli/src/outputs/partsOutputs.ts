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
  gnomonLaidFlat,
  meshBounds,
  meshVolumeMm3,
  partsPlan,
  validateMesh,
  type FilamentUse,
  type MaterialDensity,
  type Mesh,
  type PartMass,
  type PartsPlan,
  type SplitPart,
  type Vec3,
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
  readonly weights: WeightsSection;
}

/** A printed part cut into pieces that fit the print bed (splitForBed). */
export interface BedSplitSection {
  readonly bedMm: { readonly widthMm: number; readonly depthMm: number; readonly heightMm: number };
  /** cut planes x = const and y = const in the part file's frame, mm */
  readonly xCutsMm: readonly number[];
  readonly yCutsMm: readonly number[];
  readonly dovetailKeys: number;
  readonly keyClearancePerSideMm: number;
  readonly wholeVolumeMm3: number;
  /** part volume inside the keys' clearance gaps, computed on its own, mm³: Σ pieces + this = whole */
  readonly keyGapVolumeMm3: number;
  readonly piecesVolumeMm3: number;
  readonly pieces: readonly (MeshFigures & { readonly file: string; readonly cell: readonly number[] })[];
}

/** The hollow printed wedge against the solid one. */
export interface WedgeShellSection {
  readonly wallMm: number;
  readonly ribSpacingMm: number;
  /** rib planes x = const, wedge frame, mm */
  readonly ribXsMm: readonly number[];
  readonly hollowCells: number;
  /** one drain hole through the floor of each cell, wedge frame, mm */
  readonly drainHolesMm: readonly Vec3[];
  readonly solidVolumeMm3: number;
  readonly volumeMm3: number;
  /** 100 · (1 − shell / solid) */
  readonly savingPercent: number;
}

/** The heat-set insert pockets in the printed wedge's seat. */
export interface InsertsSection {
  readonly kind: string;
  /** thread of the insert, e.g. 'M5' */
  readonly thread: string;
  readonly holeDiameterMm: number;
  readonly insertLengthMm: number;
  readonly pocketDepthMm: number | null;
  /** each pocket: the plate hole it serves (plate coordinates) and its mouth on the seat and axis (wedge frame), mm */
  readonly pockets: readonly { readonly plateHoleMm: readonly number[]; readonly seatMouthMm: Vec3; readonly axis: Vec3 }[];
}

/** Weights and amounts: every part's mass, filament for printed parts, the total to lift and ship. */
export interface WeightsSection {
  /** how the masses are found */
  readonly basis: string;
  /** the density rows used, with their sources */
  readonly densities: Readonly<Record<string, MaterialDensity>>;
  readonly parts: readonly (PartMass & { readonly massKg: number })[];
  /** parts made instead of others (body.stl for plate and gnomon), not in the total */
  readonly alternatives?: Readonly<Record<string, PartMass & { readonly massKg: number; readonly replaces: readonly string[] }>>;
  readonly filament: {
    readonly material: string;
    readonly diameterMm: number;
    readonly parts: Readonly<Record<string, FilamentUse & { readonly file: string | readonly string[] }>>;
  };
  readonly totalMassG: number;
  readonly totalMassKg: number;
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
  /** printed wedge: the base and back shelf as built (thickened to hold the insert pockets), mm */
  readonly baseMm?: number;
  readonly backShelfMm?: number;
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
  /** plate.stl (process print), when written: the whole plate, and its pieces if split */
  readonly plate?: MeshFigures & { readonly grooveDepthMm: number; readonly areasMm2: { readonly plate: number; readonly grooves: number }; readonly split?: BedSplitSection };
  /** wedge.stl, when written (process print: the hollow wedge with insert pockets, and its pieces if split) */
  readonly wedge?: MeshFigures & { readonly shell?: WedgeShellSection; readonly inserts?: InsertsSection | null; readonly split?: BedSplitSection };
  /** body.stl, when written */
  readonly body?: MeshFigures & { readonly grooveDepthMm: number; readonly withWedge: boolean; readonly split?: BedSplitSection };
}

/** A section under construction: its fields may be set one by one. */
type Writable<T> = { -readonly [K in keyof T]: T[K] };

/** Volume and bounding box of a written part, as report.json gives them. */
function figures(mesh: Mesh): MeshFigures {
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
 * `split` section for a split part.
 */
function printedFiles(file: string, mesh: Mesh, split: SplitPart | null, header: string, plan: PartsPlan, notes: string[]): { files: OutputFile[]; split: BedSplitSection | null } {
  if (split === null) return { files: [{ name: file, bytes: toStl(mesh, { header: stlHeader([header]) }) }], split: null };
  const n = split.pieces.length;
  const names = split.pieces.map((p) => pieceName(file, p.index, n));
  const b = meshBounds(mesh);
  notes.push(
    `${file}: ${(b.max[0] - b.min[0]).toFixed(1)} x ${(b.max[1] - b.min[1]).toFixed(1)} x ${(b.max[2] - b.min[2]).toFixed(1)} mm does not fit the ${bedText(plan)} print bed: cut into ${n} pieces (${names.join(', ')}) joined by ${split.keys} dovetail keys; glue the keys`,
  );
  const files = split.pieces.map((p, k) => ({ name: names[k], bytes: toStl(p.mesh, { header: stlHeader([`${header}, piece ${p.index} of ${n}`]) }) }));
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
      piecesVolumeMm3: split.pieces.reduce((s, p) => s + p.volumeMm3, 0),
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
  const printing = spec.process.method === 'print';
  const notes: string[] = [];
  const masses: PartMass[] = [];
  const filament = plan.print.filament;
  const amounts: Record<string, FilamentUse & { readonly file: string | readonly string[] }> = {};
  const alternatives: Record<string, PartMass & { readonly massKg: number; readonly replaces: readonly string[] }> = {};
  const printed = (part: string, volumeMm3: number, file: string | readonly string[]) => {
    masses.push(partMass(part, volumeMm3, filament));
    amounts[part] = { file, ...filamentUse(volumeMm3, filament, plan.print.filamentDiameterMm) };
  };
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
    const halfL = (g.y1Mm - g.y0Mm) / 2;
    const flat = validateMesh(gnomonLaidFlat(gnomon.mesh, halfL, plan.tabDepthMm, gnomon.thicknessMm));
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
  }
  if (plan.files.includes('gnomon.dxf')) {
    const part = cutParts({ spec, layout, drawing }).find((p) => p.name === 'gnomon');
    if (!part) throw new Error('partsOutputs: the sheet parts have no gnomon');
    const cut = await cutPartFiles({ spec, drawing }, part);
    files.push(...cut.files);
    parts.gnomonDxf = cut.report;
  }
  // The gnomon: printed (gnomon.stl and no gnomon.dxf), else cut from the plate's sheet or other stock of its material.
  const gnomonVolume = meshVolumeMm3(gnomon.mesh);
  if (plan.files.includes('gnomon.stl') && !plan.files.includes('gnomon.dxf')) printed('gnomon', gnomonVolume, 'gnomon.stl');
  else masses.push(partMass('gnomon', gnomonVolume, spec.plate.material));

  // The plate: printed for process print (plate.stl), else cut from sheet (plate.dxf).
  if (plan.files.includes('plate.stl')) {
    const { plate, split } = await printedPlate(layout, drawing, plan);
    const out = printedFiles('plate.stl', plate.mesh, split, `umbrafab plate ${layout.plate.widthMm}x${layout.plate.lengthMm}x${layout.plate.thicknessMm} mm, grooves ${plate.grooveDepthMm} mm, face up | ${spec.name}`, plan, notes);
    files.push(...out.files);
    parts.plate = { ...figures(plate.mesh), grooveDepthMm: plate.grooveDepthMm, areasMm2: plate.areasMm2, ...(out.split ? { split: out.split } : {}) };
    printed('plate', plate.volumeMm3, out.files.map((f) => f.name));
  } else {
    const material = printing && !isFilament(spec.plate.material) ? filament : spec.plate.material;
    masses.push(partMass('plate', sheetPlateVolumeMm3(drawing, layout.plate.thicknessMm), material));
  }

  let wedgeReport: WedgeSection = {
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
  if (wedge !== null && plan.files.includes('wedge.stl') && printing) {
    // Print: the hollow wedge with insert pockets, split to the bed if need be.
    const pw = await printedWedge(layout, plan);
    notes.push(...pw.notes);
    const s = pw.shell;
    const out = printedFiles('wedge.stl', s.mesh, pw.split, `umbrafab wedge ${latText}, arrow/+y to ${pole}, shell ${s.wallMm} mm | ${spec.name}`, plan, notes);
    files.push(...out.files);
    wedgeReport = { ...wedgeReport, toeLengthMm: pw.solid.toeLengthMm, footprintMm: pw.solid.footprint, baseMm: pw.baseMm, backShelfMm: pw.backShelfMm };
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
    printed('wedge', s.volumeMm3, out.files.map((f) => f.name));
  } else if (wedge !== null && plan.files.includes('wedge.stl')) {
    files.push({
      name: 'wedge.stl',
      bytes: toStl(wedge.mesh, { header: stlHeader([`umbrafab wedge ${latText}, arrow/+y to ${pole}, seat ${plan.wedge.seatWidthMm.toFixed(1)}x${plan.wedge.seatLengthMm.toFixed(1)} mm`, spec.name]) }),
    });
    parts.wedge = figures(wedge.mesh);
    printed('wedge', meshVolumeMm3(wedge.mesh), 'wedge.stl');
  }

  if (plan.files.includes('body.stl')) {
    const body = await bodySolid(layout, drawing, plan, plan.body.withWedge ? wedge : null);
    // A body on its wedge is not split (a cut would run through the tilted plate); a flat one is, clear of the fin and the holes.
    const fin = { y0: layout.plate.faceOriginY + g.y0Mm, y1: layout.plate.faceOriginY + g.y1Mm, x: layout.plate.substyleX, t: g.thicknessMm };
    const key = 8 + 2;
    const everywhere: [number, number][] = [[-Infinity, Infinity]];
    const split = await fitToBed(
      'body.stl',
      body.mesh,
      plan,
      body.withWedge
        ? { x: everywhere, y: everywhere }
        : {
            x: [[fin.x - fin.t / 2 - key, fin.x + fin.t / 2 + 2], ...drawing.holes.map((h): [number, number] => [h.cx - h.radiusMm - key, h.cx + h.radiusMm + 2])],
            y: [[fin.y0 - key, fin.y1 + 2], ...drawing.holes.map((h): [number, number] => [h.cy - h.radiusMm - key, h.cy + h.radiusMm + 2])],
          },
    );
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
  const weights: WeightsSection = {
    basis: 'volume x density; printed parts as modelled (walls, ribs and plate solid at 100 % infill): an upper bound, sparse infill in thick walls prints lighter',
    densities: Object.fromEntries([...new Set(masses.map((m) => m.material))].map((m) => [m, materialDensity(m)])),
    parts: masses.map((m) => ({ ...m, massKg: m.massG / 1000 })),
    ...(Object.keys(alternatives).length > 0 ? { alternatives } : {}),
    filament: { material: filament, diameterMm: plan.print.filamentDiameterMm, parts: amounts },
    totalMassG: total.massG,
    totalMassKg: total.massKg,
  };
  return { files, report: { wedge: wedgeReport, parts, weights }, notes };
};
