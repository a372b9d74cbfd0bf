import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { layoutPlanar, parseSpec, planarGnomonSolid } from '@umbrafab/geometry';
import { PRINT_AT_FULL_SIZE } from '@umbrafab/fabricate';
import { buildAnyFiles } from '@umbrafab/cli';
import { expectClose } from './helpers/closeTo.ts';

const FIXTURES = ['garden-horizontal', 'wall-declining', 'wall-reclining', 'meridian-east', 'equatorial', 'equatorial-lower'];
const specOf = (name: string, patch: Record<string, unknown> = {}) => parseSpec({ ...parse(readFileSync(new URL(`../fixtures/planar/${name}.yaml`, import.meta.url), 'utf8')), ...patch });

/** ISO 216 A4 = 210 × 297 mm and ANSI/ASME Y14.1 Letter = 8.5 × 11 in, in PDF points (72 per inch, ISO 32000-1 §8.3.2.3). */
const PAGE_PT = { A4: [595.28, 841.89], Letter: [612, 792] } as const;
/** Rendering at 254 dpi gives 10 px per mm (25.4 mm per inch). */
const PX_PER_MM = 10;
/** The template's outline stroke width, mm (toTemplatePdf draws outlines 0.3 mm wide, centred on the outline). */
const OUTLINE_MM = 0.3;

async function built(name: string, patch: Record<string, unknown> = {}) {
  const spec = specOf(name, patch);
  const b = await buildAnyFiles(spec);
  const dir = mkdtempSync(join(tmpdir(), 'umbrafab-ptemplate-'));
  for (const f of b.files) writeFileSync(join(dir, f.name), f.bytes);
  return { spec, dir, report: b.report as Record<string, any>, names: b.files.map((f) => f.name) };
}

/** Page count and every page's size from Debian poppler-utils' pdfinfo, points. */
function pdfinfoSizes(file: string): { pages: number; sizes: [number, number][] } {
  const txt = execFileSync('pdfinfo', ['-l', '999', file], { encoding: 'utf8' });
  const pages = Number(/^Pages:\s+(\d+)/m.exec(txt)![1]);
  const sizes = [...txt.matchAll(/^Page\s+\d+ size:\s+([\d.]+) x ([\d.]+) pts/gm)].map((m) => [Number(m[1]), Number(m[2])] as [number, number]);
  return { pages, sizes };
}

/** One page rasterised by poppler's pdftoppm at 254 dpi, grey (PGM, netpbm: "P5 w h max" then one byte a pixel). */
function renderPage(file: string, page: number, dir: string): { w: number; h: number; dark: (x: number, y: number) => boolean } {
  const base = join(dir, `p${page}`);
  execFileSync('pdftoppm', ['-r', '254', '-gray', '-singlefile', '-f', String(page), '-l', String(page), file, base]);
  const pgm = readFileSync(`${base}.pgm`);
  const head = /^P5\s+(\d+)\s+(\d+)\s+(\d+)\s/.exec(pgm.subarray(0, 40).toString('latin1'))!;
  const [w, h, start] = [Number(head[1]), Number(head[2]), head[0].length];
  // Black ink only: the dashed reference lines are grey (#808080) and the table rules light grey.
  return { w, h, dark: (x, y) => pgm[start + y * w + x] < 100 };
}

/** Extent of the black ink between the heading band and the footer band (the drawing window), mm. */
function inkExtentMm(r: ReturnType<typeof renderPage>, topMm: number, bottomMm: number): { widthMm: number; heightMm: number } {
  const b = inkBoxPx(r, topMm, bottomMm);
  return { widthMm: (b.x1 + 1 - b.x0) / PX_PER_MM, heightMm: (b.y1 + 1 - b.y0) / PX_PER_MM };
}

/** Bounding box of the black ink in the drawing window, pixels. */
function inkBoxPx(r: ReturnType<typeof renderPage>, topMm: number, bottomMm: number): { x0: number; x1: number; y0: number; y1: number } {
  let [x0, x1, y0, y1] = [Infinity, -Infinity, Infinity, -Infinity];
  for (let y = Math.ceil(topMm * PX_PER_MM); y < Math.floor(bottomMm * PX_PER_MM); y++) {
    for (let x = 0; x < r.w; x++) {
      if (!r.dark(x, y)) continue;
      x0 = Math.min(x0, x);
      x1 = Math.max(x1, x);
      y0 = Math.min(y0, y);
      y1 = Math.max(y1, y);
    }
  }
  return { x0, x1, y0, y1 };
}

/**
 * The outline's extent across the middle row and down the middle column of the ink: outer edge to outer edge of
 * the outline's strokes, mm (the plate's drill labels, written beside the holes near its edges, stay off those two lines).
 */
function outlineSpanMm(r: ReturnType<typeof renderPage>, topMm: number, bottomMm: number): { widthMm: number; heightMm: number } {
  const ink = inkBoxPx(r, topMm, bottomMm);
  const [row, col] = [Math.round((ink.y0 + ink.y1) / 2), Math.round((ink.x0 + ink.x1) / 2)];
  const xs = Array.from({ length: r.w }, (_, x) => x).filter((x) => r.dark(x, row));
  const ys = Array.from({ length: ink.y1 - ink.y0 + 1 }, (_, k) => ink.y0 + k).filter((y) => r.dark(col, y));
  return { widthMm: (xs[xs.length - 1] + 1 - xs[0]) / PX_PER_MM, heightMm: (ys[ys.length - 1] + 1 - ys[0]) / PX_PER_MM };
}

/** The calibration bar's length on a rendered page: the dark run 0.3 mm below its top edge (at page height − margin − footer + 5 mm), mm. */
function barMm(r: ReturnType<typeof renderPage>, pageHeightMm: number): number {
  const row = Math.round((pageHeightMm - 10 - 18 + 5 + 0.3) * PX_PER_MM);
  let x0 = 0;
  while (x0 < r.w && !r.dark(x0, row)) x0++;
  let x1 = x0;
  while (x1 < r.w && r.dark(x1, row)) x1++;
  return (x1 - x0) / PX_PER_MM;
}

describe('template.pdf of every planar face, read back as the shop prints it', () => {
  for (const name of FIXTURES) {
    it(`${name}: A4 pages (ISO 216), the page count in report.json, every sheet says print at 100 %, install.md names the template`, async () => {
      const { dir, report, names } = await built(name);
      expect(names).toContain('template.pdf');
      const file = join(dir, 'template.pdf');
      const { pages, sizes } = pdfinfoSizes(file);
      expect(pages).toBe(report.template.pages);
      for (const [w, h] of sizes) {
        const [ew, eh] = report.template.orientation === 'portrait' ? PAGE_PT.A4 : [PAGE_PT.A4[1], PAGE_PT.A4[0]];
        expectClose(w, ew, 0.01, 'A4 page width', ' pt');
        expectClose(h, eh, 0.01, 'A4 page height', ' pt');
      }
      const text = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
      const sheets = text.split('\f').filter((p) => p.trim() !== '');
      expect(sheets.length).toBe(pages);
      for (const s of sheets) expect(s).toContain(PRINT_AT_FULL_SIZE.slice(0, 40));
      const labels = report.template.drawings.map((d: { label: string }) => d.label);
      expect(labels[0]).toBe('plate');
      expect(labels.includes('gnomon fin profile')).toBe(report.gnomon.kind === 'fin');
      expect(labels.includes('wall mount')).toBe(names.includes('mount.stl'));
      for (const d of report.template.drawings) expect(sheets[d.firstSheet - 1]).toContain(`${d.label} at 1:1`);
      // Every engraved hour line is in the table of line ends (a line under the fin is not engraved).
      for (const m of report.marks.filter((m: { kind: string; underGnomon?: boolean }) => m.kind === 'hour' && !m.underGnomon)) expect(text).toContain(m.label);
      const install = readFileSync(join(dir, 'install.md'), 'utf8');
      expect(install).toContain('## The paper template (template.pdf)');
      expect(install).toContain(`Print all ${pages} A4 sheets at 100 %`);
    });
  }

  it('the plate, the fin profile and the stand parts print at 1:1: rendered at 10 px/mm (pdftoppm) their ink spans their size within 0.2 mm, the bar 100 mm', async () => {
    const measured: string[] = [];
    for (const name of ['equatorial', 'garden-horizontal', 'meridian-east']) {
      const { spec, dir, report } = await built(name, { template: { paper: 'Letter' } });
      const file = join(dir, 'template.pdf');
      const pageH = report.template.orientation === 'portrait' ? 279.4 : 215.9;
      // The drawing window: below margin 10 + heading 16 mm, above margin 10 + footer 18 mm (templatePages.ts).
      const [top, bottom] = [26, pageH - 28];
      const fin = planarGnomonSolid(layoutPlanar(spec));
      const finXs = fin.profile.map((p) => p[0]);
      const finZs = fin.profile.map((p) => p[1]);
      const expected: Record<string, [number, number]> = {
        plate: [report.plate.widthMm, report.plate.lengthMm],
        'gnomon fin profile': [Math.max(...finXs) - Math.min(...finXs), Math.max(...finZs) - Math.min(...finZs)],
        // An equatorial stand's parts, each at its size as report.json's stand section gives it.
        ...Object.fromEntries(((report.stand?.parts ?? []) as { label: string; sizeMm: [number, number] }[]).map((p) => [`stand ${p.label}`, p.sizeMm])),
      };
      let checked = 0;
      for (const d of report.template.drawings) {
        if (d.firstSheet !== d.lastSheet || !expected[d.label]) continue;
        const r = renderPage(file, d.firstSheet, dir);
        const ink = d.label === 'plate' ? outlineSpanMm(r, top, bottom) : inkExtentMm(r, top, bottom);
        const [W, L] = expected[d.label];
        measured.push(`${name} ${d.label}: ${ink.widthMm} x ${ink.heightMm} mm printed, ${W.toFixed(2)} x ${L.toFixed(2)} mm + ${OUTLINE_MM} mm stroke expected`);
        expectClose(ink.widthMm, W + OUTLINE_MM, 0.2, `${name} ${d.label} width on paper`, ' mm');
        // The fin's sharp tip: a mitred stroke join reaches past the corner by (w/2)/sin(θ/2) (ISO 32000-1 §8.4.3.4), up to 0.3 mm more here.
        expectClose(ink.heightMm, L + OUTLINE_MM, d.label === 'plate' ? 0.2 : 0.5, `${name} ${d.label} height on paper`, ' mm');
        expectClose(barMm(r, pageH), 100, 0.1, `${name} calibration bar on sheet ${d.firstSheet}`, ' mm');
        checked++;
      }
      expect(checked, `${name}: a drawing on a single sheet to measure`).toBeGreaterThan(0);
      // Every stand part cut from sheet has its own 1:1 drawing in the template.
      for (const p of (report.stand?.parts ?? []) as { label: string }[]) expect(report.template.drawings.map((d: { label: string }) => d.label)).toContain(`stand ${p.label}`);
    }
    console.log(measured.join('\n'));
  });

  it('the polar demo: the gnomon fin and every stand part at 1:1 after the tables, on the sheets report.json names; a single-sheet part spans its size within 0.2 mm', async () => {
    const spec = parseSpec({ ...parse(readFileSync(new URL('../fixtures/demo.yaml', import.meta.url), 'utf8')), pictures: { write: false } });
    const b = await buildAnyFiles(spec);
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-ptemplate-'));
    const file = join(dir, 'template.pdf');
    writeFileSync(file, b.files.find((f) => f.name === 'template.pdf')!.bytes);
    const report = b.report as Record<string, any>;
    expect(pdfinfoSizes(file).pages).toBe(report.template.pages);
    const stand = report.stand.parts as { label: string; sizeMm: [number, number] }[];
    const labels = report.template.drawings.map((d: { label: string }) => d.label);
    expect(labels).toEqual(['plate', 'gnomon fin profile', ...stand.map((p) => `stand ${p.label}`)]);
    const pages = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' }).split('\f');
    let measured = 0;
    for (const d of report.template.drawings as { label: string; firstSheet: number; lastSheet: number }[]) {
      for (let k = d.firstSheet; k <= d.lastSheet; k++) expect(pages[k - 1], `sheet ${k}`).toContain(`${d.label} at 1:1`);
      const part = stand.find((p) => `stand ${p.label}` === d.label);
      if (!part || d.firstSheet !== d.lastSheet) continue;
      const pageH = report.template.orientation === 'portrait' ? 297 : 210;
      const ink = inkExtentMm(renderPage(file, d.firstSheet, dir), 26, pageH - 28);
      expectClose(ink.widthMm, part.sizeMm[0] + OUTLINE_MM, 0.2, `${d.label} width on paper`, ' mm');
      expectClose(ink.heightMm, part.sizeMm[1] + OUTLINE_MM, 0.2, `${d.label} height on paper`, ' mm');
      measured++;
    }
    expect(measured).toBeGreaterThan(0);
    // install.md's guide names each sheet as the PDF heads it: the plate, the table, the 45° triangle, then each part.
    const install = new TextDecoder().decode(b.files.find((f) => f.name === 'install.md')!.bytes);
    expect(install).toContain(`Print all ${report.template.pages} A4 sheets at 100 %`);
    const guide = [...install.matchAll(/^- sheets? (\d+)(?: to (\d+))?: the (.+?)(?: at 1:1|,| ends|$)/gm)].map((m) => ({ first: Number(m[1]), last: Number(m[2] ?? m[1]), what: m[3] }));
    for (const d of report.template.drawings as { label: string; firstSheet: number; lastSheet: number }[]) expect(guide).toContainEqual({ first: d.firstSheet, last: d.lastSheet, what: d.label });
    const triangle = guide.find((g) => g.what.startsWith('45° check triangle'))!;
    expect(pages[triangle.first - 1]).toContain('45° check triangle at 1:1');
    const table = install.match(/^- sheets? (\d+)(?: to (\d+))?: each line's distance from the style edge/m)!;
    for (let k = Number(table[1]); k <= Number(table[2] ?? table[1]); k++) expect(pages[k - 1]).toContain('offsets of the lines from the style edge');
    expect(guide.length + 1).toBe(report.template.drawings.length + 2); // + the table line, + the triangle
  });

  it('a plate larger than the sheet is tiled over overlapping sheets, and the wall mount too', async () => {
    const { dir, report } = await built('wall-reclining');
    expect(report.template.sheets.columns * report.template.sheets.rows).toBeGreaterThan(1);
    const mount = report.template.drawings.find((d: { label: string }) => d.label === 'wall mount');
    expect(mount.lastSheet - mount.firstSheet).toBeGreaterThan(0);
    const text = execFileSync('pdftotext', ['-layout', join(dir, 'template.pdf'), '-'], { encoding: 'utf8' });
    expect(text).toContain('wall mount at 1:1, column 1 of');
  });

  it('template.write: false writes no template.pdf and install.md does not mention it', async () => {
    const { names, dir, report } = await built('garden-horizontal', { template: { write: false } });
    expect(names).not.toContain('template.pdf');
    expect(report.template).toBeUndefined();
    expect(readFileSync(join(dir, 'install.md'), 'utf8')).not.toContain('template.pdf');
  });
});
