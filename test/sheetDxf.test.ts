import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseSpec } from '@umbrafab/geometry';
import { buildFiles, readSpecFile } from '@umbrafab/cli';
import { ezdxfDump } from './helpers/ezdxf.ts';
import { sheetCheck } from './helpers/sheetCheck.ts';

const ROOT = resolve(import.meta.dirname, '..');
const site = { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' };
const dir = mkdtempSync(join(tmpdir(), 'umbrafab-sheet-'));

type SheetReport = { file: string; widthMm: number; lengthMm: number; gapMm: number; edgeMm: number; pieces: { part: string }[]; otherStock: string[] };

describe.each([
  { name: 'demo (laser)', spec: () => readSpecFile(join(ROOT, 'fixtures/demo.yaml')) },
  { name: 'router brass', spec: () => readSpecFile(join(ROOT, 'fixtures/golden-specs/router-brass.yaml')) },
  { name: 'waterjet, fixed 600 mm wide sheet', spec: () => parseSpec({ site, process: { method: 'waterjet' }, cutFiles: { sheetWidth: 600 } }) },
])('sheet.dxf: $name', ({ spec }) => {
  it('lays every part of the plate stock on the sheet, never overlapping, kerf plus margin apart, names on a non-plotting layer (shapely)', async () => {
    const s = spec();
    const built = await buildFiles(s);
    const sheet = (built.report as unknown as { sheet: SheetReport }).sheet;
    const file = join(dir, sheet.file);
    writeFileSync(file, built.files.find((f) => f.name === sheet.file)!.bytes);
    // ezdxf (Debian python3-ezdxf) reads and audits it.
    const dump = ezdxfDump(file);
    expect(dump.errors).toEqual([]);
    const ref = dump.layerTable.find((l) => l.name === 'REFERENCE_NO_CUT')!;
    expect([ref.on, ref.plot]).toEqual([false, 0]);
    const names = dump.entities.filter((e) => e.type === 'TEXT').map((e) => e.text ?? '');
    for (const p of sheet.pieces) expect(names.some((t) => t.startsWith(`${p.part} `))).toBe(true);
    expect(dump.entities.filter((e) => e.type === 'TEXT').every((e) => e.layer === 'REFERENCE_NO_CUT')).toBe(true);
    if (s.cutFiles.sheetWidth !== 'auto') expect(sheet.widthMm).toBe(s.cutFiles.sheetWidth);
    // Source: shapely (Debian python3-shapely): the parts' cut regions from sheet.dxf.
    const out = sheetCheck(file, sheet.widthMm, sheet.lengthMm);
    console.log(`${sheet.file}: ${out.parts} parts on ${sheet.widthMm.toFixed(1)} x ${sheet.lengthMm.toFixed(1)} mm, closest ${out.minDistanceMm.toFixed(3)} mm apart (gap ${sheet.gapMm} mm), ${out.edgeMm.toFixed(3)} mm from the edge`);
    expect(out.parts).toBe(sheet.pieces.length);
    expect(out.valid).toBe(true);
    expect(out.maxOverlapMm2).toBe(0);
    expect(out.minDistanceMm).toBeGreaterThanOrEqual(sheet.gapMm - 1e-6);
    expect(sheet.gapMm).toBeCloseTo(s.process.kerf + s.cutFiles.sheetMargin, 9);
    expect(out.outsideMm2).toBe(0);
    expect(out.edgeMm).toBeGreaterThanOrEqual(sheet.edgeMm - 1e-6);
  });
});

describe('sheet.dxf refusals', () => {
  it('names the sheet width when a part does not fit it', async () => {
    await expect(buildFiles(parseSpec({ site, cutFiles: { sheetWidth: 100 } }))).rejects.toThrow(/cutFiles\.sheetWidth: got 100; allowed: at least [0-9.]+ mm/);
  });
  it('names the sheet length when the parts do not fit it', async () => {
    await expect(buildFiles(parseSpec({ site, cutFiles: { sheetWidth: 600, sheetLength: 150 } }))).rejects.toThrow(/cutFiles\.sheetLength: got 150; allowed: at least [0-9.]+ mm/);
  });
});
