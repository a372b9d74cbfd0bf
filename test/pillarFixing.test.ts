import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { METRIC_SIZES, parseSpec } from '@umbrafab/geometry';
import { buildAnyFiles, parseSpecText, type PlanarReport } from '@umbrafab/cli';
import { ezdxfDump } from './helpers/ezdxf.ts';

/**
 * A horizontal face on its pillar: the studs of install.md's fastener table
 * are sized from plate.dxf's own holes as ezdxf reads them (the largest
 * metric size whose ISO 273 medium clearance hole the plate's hole takes;
 * sizes recalled from memory, as in metricFasteners.ts), one per hole, and
 * long enough for the resin embedment, the levelling gap, the plate, a
 * washer, a nut and two threads beyond (common practice for studs set in
 * resin with levelling nuts), rounded to the next ISO 888 length (memory).
 */

const ROOT = resolve(import.meta.dirname, '..');
const dir = mkdtempSync(join(tmpdir(), 'umbrafab-pillar-'));
const garden = () => parseSpecText(readFileSync(join(ROOT, 'fixtures/planar/garden-horizontal.yaml'), 'utf8')) as Record<string, unknown>;
const text = (files: readonly { name: string; bytes: Uint8Array }[], name: string) => new TextDecoder().decode(files.find((f) => f.name === name)!.bytes);

describe('pillar fixing of a horizontal face', () => {
  for (const count of [4, 2]) {
    it(`${count} holes: one stud per plate.dxf hole, sized from the hole, long enough; install.md steps name them`, async () => {
      const spec = parseSpec({ ...garden(), holes: { count }, pictures: { write: false } });
      const result = await buildAnyFiles(spec);
      const dxf = join(dir, `plate-${count}.dxf`);
      writeFileSync(dxf, result.files.find((f) => f.name === 'plate.dxf')!.bytes);
      const holes = ezdxfDump(dxf).entities.filter((e) => e.type === 'CIRCLE' && e.layer === 'CUT_PROFILE');
      expect(holes.length).toBe(count);
      const holeDia = 2 * holes[0].radius!;
      const size = [...METRIC_SIZES].reverse().find((s) => s.clearanceHoleMm <= holeDia + 1e-9)!;
      const md = text(result.files, 'install.md');
      const row = md.split('\n').find((l) => l.startsWith('| plate to pillar |'));
      expect(row, 'a "plate to pillar" row in the fastener table').toBeDefined();
      const [, , , sz, len, n] = row!.split('|').map((c) => c.trim());
      expect(sz).toBe(size.name);
      expect(Number(n)).toBe(count);
      const plateT = (result.report as PlanarReport).plate.thicknessMm;
      const embed = Number(/(\d+) mm deep as a first figure/.exec(md)![1]);
      const gap = Number(/to about (\d+) mm above the pillar top/.exec(md)![1]);
      const need = embed + gap + plateT + size.washerMm + size.nutHeightMm + 2 * size.pitchMm;
      expect(Number(len)).toBeGreaterThanOrEqual(need);
      expect(Number(len) - need).toBeLessThan(10);
      expect(md).toContain(`${count} ${size.name} × ${len} mm studs`);
      const pillar = (result.report as PlanarReport).pillar!;
      expect([pillar.size, pillar.studLengthMm, pillar.studCount, pillar.embedMm, pillar.levellingGapMm]).toEqual([size.name, Number(len), count, embed, gap]);
      for (const h of holes) expect(pillar.holesMm.some(([x, y]) => Math.hypot(x - h.center![0], y - h.center![1]) < 1e-6), `report.json pillar hole at ${h.center}`).toBe(true);
      expect(md).toContain(`mark the ${count} hole centres through its Ø ${holeDia.toFixed(1)} mm holes`);
      // two washers per stud, a levelling nut under and a lock nut over the plate
      expect(md).toMatch(new RegExp(`\\| under and over the plate \\| plain washer ISO 7089, stainless A4 \\| ${size.name} \\| – \\| ${2 * count} \\|`));
      expect(md.indexOf('Fix the fin')).toBeLessThan(md.indexOf('Mark the true meridian'));
    });
  }

  it('no holes: no fastener table, the plate is bedded on the pillar', async () => {
    const result = await buildAnyFiles(parseSpec({ ...garden(), holes: { count: 0 }, pictures: { write: false } }));
    const md = text(result.files, 'install.md');
    expect(md).not.toContain('## Fasteners');
    expect((result.report as PlanarReport).pillar).toBeUndefined();
    expect(md).toMatch(/bed it level in both directions/);
  });
});
