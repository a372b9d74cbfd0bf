import { describe, expect, it } from 'vitest';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import { GNOMON_DEFAULTS, gnomonSolid, type GnomonOptions } from './gnomonSolid.ts';
import { meshBounds } from './meshBounds.ts';
import { meshVolumeMm3 } from './meshVolumeMm3.ts';
import { validateMesh } from './validateMesh.ts';

/**
 * Closed form: a right prism has V = A · t (base area times height, common
 * practice). The (y, z) profile area is the rectangle L·h plus each tab
 * (length − 2·clearance)·depth, minus the 90° V-notch (a triangle of base s
 * and height s/2: s²/4).
 */
function prismVolume(o: GnomonOptions): number {
  const tabs = o.tabs.reduce((s, t) => s + (t.lengthMm - 2 * o.tabClearanceMm) * t.depthMm, 0);
  const notch = o.nodus ? o.nodus.sizeMm ** 2 / 4 : 0;
  return o.thicknessMm * (o.lengthMm * o.heightMm + tabs - notch);
}

const CASES: Array<[string, Partial<GnomonOptions>]> = [
  ['defaults', {}],
  ['with a nodus notch', { nodus: { kind: 'notch', yMm: 12, sizeMm: 4 } }],
  ['thin, tall, three tabs, clearance', {
    heightMm: 47.25, thicknessMm: 1.5, lengthMm: 180, tabClearanceMm: 0.2, plateThicknessMm: 4,
    tabs: [{ centerYMm: -60, lengthMm: 20, depthMm: 4 }, { centerYMm: 0, lengthMm: 10, depthMm: 2 }, { centerYMm: 60, lengthMm: 20, depthMm: 4 }],
  }],
  ['no tabs', { tabs: [] }],
  ['tab flush with the end', { tabs: [{ centerYMm: 52.5, lengthMm: 15, depthMm: 3 }] }],
];

describe('gnomonSolid', () => {
  it.each(CASES)('%s: closed mesh, volume = A·t within 0.1 %%, style at heightMm', (_name, opts) => {
    const o = { ...GNOMON_DEFAULTS, ...opts };
    const part = gnomonSolid(opts);
    validateMesh(part.mesh);
    const v = meshVolumeMm3(part.mesh);
    const expected = prismVolume(o);
    expectClose(v, expected, 0.001 * expected, 'gnomon volume', ' mm³');
    // Ear clipping adds no vertex: n profile corners give 2n positions and 2(n − 2) + 2n triangles.
    const n = part.profile.length;
    expect(part.mesh.positions.length).toBe(2 * n);
    expect(part.mesh.triangles.length).toBe(4 * n - 4);
    // Style edges: the corners at the ends of both top edges sit at z = heightMm.
    const b = meshBounds(part.mesh);
    expectClose(b.max[2], o.heightMm, 0.01, 'style height', ' mm');
    for (const x of [-o.thicknessMm / 2, o.thicknessMm / 2]) {
      for (const y of [-o.lengthMm / 2, o.lengthMm / 2]) {
        const corner = part.mesh.positions.find((p) => p[0] === x && p[1] === y && p[2] === b.max[2]);
        expect(corner, `style corner at x=${x}, y=${y}`).toBeDefined();
      }
    }
    expect(b.min[0]).toBe(-o.thicknessMm / 2);
    expect(b.max[0]).toBe(o.thicknessMm / 2);
    const deepest = Math.max(0, ...o.tabs.map((t) => t.depthMm));
    expect(b.min[2] + deepest).toBe(0);
  });

  it('drops the corner a flush tab would leave collinear', () => {
    const part = gnomonSolid({ tabs: [{ centerYMm: 52.5, lengthMm: 15, depthMm: 3 }] });
    expect(part.profile.some(([y, z]) => y === 60 && z === 0)).toBe(false);
    expect(part.profile.length).toBe(6);
  });

  it('reports the nodus on the style edge', () => {
    expect(gnomonSolid({ nodus: { kind: 'notch', yMm: 12, sizeMm: 4 } }).nodusMm).toEqual([0, 12, 20]);
  });

  it('rejects bad inputs, naming the field and value', () => {
    expect(() => gnomonSolid({ thicknessMm: 0 })).toThrow(/gnomon\.thicknessMm: got 0;/);
    expect(() => gnomonSolid({ heightMm: -1 })).toThrow(/gnomon\.heightMm: got -1;/);
    expect(() => gnomonSolid({ plateThicknessMm: 2 })).toThrow(/gnomon\.tabs\[0\]\.depthMm: got 3; allowed: at most plateThicknessMm = 2 mm/);
    expect(() => gnomonSolid({ tabClearanceMm: 7.5 })).toThrow(/gnomon\.tabClearanceMm: got 7\.5;/);
    expect(() => gnomonSolid({ tabs: [{ centerYMm: 0, lengthMm: 10, depthMm: 3 }, { centerYMm: 8, lengthMm: 10, depthMm: 3 }] })).toThrow(/overlaps/);
    expect(() => gnomonSolid({ tabs: [{ centerYMm: 58, lengthMm: 10, depthMm: 3 }] })).toThrow(/gnomon\.tabs\[0\]: spans y = 53…63 mm; allowed: a tab within the fin/);
    expect(() => gnomonSolid({ nodus: { kind: 'notch', yMm: 0, sizeMm: 40 } })).toThrow(/gnomon\.nodus\.sizeMm: got 40;/);
    expect(() => gnomonSolid({ nodus: { kind: 'notch', yMm: 59, sizeMm: 4 } })).toThrow(/gnomon\.nodus/);
  });

  it('does not mutate its options', () => {
    const tabs = [{ centerYMm: 10, lengthMm: 8, depthMm: 2 }, { centerYMm: -10, lengthMm: 8, depthMm: 2 }];
    const copy = JSON.parse(JSON.stringify(tabs));
    gnomonSolid({ tabs });
    expect(tabs).toEqual(copy);
  });
});
