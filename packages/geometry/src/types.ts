/**
 * Plain-data types shared by the geometry: everything survives JSON.stringify.
 *
 * The face frame (docs/design.md §2), used by every mark and curve in face coordinates:
 * - origin on the substyle (the foot of the style on the face), at the middle
 *   of the hour marks' span (where a nodus foot sits by default); units mm;
 * - x across the plate in the face drawing, right-positive when the plate is
 *   seen face-on with its pole-ward end up (east on the right in the northern
 *   hemisphere, on the left in the southern one);
 * - y along the style, positive toward the elevated pole;
 * - z the outward face normal.
 * Plate coordinates (DXF, G-code, SVG) put the origin at the plate's
 * lower-left corner: plate = face + (plate.substyleX, plate.faceOriginY).
 */
export type Vec2 = readonly [number, number];

/** A polyline (open) or polygon (closed), plate or face coordinates as stated by its owner. */
export interface Path {
  readonly kind: 'path';
  readonly points: readonly Vec2[];
  readonly closed: boolean;
}

/** An axis-aligned rectangle with rounded corners (radius 0 = sharp). */
export interface RoundedRect {
  readonly kind: 'rect';
  readonly cx: number;
  readonly cy: number;
  readonly widthMm: number;
  readonly heightMm: number;
  readonly cornerRadiusMm: number;
}

export interface Circle {
  readonly kind: 'circle';
  readonly cx: number;
  readonly cy: number;
  readonly radiusMm: number;
}

export type MarkKind = 'hour' | 'half' | 'quarter';
export type StyleEdge = 'west' | 'east';
export type Hemisphere = 'north' | 'south';

/** One line on the face: the report.json contract of docs/design.md §6. */
export interface Mark {
  readonly label: string;
  /** The clock reading the line stands for, minutes after midnight (495 for the 08:15 line). */
  readonly minutes: number;
  readonly kind: MarkKind;
  /** Hour angle of the sun when the shadow lies on this line, degrees (0 at apparent noon, negative mornings). */
  readonly hourAngleDeg: number;
  readonly style: StyleEdge;
  /** Face x of the line's centre, mm, right-positive, from the gnomon's centre plane. */
  readonly xMm: number;
  readonly y0Mm: number;
  readonly y1Mm: number;
  readonly widthMm: number;
  /**
   * Set when the line lies inside the gnomon's footprint (the noon band of a
   * solar-time dial is the fin itself): listed for the record, not engraved.
   */
  readonly underGnomon?: true;
}

/** Single-stroke text placed on the face: each stroke an open polyline in face coordinates. */
export interface TextBlock {
  readonly role: 'numeral' | 'title' | 'label';
  readonly text: string;
  readonly heightMm: number;
  /** Stroke (line) width the engraving should use, mm. */
  readonly strokeWidthMm: number;
  readonly strokes: readonly Path[];
}
