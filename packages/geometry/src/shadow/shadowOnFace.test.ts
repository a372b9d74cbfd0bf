import { describe, expect, test } from 'vitest';
import { gnomonSolid } from '../parts/gnomonSolid.ts';
import { layoutDial } from '../polar/layoutDial.ts';
import { parseSpec } from '../spec/parseSpec.ts';
import { shadowOnLine } from './castShadow.ts';
import { gnomonForLayout } from './gnomonForLayout.ts';
import { shadowOnFace } from './shadowOnFace.ts';
import { styleEdges } from './styleEdges.ts';

const DEG = Math.PI / 180;
const layout = layoutDial(parseSpec({ site: { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' }, hours: { from: '08:00', to: '16:00' } }));
const g = layout.gnomon;

describe('styleEdges', () => {
  test('a plain fin has one top edge on each side, at x = ±t/2 and z = h, spanning the fin', () => {
    const e = styleEdges(gnomonSolid({ heightMm: 20, thicknessMm: 3, lengthMm: 120 }).mesh);
    expect(e.minusX).toEqual([[[-1.5, -60, 20], [-1.5, 60, 20]]]);
    expect(e.plusX).toEqual([[[1.5, -60, 20], [1.5, 60, 20]]]);
  });

  test('a nodus notch adds its two flanks on each side', () => {
    const e = styleEdges(gnomonSolid({ heightMm: 20, thicknessMm: 3, lengthMm: 120, nodus: { kind: 'notch', yMm: 10, sizeMm: 4 } }).mesh);
    expect(e.plusX.length).toBe(4);
    expect(Math.min(...e.plusX.flatMap((s) => [s[0][2], s[1][2]]))).toBe(18);
  });

  test('the layout gnomon spans gnomon.y0Mm…y1Mm with its style at gnomon.heightMm', () => {
    const part = gnomonForLayout(layout);
    const e = styleEdges(part.mesh);
    const ys = [...e.minusX, ...e.plusX].flatMap((s) => [s[0][1], s[1][1]]);
    expect(Math.min(...ys)).toBeCloseTo(g.y0Mm, 9);
    expect(Math.max(...ys)).toBeCloseTo(g.y1Mm, 9);
    expect(e.sideX).toEqual([-g.thicknessMm / 2, g.thicknessMm / 2]);
  });
});

describe('shadowOnFace', () => {
  test('nothing when the Sun is behind the face or in its plane', () => {
    expect(shadowOnFace(layout, [0.3, 0.1, -0.2])).toEqual([]);
    expect(shadowOnFace(layout, [1, 0, 0])).toEqual([]);
  });

  test('Sun on the face normal: the shadow is the fin footprint', () => {
    const polys = shadowOnFace(layout, [0, 0, 1]);
    const xs = polys.flatMap((p) => p.points.map((q) => q[0]));
    const ys = polys.flatMap((p) => p.points.map((q) => q[1]));
    expect(Math.min(...xs)).toBeCloseTo(-g.thicknessMm / 2, 12);
    expect(Math.max(...xs)).toBeCloseTo(g.thicknessMm / 2, 12);
    expect(Math.min(...ys)).toBeCloseTo(g.y0Mm, 12);
    expect(Math.max(...ys)).toBeCloseTo(g.y1Mm, 12);
  });

  // The 45° check (common practice, docs/design.md §2): at |H| = 45° the shadow edge lies h beyond the style edge.
  test.each([-45, 45])('equinox, H = %i°: the far shadow edge lies at ±(t/2 + h)', (hDeg) => {
    const H = hDeg * DEG;
    const sun = [-Math.sin(H), 0, Math.cos(H)] as const; // north: face x = east
    const xs = shadowOnFace(layout, sun).flatMap((p) => p.points.map((q) => q[0]));
    const far = hDeg < 0 ? Math.min(...xs) : Math.max(...xs);
    expect(Math.abs(far)).toBeCloseTo(g.thicknessMm / 2 + g.heightMm, 9);
    // and the ray-cast style edge on a mark-like line agrees with the polygon
    const e = styleEdges(gnomonForLayout(layout).mesh);
    const cast = shadowOnLine(hDeg < 0 ? e.minusX : e.plusX, sun, [far, -10], [far, 10]);
    expect(cast?.errorMm).toBeCloseTo(0, 9);
    expect(cast?.coverage).toBe(1);
  });

  test('a notched gnomon gives one convex polygon per strip of its top (3 + 2 for a V-notch), all closed', () => {
    const notched = layoutDial(parseSpec({ site: { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' }, hours: { from: '08:00', to: '16:00' }, parts: { nodus: true } }));
    const part = gnomonForLayout(notched);
    expect(part.nodusMm).toBeDefined();
    const polys = shadowOnFace(notched, [0.2, 0.1, 0.9], part);
    expect(polys.length).toBe(4);
    for (const p of polys) expect(p.closed).toBe(true);
    // The notch's apex (on the side faces, sizeMm/2 below the style) is a corner of the shadow.
    const ny = part.nodusMm![1];
    const nz = part.styleHeightMm - notched.spec.parts.nodusSize / 2;
    const apexes = part.styleXMm.map((x) => [x - (nz * 0.2) / 0.9, ny - (nz * 0.1) / 0.9]);
    const hit = polys.some((p) => p.points.some((q) => apexes.some((a) => Math.hypot(q[0] - a[0], q[1] - a[1]) < 1e-9)));
    expect(hit).toBe(true);
  });
});
