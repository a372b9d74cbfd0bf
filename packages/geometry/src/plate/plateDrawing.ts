import type { DialLayout } from '../polar/layoutDial.ts';
import type { Circle, MarkKind, Path, RoundedRect, Vec2 } from '../types.ts';
import { faceToPlate } from './faceToPlate.ts';

/** An engraved line (a mark or a curve) as a centre-line in plate coordinates. */
export interface DrawnLine {
  readonly label: string;
  readonly kind: MarkKind | 'curve';
  readonly widthMm: number;
  readonly path: Path;
  /** set on a date line or mean-time curve: the shadow check reads it back (its centre-line is kept beside etch outlines) */
  readonly readBack?: true;
}

export interface DrawnText {
  readonly role: 'numeral' | 'title' | 'label';
  readonly text: string;
  readonly strokeWidthMm: number;
  readonly strokes: readonly Path[];
}

/**
 * The plate as a drawing: nominal shapes (no kerf yet) in plate coordinates,
 * origin at the plate's lower-left corner, mm. Writers (DXF, SVG, G-code)
 * read this; kerf and process allowances are applied in `fabricate`.
 */
export interface PlateDrawing {
  readonly widthMm: number;
  readonly lengthMm: number;
  readonly substyleX: number;
  readonly faceOriginY: number;
  readonly outline: RoundedRect;
  readonly holes: readonly Circle[];
  readonly slots: readonly RoundedRect[];
  readonly lines: readonly DrawnLine[];
  readonly text: readonly DrawnText[];
  /** Lines for checking, never cut: the substyle, the gnomon's footprint, the 45° check. */
  readonly reference: readonly { readonly label: string; readonly path: Path }[];
  /** An equatorial plate engraved on both faces (face.side both): its lower face. */
  readonly lowerFace?: LowerFaceDrawing;
}

/**
 * The lower face of a plate engraved on both faces, drawn as seen from below
 * once the plate is turned over about its flip axis, the vertical line
 * x = flipAxisX (left edge to right): plate coordinates of the turned plate,
 * in which the outline and the holes, symmetric about that axis, lie where
 * they lay before the turn, so they register the second side's job.
 */
export interface LowerFaceDrawing {
  readonly flipAxisX: number;
  readonly lines: readonly DrawnLine[];
  readonly text: readonly DrawnText[];
}

/** The plate's outer profile in plate coordinates: a rounded rectangle from the origin at its lower-left corner. */
export function plateOutline(plate: { readonly widthMm: number; readonly lengthMm: number; readonly cornerRadiusMm: number }): RoundedRect {
  return { kind: 'rect', cx: plate.widthMm / 2, cy: plate.lengthMm / 2, widthMm: plate.widthMm, heightMm: plate.lengthMm, cornerRadiusMm: plate.cornerRadiusMm };
}

/** The plate and its face origin, as both layouts hold them (see `LaidOutPlate`). */
export interface DrawnPlate {
  readonly widthMm: number;
  readonly lengthMm: number;
  readonly cornerRadiusMm: number;
  /** plate x of the face origin: the gnomon's centre plane (the substyle), mm */
  readonly substyleX: number;
  /** plate y of the face origin (polar: the middle of the hour marks; planar: the roots' middle, or the marks' middle when ψ = 0), mm */
  readonly faceOriginY: number;
  /** mounting holes (and a planar rod's hole), nominal size, plate coordinates */
  readonly holes: readonly Circle[];
  /** gnomon slots, nominal size (tab + fit clearance on every side), plate coordinates */
  readonly slots: readonly RoundedRect[];
}

/**
 * A plate drawing from its plate and its parts already in plate coordinates:
 * the one assembly behind `plateDrawing` (polar) and `planarPlateDrawing`.
 */
export function assemblePlateDrawing(
  plate: DrawnPlate,
  parts: { readonly lines: readonly DrawnLine[]; readonly text: readonly DrawnText[]; readonly reference: PlateDrawing['reference'] },
): PlateDrawing {
  return {
    widthMm: plate.widthMm,
    lengthMm: plate.lengthMm,
    substyleX: plate.substyleX,
    faceOriginY: plate.faceOriginY,
    outline: plateOutline(plate),
    holes: plate.holes,
    slots: plate.slots,
    lines: parts.lines,
    text: parts.text,
    reference: parts.reference,
  };
}

/**
 * The plate drawing of a layout: face coordinates moved to plate coordinates
 * (x + substyleX, y + faceOriginY).
 * @example plateDrawing(layoutDial(spec)).lines[0].path.points
 */
export function plateDrawing(layout: DialLayout, extraLines: readonly DrawnLine[] = [], extraText: readonly DrawnText[] = []): PlateDrawing {
  const { plate, gnomon } = layout;
  const to = faceToPlate(plate);
  const seg = (a: Vec2, b: Vec2): Path => to.path([a, b]);

  const lines: DrawnLine[] = layout.marks.filter((m) => !m.underGnomon).map((m) => ({
    label: `${m.label} ${m.style}`,
    kind: m.kind,
    widthMm: m.widthMm,
    path: seg([m.xMm, m.y0Mm], [m.xMm, m.y1Mm]),
  }));

  const t2 = gnomon.thicknessMm / 2;
  const h = gnomon.heightMm;
  const checkY = layout.marks.length ? Math.min(...layout.marks.map((m) => m.y0Mm)) : 0;
  const east = layout.hemisphere === 'north' ? 1 : -1;
  const reference = [
    { label: 'substyle', path: seg([0, 0 - to.dy], [0, plate.lengthMm - to.dy]) },
    { label: 'gnomon footprint', path: to.footprint(gnomon.thicknessMm, gnomon.y0Mm, gnomon.y1Mm) },
    // The 45° check (common practice): at |H| = 45° the line lies one gnomon height from its style edge.
    { label: '45 deg check west', path: seg([-east * t2, checkY], [-east * (t2 + h), checkY]) },
    { label: '45 deg check east', path: seg([east * t2, checkY], [east * (t2 + h), checkY]) },
  ];
  const text = to.text([...layout.numerals, ...layout.title]);
  return assemblePlateDrawing(plate, { lines: [...lines, ...extraLines], text: [...text, ...extraText], reference });
}
