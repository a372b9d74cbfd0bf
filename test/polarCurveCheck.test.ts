import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { checkDial, drawnCurvesFromLayout, layoutDial, type DrawnCurve } from '@umbrafab/geometry';
import { readSpecFile } from '@umbrafab/cli';

// The polar check measures the date lines and mean-time curves too: the nodus
// on the gnomon mesh's style edge, the Sun of sunTrack (astronomy-engine; its
// agreement with astronomy-engine's Horizon is measured in sunTrack.test.ts),
// the distance of the nodus shadow from each drawn polyline. The curves
// themselves are held to astronomy-engine's site-based Sun in polarCurves.test.ts.

const ROOT = join(import.meta.dirname, '..');
const layout = layoutDial(readSpecFile(join(ROOT, 'fixtures/specs/page-nodus.yaml')));
const drawn = drawnCurvesFromLayout(layout);

/** The curve with a stretch of ten vertices from the middle of its first run moved square to the run by `mm`. */
function movedStretch(c: DrawnCurve, mm: number): DrawnCurve {
  const path = c.paths[0];
  const i0 = Math.floor(path.length / 2) - 5;
  const [a, b] = [path[i0 - 1], path[i0 + 10]];
  const l = Math.hypot(b[0] - a[0], b[1] - a[1]);
  const moved = path.map((p, i): readonly [number, number] => (i < i0 || i >= i0 + 10 ? p : [p[0] - ((b[1] - a[1]) / l) * mm, p[1] + ((b[0] - a[0]) / l) * mm]));
  return { ...c, paths: [moved, ...c.paths.slice(1)] };
}

describe('polar check of the curves (fixtures/specs/page-nodus.yaml)', () => {
  it('measures every drawn date line and mean-time curve, each within 0.001 mm of the nodus shadow, and passes', () => {
    const check = checkDial(layout);
    for (const c of check.curves) console.log(`page-nodus: ${c.label}: worst ${c.worstMm.toExponential(2)} mm / ${c.worstS.toFixed(3)} s over ${c.samples} (${c.worstDate})`);
    expect(check.curves.map((c) => c.label)).toEqual(drawn.map((c) => c.label));
    expect(check.curves.filter((c) => c.kind === 'date').length).toBe(4);
    expect(check.curves.filter((c) => c.kind === 'meanTime').length).toBe(10);
    for (const c of check.curves) {
      expect(c.samples, c.label).toBeGreaterThan(50);
      expect(c.worstMm, c.label).toBeLessThanOrEqual(0.001);
    }
    expect(check.curveToleranceMm).toBe(check.toleranceMm);
    expect(check.pass).toBe(true);
  });

  it('a stretch of a mean-time curve and a whole date line moved by 0.05 mm are caught, the others still pass (tolerance 0.001 mm)', () => {
    const curves = drawn.map((c) => {
      if (c.label === '12:00 mean time') return movedStretch(c, 0.05);
      if (c.label === 'December solstice') return { ...c, paths: c.paths.map((p) => p.map(([x, y]): readonly [number, number] => [x, y + 0.05])) };
      return c;
    });
    const check = checkDial(layout, { curves, toleranceMm: 0.001, everyDays: 2 });
    expect(check.pass).toBe(false);
    expect(check.failures).toEqual([]);
    expect(check.curves.filter((c) => !c.pass).map((c) => c.label).sort()).toEqual(['12:00 mean time', 'December solstice']);
    for (const label of ['12:00 mean time', 'December solstice']) {
      const hit = check.curves.find((c) => c.label === label)!;
      console.log(`moved ${label}: worst ${hit.worstMm.toExponential(3)} mm on ${hit.worstDate}`);
      expect(hit.worstMm).toBeGreaterThan(0.04);
      expect(hit.worstMm).toBeLessThan(0.0506);
    }
  });

  it('a dial without a nodus has no curves to check', () => {
    const plain = layoutDial(readSpecFile(join(ROOT, 'fixtures/demo.yaml')));
    expect(drawnCurvesFromLayout(plain)).toEqual([]);
    expect(checkDial(plain, { everyDays: 30 }).curves).toEqual([]);
  });
});
