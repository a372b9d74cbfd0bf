import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { layoutDial, parseSpec, plateDrawing, sheetParts } from '@umbrafab/geometry';
import { buildFiles } from '@umbrafab/cli';
import { ezdxfDump } from './helpers/ezdxf.ts';

const site = { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' };
const cases = [
  { name: 'router 3.175 mm tool, 3 mm sheet (narrow slots: round ends)', raw: { site, process: { method: 'router' } }, relief: 'round-ends' },
  { name: 'router 3.175 mm tool, 6 mm sheet (dog-bones)', raw: { site, process: { method: 'router' }, plate: { thickness: 6 } }, relief: 'dogbone' },
  { name: 'router 3.175 mm tool, 3 mm sheet, a nodus notch (round)', raw: { site, process: { method: 'router' }, gnomon: { nodus: true } }, relief: 'round-ends' },
  { name: 'router 6 mm tool, 10 mm sheet, 3 tabs', raw: { site, process: { method: 'router', kerf: 6 }, plate: { thickness: 10 }, gnomon: { height: 80, tabs: 3, tabLength: 20, overhang: 12 }, holes: { diameter: 8 } }, relief: 'dogbone' },
];

const dir = mkdtempSync(join(tmpdir(), 'umbrafab-relief-'));

describe.each(cases)('inside-corner relief: $name', ({ raw, relief }) => {
  it('lets a round tool of the router radius cut the whole nominal tab inside the relieved slot, and leaves no fillet at the tab roots (shapely)', async () => {
    const built = await buildFiles(parseSpec(raw));
    const layout = built.layout;
    const r = layout.spec.process.kerf / 2;
    writeFileSync(join(dir, 'plate.dxf'), built.files.find((f) => f.name === 'plate.dxf')!.bytes);
    writeFileSync(join(dir, 'gnomon.dxf'), built.files.find((f) => f.name === 'gnomon.dxf')!.bytes);
    // The relieved outlines as written to plate.dxf and gnomon.dxf, read back by ezdxf (Debian python3-ezdxf).
    const plate = ezdxfDump(join(dir, 'plate.dxf'));
    const gnomon = ezdxfDump(join(dir, 'gnomon.dxf'));
    expect(plate.errors).toEqual([]);
    expect(gnomon.errors).toEqual([]);
    const polys = plate.entities.filter((e) => e.layer === 'CUT_PROFILE' && e.type === 'LWPOLYLINE').map((e) => e.points!.map((p) => [p[0], p[1]]));
    const slots = polys.filter((p) => Math.max(...p.map((q) => q[0])) - Math.min(...p.map((q) => q[0])) < 30);
    expect(slots.length).toBe(layout.plate.slots.length);
    const c = layout.spec.process.clearance;
    // The nominal tab (the fin's thickness × tab length) centred in its slot, as the fin seats.
    const tabs = layout.plate.slots.map((s) => {
      const w = s.widthMm / 2 - c;
      const h = s.heightMm / 2 - c;
      return [[s.cx - w, s.cy - h], [s.cx + w, s.cy - h], [s.cx + w, s.cy + h], [s.cx - w, s.cy + h]];
    });
    const ordered = layout.plate.slots.map((s) => slots.find((p) => Math.abs(p.reduce((m, q) => m + q[1], 0) / p.length - s.cy) < 2)!);
    const fin = gnomon.entities.find((e) => e.layer === 'CUT_PROFILE')!.points!.map((p) => [p[0], p[1]]);
    const nominalParts = sheetParts(layoutDial(parseSpec(raw)), plateDrawing(layoutDial(parseSpec(raw))), { reliefToolRadiusMm: 0 });
    const finNominal = nominalParts.find((p) => p.name === 'gnomon')!.outer.points;
    const input = join(dir, 'relief.json');
    writeFileSync(input, JSON.stringify({ r, slots: ordered, tabs, fin, finNominal }));
    const out = JSON.parse(execFileSync('/usr/bin/python3', [join(import.meta.dirname, 'helpers/relief_check.py'), input], { encoding: 'utf8' })) as {
      tabOutside: number[];
      slotValid: boolean[];
      finValid: boolean;
      finLeft: number;
      finLeftNominal: number;
    };
    expect((built.report.plate as unknown as { cut: { slotRelief: string[] } }).cut.slotRelief).toEqual(layout.plate.slots.map(() => relief));
    console.log(`relief ${relief}, r = ${r} mm: tab area outside the tool's reach ${Math.max(...out.tabOutside).toExponential(2)} mm²; material left at the tab roots ${out.finLeft.toExponential(2)} mm² (without relief ${out.finLeftNominal.toFixed(3)} mm²)`);
    expect(out.slotValid.every(Boolean)).toBe(true);
    expect(out.finValid).toBe(true);
    for (const a of out.tabOutside) expect(a).toBeLessThan(1e-6);
    // Without relief the tool leaves a fillet of (1 − π/4)·r² at each tab root (circle geometry, common practice).
    expect(out.finLeftNominal).toBeGreaterThan(0.9 * 2 * layout.gnomon.tabs.length * (1 - Math.PI / 4) * r * r);
    expect(out.finLeft).toBeLessThan(1e-3);
  });
});

describe('the nodus notch for a round tool', () => {
  it('is a half-circle of radius r + 0.05 mm centred on the middle of the V\'s opening, the V inside it, nothing else removed (ezdxf)', async () => {
    const raw = { site, process: { method: 'router' }, gnomon: { nodus: true } };
    const built = await buildFiles(parseSpec(raw));
    writeFileSync(join(dir, 'gnomon-nodus.dxf'), built.files.find((f) => f.name === 'gnomon.dxf')!.bytes);
    const fin = ezdxfDump(join(dir, 'gnomon-nodus.dxf')).entities.find((e) => e.layer === 'CUT_PROFILE')!.points!.map((p) => [p[0], p[1]] as const);
    const nominal = sheetParts(layoutDial(parseSpec(raw)), plateDrawing(layoutDial(parseSpec(raw))), { reliefToolRadiusMm: 0 }).find((p) => p.name === 'gnomon')!.outer.points;
    const top = Math.max(...nominal.map((p) => p[1]));
    // The nominal V: the three points of the outline below the style edge between two style-edge points.
    const apexIndex = nominal.findIndex((p, i) => p[1] < top - 1e-9 && nominal[i - 1]?.[1] === top && nominal[i + 1]?.[1] === top);
    const [a, apex, b] = [nominal[apexIndex - 1], nominal[apexIndex], nominal[apexIndex + 1]];
    const centre = [(a[0] + b[0]) / 2, top];
    const rho = built.layout.spec.process.kerf / 2 + 0.05;
    const R = Math.max(rho, Math.abs(a[0] - b[0]) / 2);
    expect(R).toBeCloseTo(rho, 9); // the 3 mm V is narrower than the 3.175 mm tool
    const inNotch = fin.filter((p) => p[1] < top - 1e-6 && Math.hypot(p[0] - centre[0], p[1] - centre[1]) < R + 0.01);
    expect(inNotch.length).toBeGreaterThan(8);
    for (const p of inNotch) expect(Math.hypot(p[0] - centre[0], p[1] - centre[1])).toBeCloseTo(R, 5);
    // its bottom at R below the style edge, the V's bottom (s/2 deep) inside it
    const depth = top - Math.min(...inNotch.map((p) => p[1]));
    expect(depth).toBeLessThanOrEqual(R + 1e-6);
    expect(depth).toBeGreaterThan(R - 0.005); // chords within the 0.005 mm tolerance of the arc
    expect(top - apex[1]).toBeLessThan(R);
    // everywhere else the outline is the nominal one: every point below the style edge outside the notch is a nominal point
    const elsewhere = fin.filter((p) => !inNotch.includes(p) && p[1] < top - 1e-6);
    for (const p of elsewhere) expect(nominal.some((q) => Math.hypot(q[0] - p[0], q[1] - p[1]) < 1e-6) || p[1] < Math.min(...nominal.map((q) => q[1])) + 10, `${p}`).toBe(true);
  });
});

describe('relief switched off', () => {
  it('cutFiles.relief: off leaves the slots and the fin exactly nominal', async () => {
    const built = await buildFiles(parseSpec({ site, process: { method: 'router' }, cutFiles: { relief: 'off' } }));
    expect((built.report.plate as unknown as { cut: { slotRelief: string[] } }).cut.slotRelief).toEqual(['none', 'none']);
  });
});

describe('a relief that does not fit', () => {
  it('is refused with exit 1 naming the tool and the room at the tab root', async () => {
    await expect(buildFiles(parseSpec({ site, process: { method: 'router', kerf: 6 }, plate: { thickness: 10 }, gnomon: { height: 80, tabs: 3, tabLength: 20 }, holes: { diameter: 8 } }))).rejects.toThrow(/process\.kerf: got 6; allowed: a router tool narrower than 4\.900 mm, so the tab-root reliefs fit/);
  });
});
