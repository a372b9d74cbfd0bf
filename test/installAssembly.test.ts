import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { MATERIAL_DENSITIES, flatStand, parseSpec, sheetPartAreaMm2, type InstallSheet } from '@umbrafab/geometry';
import { buildFiles, parseSpecText, readSpecFile } from '@umbrafab/cli';

/**
 * The assembly section of install.md: steps in order, wording right in both
 * hemispheres (docs/design.md §4: the plate rises toward the elevated pole, true
 * south in the southern hemisphere), the weights from volume × density
 * (the density table of parts/materials.ts) and the fastener table.
 */

const ROOT = resolve(import.meta.dirname, '..');
const text = (r: Awaited<ReturnType<typeof buildFiles>>, name: string) => new TextDecoder().decode(r.files.find((f) => f.name === name)!.bytes);

const south = await buildFiles(readSpecFile(join(ROOT, 'fixtures/golden-specs/south-waterjet.yaml')));
const north = await buildFiles(readSpecFile(join(ROOT, 'fixtures/demo.yaml')));

describe('install.md assembly section', () => {
  it('a southern site: the raised end points south, aligned to true south, never "face true north"', () => {
    const md = text(south, 'install.md');
    expect(south.layout.hemisphere).toBe('south');
    expect(md).toMatch(/The raised end \(the end away from the numerals\) points to the geographic south/);
    expect(md).toMatch(/\*\*Align to true south\.\*\* Turn the whole stand until the style lies in the geographic meridian with the raised end toward true south/);
    expect(md).toMatch(/## 2\. True south/);
    expect(md).toMatch(/turn the dial until its raised end points [\d.]+° (east|west) of the compass's south, at true south/);
    expect(md).not.toMatch(/face true north/);
    expect(md).toMatch(/tall end over the same foot \(that end goes toward the south\)/);
  });

  it('a northern site: the raised end points north, turned from the compass to true north', () => {
    const md = text(north, 'install.md');
    expect(md).toMatch(/points to the geographic north/);
    expect(md).toMatch(/\*\*Align to true north\.\*\*/);
    expect(md).toMatch(/to face true north/);
    expect(md).not.toMatch(/true south/);
  });

  it('lists the steps in order: gnomon, square, stand, plate, level, align, anchor and tighten', () => {
    const md = text(north, 'install.md');
    const titles = [...md.matchAll(/^\d+\. \*\*(.+?)\.\*\*/gm)].map((m) => m[1]);
    expect(titles).toEqual(['Fix the gnomon', 'Square it', 'Assemble the stand', 'Fix the plate to the stand', 'Level', 'Align to true north', 'Anchor and tighten']);
    // the laser demo's 3 mm aluminium: welded or bonded tabs; the 45° check at the gnomon height
    expect(md).toMatch(/TIG- or MIG-weld the tab ends/);
    expect(md).toMatch(/50\.0 mm above the face and 50\.0 mm from the line/);
  });

  it('weights: each part is volume × density (within 0.1 %), the total their sum; the fastener table as in report.json', () => {
    const sheet = (north.report as unknown as { install: InstallSheet }).install;
    const stand = flatStand(north.layout);
    const rho = MATERIAL_DENSITIES.aluminium.densityGPerCm3 / 1000; // g/mm³
    for (const part of stand.parts) {
      const w = sheet.assembly.weights.parts.find((x) => x.part === part.name)!;
      const expected = (sheetPartAreaMm2(part) * part.thicknessMm * rho) / 1000;
      expect(Math.abs(w.massKgEach - expected) / expected).toBeLessThan(0.001);
      expect(w.quantity).toBe(part.quantity ?? 1);
    }
    const sum = sheet.assembly.weights.parts.reduce((s, w) => s + w.massKgEach * w.quantity, 0);
    expect(sheet.assembly.weights.totalKg).toBeCloseTo(sum, 9);
    const md = text(north, 'install.md');
    expect(md).toContain(`**total to lift and ship** | | | | **${sheet.assembly.weights.totalKg.toFixed(2)}**`);
    const screws = (north.report as unknown as { fasteners: { use: string; size: string; lengthMm: number; count: number }[] }).fasteners[0];
    expect(screws).toMatchObject({ use: 'plate to seat rails', size: 'M5', count: 4 });
    // 3 mm plate + 3 mm rail + 1 mm washer + 5 mm nut + 2 × 0.8 mm threads = 13.6 mm → 16 mm (ISO 888 preferred lengths, memory)
    expect(screws.lengthMm).toBe(16);
    expect(md).toMatch(/\| plate to seat rails \| pan-head machine screw ISO 7045, stainless A4 \| M5 \| 16 \| 4 \| none \|/);
  });

  it('a printed dial: the wedge carries the plate, its ground screws in the table', async () => {
    const raw = parseSpecText(readFileSync(join(ROOT, 'fixtures/specs/parts-print.yaml'), 'utf8'));
    const r = await buildFiles(parseSpec(raw));
    const md = text(r, 'install.md');
    expect(md).toMatch(/## Parts and weights \(on its printed wedge\)/);
    expect(md).toMatch(/\*\*Set out the wedge\.\*\*/);
  });
});
