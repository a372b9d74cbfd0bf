import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { fitPixelBudget, MAX_PICTURE_PIXELS } from '@umbrafab/fabricate';

const ROOT = resolve(import.meta.dirname, '..');
const work = mkdtempSync(join(tmpdir(), 'umbrafab-mem-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

describe('picture memory is bounded', () => {
  it('fitPixelBudget: keeps a resolution that fits, lowers one that does not to the largest that does (0.01 px/mm steps)', () => {
    expect(fitPixelBudget(237, 147, 4)).toEqual({ pxPerMm: 4, lowered: false });
    const big = fitPixelBudget(3010, 3018, 20);
    expect(big.lowered).toBe(true);
    const px = (ppm: number) => Math.round(3010 * ppm) * Math.round(3018 * ppm);
    expect(px(big.pxPerMm)).toBeLessThanOrEqual(MAX_PICTURE_PIXELS);
    expect(px(big.pxPerMm + 0.01)).toBeGreaterThan(MAX_PICTURE_PIXELS);
    expect(fitPixelBudget(100, 100, 4, { maxPixels: 100 })).toEqual({ pxPerMm: 0.1, lowered: true });
  });

  it('a 3000 x 3000 mm plate at 20 px/mm builds with peak RSS at most 512 MiB (child maxRSS), the PNGs within the budget and a note saying so', () => {
    const demo = readFileSync(join(ROOT, 'fixtures/demo.yaml'), 'utf8');
    const spec = join(work, 'big.yaml');
    writeFileSync(spec, demo.replace(/^plate:\n/m, 'plate:\n  width: 3000\n  length: 3000\n') + 'pictures:\n  pxPerMm: 20\n');
    const out = join(work, 'out');
    const child = execFileSync(process.execPath, ['--import', 'tsx', join(ROOT, 'test/helpers/cliChild.ts'), 'build', spec, '--out', out], { cwd: ROOT, encoding: 'utf8', timeout: 280_000, stdio: ['ignore', 'pipe', 'pipe'] });
    const r = JSON.parse(child.trim().split('\n').pop()!) as { code: number; ms: number; maxRssKiB: number };
    console.log(`3000 x 3000 mm at 20 px/mm: built in ${(r.ms / 1000).toFixed(1)} s, peak RSS ${(r.maxRssKiB / 1024).toFixed(0)} MiB`);
    expect(r.code).toBe(0);
    expect(r.maxRssKiB).toBeLessThanOrEqual(512 * 1024);
    const report = JSON.parse(readFileSync(join(out, 'report.json'), 'utf8'));
    expect(report.pictures.pxPerMm).toBe(20);
    expect(report.pictures.maxPixels).toBe(MAX_PICTURE_PIXELS);
    expect(report.pictures.note).toMatch(/^pictures: preview\.png at [\d.]+ px\/mm and assembly\.png at [\d.]+ px\/mm instead of pictures\.pxPerMm 20/);
    expect(report.notes).toContain(report.pictures.note);
    for (const name of ['preview.png', 'assembly.png']) {
      // The size from the file itself: the IHDR chunk's width and height (W3C PNG, 2nd ed., §11.2.2), after the signature.
      const b = readFileSync(join(out, name));
      expect(b.subarray(12, 16).toString('latin1')).toBe('IHDR');
      const png = { width: b.readUInt32BE(16), height: b.readUInt32BE(20) };
      expect(png.width * png.height, name).toBeLessThanOrEqual(MAX_PICTURE_PIXELS);
      expect(png.width * png.height, name).toBeGreaterThan(MAX_PICTURE_PIXELS * 0.95);
      const key = name === 'preview.png' ? 'preview' : 'assembly';
      expect(report.pictures[key].widthPx).toBe(png.width);
      expect(report.pictures[key].pxPerMm).toBeLessThan(20);
    }
  }, 300_000);
});
