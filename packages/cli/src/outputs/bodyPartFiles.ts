import { printedBody, type WedgePart } from '@umbrafab/geometry';
import { meshFigures } from './meshFigures.ts';
import { printedAmounts, type AlternativePart, type PartsContext, type PartStep } from './partStep.ts';
import type { PartsSection } from './partsSections.ts';
import { printedPartFiles } from './printedPartFiles.ts';

/**
 * body.stl, when the plan lists it: plate and gnomon in one print (fused to
 * the wedge when `parts.body.withWedge`), split to the bed by `printedBody`.
 * Its mass is an alternative to the parts it replaces, kept out of the total.
 * @example (await bodyPartFiles(ctx, null)).alternatives.body?.replaces // ['plate', 'gnomon']
 */
export async function bodyPartFiles(ctx: PartsContext, wedge: WedgePart | null): Promise<PartStep<Pick<PartsSection, 'body'>> & { readonly alternatives: Readonly<Record<string, AlternativePart>> }> {
  const { spec, layout, drawing, plan, latText, pole } = ctx;
  if (!plan.files.includes('body.stl')) return { files: [], report: {}, masses: [], filament: {}, notes: [], alternatives: {} };
  const { body, split } = await printedBody(layout, drawing, plan, wedge);
  const out = printedPartFiles('body.stl', body.mesh, split, `umbrafab body, grooves ${body.grooveDepthMm} mm${body.withWedge ? `, wedge ${latText} -> ${pole}` : ''} | ${spec.name}`, plan);
  // The body replaces plate and gnomon (and the wedge when fused): its mass is an alternative, kept out of the total.
  const { masses: [bodyMass], filament } = printedAmounts(plan, 'body', body.volumeMm3, out.files.map((f) => f.name));
  return {
    files: out.files,
    report: { body: { ...meshFigures(body.mesh), grooveDepthMm: body.grooveDepthMm, withWedge: body.withWedge, ...(out.split ? { split: out.split } : {}) } },
    masses: [],
    filament,
    notes: out.notes,
    alternatives: { body: { ...bodyMass, massKg: bodyMass.massG / 1000, replaces: body.withWedge ? ['plate', 'gnomon', 'wedge'] : ['plate', 'gnomon'] } },
  };
}
