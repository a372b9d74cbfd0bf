import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { parseSpec } from '@umbrafab/geometry';
import { buildAnyFiles, type PlanarReport } from '@umbrafab/cli';
import { ezdxfDump } from './helpers/ezdxf.ts';
import { sheetCheck } from './helpers/sheetCheck.ts';

const ROOT = resolve(import.meta.dirname, '..');
const FIXTURES = ['garden-horizontal', 'wall-declining', 'wall-reclining', 'meridian-east', 'equatorial', 'equatorial-lower'];
const specOf = (name: string, patch: Record<string, unknown> = {}) => parseSpec({ ...parse(readFileSync(join(ROOT, `fixtures/planar/${name}.yaml`), 'utf8')), ...patch });


describe('sheet.dxf of every planar face: plate, sheet fin, wall mount and equatorial stand nested on the stock', () => {
  for (const name of FIXTURES) {
    it(`${name}: ezdxf audit clean, every part once, none overlapping, kerf plus margin apart, all inside the sheet (shapely)`, async () => {
      const spec = specOf(name);
      const built = await buildAnyFiles(spec);
      const names = built.files.map((f) => f.name);
      const sheet = (built.report as PlanarReport).sheet!;
      const dir = mkdtempSync(join(tmpdir(), 'umbrafab-psheet-'));
      const file = join(dir, sheet.file);
      writeFileSync(file, built.files.find((f) => f.name === sheet.file)!.bytes);
      // The parts on the sheet are the parts cut in their own files (plate.dxf, gnomon.dxf, mount.dxf).
      // A fin thicker than the plate is other stock (the wall dial's 4 mm fin on a 3 mm plate).
      const cut = ['plate', 'gnomon', 'mount'].filter((p) => names.includes(`${p}.dxf`));
      const report = built.report as { gnomon: { thicknessMm: number }; plate: { thicknessMm: number } };
      const other = report.gnomon.thicknessMm === report.plate.thicknessMm ? [] : ['gnomon'];
      // An equatorial stand cut from sheet (stand.dxf) joins them, each part as many times as stand.dxf lists it.
      const stand = names.includes('stand.dxf') ? (built.report as PlanarReport).stand!.parts.flatMap((p) => Array<string>(p.quantity).fill(p.name)) : [];
      const own = [...cut.filter((p) => !other.includes(p)), ...stand];
      expect(sheet.pieces.map((p) => p.part).sort()).toEqual(own.sort());
      expect(sheet.otherStock).toEqual(other.filter((p) => cut.includes(p)));
      // ezdxf (Debian python3-ezdxf) reads and audits it.
      const dump = ezdxfDump(file);
      expect(dump.errors).toEqual([]);
      expect(dump.insunits).toBe(4);
      const texts = dump.entities.filter((e) => e.type === 'TEXT');
      for (const p of sheet.pieces) expect(texts.some((t) => (t.text ?? '').startsWith(`${p.part} `))).toBe(true);
      expect(texts.every((e) => e.layer === 'REFERENCE_NO_CUT')).toBe(true);
      // Source: shapely (Debian python3-shapely): the parts' cut regions read back from sheet.dxf.
      const out = sheetCheck(file, sheet.widthMm, sheet.lengthMm);
      console.log(`${name} ${sheet.file}: ${out.parts} parts (${own.join(', ')}) on ${sheet.widthMm.toFixed(1)} x ${sheet.lengthMm.toFixed(1)} mm, closest ${out.minDistanceMm?.toFixed(3) ?? '-'} mm apart (gap ${sheet.gapMm} mm), ${out.edgeMm.toFixed(3)} mm from the edge`);
      expect(out.parts).toBe(sheet.pieces.length);
      expect(out.valid).toBe(true);
      expect(out.maxOverlapMm2).toBe(0);
      if (out.parts > 1) expect(out.minDistanceMm).toBeGreaterThanOrEqual(sheet.gapMm - 1e-6);
      expect(sheet.gapMm).toBeCloseTo(spec.process.kerf + spec.cutFiles.sheetMargin, 9);
      expect(out.outsideMm2).toBe(0);
      expect(out.edgeMm).toBeGreaterThanOrEqual(sheet.edgeMm - 1e-6);
    });
  }

  it('a printed face writes no sheet.dxf; a too narrow sheet is refused naming cutFiles.sheetWidth', async () => {
    const printed = await buildAnyFiles(specOf('garden-horizontal', { process: { method: 'print' } }));
    expect(printed.files.map((f) => f.name)).not.toContain('sheet.dxf');
    expect((printed.report as { sheet?: unknown }).sheet).toBeUndefined();
    await expect(buildAnyFiles(specOf('wall-declining', { cutFiles: { sheetWidth: 100 } }))).rejects.toThrow(/cutFiles\.sheetWidth: got 100; allowed: at least [0-9.]+ mm/);
  });
});
