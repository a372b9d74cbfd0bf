import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import DxfParser from 'dxf-parser';
import { describe, expect, it } from 'vitest';
import { parseSpec } from '@umbrafab/geometry';
import { buildFiles } from '@umbrafab/cli';
import { ezdxfDump } from './helpers/ezdxf.ts';

const site = { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' };
const dir = mkdtempSync(join(tmpdir(), 'umbrafab-formats-'));

describe.each([
  { name: 'laser', raw: { site, cutFiles: { r12: true, svg: true } }, base: ['plate', 'gnomon'] },
  { name: 'router, pre-compensated', raw: { site, process: { method: 'router' }, cutFiles: { r12: true, svg: true, precompensate: true } }, base: ['plate-offset-1.5875mm', 'gnomon-offset-1.5875mm'] },
  { name: 'waterjet outlines', raw: { site, process: { method: 'waterjet' }, cutFiles: { r12: true, svg: true } }, base: ['plate', 'gnomon'] },
])('cut-file copies: $name', async ({ raw, base }) => {
  const built = await buildFiles(parseSpec(raw));
  const text = (name: string) => new TextDecoder().decode(built.files.find((f) => f.name === name)!.bytes);

  it.each(base)('%s-r12.dxf is DXF R12 with only LINE, ARC and POLYLINE, clean in ezdxf, the same cut as the AC1021 file', (b) => {
    const file = join(dir, `${b}-r12.dxf`);
    writeFileSync(file, text(`${b}-r12.dxf`));
    // Source: ezdxf (Debian python3-ezdxf) reads R12 (AC1009) and audits it; entity types per the R12 DXF Reference.
    const r12 = ezdxfDump(file);
    expect(r12.version).toBe('AC1009');
    expect(r12.errors).toEqual([]);
    expect(r12.insunits).toBe(4);
    expect(r12.measurement).toBe(1);
    expect(new Set(r12.entities.map((e) => e.type)).size).toBeGreaterThan(0);
    for (const e of r12.entities) expect(['LINE', 'ARC', 'POLYLINE']).toContain(e.type);
    for (const l of r12.layerTable.filter((t) => t.name.endsWith('_NO_CUT'))) expect(l.on).toBe(false);
    const full = join(dir, `${b}.dxf`);
    writeFileSync(full, text(`${b}.dxf`));
    const ac = ezdxfDump(full);
    const cutR12 = r12.entities.filter((e) => e.layer === 'CUT_PROFILE');
    const cutAc = ac.entities.filter((e) => e.layer === 'CUT_PROFILE');
    expect(cutR12.length).toBe(cutAc.length);
    // A hole is a closed POLYLINE of two half circles (bulge 1): its diameter is the two vertices' distance.
    const holes = cutR12.filter((e) => e.points!.length === 2 && e.points!.every((p) => p[2] === 1));
    const circles = cutAc.filter((e) => e.type === 'CIRCLE');
    expect(holes.length).toBe(circles.length);
    for (const [i, h] of holes.entries()) expect(Math.abs(Math.hypot(h.points![1][0] - h.points![0][0], h.points![1][1] - h.points![0][1]) - 2 * circles[i].radius!)).toBeLessThan(1e-6);
    expect(r12.comments.join(' ')).toMatch(b.includes('offset') ? /PRE-COMPENSATED/ : /TRUE SIZE/);
    // Second reader: the npm dxf-parser.
    expect(new DxfParser().parseSync(text(`${b}-r12.dxf`))?.entities.length).toBe(r12.entities.length);
  });

  it.each(base)('%s-cut.svg is true scale in mm, one group per operation, no reference geometry', (b) => {
    // SVG 1.1 (W3C): width/height with the "mm" unit and a viewBox of the same numbers = 1 user unit per mm.
    const svg = text(`${b}-cut.svg`);
    const m = /<svg [^>]*width="([0-9.]+)mm" height="([0-9.]+)mm" viewBox="0 0 ([0-9.]+) ([0-9.]+)"/.exec(svg)!;
    expect(m).not.toBeNull();
    expect(m[1]).toBe(m[3]);
    expect(m[2]).toBe(m[4]);
    const groups = [...svg.matchAll(/<g id="([A-Z_]+)"/g)].map((g) => g[1]);
    expect(groups).toContain('CUT_PROFILE');
    expect(new Set(groups).size).toBe(groups.length);
    for (const g of groups) expect(g.endsWith('_NO_CUT')).toBe(false);
    const dims = b.startsWith('plate') ? built.layout.plate : null;
    const pre = b.includes('offset') ? built.layout.spec.process.kerf : 0;
    if (dims) {
      expect(Math.abs(Number(m[1]) - dims.widthMm - pre)).toBeLessThan(1e-3);
      expect(Math.abs(Number(m[2]) - dims.lengthMm - pre)).toBeLessThan(1e-3);
    }
  });
});
