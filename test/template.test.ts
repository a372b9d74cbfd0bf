import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { parse as parseYaml } from 'yaml';
import { describe, expect, it } from 'vitest';
import { layoutDial, parseSpec, plateDrawing } from '@umbrafab/geometry';
import { CALIBRATION_BAR_RGB, TEMPLATE_BORDER_MM, templateTiles, toTemplatePdf } from '@umbrafab/fabricate';
import { expectClose } from './helpers/closeTo.ts';

// pdfjs-dist 6 wants two Node 22 built-ins; Node 20 lacks them (plain equivalents, test-only).
(Promise as any).withResolvers ??= function () {
  let resolve: unknown;
  let reject: unknown;
  const promise = new Promise((a, b) => ((resolve = a), (reject = b)));
  return { promise, resolve, reject };
};
(ArrayBuffer.prototype as any).transferToFixedLength ??= function (this: ArrayBuffer, len?: number) {
  const n = len ?? this.byteLength;
  const out = new ArrayBuffer(n);
  new Uint8Array(out).set(new Uint8Array(this, 0, Math.min(n, this.byteLength)));
  return out;
};

const ROOT = resolve(import.meta.dirname, '..');
const demoRaw = () => parseYaml(readFileSync(join(ROOT, 'fixtures/demo.yaml'), 'utf8')) as Record<string, unknown>;
/** PDF points per mm: 72 pt per inch (ISO 32000-1 §8.3.2.3), 25.4 mm per inch. */
const PT_PER_MM = 72 / 25.4;

async function templateOf(patch: Record<string, unknown>, paper: 'A4' | 'Letter') {
  const spec = parseSpec({ ...demoRaw(), ...patch, template: { paper } });
  const layout = layoutDial(spec);
  const drawing = plateDrawing(layout);
  const pdf = await toTemplatePdf({ drawing, marks: layout.marks, gnomonHeightMm: layout.gnomon.heightMm, gnomonThicknessMm: layout.gnomon.thicknessMm, title: spec.name }, { paper });
  const dir = mkdtempSync(join(tmpdir(), 'umbrafab-template-'));
  const file = join(dir, 'template.pdf');
  writeFileSync(file, pdf);
  return { pdf, file, dir, tiles: templateTiles(drawing, { paper }), layout };
}

/** Every page's size from Debian poppler-utils' pdfinfo, points. */
function pdfinfoSizes(file: string): { pages: number; sizes: [number, number][] } {
  const txt = execFileSync('pdfinfo', ['-l', '999', file], { encoding: 'utf8' });
  const pages = Number(/^Pages:\s+(\d+)/m.exec(txt)![1]);
  const sizes = [...txt.matchAll(/^Page\s+\d+ size:\s+([\d.]+) x ([\d.]+) pts/gm)].map((m) => [Number(m[1]), Number(m[2])] as [number, number]);
  return { pages, sizes };
}

/** Length in PDF points of the calibration bar on page 1, read with pdfjs-dist's operator list and the CTM (ISO 32000-1 §8.4.4). */
async function barLengthPt(pdf: Uint8Array): Promise<{ lengthPt: number; heightPt: number }> {
  const pdfjs = await import('pdfjs-dist/legacy/build/pdf.mjs');
  const doc = await pdfjs.getDocument({ data: new Uint8Array(pdf), useSystemFonts: false, disableFontFace: true, standardFontDataUrl: join(ROOT, 'node_modules/pdfjs-dist/standard_fonts/') }).promise;
  const page = await doc.getPage(1);
  const ops = await page.getOperatorList();
  const O = pdfjs.OPS;
  type M = [number, number, number, number, number, number];
  const mul = (m: M, n: M): M => [m[0] * n[0] + m[1] * n[2], m[0] * n[1] + m[1] * n[3], m[2] * n[0] + m[3] * n[2], m[2] * n[1] + m[3] * n[3], m[4] * n[0] + m[5] * n[2] + n[4], m[4] * n[1] + m[5] * n[3] + n[5]];
  let ctm: M = [1, 0, 0, 1, 0, 0];
  const stack: M[] = [];
  let fill = '';
  const found: { lengthPt: number; heightPt: number }[] = [];
  for (let i = 0; i < ops.fnArray.length; i++) {
    const fn = ops.fnArray[i];
    const args = ops.argsArray[i];
    if (fn === O.save) stack.push(ctm);
    else if (fn === O.restore) ctm = stack.pop() ?? [1, 0, 0, 1, 0, 0];
    else if (fn === O.transform) ctm = mul(args as M, ctm);
    else if (fn === O.setFillRGBColor) fill = String(args[0]);
    else if (fn === O.constructPath && fill === CALIBRATION_BAR_RGB) {
      const mm = args[2] as ArrayLike<number>; // [minX, minY, maxX, maxY] in user space
      const p = (x: number, y: number) => [ctm[0] * x + ctm[2] * y + ctm[4], ctm[1] * x + ctm[3] * y + ctm[5]];
      const a = p(mm[0], mm[1]);
      const b = p(mm[2], mm[3]);
      found.push({ lengthPt: Math.abs(b[0] - a[0]), heightPt: Math.abs(b[1] - a[1]) });
    }
  }
  expect(found.length, 'one calibration bar on the page').toBe(1);
  return found[0];
}

describe('template.pdf read back', () => {
  it('A4: page size 595.28 x 841.89 pt (ISO 216: 210 x 297 mm), every page', async () => {
    const { file, tiles } = await templateOf({}, 'A4');
    const { pages, sizes } = pdfinfoSizes(file);
    expect(pages).toBe(tiles.columns * tiles.rows + 2);
    expect(sizes.length).toBe(pages);
    for (const [w, h] of sizes) {
      const [ew, eh] = tiles.orientation === 'portrait' ? [595.28, 841.89] : [841.89, 595.28];
      expectClose(w, ew, 0.01, 'A4 page width', ' pt');
      expectClose(h, eh, 0.01, 'A4 page height', ' pt');
    }
  });

  it('Letter: page size 612 x 792 pt (ANSI/ASME Y14.1: 8.5 x 11 in)', async () => {
    const { file, tiles } = await templateOf({}, 'Letter');
    for (const [w, h] of pdfinfoSizes(file).sizes) {
      const [ew, eh] = tiles.orientation === 'portrait' ? [612, 792] : [792, 612];
      expectClose(w, ew, 0.01, 'Letter page width', ' pt');
      expectClose(h, eh, 0.01, 'Letter page height', ' pt');
    }
  });

  it('draws the calibration bar exactly 100 mm = 283.465 pt long (pdfjs-dist operator list)', async () => {
    for (const paper of ['A4', 'Letter'] as const) {
      const { pdf } = await templateOf({}, paper);
      const bar = await barLengthPt(pdf);
      expectClose(bar.lengthPt, 100 * PT_PER_MM, 0.001, `${paper} calibration bar`, ' pt');
      expectClose(bar.heightPt, 4 * PT_PER_MM, 0.001, `${paper} bar height`, ' pt');
    }
  });

  it('rasterised at 254 dpi (10 px/mm) by pdftoppm, the bar spans 1000 px (within 1 px)', async () => {
    const { file, dir, tiles } = await templateOf({}, 'A4');
    execFileSync('pdftoppm', ['-r', '254', '-gray', '-f', '1', '-l', '1', file, join(dir, 'p')]);
    const pgm = readFileSync(join(dir, 'p-1.pgm'));
    // PGM (netpbm): "P5\n<w> <h>\n<max>\n" then one byte per pixel.
    const head = /^P5\s+(\d+)\s+(\d+)\s+(\d+)\s/.exec(pgm.subarray(0, 40).toString('latin1'))!;
    const w = Number(head[1]);
    const start = head[0].length;
    // Bar top at page height − margin − footer + 5 mm; sample 0.3 mm below its top edge (inside the solid strip).
    const row = Math.round((tiles.pageHeightMm - 10 - 18 + 5 + 0.3) * 10);
    const dark = (x: number) => pgm[start + row * w + x] < 128;
    let x0 = 0;
    while (x0 < w && !dark(x0)) x0++;
    let x1 = x0;
    while (x1 < w && dark(x1)) x1++;
    expectClose(x1 - x0, 1000, 1, 'bar length at 10 px/mm', ' px');
  });

  it('says to print at 100 % with no scaling on every sheet and lists every mark (pdftotext)', async () => {
    const { file, layout, tiles } = await templateOf({}, 'A4');
    const text = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
    const pages = text.split('\f').filter((p) => p.trim() !== '');
    expect(pages.length).toBe(tiles.columns * tiles.rows + 2);
    for (const p of pages) expect(p).toContain('Print at 100 % (actual size), no scaling');
    for (const m of layout.marks) expect(text).toContain(m.label);
    expect(text).toContain('from style edge');
    expect(text).toContain('45° check triangle');
    // The 09:00 line of the demo lies |x| − t/2 from its style edge.
    const nine = layout.marks.find((m) => m.label === '09:00')!;
    expect(text).toContain((Math.abs(nine.xMm) - layout.gnomon.thicknessMm / 2).toFixed(2));
  });

  it('keeps every drill label inside the plate outline on its sheet (pdftotext -bbox)', async () => {
    const { file, tiles, layout } = await templateOf({}, 'A4');
    const xml = execFileSync('pdftotext', ['-bbox', file, '-'], { encoding: 'utf8' });
    const pages = xml.split('<page ').slice(1);
    const { widthMm: W, lengthMm: L } = layout.plate;
    let labels = 0;
    for (let c = 0; c < tiles.columns; c++) {
      for (let r = 0; r < tiles.rows; r++) {
        const page = pages[r * tiles.columns + c];
        expect(page).toMatch(new RegExp(`>column</word>\\s*<word[^>]*>${c + 1}</word>`));
        // The plate's rectangle on this sheet, mm (the same mapping as the drawing: plate y up, sheet y down).
        const x0 = tiles.window.x + TEMPLATE_BORDER_MM - tiles.colStartMm[c];
        const yTop = tiles.window.y + TEMPLATE_BORDER_MM - tiles.rowStartMm[r];
        const words = [...page.matchAll(/<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)">([^<]*)<\/word>/g)];
        words.forEach((w, i) => {
          if (w[5] !== 'drill') return;
          const mm = (k: number, j: number) => Number(words[k][j]) / PT_PER_MM;
          const box = [mm(i, 1), mm(i, 2), mm(i + 1, 3), mm(i + 1, 4)];
          labels++;
          expect(box[0], `drill label left edge on sheet ${c + 1},${r + 1}`).toBeGreaterThan(x0);
          expect(box[2], `drill label right edge on sheet ${c + 1},${r + 1}`).toBeLessThan(x0 + W);
          expect(box[1]).toBeGreaterThan(yTop);
          expect(box[3]).toBeLessThan(yTop + L);
        });
      }
    }
    expect(labels).toBeGreaterThanOrEqual(layout.plate.holes.length);
  });

  it('tiles a plate larger than the sheet with overlapping sheets', async () => {
    const { file, tiles } = await templateOf({ plate: { thickness: 3, material: 'aluminium', width: 420, length: 330 } }, 'A4');
    expect(tiles.columns * tiles.rows).toBeGreaterThan(2);
    // Neighbouring windows overlap by template.overlap (15 mm).
    if (tiles.columns > 1) expectClose(tiles.colStartMm[0] + tiles.window.w - tiles.colStartMm[1], 15, 1e-9, 'column overlap', ' mm');
    if (tiles.rows > 1) expectClose(tiles.rowStartMm[0] + tiles.window.h - tiles.rowStartMm[1], 15, 1e-9, 'row overlap', ' mm');
    expect(pdfinfoSizes(file).pages).toBe(tiles.columns * tiles.rows + 2);
  });

  it('is byte-stable', async () => {
    const a = await templateOf({}, 'A4');
    const b = await templateOf({}, 'A4');
    expect(Buffer.from(a.pdf).equals(Buffer.from(b.pdf))).toBe(true);
  });
});
