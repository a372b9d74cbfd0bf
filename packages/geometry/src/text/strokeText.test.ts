import { describe, expect, it } from 'vitest';
import { strokeText, strokeTextWidthMm } from './strokeText.ts';

describe('strokeText (Hershey futural single-stroke glyphs)', () => {
  it('draws "1" as one stroke reaching cap height from the baseline', () => {
    const [stroke, ...rest] = strokeText('1', { heightMm: 21, at: [0, 0] });
    expect(rest).toHaveLength(0);
    const ys = stroke.points.map((p) => p[1]);
    expect(Math.min(...ys)).toBeCloseTo(0, 12);
    expect(Math.max(...ys)).toBeCloseTo(21, 12);
  });
  it('centres text on its anchor', () => {
    const w = strokeTextWidthMm('XII', 8);
    const pts = strokeText('XII', { heightMm: 8, at: [100, 0], align: 'center' }).flatMap((s) => s.points);
    expect(Math.min(...pts.map((p) => p[0]))).toBeGreaterThanOrEqual(100 - w / 2);
    expect(Math.max(...pts.map((p) => p[0]))).toBeLessThanOrEqual(100 + w / 2);
  });
});
