import { faceToPlate } from '../plate/faceToPlate.ts';
import { assemblePlateDrawing, type DrawnLine, type PlateDrawing } from '../plate/plateDrawing.ts';
import { clipPolyline } from '../polar/clipPolyline.ts';
import type { Path, Vec2 } from '../types.ts';
import type { PlanarLayout } from './layoutPlanar.ts';

/**
 * The plate drawing of a planar layout: the same plain shape as the polar
 * plate's (`plateDrawing`), so plate.dxf, preview.svg and the engraving
 * programs read every face type alike. Face coordinates move to plate
 * coordinates by (substyleX, faceOriginY). References (never cut): the
 * substyle, the gnomon's footprint and, on a wall whose substyle leans, the
 * plumb line through the face origin. An equatorial plate engraved on both
 * faces adds its lower face (`lowerFace`), as seen from below after turning
 * the plate over about its vertical centre line, the rod's line.
 *
 * @example planarPlateDrawing(layoutPlanar(spec)).lines.length
 */
export function planarPlateDrawing(layout: PlanarLayout): PlateDrawing {
  const { plate, gnomon } = layout;
  const to = faceToPlate(plate);
  const { dx, dy, path } = to;

  const lines: DrawnLine[] = layout.marks.filter((m) => !m.underGnomon).map((m) => ({
    label: `${m.label} ${m.edge}`,
    kind: m.kind,
    widthMm: m.widthMm,
    path: path([m.a, m.b]),
  }));
  for (const c of layout.curves) {
    c.paths.forEach((p, i) => lines.push({ label: `${c.label}${c.paths.length > 1 ? ` ${i + 1}` : ''}`, kind: 'curve', widthMm: c.widthMm, path: path(p), readBack: true }));
  }
  const text = to.text([...layout.numerals, ...layout.title]);
  const t2 = gnomon.thicknessMm / 2;
  const reference: { label: string; path: Path }[] = [
    { label: 'substyle', path: path([[0, -dy], [0, plate.lengthMm - dy]]) },
    gnomon.kind === 'rod'
      ? { label: 'rod footprint', path: to.footprint(gnomon.thicknessMm, -t2, t2) }
      : { label: 'gnomon footprint', path: to.footprint(gnomon.thicknessMm, gnomon.y0Mm, gnomon.y1Mm) },
  ];
  if (layout.faceType === 'vertical' && Math.abs(layout.plateTurnDeg) > 1e-9) {
    const a = (layout.plateTurnDeg * Math.PI) / 180;
    // The plumb line in plate coordinates: the face's "up" turned back by the plate's turn.
    const u: Vec2 = [-Math.sin(a), Math.cos(a)];
    const r = Math.hypot(plate.widthMm, plate.lengthMm);
    const box = { xMinMm: -dx, xMaxMm: plate.widthMm - dx, yMinMm: -dy, yMaxMm: plate.lengthMm - dy };
    for (const piece of clipPolyline([[-u[0] * r, -u[1] * r], [u[0] * r, u[1] * r]], box)) reference.push({ label: 'plumb line', path: path(piece) });
  }
  const drawing = assemblePlateDrawing(plate, { lines, text, reference });
  if (!layout.lowerFace) return drawing;
  // The lower face's own drawing is already in the turned plate's coordinates: the rod lies on the flip axis.
  const lower = planarPlateDrawing(layout.lowerFace);
  return { ...drawing, lowerFace: { flipAxisX: plate.widthMm / 2, lines: lower.lines, text: lower.text } };
}
