import { finSheetPart, wallMount, type DialSpec, type PlanarGnomonPart, type PlanarLayout, type PlateDrawing, type SheetPart } from '@umbrafab/geometry';
import { CALIBRATION_BAR_MM, partsTemplateTiles, toPartsTemplatePdf, type PlanarTemplateGuide, type TemplatePart } from '@umbrafab/fabricate';
import type { OutputFile } from '../writeFilesAtomic.ts';
import type { TemplateSection } from './picturesOutputs.ts';
import { sheetFiles, type SheetSections } from './sheetOutputs.ts';

/** The outputs a planar face shares with the polar plate beyond its own cut files: template.pdf and sheet.dxf. */
export interface PlanarExtras {
  readonly files: readonly OutputFile[];
  /** report.json sections, each present when its file is written */
  readonly report: { readonly template?: PlanarTemplateSection } & SheetSections;
  /** what install.md says about template.pdf (absent when it is not written) */
  readonly templateGuide?: PlanarTemplateGuide;
}

/** report.json `template` of a planar face: the polar section's fields, and which sheets show which drawing. */
export interface PlanarTemplateSection extends TemplateSection {
  readonly pages: number;
  /** each drawing at 1:1 (the plate, the fin profile, the wall mount) and its sheets, in page order */
  readonly drawings: PlanarTemplateGuide['drawings'];
}

/**
 * The outputs of a horizontal, wall, meridian or equatorial face that
 * polar builds write too: template.pdf (`planarTemplate`) and, for the
 * cutting processes, sheet.dxf (`sheetFiles`: the plate, the sheet fin and
 * the wall mount nested on one stock sheet, as cut, each with the relief
 * its own DXF has). `cutParts` are the face's parts as plate.dxf and
 * gnomon.dxf draw them; the wall mount is added here.
 */
export async function planarExtraOutputs(spec: DialSpec, layout: PlanarLayout, drawing: PlateDrawing, gnomon: PlanarGnomonPart, cutParts: readonly SheetPart[]): Promise<PlanarExtras> {
  const template = await planarTemplate(spec, layout, drawing, gnomon);
  const mount = wallMount(layout)?.part;
  const sheet = spec.process.method === 'print' ? undefined : await sheetFiles(spec, layout.plate.thicknessMm, [...cutParts, ...(mount ? [mount] : [])]);
  return {
    files: [...(sheet?.files ?? []), ...(template?.files ?? [])],
    report: { ...(sheet?.report ?? {}), ...(template ? { template: template.report } : {}) },
    ...(template ? { templateGuide: template.guide } : {}),
  };
}

/**
 * template.pdf of a planar face (`toPartsTemplatePdf`: the plate at 1:1,
 * the table of line ends and holes, the gnomon fin's profile and the wall
 * mount at 1:1, each nominal), its report section and install.md's guide
 * to its sheets; null when template.write is false.
 */
async function planarTemplate(spec: DialSpec, layout: PlanarLayout, drawing: PlateDrawing, gnomon: PlanarGnomonPart): Promise<{ files: OutputFile[]; report: PlanarTemplateSection; guide: PlanarTemplateGuide } | null> {
  if (!spec.template.write) return null;
  const nominal = { material: spec.plate.material, reliefToolRadiusMm: 0, chordToleranceMm: spec.cutFiles.chordTolerance };
  const parts: TemplatePart[] = [];
  if (gnomon.kind === 'fin') parts.push({ label: 'gnomon fin profile', part: finSheetPart(gnomon.profile, { ...nominal, thicknessMm: gnomon.thicknessMm }) });
  const mount: SheetPart | undefined = wallMount(layout)?.part;
  if (mount) parts.push({ label: 'wall mount', part: mount });
  const g = layout.gnomon;
  const intro = [
    `${layout.faceType} face. Gnomon: ${g.kind === 'fin' ? `fin ${g.thicknessMm} mm thick` : `rod ${g.thicknessMm} mm across`}, style height ${g.styleHeightDeg.toFixed(2)}° to the face.`,
    `The face origin (the fin's root, on the substyle) lies at x ${layout.plate.substyleX.toFixed(1)}, y ${layout.plate.faceOriginY.toFixed(1)} mm from the plate's lower-left corner.`,
  ];
  const tOpts = { paper: spec.template.paper, orientation: spec.template.orientation, overlapMm: spec.template.overlap, marginMm: spec.template.margin };
  const input = { drawing, title: spec.name, intro, parts };
  const pdf = await toPartsTemplatePdf(input, tOpts);
  const tiles = partsTemplateTiles(input, tOpts);
  const plateSheets = tiles.plate.columns * tiles.plate.rows;
  const drawings: { label: string; firstSheet: number; lastSheet: number }[] = [{ label: 'plate', firstSheet: 1, lastSheet: plateSheets }];
  const tableLast = tiles.pages - tiles.parts.reduce((n, t) => n + t.columns * t.rows, 0);
  let next = tableLast + 1;
  parts.forEach((p, i) => {
    const n = tiles.parts[i].columns * tiles.parts[i].rows;
    drawings.push({ label: p.label, firstSheet: next, lastSheet: next + n - 1 });
    next += n;
  });
  const guide: PlanarTemplateGuide = { paper: tiles.plate.paper, pages: tiles.pages, drawings, tableSheets: [plateSheets + 1, tableLast] };
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
