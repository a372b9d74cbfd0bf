import { layoutDial, plateDrawing, type DialLayout, type DialSpec } from '@umbrafab/geometry';
import { kerfCompensate, toDxf, toReportJson, toSvg } from '@umbrafab/fabricate';
import type { OutputFile } from './writeFilesAtomic.ts';

/** Everything one build produces, in memory (no I/O): the CLI writes it, the page serves it. */
export interface BuildResult {
  readonly layout: DialLayout;
  readonly files: readonly OutputFile[];
  readonly report: Record<string, unknown>;
}

const GENERATOR = 'umbrafab 0.1.0';
const enc = new TextEncoder();

/**
 * Run geometry then the writers for one validated spec. The same spec always
 * gives byte-identical files (no clock, no randomness, fixed rounding).
 */
export function buildFiles(spec: DialSpec): BuildResult {
  const layout = layoutDial(spec);
  const drawing = plateDrawing(layout);
  const cut = kerfCompensate(drawing, spec.process.kerf);
  const dxf = toDxf(drawing, { method: spec.process.method, kerfMm: spec.process.kerf });
  const svg = toSvg(drawing, { caption: `${spec.name} - preview at 1:1, plate ${layout.plate.widthMm} x ${layout.plate.lengthMm} mm` });

  const names = ['plate.dxf', 'preview.svg', 'report.json'];
  const report = {
    generator: GENERATOR,
    spec,
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
        kerfMm: spec.process.kerf,
        offsetMm: cut.offsetMm,
        outlineWidthMm: cut.outline.widthMm,
        outlineLengthMm: cut.outline.heightMm,
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
    notes: layout.notes,
    files: names,
  };
  const files: OutputFile[] = [
    { name: 'plate.dxf', bytes: enc.encode(dxf) },
    { name: 'preview.svg', bytes: enc.encode(svg) },
    { name: 'report.json', bytes: enc.encode(toReportJson(report)) },
  ];
  return { layout, files, report };
}
