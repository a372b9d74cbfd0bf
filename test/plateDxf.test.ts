import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import DxfParser from 'dxf-parser';
import { describe, expect, it } from 'vitest';
import { parseSpec } from '@umbrafab/geometry';
import { buildFiles } from '@umbrafab/cli';
import { ezdxfDump, type DxfDump } from './helpers/ezdxf.ts';

const cases = [
  { name: 'laser, north, standard time', raw: { site: { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' }, dial: { reads: 'standard' }, hours: { from: '08:00', to: '16:00' } } },
  { name: 'waterjet, south, solar time', raw: { site: { latitude: -33.9, longitude: 18.4, timezone: 'Africa/Johannesburg' }, process: { method: 'waterjet' }, marks: { hour: { width: 1.6 }, half: { width: 1.2 }, quarter: { width: 1 } } } },
  { name: 'router, roman, 2 holes', raw: { site: { latitude: 64.1, longitude: -21.9, timezone: 'Atlantic/Reykjavik' }, process: { method: 'router', kerf: 3.175 }, dial: { numerals: 'roman' }, gnomon: { height: 70, thickness: 6 }, holes: { count: 2, diameter: 8 } } },
  { name: 'laser, pre-compensated', raw: { site: { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' }, cutFiles: { precompensate: true } } },
];

type Built = Awaited<ReturnType<typeof buildFiles>>;

async function writeDxf(raw: object): Promise<{ dump: DxfDump; text: string; built: Built }> {
  const built = await buildFiles(parseSpec(raw));
  const dir = mkdtempSync(join(tmpdir(), 'umbrafab-dxf-'));
  const name = built.files.find((f) => /^plate(-offset-[0-9.]+mm)?\.dxf$/.test(f.name))!.name;
  const file = join(dir, name);
  const text = new TextDecoder().decode(built.files.find((f) => f.name === name)!.bytes);
  writeFileSync(file, text);
  return { dump: ezdxfDump(file), text, built };
}

const readBack = await Promise.all(cases.map((c) => writeDxf(c.raw)));

describe.each(cases.map((c, i) => ({ ...c, i })))('plate.dxf read back by ezdxf: $name', ({ i }) => {
  const { dump, text, built } = readBack[i];
  const spec = built.layout.spec;
  const plate = built.layout.plate;
  const kerf = spec.process.kerf;

  it('passes the ezdxf audit with $INSUNITS = 4 (mm) and every entity at z = 0', () => {
    // Source: ezdxf (Debian python3-ezdxf) recover + audit; $INSUNITS 4 = millimetres per the AutoCAD DXF Reference.
    expect(dump.errors).toEqual([]);
    expect(dump.fixes).toEqual([]);
    expect(dump.insunits).toBe(4);
    for (const e of dump.entities) for (const z of e.z ?? []) expect(z).toBe(0);
    expect(dump.layers).toEqual(expect.arrayContaining(['CUT_PROFILE', 'REFERENCE_NO_CUT']));
    // $MEASUREMENT 1 = metric; $EXTMIN/$EXTMAX enclose every entity (AutoCAD DXF Reference, HEADER section).
    expect(dump.measurement).toBe(1);
    for (const e of dump.entities) {
      for (const [x, y] of e.points ?? (e.center ? [[e.center[0] - e.radius!, e.center[1] - e.radius!], [e.center[0] + e.radius!, e.center[1] + e.radius!]] : [])) {
        expect(x).toBeGreaterThanOrEqual(dump.extmin[0] - 1e-6);
        expect(y).toBeGreaterThanOrEqual(dump.extmin[1] - 1e-6);
        expect(x).toBeLessThanOrEqual(dump.extmax[0] + 1e-6);
        expect(y).toBeLessThanOrEqual(dump.extmax[1] + 1e-6);
      }
    }
  });

  it('keeps the reference layers off and non-plotting, and only cutting and engraving geometry on plotting layers', () => {
    // AutoCAD DXF Reference, LAYER table: group 62 negative = layer off; group 290 = 0 = not plotted. Read by ezdxf.
    for (const l of dump.layerTable.filter((t) => t.name.endsWith('_NO_CUT'))) {
      expect(l.color).toBeLessThan(0);
      expect(l.on).toBe(false);
      expect(l.plot).toBe(0);
    }
    const plotting = new Set(dump.layerTable.filter((t) => t.on && t.plot !== 0).map((t) => t.name));
    for (const e of dump.entities) if (plotting.has(e.layer)) expect(['CUT_PROFILE', 'LINE_SCORE', 'LINE_ETCH_OUTLINE', 'TEXT_ENGRAVE']).toContain(e.layer);
    expect(dump.entities.filter((e) => e.layer === 'REFERENCE_NO_CUT' && e.type === 'LWPOLYLINE').length).toBe(built.layout.marks.length ? 4 : 4);
  });

  it('holds every mark of report.json at plate.substyleX + xMm within 0.001 mm', () => {
    // Waterjet: the marks are etched as outlines; their centre-lines stay on MARK_CENTRE_NO_CUT for checking.
    const etch = false;
    const layer = spec.process.method === 'waterjet' ? 'MARK_CENTRE_NO_CUT' : 'LINE_SCORE';
    const polys = dump.entities.filter((e) => e.layer === layer);
    let worst = 0;
    for (const m of built.layout.marks) {
      if (m.underGnomon) continue; // covered by the fin: not engraved (checked below)
      const x = plate.substyleX + m.xMm;
      const y0 = plate.faceOriginY + m.y0Mm;
      const y1 = plate.faceOriginY + m.y1Mm;
      let best = Infinity;
      for (const p of polys) {
        const xs = p.points!.map((q) => q[0]);
        const ys = p.points!.map((q) => q[1]);
        const cx = (Math.min(...xs) + Math.max(...xs)) / 2;
        const w = Math.max(...xs) - Math.min(...xs);
        const err = Math.max(Math.abs(cx - x), Math.abs(Math.min(...ys) - y0), Math.abs(Math.max(...ys) - y1), etch ? Math.abs(w - m.widthMm) : Math.abs(w));
        best = Math.min(best, err);
      }
      worst = Math.max(worst, best);
    }
    // Lines under the gnomon's footprint are the only ones not drawn.
    const drawn = built.layout.marks.filter((m) => !m.underGnomon);
    // One centre-line per engraved mark (on LINE_SCORE also the date lines and curves, if any).
    expect(polys.filter((p) => p.points!.length === 2).length).toBeGreaterThanOrEqual(drawn.length);
    for (const m of built.layout.marks.filter((k) => k.underGnomon)) expect(Math.abs(m.xMm) - m.widthMm / 2).toBeLessThan(spec.gnomon.thickness / 2);
    console.log(`worst mark position error vs report.json (${spec.process.method}): ${worst.toExponential(2)} mm over ${built.layout.marks.length} marks`);
    expect(worst).toBeLessThanOrEqual(0.001);
  });

  it('draws the cut profile at true size by default, and offset by exactly kerf/2 only when asked', () => {
    // Nominal = the part as it must come out; kerf compensation (common practice, docs/design.md §5) only with cutFiles.precompensate.
    const pre = spec.cutFiles.precompensate;
    const k = pre ? kerf / 2 : 0;
    expect(built.report.plate).toMatchObject({ cut: { drawn: pre ? 'precompensated' : 'nominal', offsetMm: k } });
    expect(built.files.some((f) => f.name === 'plate.dxf')).toBe(!pre);
    const cut = dump.entities.filter((e) => e.layer === 'CUT_PROFILE');
    const polys = cut.filter((e) => e.type === 'LWPOLYLINE');
    const bbox = (e: (typeof polys)[number]) => {
      const xs = e.points!.map((q) => q[0]);
      const ys = e.points!.map((q) => q[1]);
      return { w: Math.max(...xs) - Math.min(...xs), h: Math.max(...ys) - Math.min(...ys), x0: Math.min(...xs), y0: Math.min(...ys) };
    };
    const sorted = [...polys].sort((a, b) => bbox(b).w - bbox(a).w);
    const outer = bbox(sorted[0]);
    expect(sorted[0].closed).toBe(true);
    expect(Math.abs(outer.w - plate.widthMm - 2 * k)).toBeLessThan(1e-6);
    expect(Math.abs(outer.h - plate.lengthMm - 2 * k)).toBeLessThan(1e-6);
    expect(Math.abs(outer.x0 + k)).toBeLessThan(1e-6);
    expect(Math.abs(outer.y0 + k)).toBeLessThan(1e-6);
    const slots = sorted.slice(1);
    expect(slots).toHaveLength(plate.slots.length);
    for (const s of slots) {
      expect(s.closed).toBe(true);
      // The slot exactly; a router's slot has its inside-corner relief (checked with shapely in routerRelief.test.ts):
      // dog-bones reach rho·(1 − 1/√2) past each wall, round ends (W/2) past each end.
      const relief = (built.report.plate as unknown as { cut: { slotRelief: string[] } }).cut.slotRelief[0];
      const rho = kerf / 2 + 0.05;
      const dw = relief === 'dogbone' ? 2 * rho * (1 - Math.SQRT1_2) : 0;
      const dh = relief === 'dogbone' ? dw : relief === 'round-ends' ? plate.slots[0].widthMm : 0;
      expect(Math.abs(plate.slots[0].widthMm - 2 * k + dw - bbox(s).w)).toBeLessThan(0.01);
      expect(Math.abs(plate.slots[0].heightMm - 2 * k + dh - bbox(s).h)).toBeLessThan(0.01);
      if (relief === 'none') expect(Math.abs(plate.slots[0].widthMm - 2 * k - bbox(s).w)).toBeLessThan(1e-6);
    }
    const circles = cut.filter((e) => e.type === 'CIRCLE');
    expect(circles).toHaveLength(plate.holes.length);
    for (const c of circles) expect(Math.abs(2 * c.radius! - (spec.holes.diameter - 2 * k))).toBeLessThan(1e-6);
    // The note on the non-plotting layer says which it is.
    const notes = dump.entities.filter((e) => e.type === 'TEXT').map((e) => e.text ?? '');
    expect(dump.entities.filter((e) => e.type === 'TEXT').every((e) => e.layer === 'REFERENCE_NO_CUT')).toBe(true);
    expect(notes.some((t) => (pre ? /PRE-COMPENSATED cut profiles, offset 0\.075 mm/ : /TRUE SIZE \(nominal\)/).test(t))).toBe(true);
  });

  it('opens in a second reader (npm dxf-parser) with the same entities', () => {
    const parsed = new DxfParser().parseSync(text);
    expect(parsed?.entities.length).toBe(dump.entities.length);
    expect(parsed?.header?.$INSUNITS).toBe(4);
  });
});

describe('plate.dxf determinism', () => {
  it('is byte-identical on a second build in the same process', async () => {
    const a = (await writeDxf(cases[0].raw)).text;
    const b = (await writeDxf(cases[0].raw)).text;
    expect(a).toBe(b);
  });
});
