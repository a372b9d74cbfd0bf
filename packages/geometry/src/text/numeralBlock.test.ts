import { describe, expect, it } from 'vitest';
import { numeralBlock, numeralStrokeMm } from './numeralBlock.ts';
import { strokeText } from './strokeText.ts';

describe('numeralStrokeMm', () => {
  it('is a twelfth of the height, at least 0.2 mm, never wider than the marks', () => {
    expect(numeralStrokeMm(1, 6)).toBe(0.5);
    expect(numeralStrokeMm(0.4, 6)).toBe(0.4);
    expect(numeralStrokeMm(1, 1.2)).toBe(0.2);
  });
});

describe('numeralBlock', () => {
  it('strokes the text centred on its baseline point, at the given height and width', () => {
    const b = numeralBlock('IX', 8, 0.5, [10, -20]);
    expect({ role: b.role, text: b.text, heightMm: b.heightMm, strokeWidthMm: b.strokeWidthMm }).toEqual({ role: 'numeral', text: 'IX', heightMm: 8, strokeWidthMm: 0.5 });
    expect(b.strokes).toEqual(strokeText('IX', { heightMm: 8, at: [10, -20], align: 'center' }));
    const xs = b.strokes.flatMap((s) => s.points.map((p) => p[0]));
    expect(Math.abs((Math.min(...xs) + Math.max(...xs)) / 2 - 10)).toBeLessThan(0.5);
  });
});
