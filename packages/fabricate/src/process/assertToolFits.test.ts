import { describe, expect, it } from 'vitest';
import { layoutDial, parseSpec, plateDrawing, sheetParts } from '@umbrafab/geometry';
import { assertToolFits, cutFeatures } from './assertToolFits.ts';

const nominal = (extra: Record<string, unknown>) => {
  const layout = layoutDial(parseSpec({ site: { latitude: 50, longitude: 5, timezone: 'Europe/Brussels' }, process: { method: 'router' }, ...extra }));
  return sheetParts(layout, plateDrawing(layout), { reliefToolRadiusMm: 0 });
};

describe('assertToolFits', () => {
  it('lists holes, slots and the gaps between tabs of the nominal parts', () => {
    const parts = nominal({});
    expect(parts.map((p) => p.name)).toEqual(['plate', 'gnomon', 'stand-cheek', 'stand-foot', 'stand-rail', 'stand-cross']);
    const f = parts.filter((p) => p.name === 'plate' || p.name === 'gnomon').flatMap(cutFeatures);
    expect(f.filter((x) => x.feature.startsWith('hole')).map((x) => x.widthMm)).toEqual([5.5, 5.5, 5.5, 5.5]);
    expect(f.filter((x) => x.feature.startsWith('slot')).map((x) => x.widthMm.toFixed(6))).toEqual(['3.200000', '3.200000']);
    expect(f.some((x) => x.part === 'gnomon' && x.feature.startsWith('gap'))).toBe(true);
  });

  it('passes a 3.175 mm tool and refuses a 6 mm one, naming the feature and both sizes', () => {
    const parts = nominal({});
    expect(() => assertToolFits(parts, 3.175)).not.toThrow();
    expect(() => assertToolFits(parts, 6)).toThrow(/process\.kerf: the 6 mm tool is not narrower than the plate's slot 1 \(3\.200 × 15\.200 mm\), which is 3\.200 mm wide/);
  });

  it('names a hole narrower than the tool', () => {
    const parts = nominal({ holes: { diameter: 3 }, gnomon: { thickness: 6 }, plate: { thickness: 6 } });
    expect(() => assertToolFits(parts, 3.175)).toThrow(/hole 1 \(Ø 3\.000 mm\), which is 3\.000 mm wide/);
  });
});
