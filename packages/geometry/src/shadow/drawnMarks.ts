import type { DialLayout } from '../polar/layoutDial.ts';
import type { Mark, Vec2 } from '../types.ts';

/** One mark as drawn: the layout's mark (label, hour angle, casting style) and the drawn line's two ends in face coordinates. */
export interface DrawnMark {
  readonly mark: Mark;
  /** end at the smaller y, face coordinates, mm */
  readonly a: Vec2;
  /** end at the larger y, face coordinates, mm */
  readonly b: Vec2;
}

/** The layout's own engraved marks as drawn lines (x = xMm from y0Mm to y1Mm); lines under the fin are not drawn. */
export function drawnMarksFromLayout(layout: DialLayout): DrawnMark[] {
  return layout.marks.filter((m) => !m.underGnomon).map((m) => ({ mark: m, a: [m.xMm, m.y0Mm], b: [m.xMm, m.y1Mm] }));
}
