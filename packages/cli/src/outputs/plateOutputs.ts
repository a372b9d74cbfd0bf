import type { Hemisphere, Mark } from '@umbrafab/geometry';
import { toSvg, type SvgOptions } from '@umbrafab/fabricate';
import { utf8, type BuildContext, type Producer } from './outputTypes.ts';
import { cutPartFiles, cutParts, type CutFileSection } from './cutParts.ts';

/** The report.json sections of the plate: the face's marks, the plate and the gnomon as laid out. */
export interface PlateSections {
  /** the hemisphere the face is drawn for (east on the right in the north, on the left in the south) */
  readonly hemisphere: Hemisphere;
  /** every line of the face, engraved or lying under the fin (`underGnomon`), docs/design.md §6 */
  readonly marks: readonly Mark[];
  readonly plate: PlateSection;
  readonly gnomon: GnomonSection;
}

/** The plate as laid out; plate coordinates: mm from the plate's lower-left corner. */
export interface PlateSection {
  readonly widthMm: number;
  readonly lengthMm: number;
  readonly thicknessMm: number;
  readonly cornerRadiusMm: number;
  /** plate x of the gnomon's centre plane (the substyle), mm: plate x = substyleX + mark xMm */
  readonly substyleX: number;
  /** plate y of the face origin, mm: plate y = faceOriginY + mark y */
  readonly faceOriginY: number;
  /** mounting holes: centre (plate coordinates) and diameter, mm */
  readonly holes: readonly { readonly xMm: number; readonly yMm: number; readonly diameterMm: number }[];
  /** gnomon slots: centre (plate coordinates), width across the style and length along it, mm */
  readonly slots: readonly { readonly xMm: number; readonly yMm: number; readonly widthMm: number; readonly lengthMm: number }[];
  /** the cut as plate.dxf draws it (nominal by default; offset by kerf/2 when cutFiles.precompensate) */
  readonly cut: CutFileSection & {
    readonly method: string;
    /** fit clearance per side of a tab in its slot, mm */
    readonly fitClearancePerSideMm: number;
  };
}

/** The gnomon as laid out on the face (face coordinates, mm). */
export interface GnomonSection {
  /** height of the style edges above the face, mm */
  readonly heightMm: number;
  /** fin thickness, mm: the two style edges lie at x = ±thickness/2 */
  readonly thicknessMm: number;
  /** face y of the style's two ends, mm */
  readonly y0Mm: number;
  readonly y1Mm: number;
  /** tabs through the plate: face y of each centre and length along the style, mm */
  readonly tabs: readonly { readonly centerYMm: number; readonly lengthMm: number }[];
}

/**
 * plate.dxf (nominal; `plate-offset-K mm.dxf` when cutFiles.precompensate,
 * with its R12 and SVG copies on request) and preview.svg, and the report's
 * hemisphere, marks, plate and gnomon sections.
 */
export const plateOutputs: Producer<PlateSections> = async (ctx) => {
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
    },
  };
};

/** The text of preview.svg (shared with the pictures, which render it to PNG). */
export function previewSvgText(ctx: BuildContext): string {
  return toSvg(ctx.drawing, previewSvgOptions(ctx));
}

/** How preview.svg is drawn; with `previewFrame` the page finds the plate in it. */
export function previewSvgOptions({ spec, layout }: BuildContext): SvgOptions {
  return { caption: `${spec.name} - preview at 1:1, plate ${layout.plate.widthMm} x ${layout.plate.lengthMm} mm` };
}
