import { finSheetPart, plateSheetPart, wallMount, type DialSpec, type PlanarGnomonPart, type PlanarLayout, type PlateDrawing, type SheetPart } from '@umbrafab/geometry';
import { CALIBRATION_BAR_MM, cutFromParts, partsTemplateTiles, toPartsTemplatePdf, writesCutProgram, type CutProgram, type CuttingReport, type TemplateGuide, type TemplatePart } from '@umbrafab/fabricate';
import { utf8 } from './outputTypes.ts';
import type { OutputFile } from '../writeFilesAtomic.ts';
import type { TemplateSection } from './picturesOutputs.ts';
import { sheetFiles, type SheetSections } from './sheetOutputs.ts';
import { EQUATORIAL_STAND_LABELS, equatorialStandSheetParts } from './planarStandOutputs.ts';

/** The outputs a planar face shares with the polar plate beyond its own cut files: template.pdf, sheet.dxf and cut.ngc. */
export interface PlanarExtras {
  readonly files: readonly OutputFile[];
  /** report.json sections, each present when its file is written */
  readonly report: { readonly template?: PlanarTemplateSection; readonly cutting?: CuttingReport & { readonly otherStock: readonly string[] } } & SheetSections;
  /** what install.md says about template.pdf (absent when it is not written) */
  readonly templateGuide?: TemplateGuide;
}

/** report.json `template` of a planar face: the same section as the polar plate's. */
export type PlanarTemplateSection = TemplateSection;

/**
 * The outputs of a horizontal, wall, meridian or equatorial face that
 * polar builds write too: template.pdf (`planarTemplate`) and, for the
 * cutting processes, sheet.dxf (`sheetFiles`: the plate, the sheet fin,
 * the wall mount and the equatorial stand's parts nested on one stock
 * sheet, as cut, each with the relief its own DXF has). `cutParts` are the
 * face's parts as plate.dxf and gnomon.dxf draw them; the wall mount and
 * the stand are added here.
 */
export async function planarExtraOutputs(spec: DialSpec, layout: PlanarLayout, drawing: PlateDrawing, gnomon: PlanarGnomonPart, cutParts: readonly SheetPart[]): Promise<PlanarExtras> {
  const template = await planarTemplate(spec, layout, drawing, gnomon);
  const mount = wallMount(layout)?.part;
  const stand = equatorialStandSheetParts(spec, layout);
  const all = [...cutParts, ...(mount ? [mount] : []), ...stand];
  const sheet = spec.process.method === 'print' ? undefined : await sheetFiles(spec, layout.plate.thicknessMm, all);
  const cut = await planarCutProgram(spec, layout, drawing, gnomon, all);
  return {
    files: [...(sheet?.files ?? []), ...(cut ? [{ name: cut.file.name, bytes: utf8(cut.file.text) }] : []), ...(template?.files ?? [])],
    report: { ...(sheet?.report ?? {}), ...(cut ? { cutting: cut.report } : {}), ...(template ? { template: template.report } : {}) },
    ...(template ? { templateGuide: template.guide } : {}),
  };
}

/**
 * cut.ngc of a planar face for a router job with engrave.cut.write
 * (`cutFromParts`, the polar writer): the parts of the plate's stock and
 * thickness (plate, sheet fin, wall mount, equatorial stand), the plate at the work origin;
 * a part of other stock (a fin thicker than the plate) is listed in
 * `otherStock`, cut separately. Null when no cut.ngc is written.
 */
async function planarCutProgram(spec: DialSpec, layout: PlanarLayout, drawing: PlateDrawing, gnomon: PlanarGnomonPart, parts: readonly SheetPart[]): Promise<{ file: CutProgram['file']; report: CutProgram['report'] & { readonly otherStock: readonly string[] } } | null> {
  if (!writesCutProgram(spec)) return null;
  const same = (p: SheetPart) => p.material === spec.plate.material && Math.abs(p.thicknessMm - layout.plate.thicknessMm) < 1e-9;
  const o = { material: spec.plate.material, reliefToolRadiusMm: 0, chordToleranceMm: spec.cutFiles.chordTolerance };
  // The same parts before their inside-corner relief, for the tool-fit check.
  const standBare = equatorialStandSheetParts(spec, layout, { reliefToolRadiusMm: 0 });
  const bareOf = (p: SheetPart): SheetPart => {
    if (p.name === 'plate') return plateSheetPart(drawing, { ...o, thicknessMm: p.thicknessMm });
    if (p.name === 'gnomon') return finSheetPart(gnomon.profile, { ...o, thicknessMm: p.thicknessMm });
    return standBare.find((q) => q.name === p.name) ?? p;
  };
  const bare = parts.map(bareOf);
  const r = await cutFromParts(spec, bare.filter(same), parts.filter(same));
  return { file: r.file, report: { ...r.report, otherStock: parts.filter((p) => !same(p)).map((p) => p.name) } };
}

/**
 * template.pdf of a planar face (`toPartsTemplatePdf`: the plate at 1:1,
 * the table of line ends and holes, the gnomon fin's profile, the wall
 * mount and an equatorial stand's parts at 1:1, each nominal), its report section and install.md's guide
 * to its sheets; null when template.write is false.
 */
async function planarTemplate(spec: DialSpec, layout: PlanarLayout, drawing: PlateDrawing, gnomon: PlanarGnomonPart): Promise<{ files: OutputFile[]; report: PlanarTemplateSection; guide: TemplateGuide } | null> {
  if (!spec.template.write) return null;
  const nominal = { material: spec.plate.material, reliefToolRadiusMm: 0, chordToleranceMm: spec.cutFiles.chordTolerance };
  const parts: TemplatePart[] = [];
  // A plate engraved on both faces: its lower face as seen from below (the plate turned over about its flip axis), the same outline and holes.
  if (drawing.lowerFace) {
    const lower = { ...drawing, lines: drawing.lowerFace.lines, text: drawing.lowerFace.text, lowerFace: undefined };
    parts.push({ label: 'plate, lower face seen from below (turned over about the flip axis)', part: plateSheetPart(lower, { ...nominal, thicknessMm: layout.plate.thicknessMm }) });
  }
  if (gnomon.kind === 'fin') parts.push({ label: 'gnomon fin profile', part: finSheetPart(gnomon.profile, { ...nominal, thicknessMm: gnomon.thicknessMm }) });
  const mount: SheetPart | undefined = wallMount(layout)?.part;
  if (mount) parts.push({ label: 'wall mount', part: mount });
  // The equatorial stand's parts when they are cut from sheet, nominal, one drawing per part, named as stand.dxf names it.
  for (const p of equatorialStandSheetParts(spec, layout, { reliefToolRadiusMm: 0 })) parts.push({ label: `stand ${EQUATORIAL_STAND_LABELS[p.name] ?? p.name}`, part: p });
  const g = layout.gnomon;
  const intro = [
    `${layout.faceType} face. Gnomon: ${g.kind === 'fin' ? `fin ${g.thicknessMm} mm thick` : `rod ${g.thicknessMm} mm across`}, style height ${g.styleHeightDeg.toFixed(2)}° to the face.`,
    ...(drawing.lowerFace
      ? [
          'Engraved on both faces: the plate drawing is the upper face; the lower face, seen from below, follows this table.',
          `Lower face: turn the plate over about its vertical centre line x = ${drawing.lowerFace.flipAxisX.toFixed(1)} mm (through the rod hole); its lines are listed as 'lower'.`,
        ]
      : []),
    `The face origin (the fin's root, on the substyle) lies at x ${layout.plate.substyleX.toFixed(1)}, y ${layout.plate.faceOriginY.toFixed(1)} mm from the plate's lower-left corner.`,
  ];
  const tOpts = { paper: spec.template.paper, orientation: spec.template.orientation, overlapMm: spec.template.overlap, marginMm: spec.template.margin };
  const plateLabel = drawing.lowerFace ? 'plate, upper face' : 'plate';
  const input = { drawing, title: spec.name, intro, parts, plateLabel };
  const pdf = await toPartsTemplatePdf(input, tOpts);
  const tiles = partsTemplateTiles(input, tOpts);
  const plateSheets = tiles.plate.columns * tiles.plate.rows;
  const drawings: { label: string; firstSheet: number; lastSheet: number }[] = [{ label: plateLabel, firstSheet: 1, lastSheet: plateSheets }];
  const tableLast = tiles.pages - tiles.parts.reduce((n, t) => n + t.columns * t.rows, 0);
  let next = tableLast + 1;
  parts.forEach((p, i) => {
    const n = tiles.parts[i].columns * tiles.parts[i].rows;
    drawings.push({ label: p.label, firstSheet: next, lastSheet: next + n - 1 });
    next += n;
  });
  const guide: TemplateGuide = { paper: tiles.plate.paper, pages: tiles.pages, drawings, tableSheets: [plateSheets + 1, tableLast], tableLists: "the ends of every line and the hole centres, mm from the plate's lower-left corner", printed: spec.process.method === 'print' };
  return {
    files: [{ name: 'template.pdf', bytes: pdf }],
    report: {
      paper: tiles.plate.paper,
      orientation: tiles.plate.orientation,
      sheets: { columns: tiles.plate.columns, rows: tiles.plate.rows },
      overlapMm: tiles.plate.overlapMm,
      calibrationBarMm: CALIBRATION_BAR_MM,
      scale: '1:1',
      pages: tiles.pages,
      drawings,
    },
    guide,
  };
}
