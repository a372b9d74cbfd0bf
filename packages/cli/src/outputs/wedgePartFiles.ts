import { meshVolumeMm3, printedWedge, type WedgePart } from '@umbrafab/geometry';
import { stlHeader, toStl } from '@umbrafab/fabricate';
import { meshFigures } from './meshFigures.ts';
import { printedAmounts, type PartsContext, type PartStep } from './partStep.ts';
import type { PartsSection, WedgeSection } from './partsSections.ts';
import { printedPartFiles } from './printedPartFiles.ts';

/** The wedge's part of the report: the `wedge` section, and wedge.stl's figures when written. */
export interface WedgeReport {
  readonly wedgeSection: WedgeSection;
  readonly figures: Pick<PartsSection, 'wedge'>;
}

/**
 * The latitude wedge: its report section (tilt and pole always, its
 * geometry when it is built) and wedge.stl when the plan lists it — the
 * hollow wedge with insert pockets for process print (split to the bed if
 * need be), else the solid wedge.
 * @example (await wedgePartFiles(ctx, dialWedge(plan, layout))).report.wedgeSection.angleDeg
 */
export async function wedgePartFiles(ctx: PartsContext, wedge: WedgePart | null): Promise<PartStep<WedgeReport>> {
  const section = wedgeSection(ctx, wedge);
  if (wedge === null || !ctx.plan.files.includes('wedge.stl')) return { files: [], report: { wedgeSection: section, figures: {} }, masses: [], filament: {}, notes: [] };
  return ctx.spec.process.method === 'print' ? printedWedgeFiles(ctx, section) : solidWedgeFile(ctx, wedge, section);
}

/** The `wedge` section: tilt, the elevated pole the seat rises toward and the arrow points to, and the built wedge's geometry. */
function wedgeSection(ctx: PartsContext, wedge: WedgePart | null): WedgeSection {
  const { plan, pole } = ctx;
  return {
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
}

/** Print: the hollow wedge with insert pockets, split to the bed if need be; its shell, inserts and base as built. */
async function printedWedgeFiles(ctx: PartsContext, section: WedgeSection): Promise<PartStep<WedgeReport>> {
  const { spec, layout, plan, latText, pole } = ctx;
  const pw = await printedWedge(layout, plan);
  const s = pw.shell;
  const out = printedPartFiles('wedge.stl', s.mesh, pw.split, `umbrafab wedge ${latText}, arrow/+y to ${pole}, shell ${s.wallMm} mm | ${spec.name}`, plan);
  const wedge = {
    ...meshFigures(s.mesh),
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
  return {
    files: out.files,
    report: { wedgeSection: { ...section, toeLengthMm: pw.solid.toeLengthMm, footprintMm: pw.solid.footprint, baseMm: pw.baseMm, backShelfMm: pw.backShelfMm }, figures: { wedge } },
    ...printedAmounts(plan, 'wedge', s.volumeMm3, out.files.map((f) => f.name)),
    notes: [...pw.notes, ...out.notes],
  };
}

/** Other processes: the solid wedge as one file. */
function solidWedgeFile(ctx: PartsContext, wedge: WedgePart, section: WedgeSection): PartStep<WedgeReport> {
  const { spec, plan, latText, pole } = ctx;
  return {
    files: [
      {
        name: 'wedge.stl',
        bytes: toStl(wedge.mesh, { header: stlHeader([`umbrafab wedge ${latText}, arrow/+y to ${pole}, seat ${plan.wedge.seatWidthMm.toFixed(1)}x${plan.wedge.seatLengthMm.toFixed(1)} mm`, spec.name]) }),
      },
    ],
    report: { wedgeSection: section, figures: { wedge: meshFigures(wedge.mesh) } },
    ...printedAmounts(plan, 'wedge', meshVolumeMm3(wedge.mesh), 'wedge.stl'),
    notes: [],
  };
}
