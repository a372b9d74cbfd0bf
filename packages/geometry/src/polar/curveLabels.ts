import { strokeText, strokeTextWidthMm } from '../text/strokeText.ts';
import type { Mark, TextBlock, Vec2 } from '../types.ts';
import type { MarkField } from './markField.ts';

/** A curve to label: its text and its polylines in face coordinates (y from the face origin). */
export interface CurveToLabel {
  readonly text: string;
  readonly polylines: readonly (readonly Vec2[])[];
  /** keep the label on this half of the face (x < 0 or x > 0), e.g. spring date left, autumn date right */
  readonly side?: 'left' | 'right';
}

/** Free space kept between a label and any mark, curve or other label, mm. */
const LABEL_CLEAR_MM = 0.6;

/**
 * Single-stroke labels for face curves: each label sits just pole-ward of its
 * curve, in a gap between marks where it touches no mark, no other curve, no
 * obstacle (e.g. a mean-time curve) and no other label, inside the mark field; the outermost free place is taken
 * (the marks are widest apart there). Tried above, then below the curve, at
 * `heightMm`, then at 70 % and 50 % of it (never under 1.5 mm); a curve with no free place gets no label (reported by the caller).
 * @example curveLabels([{text: '21 JUN', polylines}], marks, field, 2.5)
 */
export function curveLabels(
  curves: readonly CurveToLabel[],
  marks: readonly Mark[],
  field: MarkField,
  heightMm: number,
  obstacles: readonly (readonly Vec2[])[] = [],
): (TextBlock | undefined)[] {
  const placed: { x0: number; x1: number; y0: number; y1: number }[] = [];
  const others = [...curves.flatMap((c) => c.polylines), ...obstacles];
  return curves.map((c) => {
    for (const hgt of [heightMm, 0.7 * heightMm, 0.5 * heightMm].filter((v) => v >= 1.5)) {
      const w = strokeTextWidthMm(c.text, hgt);
      const candidates = c.polylines.flatMap((p) => p.map((q) => q[0])).filter((x) => (c.side === 'left' ? x < 0 : c.side === 'right' ? x > 0 : true)).sort((a, b) => Math.abs(b) - Math.abs(a));
      for (const xc of candidates) {
        const x0 = xc - w / 2;
        const x1 = xc + w / 2;
        if (x0 < field.xMinMm || x1 > field.xMaxMm) continue;
        const own = yRange(c.polylines, x0, x1);
        if (!own) continue;
        for (const y0 of [own[1] + LABEL_CLEAR_MM, own[0] - LABEL_CLEAR_MM - hgt]) {
          const y1 = y0 + hgt;
          if (y1 > field.yMaxMm || y0 < field.yMinMm) continue;
          const box = { x0: x0 - LABEL_CLEAR_MM, x1: x1 + LABEL_CLEAR_MM, y0: y0 - LABEL_CLEAR_MM / 2, y1: y1 + LABEL_CLEAR_MM / 2 };
          if (marks.some((m) => m.xMm + m.widthMm / 2 > box.x0 && m.xMm - m.widthMm / 2 < box.x1 && m.y1Mm > box.y0 && m.y0Mm < box.y1)) continue;
          if (placed.some((b) => b.x1 > box.x0 && b.x0 < box.x1 && b.y1 > box.y0 && b.y0 < box.y1)) continue;
          if (others.some((p) => !c.polylines.includes(p) && crossesBox(p, box))) continue;
          placed.push(box);
          const strokes = strokeText(c.text, { heightMm: hgt, at: [xc, y0], align: 'center' });
          return { role: 'label' as const, text: c.text, heightMm: hgt, strokeWidthMm: Math.max(0.2, Math.min(0.4, hgt / 10)), strokes };
        }
      }
    }
    return undefined;
  });
}

/** Lowest and highest y of the polylines over x0..x1 (every point and both ends), or undefined if they do not cover it. */
function yRange(polylines: readonly (readonly Vec2[])[], x0: number, x1: number): [number, number] | undefined {
  for (const p of polylines) {
    const xs = p.map((q) => q[0]);
    if (Math.min(...xs) > x0 || Math.max(...xs) < x1) continue;
    const ys = p.filter((q) => q[0] >= x0 && q[0] <= x1).map((q) => q[1]);
    ys.push(yAt(p, x0), yAt(p, x1));
    return [Math.min(...ys), Math.max(...ys)];
  }
  return undefined;
}

function yAt(p: readonly Vec2[], x: number): number {
  for (let i = 0; i + 1 < p.length; i++) {
    const [a, b] = [p[i], p[i + 1]];
    if ((a[0] - x) * (b[0] - x) <= 0 && a[0] !== b[0]) return a[1] + ((x - a[0]) / (b[0] - a[0])) * (b[1] - a[1]);
  }
  return p[0][1];
}

function crossesBox(p: readonly Vec2[], b: { x0: number; x1: number; y0: number; y1: number }): boolean {
  for (let i = 0; i + 1 < p.length; i++) {
    const [a, c] = [p[i], p[i + 1]];
    if (Math.max(a[0], c[0]) < b.x0 || Math.min(a[0], c[0]) > b.x1 || Math.max(a[1], c[1]) < b.y0 || Math.min(a[1], c[1]) > b.y1) continue;
    return true;
  }
  return false;
}
