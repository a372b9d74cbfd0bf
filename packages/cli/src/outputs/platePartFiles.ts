import { isFilament, partMass, printedPlate, sheetPlateVolumeMm3 } from '@umbrafab/geometry';
import { meshFigures } from './meshFigures.ts';
import { printedAmounts, type PartsContext, type PartStep } from './partStep.ts';
import type { PartsSection } from './partsSections.ts';
import { printedPartFiles } from './printedPartFiles.ts';

/**
 * The plate as a part: printed for process print (plate.stl, split to the
 * bed if need be, with its figures), else cut from sheet (plate.dxf, written
 * by the plate outputs): then only its mass, in the plate's material (the
 * filament when a print job names a sheet metal).
 * @example (await platePartFiles(ctx)).masses[0].part // 'plate'
 */
export async function platePartFiles(ctx: PartsContext): Promise<PartStep<Pick<PartsSection, 'plate'>>> {
  const { spec, layout, drawing, plan } = ctx;
  if (!plan.files.includes('plate.stl')) {
    const material = spec.process.method === 'print' && !isFilament(spec.plate.material) ? plan.print.filament : spec.plate.material;
    return { files: [], report: {}, masses: [partMass('plate', sheetPlateVolumeMm3(drawing, layout.plate.thicknessMm), material)], filament: {}, notes: [] };
  }
  const { plate, split } = await printedPlate(layout, drawing, plan);
  const out = printedPartFiles('plate.stl', plate.mesh, split, `umbrafab plate ${layout.plate.widthMm}x${layout.plate.lengthMm}x${layout.plate.thicknessMm} mm, grooves ${plate.grooveDepthMm} mm, face up | ${spec.name}`, plan);
  return {
    files: out.files,
    report: { plate: { ...meshFigures(plate.mesh), grooveDepthMm: plate.grooveDepthMm, areasMm2: plate.areasMm2, ...(out.split ? { split: out.split } : {}) } },
    ...printedAmounts(plan, 'plate', plate.volumeMm3, out.files.map((f) => f.name)),
    notes: out.notes,
  };
}
