import { toSvg } from '@umbrafab/fabricate';
import { utf8, type BuildContext, type Producer } from './outputTypes.ts';
import { cutPartFiles, cutParts } from './cutParts.ts';

/**
 * plate.dxf (nominal; `plate-offset-K mm.dxf` when cutFiles.precompensate,
 * with its R12 and SVG copies on request) and preview.svg, and the report's
 * marks, plate, gnomon and time sections.
 */
export const plateOutputs: Producer = async (ctx) => {
  const { spec, layout, drawing } = ctx;
  const plate = cutParts(ctx).find((p) => p.name === 'plate');
  if (!plate) throw new Error('plateOutputs: the sheet parts have no plate');
  const cut = await cutPartFiles(ctx, plate);
  const svg = previewSvgText({ spec, layout, drawing });
  return {
    files: [...cut.files, { name: 'preview.svg', bytes: utf8(svg) }],
    report: {
      hemisphere: layout.hemisphere,
      marks: layout.marks,
      plate: {
        widthMm: layout.plate.widthMm,
        lengthMm: layout.plate.lengthMm,
        thicknessMm: layout.plate.thicknessMm,
        cornerRadiusMm: layout.plate.cornerRadiusMm,
        substyleX: layout.plate.substyleX,
        faceOriginY: layout.plate.faceOriginY,
        holes: layout.plate.holes.map((c) => ({ xMm: c.cx, yMm: c.cy, diameterMm: 2 * c.radiusMm })),
        slots: layout.plate.slots.map((s) => ({ xMm: s.cx, yMm: s.cy, widthMm: s.widthMm, lengthMm: s.heightMm })),
        cut: {
          method: spec.process.method,
          ...cut.report,
          fitClearancePerSideMm: spec.process.clearance,
        },
      },
      gnomon: {
        heightMm: layout.gnomon.heightMm,
        thicknessMm: layout.gnomon.thicknessMm,
        y0Mm: layout.gnomon.y0Mm,
        y1Mm: layout.gnomon.y1Mm,
        tabs: layout.gnomon.tabs,
      },
      time: layout.time,
    },
  };
};

/** The text of preview.svg (shared with the pictures, which render it to PNG). */
export function previewSvgText({ spec, layout, drawing }: BuildContext): string {
  return toSvg(drawing, { caption: `${spec.name} - preview at 1:1, plate ${layout.plate.widthMm} x ${layout.plate.lengthMm} mm` });
}
