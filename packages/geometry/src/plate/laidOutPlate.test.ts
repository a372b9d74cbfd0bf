import { describe, expect, it } from 'vitest';
import { parseSpec } from '../spec/parseSpec.ts';
import { cornerHoles } from './cornerHoles.ts';
import { gnomonTabs } from './gnomonTabs.ts';
import { laidOutPlate } from './laidOutPlate.ts';

const spec = (over: Record<string, unknown> = {}) => parseSpec({ site: { latitude: 40, longitude: 0, timezone: 'UTC' }, ...over });

describe('gnomonTabs', () => {
  it('spreads the tabs evenly, each centred in its share of the stretch', () => {
    const s = spec({ gnomon: { tabs: 2, tabLength: 10 } });
    expect(gnomonTabs(s, -40, 40, 'style')).toEqual([{ centerYMm: -20, lengthMm: 10 }, { centerYMm: 20, lengthMm: 10 }]);
  });

  it('refuses tabs taking more than 80 % of the stretch, naming gnomon.tabLength and the stretch', () => {
    const s = spec({ gnomon: { tabs: 2, tabLength: 10 } });
    expect(() => gnomonTabs(s, 0, 20, 'footprint')).toThrow(/gnomon\.tabLength.*20\.0 mm footprint/s);
  });
});

describe('cornerHoles', () => {
  it('gives none, two at mid-length or four in the corners', () => {
    expect(cornerHoles({ count: 0, diameter: 6, inset: 10 }, 100, 200)).toEqual([]);
    expect(cornerHoles({ count: 2, diameter: 6, inset: 10 }, 100, 200).map((c) => [c.cx, c.cy])).toEqual([[10, 100], [90, 100]]);
    const four = cornerHoles({ count: 4, diameter: 6, inset: 10 }, 100, 200);
    expect(four.map((c) => [c.cx, c.cy])).toEqual([[10, 10], [90, 10], [10, 190], [90, 190]]);
    expect(four.every((c) => c.radiusMm === 3)).toBe(true);
  });
});

describe('laidOutPlate', () => {
  it('puts one slot per tab on the substyle, tab plus clearance on every side, and clamps the corner radius', () => {
    const s = spec({ plate: { cornerRadius: 80 }, gnomon: { thickness: 3 }, process: { method: 'laser', clearance: 0.1 } });
    const p = laidOutPlate(s, { widthMm: 120, lengthMm: 200, substyleX: 60, faceOriginY: 90 }, [{ centerYMm: -20, lengthMm: 10 }], []);
    expect(p.cornerRadiusMm).toBe(60);
    expect(p.thicknessMm).toBe(s.plate.thickness);
    expect(p.slots).toHaveLength(1);
    expect(p.slots[0].cx).toBe(60);
    expect(p.slots[0].cy).toBe(70);
    expect(p.slots[0].widthMm).toBeCloseTo(3.2, 12);
    expect(p.slots[0].heightMm).toBeCloseTo(10.2, 12);
  });
});
