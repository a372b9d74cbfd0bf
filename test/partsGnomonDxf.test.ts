import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import DxfParser from 'dxf-parser';
import { describe, expect, it } from 'vitest';
import { parseSpec } from '@umbrafab/geometry';
import { buildFiles, parseSpecText } from '@umbrafab/cli';
import { ezdxfDump } from './helpers/ezdxf.ts';

const ROOT = resolve(import.meta.dirname, '..');
const demoRaw = parseSpecText(readFileSync(join(ROOT, 'fixtures/demo.yaml'), 'utf8')) as Record<string, unknown>;

const cases = [
  { name: 'demo (laser, kerf 0.15)', raw: demoRaw },
  { name: 'waterjet, south, 6 mm sheet, 3 tabs', raw: { site: { latitude: -33.9, longitude: 18.4, timezone: 'Africa/Johannesburg' }, process: { method: 'waterjet' }, plate: { thickness: 6 }, gnomon: { height: 40, tabs: 3, tabLength: 12 } } },
  { name: 'router (kerf = 3.175 mm tool), nodus notch', raw: { site: { latitude: 64.1, longitude: -21.9, timezone: 'Atlantic/Reykjavik' }, process: { method: 'router' }, plate: { thickness: 6 }, gnomon: { height: 70 }, holes: { count: 2, diameter: 8 }, parts: { nodus: true, nodusSize: 8 } } },
  { name: 'waterjet, pre-compensated', raw: { site: { latitude: -33.9, longitude: 18.4, timezone: 'Africa/Johannesburg' }, process: { method: 'waterjet' }, plate: { thickness: 6 }, gnomon: { height: 40 }, cutFiles: { precompensate: true } } },
];

const dir = mkdtempSync(join(tmpdir(), 'umbrafab-gnomon-dxf-'));
const built = await Promise.all(
  cases.map(async (c, i) => {
    const result = await buildFiles(parseSpec(c.raw));
    const file = join(dir, `gnomon-${i}.dxf`);
    const text = new TextDecoder().decode(result.files.find((f) => /^gnomon(-offset-[0-9.]+mm)?\.dxf$/.test(f.name))!.bytes);
    writeFileSync(file, text);
    return { ...c, result, text, dump: ezdxfDump(file) };
  }),
);

/** Distance from point p to the infinite line through a and b. */
function lineDistance(p: readonly number[], a: readonly number[], b: readonly number[]): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  return Math.abs((p[0] - a[0]) * dy - (p[1] - a[1]) * dx) / Math.hypot(dx, dy);
}

describe.each(built)('gnomon.dxf read back: $name', ({ result, text, dump }) => {
  const spec = result.layout.spec;
  const g = result.layout.gnomon;
  const T = result.layout.plate.thicknessMm;
  const kerf = spec.process.kerf;
  // Nominal by default; offset by kerf/2 (kerf compensation, common practice) only with cutFiles.precompensate.
  const k = spec.cutFiles.precompensate ? kerf / 2 : 0;

  it('is written for the cut process, with the gnomon cut from the sheet: t = plate.thickness', () => {
    expect(result.files.map((f) => f.name)).toEqual(expect.arrayContaining([k ? `gnomon-offset-${k}mm.dxf` : 'gnomon.dxf']));
    expect(result.files.some((f) => f.name === 'gnomon.stl')).toBe(false);
    expect(g.thicknessMm).toBe(T);
    expect(spec.parts.gnomonFrom).toBe('sheet');
  });

  it('passes the ezdxf audit: $INSUNITS 4 (mm), layers as plate.dxf, every entity at z = 0', () => {
    // Source: ezdxf (Debian python3-ezdxf) recover + audit; $INSUNITS 4 = millimetres (AutoCAD DXF Reference).
    expect(dump.errors).toEqual([]);
    expect(dump.fixes).toEqual([]);
    expect(dump.insunits).toBe(4);
    expect(dump.layers).toEqual(expect.arrayContaining(['CUT_PROFILE', 'REFERENCE_NO_CUT']));
    for (const e of dump.entities) for (const z of e.z ?? []) expect(z).toBe(0);
    // Second reader: the npm dxf-parser.
    const parsed = new DxfParser().parseSync(text)!;
    expect(parsed.entities.filter((e) => e.layer === 'CUT_PROFILE').length).toBe(1);
  });

  it('holds one closed CUT_PROFILE polyline, nominal (or grown by exactly kerf/2 when pre-compensated) on every edge (measured), origin at the lower-left', () => {
    const cut = dump.entities.filter((e) => e.layer === 'CUT_PROFILE');
    expect(cut.length).toBe(1);
    expect(cut[0].type).toBe('LWPOLYLINE');
    expect(cut[0].closed).toBe(true);
    const pts = cut[0].points!;
    // Nominal outline from the layout (independent of the part builder): fin L × h on the
    // face line y = T, tabs T deep at the layout's tab centres, the nodus notch.
    const L = g.y1Mm - g.y0Mm;
    const xs = pts.map((p) => p[0]);
    const ys = pts.map((p) => p[1]);
    expect(Math.min(...xs)).toBeCloseTo(-k, 6);
    expect(Math.min(...ys)).toBeCloseTo(-k, 6);
    expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(L + 2 * k, 6);
    expect(Math.max(...ys) - Math.min(...ys)).toBeCloseTo(g.heightMm + T + 2 * k, 6);
    // Measured offset: each nominal edge has a parallel cut edge k outside it (k = 0: on it).
    const nominal: [number, number][][] = [
      [[0, T], [0, T + g.heightMm]],
      [[L, T], [L, T + g.heightMm]],
      [[0, T + g.heightMm], [L, T + g.heightMm]],
      ...g.tabs.flatMap((t): [number, number][][] => {
        const a = t.centerYMm - g.y0Mm - t.lengthMm / 2;
        const b = t.centerYMm - g.y0Mm + t.lengthMm / 2;
        return [[[a, 0], [b, 0]], [[a, 0], [a, T]], [[b, 0], [b, T]]];
      }),
    ];
    let worst = 0;
    let matched = 0;
    for (const [a, b] of nominal) {
      // the cut edge parallel to this nominal edge and nearest to it
      let best = Infinity;
      for (let i = 0; i < pts.length; i++) {
        const p = pts[i];
        const q = pts[(i + 1) % pts.length];
        const parallel = Math.abs((q[0] - p[0]) * (b[1] - a[1]) - (q[1] - p[1]) * (b[0] - a[0])) < 1e-9;
        if (!parallel) continue;
        const d = lineDistance(p, a, b);
        if (Math.abs(d - k) < Math.abs(best - k)) best = d;
      }
      worst = Math.max(worst, Math.abs(best - k));
      matched++;
    }
    console.log(`${spec.process.method}: ${matched} nominal edges, cut path offset ${k} mm, worst error ${worst.toExponential(2)} mm`);
    expect(worst).toBeLessThanOrEqual(1e-6);
    // The face line on REFERENCE_NO_CUT: the style edge is exactly h above it.
    const ref = dump.entities.find((e) => e.layer === 'REFERENCE_NO_CUT' && e.type !== 'TEXT')!;
    expect(ref.points!.map((p) => p[1])).toEqual([T, T]);
    expect(Math.max(...ys) - k - T).toBeCloseTo(g.heightMm, 6);
  });
});
