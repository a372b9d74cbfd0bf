import { assertPositive, assertRange } from '@umbrafab/geometry';
import type { Vec2 } from './engraveInput.ts';
import { offsetPolyline } from './offsetPolyline.ts';

/**
 * Tool-centre path that clears a groove of `widthMm` along an open polyline
 * with a flat end mill of diameter `toolMm`: parallel offsets of the centre
 * line spread evenly from −(w − D)/2 to +(w − D)/2, no further apart than
 * `stepoverFraction`·D, joined end to end in a serpentine (every other row
 * reversed), so one continuous feed clears the whole groove. The short
 * step-overs between rows lie across the groove's ends, inside the groove.
 *
 * A groove no wider than the tool is a single centre-line pass.
 *
 * @returns the serpentine polyline (open)
 * @example flatGroovePath([[0, 0], [10, 0]], 2, 1, 0.5).length // 6 (3 rows of 2 points)
 */
export function flatGroovePath(
  points: readonly Vec2[],
  widthMm: number,
  toolMm: number,
  stepoverFraction: number,
): readonly Vec2[] {
  assertPositive('widthMm', widthMm);
  assertPositive('flatEndMillMm', toolMm);
  assertRange('flatStepoverFraction', stepoverFraction, 0, 1, '', 'lo');
  const spanMm = widthMm - toolMm;
  if (!(spanMm > 1e-9)) return points;
  const rows = Math.ceil(spanMm / (toolMm * stepoverFraction) - 1e-9) + 1;
  const out: Vec2[] = [];
  for (let k = 0; k < rows; k += 1) {
    const offset = -spanMm / 2 + (spanMm * k) / (rows - 1);
    const row = offsetPolyline(points, offset);
    out.push(...(k % 2 === 0 ? row : [...row].reverse()));
  }
  return out;
}
