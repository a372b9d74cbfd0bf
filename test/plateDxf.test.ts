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
];

type Built = Awaited<ReturnType<typeof buildFiles>>;

async function writeDxf(raw: object): Promise<{ dump: DxfDump; text: string; built: Built }> {
  const built = await buildFiles(parseSpec(raw));
  const dir = mkdtempSync(join(tmpdir(), 'umbrafab-dxf-'));
  const file = join(dir, 'plate.dxf');
  const text = new TextDecoder().decode(built.files.find((f) => f.name === 'plate.dxf')!.bytes);
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
    expect(dump.layers).toEqual(expect.arrayContaining(['CUT_PROFILE', 'TEXT_ENGRAVE', 'REFERENCE_NO_CUT']));
  });

  it('holds every mark of report.json at plate.substyleX + xMm within 0.001 mm', () => {
    const etch = spec.process.method === 'waterjet';
    const layer = etch ? 'LINE_ETCH_OUTLINE' : 'LINE_SCORE';
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
    // One entity per engraved mark: a centre-line vector, or one closed outline (waterjet).
    expect(polys.length).toBe(drawn.length);
    for (const m of built.layout.marks.filter((k) => k.underGnomon)) expect(Math.abs(m.xMm) - m.widthMm / 2).toBeLessThan(spec.gnomon.thickness / 2);
    console.log(`worst mark position error vs report.json (${spec.process.method}): ${worst.toExponential(2)} mm over ${built.layout.marks.length} marks`);
    expect(worst).toBeLessThanOrEqual(0.001);
  });

  it('grows the outer profile and shrinks slots and holes by kerf/2', () => {
    // Kerf compensation, common practice (docs/design.md §5).
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
    expect(outer.w - plate.widthMm).toBeCloseTo(kerf, 6);
    expect(outer.h - plate.lengthMm).toBeCloseTo(kerf, 6);
    expect(outer.x0).toBeCloseTo(-kerf / 2, 6);
    const slots = sorted.slice(1);
    expect(slots).toHaveLength(plate.slots.length);
    for (const s of slots) {
      expect(s.closed).toBe(true);
      expect(plate.slots[0].widthMm - bbox(s).w).toBeCloseTo(kerf, 6);
      expect(plate.slots[0].heightMm - bbox(s).h).toBeCloseTo(kerf, 6);
    }
    const circles = cut.filter((e) => e.type === 'CIRCLE');
    expect(circles).toHaveLength(plate.holes.length);
    for (const c of circles) expect(plate.holes[0].radiusMm - c.radius!).toBeCloseTo(kerf / 2, 6);
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
