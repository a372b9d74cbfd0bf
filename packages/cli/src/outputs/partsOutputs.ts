import { dialGnomon, dialWedge, partsPlan, type WedgePart } from '@umbrafab/geometry';
import { bodyPartFiles } from './bodyPartFiles.ts';
import { gnomonPartFiles } from './gnomonPartFiles.ts';
import type { Producer } from './outputTypes.ts';
import type { PartsContext } from './partStep.ts';
import type { PartsSection, PartsSections } from './partsSections.ts';
import { partWeights } from './partWeights.ts';
import { platePartFiles } from './platePartFiles.ts';
import { wedgePartFiles } from './wedgePartFiles.ts';

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
  const lat = spec.site.latitude;
  const ctx: PartsContext = { spec, layout, drawing, plan, latText: `${Math.abs(lat).toFixed(2)} deg ${lat >= 0 ? 'N' : 'S'}`, pole: plan.elevatedPole === 'north' ? 'true north' : 'true south' };
  const gnomonPart = dialGnomon(plan, layout);
  const needWedge = plan.files.includes('wedge.stl') || (plan.files.includes('body.stl') && plan.body.withWedge);
  const wedgePart: WedgePart | null = needWedge ? dialWedge(plan, layout) : null;
  const gnomon = await gnomonPartFiles(ctx, gnomonPart);
  const plate = await platePartFiles(ctx);
  const wedge = await wedgePartFiles(ctx, wedgePart);
  const body = await bodyPartFiles(ctx, wedgePart);
  const steps = [gnomon, plate, wedge, body];
  const g = layout.gnomon;
  const parts: PartsSection = {
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
    ...gnomon.report,
    ...plate.report,
    ...wedge.report.figures,
    ...body.report,
  };
  const weights = partWeights(plan, steps.flatMap((s) => s.masses), body.alternatives, Object.assign({}, ...steps.map((s) => s.filament)));
  return { files: steps.flatMap((s) => s.files), report: { wedge: wedge.report.wedgeSection, parts, weights }, notes: steps.flatMap((s) => s.notes) };
};
