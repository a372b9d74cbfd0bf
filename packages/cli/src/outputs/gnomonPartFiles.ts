import { fitsBed, gnomonLaidFlat, gnomonOnPlate, meshBounds, meshVolumeMm3, partMass, SpecError, validateMesh, type GnomonPart } from '@umbrafab/geometry';
import { stlHeader, toStl } from '@umbrafab/fabricate';
import type { OutputFile } from '../writeFilesAtomic.ts';
import { cutPartFiles, cutParts, type CutFileSection } from './cutParts.ts';
import { meshFigures } from './meshFigures.ts';
import { printedAmounts, type PartsContext, type PartStep } from './partStep.ts';
import type { PartsSection } from './partsSections.ts';
import { bedText } from './printedPartFiles.ts';

/** The gnomon's part of the report: its figures, and gnomon.dxf's when written. */
export interface GnomonReport {
  readonly gnomon: PartsSection['gnomon'];
  readonly gnomonDxf?: CutFileSection;
}

/**
 * The gnomon: gnomon.stl (laid flat; refused when the bed cannot take it
 * whole) and/or gnomon.dxf as the plan lists them, its figures assembled on
 * the plate, and its mass: printed when gnomon.stl is its only file, else
 * cut from the plate's sheet or other stock of the plate's material.
 * @example (await gnomonPartFiles(ctx, dialGnomon(plan, layout))).report.gnomon.styleHeightAboveFaceMm
 */
export async function gnomonPartFiles(ctx: PartsContext, gnomon: GnomonPart): Promise<PartStep<GnomonReport>> {
  const { spec, layout, drawing, plan } = ctx;
  const g = layout.gnomon;
  // Assembled: style edges gnomon height above the face, tab bottoms at the plate's underside.
  const assembled = meshBounds(gnomonOnPlate(gnomon, plan));
  const figures = {
    ...meshFigures(gnomon.mesh),
    styleHeightAboveFaceMm: assembled.max[2],
    tabBottomBelowFaceMm: -assembled.min[2],
    thicknessMm: gnomon.thicknessMm,
    lengthMm: g.y1Mm - g.y0Mm,
    profileAreaMm2: gnomon.profileAreaMm2,
    ...(gnomon.nodusMm ? { nodusFaceYMm: gnomon.nodusMm[1] + plan.gnomonCentreYMm } : {}),
  };
  const files: OutputFile[] = [];
  let report: GnomonReport = { gnomon: figures };
  if (plan.files.includes('gnomon.stl')) {
    const flat = gnomonFlatForPrint(ctx, gnomon);
    files.push({
      name: 'gnomon.stl',
      bytes: toStl(flat, { header: stlHeader([`umbrafab gnomon h=${g.heightMm} t=${g.thicknessMm} L=${(g.y1Mm - g.y0Mm).toFixed(1)} mm, ${g.tabs.length} tabs, laid flat`, spec.name]) }),
    });
    report = { gnomon: { ...figures, ...meshFigures(flat) } };
  }
  if (plan.files.includes('gnomon.dxf')) {
    const part = cutParts({ spec, layout, drawing }).find((p) => p.name === 'gnomon');
    if (!part) throw new Error('gnomonPartFiles: the sheet parts have no gnomon');
    const cut = await cutPartFiles({ spec, drawing }, part);
    files.push(...cut.files);
    report = { ...report, gnomonDxf: cut.report };
  }
  const volume = meshVolumeMm3(gnomon.mesh);
  const amounts = plan.files.includes('gnomon.stl') && !plan.files.includes('gnomon.dxf') ? printedAmounts(plan, 'gnomon', volume, 'gnomon.stl') : { masses: [partMass('gnomon', volume, spec.plate.material)], filament: {} };
  return { files, report, ...amounts, notes: [] };
}

/** The gnomon laid flat for printing, refused as a SpecError when the bed cannot take it whole (a joint in the fin would move the style). */
function gnomonFlatForPrint(ctx: PartsContext, gnomon: GnomonPart) {
  const { layout, plan } = ctx;
  const g = layout.gnomon;
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
  return flat;
}
