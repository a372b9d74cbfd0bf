import { defaultPictureDate, sheetParts, sunForPicture, viewAssembly, type PictureSun, type ScenePicture } from '@umbrafab/geometry';
import { fitPixelBudget, svgHeightMm, svgWidthMm, templateDrawings, templateTiles, toAssemblySvg, toPngAsync, toTemplatePdf, CALIBRATION_BAR_MM, MAX_PICTURE_PIXELS, type TemplateDrawingSheets, type TemplateGuide } from '@umbrafab/fabricate';
import { STAND_PART_LABELS } from './standOutputs.ts';
import { previewSvgText } from './plateOutputs.ts';
import { perDrawing } from './perDrawing.ts';
import type { OutputFile } from '../writeFilesAtomic.ts';
import { utf8, type BuildContext, type Producer } from './outputTypes.ts';

/** The report.json sections of the pictures and the paper template, each present when written. */
export interface PicturesSections {
  readonly pictures?: PicturesSection;
  readonly template?: TemplateSection;
}

/** The pictures as rendered. */
export interface PicturesSection {
  /** PNG resolution asked for (pictures.pxPerMm), pixels per mm of the drawing */
  readonly pxPerMm: number;
  /** present only when a picture was rendered at less than pxPerMm: the pixel budget of one picture */
  readonly maxPixels?: number;
  /** present only then: which picture went to which resolution, as in report.json's notes */
  readonly note?: string;
  /** preview.svg / preview.png: the face at 1:1; `pxPerMm` only when lowered to fit maxPixels */
  readonly preview: { readonly widthMm: number; readonly pxPerMm?: number; readonly widthPx: number; readonly heightPx: number };
  /** assembly.svg / assembly.png: the dial on its stand with the shadow at pictures.date / pictures.time */
  readonly assembly: AssemblyPictureSection & {
    /** 'west' or 'east': the style edge casting the shadow */
    readonly shadowStyle: string;
    /** face x of the shadow's edge on the face, mm */
    readonly shadowEdgeXMm: number;
    readonly wedgeTiltDeg: number;
    readonly viewAzimuthDeg: number;
    readonly viewElevationDeg: number;
  };
}

/** assembly.svg / assembly.png of any face type: its size and the moment it shows. */
export interface AssemblyPictureSection {
  readonly widthMm: number;
  readonly heightMm: number;
  /** only when lowered to fit maxPixels */
  readonly pxPerMm?: number;
  readonly widthPx: number;
  readonly heightPx: number;
  /** local date 'YYYY-MM-DD' */
  readonly date: string;
  /** the dial reading shown, 'HH:MM' */
  readonly dialTime: string;
  /** the local clock then, 'HH:MM:SS' */
  readonly clock: string;
  readonly daylightSaving: boolean;
  /** the instant, ISO 8601 UTC */
  readonly utc: string;
  readonly sunAltitudeDeg: number;
  /** from true north toward the east, degrees */
  readonly sunAzimuthDeg: number;
}

/** The size and moment fields of an assembly picture's report section, in report order. */
export function assemblyPictureFields(picture: ScenePicture, png: Uint8Array, fit: { pxPerMm: number; lowered: boolean }, date: string, sun: PictureSun): AssemblyPictureSection {
  const r3 = (v: number) => Math.round(v * 1000) / 1000;
  return {
    widthMm: picture.widthMm,
    heightMm: picture.heightMm,
    ...(fit.lowered ? { pxPerMm: fit.pxPerMm } : {}),
    widthPx: readU32(png, 16),
    heightPx: readU32(png, 20),
    date,
    dialTime: sun.dialTime,
    clock: sun.clock,
    daylightSaving: sun.daylightSaving,
    utc: sun.utc,
    sunAltitudeDeg: r3(sun.altitudeDeg),
    sunAzimuthDeg: r3(sun.azimuthDeg),
  };
}

/** template.pdf as laid out. */
export interface TemplateSection {
  readonly paper: string;
  readonly orientation: string;
  /** how many sheets across and down tile the plate */
  readonly sheets: { readonly columns: number; readonly rows: number };
  readonly overlapMm: number;
  /** length of the calibration bar, mm */
  readonly calibrationBarMm: number;
  readonly scale: string;
  /** sheets in all */
  readonly pages: number;
  /** each drawing at 1:1 (the plate, the gnomon fin's profile, the stand's or wall mount's parts) and its sheets, in page order */
  readonly drawings: readonly TemplateDrawingSheets[];
}

/**
 * preview.png (rendered from the very preview.svg the plate outputs write),
 * assembly.svg and assembly.png (the dial on its wedge with the shadow for
 * pictures.date / pictures.time), and template.pdf (1:1 paper template);
 * the report's `pictures` and `template` sections.
 */
export const picturesOutputs: Producer<PicturesSections> = async (ctx) => {
  // The pictures start first: their PNGs render on worker threads while the PDF is laid out here.
  const pictures = ctx.spec.pictures.write ? pictureOutputs(ctx) : undefined;
  const template = ctx.spec.template.write ? templateOutputs(ctx) : undefined;
  const [p, t] = await Promise.all([pictures, template]);
  return {
    files: [...(p?.files ?? []), ...(t?.files ?? [])],
    report: { ...(p ? { pictures: p.report } : {}), ...(t ? { template: t.report } : {}) },
    notes: p?.notes ?? [],
  };
};

/**
 * preview.png, assembly.svg and assembly.png, and the report's `pictures`
 * section. Each PNG is held to MAX_PICTURE_PIXELS: a plate too large for
 * pictures.pxPerMm is rendered at the highest resolution that fits, and the
 * report and a note say so (memory stays bounded whatever the plate size).
 */
async function pictureOutputs(ctx: BuildContext): Promise<{ files: OutputFile[]; report: PicturesSection; notes: string[] }> {
  const { spec, layout, drawing } = ctx;
  const pics = spec.pictures;
  const ppm = pics.pxPerMm;
  const preview = previewSvgText(ctx);
  const previewFit = fitPixelBudget(svgWidthMm(preview), svgHeightMm(preview), ppm);
  // Start rendering before anything else, on a worker thread.
  const previewPngJob = toPngAsync(preview, { pxPerMm: previewFit.pxPerMm });
  const date = pics.date ?? defaultPictureDate(layout);
  const sun = sunForPicture(layout, date, pics.time);
  const picture = viewAssembly(layout, drawing, sun, { viewAzimuthDeg: pics.viewAzimuth, viewElevationDeg: pics.viewElevation });
  const assemblySvg = toAssemblySvg(picture, { title: `${spec.name} on its ${Math.abs(spec.site.latitude)}° ${picture.assembly.stand !== null ? 'flat-pack stand' : 'wedge'}, ${date}, shadow on ${pics.time}` });
  const assemblyFit = fitPixelBudget(picture.widthMm, picture.heightMm, ppm);
  // Two pictures at the full pixel budget render one after the other, so only one large pixel buffer is alive at a time.
  const large = (widthMm: number, heightMm: number, pxPerMm: number) => widthMm * heightMm * pxPerMm * pxPerMm > MAX_PICTURE_PIXELS / 2;
  const oneAtATime = large(svgWidthMm(preview), svgHeightMm(preview), previewFit.pxPerMm) && large(picture.widthMm, picture.heightMm, assemblyFit.pxPerMm);
  const assemblyPngJob = oneAtATime ? previewPngJob.then(() => toPngAsync(assemblySvg, { pxPerMm: assemblyFit.pxPerMm })) : toPngAsync(assemblySvg, { pxPerMm: assemblyFit.pxPerMm });
  const [previewPng, assemblyPng] = await Promise.all([previewPngJob, assemblyPngJob]);
  const lowered = [
    ...(previewFit.lowered ? [`preview.png at ${previewFit.pxPerMm} px/mm`] : []),
    ...(assemblyFit.lowered ? [`assembly.png at ${assemblyFit.pxPerMm} px/mm`] : []),
  ];
  const note = lowered.length
    ? `pictures: ${lowered.join(' and ')} instead of pictures.pxPerMm ${ppm}, to stay within ${MAX_PICTURE_PIXELS / 1e6} million pixels a picture (the plate is large; the DXF, SVG and PDF are at full scale)`
    : null;
  const fitted = (f: { pxPerMm: number; lowered: boolean }) => (f.lowered ? { pxPerMm: f.pxPerMm } : {});
  const size = (png: Uint8Array) => ({ widthPx: readU32(png, 16), heightPx: readU32(png, 20) });
  const r3 = (v: number) => Math.round(v * 1000) / 1000;
  return {
    files: [
      { name: 'preview.png', bytes: previewPng },
      { name: 'assembly.svg', bytes: utf8(assemblySvg) },
      { name: 'assembly.png', bytes: assemblyPng },
    ],
    notes: note ? [note] : [],
    report: {
      pxPerMm: ppm,
      ...(note ? { maxPixels: MAX_PICTURE_PIXELS, note } : {}),
      preview: { widthMm: svgWidthMm(preview), ...fitted(previewFit), ...size(previewPng) },
      assembly: {
        ...assemblyPictureFields(picture, assemblyPng, assemblyFit, date, sun),
        shadowStyle: picture.shadow.style,
        shadowEdgeXMm: r3(picture.shadow.edgeXMm),
        wedgeTiltDeg: r3((picture.assembly.tiltRad * 180) / Math.PI),
        viewAzimuthDeg: pics.viewAzimuth,
        viewElevationDeg: pics.viewElevation,
      },
    },
  };
}

/** What the polar template.pdf draws besides the plate, and its paper options (shared with install.md's guide to its sheets). */
export function polarTemplateInput({ spec, layout, drawing }: BuildContext) {
  const tOpts = { paper: spec.template.paper, orientation: spec.template.orientation, overlapMm: spec.template.overlap, marginMm: spec.template.margin };
  // The flat parts cut besides the plate (a sheet gnomon, the stand's parts), nominal, each at 1:1 after the tables.
  const parts = sheetParts(layout, drawing, { reliefToolRadiusMm: 0 })
    .filter((p) => p.name !== 'plate')
    .map((p) => ({ label: p.name === 'gnomon' ? 'gnomon fin profile' : `stand ${STAND_PART_LABELS[p.name] ?? p.name}`, part: p }));
  const input = { marks: layout.marks, gnomonHeightMm: layout.gnomon.heightMm, gnomonThicknessMm: layout.gnomon.thicknessMm, title: spec.name, parts };
  return { input, tOpts };
}

/** install.md's guide to the polar template.pdf's sheets (the same page plan the PDF is drawn with); null when none is written. */
export function polarTemplateGuide(ctx: BuildContext): TemplateGuide | null {
  if (!ctx.spec.template.write) return null;
  const { input, tOpts } = polarTemplateInput(ctx);
  const plan = templateDrawings({ drawing: ctx.drawing, ...input }, tOpts);
  return { paper: templateTiles(ctx.drawing, tOpts).paper, pages: plan.pages, drawings: plan.drawings, tableSheets: plan.tableSheets, tableLists: "each line's distance from the style edge (the gnomon's side) at the line's middle, mm", checkSheet: plan.checkSheet, printed: ctx.spec.process.method === 'print' };
}

/** template.pdf and the report's `template` section. */
async function templateOutputs(ctx: BuildContext): Promise<{ files: OutputFile[]; report: TemplateSection }> {
  const { drawing } = ctx;
  const { input, tOpts } = polarTemplateInput(ctx);
  // Once per drawing and input (every latitude of a batch that shares the plate and parts gets the same template).
  const pdf = await perDrawing(drawing, `template ${JSON.stringify([input, tOpts])}`, () => toTemplatePdf({ drawing, ...input }, tOpts));
  const tiles = templateTiles(drawing, tOpts);
  const plan = templateDrawings({ drawing, ...input }, tOpts);
  return {
    files: [{ name: 'template.pdf', bytes: pdf }],
    report: {
      paper: tiles.paper,
      orientation: tiles.orientation,
      sheets: { columns: tiles.columns, rows: tiles.rows },
      overlapMm: tiles.overlapMm,
      calibrationBarMm: CALIBRATION_BAR_MM,
      scale: '1:1',
      pages: plan.pages,
      drawings: plan.drawings,
    },
  };
}

/** Big-endian uint32 (PNG IHDR width at byte 16, height at 20). */
export function readU32(b: Uint8Array, at: number): number {
  return ((b[at] << 24) >>> 0) + (b[at + 1] << 16) + (b[at + 2] << 8) + b[at + 3];
}
