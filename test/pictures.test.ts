import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { inflateSync } from 'node:zlib';
import { parse as parseYaml } from 'yaml';
import { describe, expect, it } from 'vitest';
import { defaultPictureDate, faceToWorld, layoutDial, parseSpec, plateDrawing, projectToPicture, sunForPicture, viewAssembly, type Vec2 } from '@umbrafab/geometry';
import { svgWidthMm, toAssemblySvg, toPng, toSvg } from '@umbrafab/fabricate';
import { buildFiles } from '@umbrafab/cli';
import { expectClose } from './helpers/closeTo.ts';

const ROOT = resolve(import.meta.dirname, '..');
const demoRaw = () => parseYaml(readFileSync(join(ROOT, 'fixtures/demo.yaml'), 'utf8')) as Record<string, unknown>;

/** A minimal PNG reader: IHDR, then IDAT inflated and unfiltered (W3C PNG 2nd ed. / ISO/IEC 15948, §11.2.2 IHDR, §9 filters). 8-bit RGB or RGBA only. */
function decodePng(png: Uint8Array): { width: number; height: number; channels: number; pixels: Uint8Array } {
  const sig = [137, 80, 78, 71, 13, 10, 26, 10];
  sig.forEach((b, i) => expect(png[i], 'PNG signature').toBe(b));
  const dv = new DataView(png.buffer, png.byteOffset, png.byteLength);
  let off = 8;
  let width = 0;
  let height = 0;
  let channels = 0;
  const idat: Uint8Array[] = [];
  while (off < png.length) {
    const len = dv.getUint32(off);
    const type = String.fromCharCode(...png.subarray(off + 4, off + 8));
    const body = png.subarray(off + 8, off + 8 + len);
    if (type === 'IHDR') {
      width = dv.getUint32(off + 8);
      height = dv.getUint32(off + 12);
      expect(body[8], 'bit depth').toBe(8);
      channels = body[9] === 6 ? 4 : body[9] === 2 ? 3 : 0;
      expect(channels, `colour type ${body[9]}`).toBeGreaterThan(0);
    } else if (type === 'IDAT') idat.push(body);
    off += 12 + len;
  }
  const raw = inflateSync(Buffer.concat(idat));
  const stride = width * channels;
  const pixels = new Uint8Array(height * stride);
  for (let y = 0; y < height; y++) {
    const f = raw[y * (stride + 1)];
    for (let x = 0; x < stride; x++) {
      const v = raw[y * (stride + 1) + 1 + x];
      const a = x >= channels ? pixels[y * stride + x - channels] : 0;
      const b = y > 0 ? pixels[(y - 1) * stride + x] : 0;
      const c = x >= channels && y > 0 ? pixels[(y - 1) * stride + x - channels] : 0;
      const p = a + b - c;
      const pa = Math.abs(p - a);
      const pb = Math.abs(p - b);
      const pc = Math.abs(p - c);
      const paeth = pa <= pb && pa <= pc ? a : pb <= pc ? b : c;
      const pred = f === 0 ? 0 : f === 1 ? a : f === 2 ? b : f === 3 ? (a + b) >> 1 : paeth;
      pixels[y * stride + x] = (v + pred) & 255;
    }
  }
  return { width, height, channels, pixels };
}

/** Ratio of a pixel's luminance (Rec. 709 weights, common practice) 0..255. */
function luminance(img: ReturnType<typeof decodePng>, x: number, y: number): number {
  const i = (y * img.width + x) * img.channels;
  return 0.2126 * img.pixels[i] + 0.7152 * img.pixels[i + 1] + 0.0722 * img.pixels[i + 2];
}

describe('pictures: preview.png and assembly.png from the demo build', async () => {
  const spec = parseSpec(demoRaw());
  const result = await buildFiles(spec);
  const file = (name: string) => {
    const f = result.files.find((x) => x.name === name);
    if (!f) throw new Error(`the build wrote no ${name}`);
    return f.bytes;
  };

  it('writes preview.png from the very preview.svg, at pictures.pxPerMm (IHDR size = SVG size × px/mm)', () => {
    const svg = new TextDecoder().decode(file('preview.svg'));
    const png = decodePng(file('preview.png'));
    const ppm = spec.pictures.pxPerMm;
    const wMm = svgWidthMm(svg);
    const hMm = Number(/<svg[^>]*\sheight="([\d.]+)mm"/.exec(svg)![1]);
    expect(png.width).toBe(Math.round(wMm * ppm));
    expect(png.height).toBe(Math.round(hMm * ppm));
    // The same SVG rendered again gives the same bytes (byte-stable, no system fonts).
    expect(Buffer.from(toPng(svg, { pxPerMm: ppm })).equals(Buffer.from(file('preview.png')))).toBe(true);
  });

  it('writes assembly.svg and assembly.png of the same size in mm', () => {
    const svg = new TextDecoder().decode(file('assembly.svg'));
    const png = decodePng(file('assembly.png'));
    const a = result.report.pictures!;
    expect(png.width).toBe(a.assembly.widthMm * spec.pictures.pxPerMm);
    expect(png.height).toBe(a.assembly.heightMm * spec.pictures.pxPerMm);
    expect([png.width, png.height]).toEqual([a.assembly.widthPx, a.assembly.heightPx]);
    expect(svg).toContain('id="face-shadow"');
  });

  it('renders a PNG at any stated px/mm (1 and 10 px/mm)', () => {
    const drawing = plateDrawing(layoutDial(spec));
    const svg = toSvg(drawing);
    for (const ppm of [1, 10]) {
      const png = decodePng(toPng(svg, { pxPerMm: ppm }));
      expect(png.width).toBe(Math.round(svgWidthMm(svg) * ppm));
    }
  });
});

describe('pictures: the shadow in the assembly picture', () => {
  const ppm = 4;
  for (const [name, patch, time] of [
    ['demo (north, standard time), 10:00', {}, '10:00'],
    ['demo at 15:00', {}, '15:00'],
    ['southern solar-time dial, 09:00', { site: { latitude: -33.9, longitude: 18.4, timezone: 'Africa/Johannesburg' }, dial: { reads: 'solar' } }, '09:00'],
  ] as const) {
    it(`puts the shadow edge on the ${time} mark within 1 px at ${ppm} px/mm: ${name}`, () => {
      const raw = { ...demoRaw(), ...patch, pictures: { time, pxPerMm: ppm } };
      const spec = parseSpec(raw);
      const layout = layoutDial(spec);
      const drawing = plateDrawing(layout);
      const sun = sunForPicture(layout, defaultPictureDate(layout), time);
      const pic = viewAssembly(layout, drawing, sun);
      const mark = layout.marks.find((m) => m.label === time && m.style === pic.shadow.style);
      expect(mark, `a ${time} ${pic.shadow.style} mark`).toBeDefined();

      // 1. Geometry: the shadow polygons (from the gnomon mesh) reach the mark's line.
      const side = mark!.xMm < 0 ? -1 : 1;
      const verts = pic.shadow.polygons.flat();
      const far = verts.reduce((m, v) => (side * v[0] > side * m[0] ? v : m), verts[0]);
      expectClose(far[0], mark!.xMm, 0.01, 'shadow edge x on the face', ' mm');
      const px = (p: Vec2): Vec2 => [p[0] * ppm, p[1] * ppm];
      const a = px(projectToPicture(pic.view, faceToWorld(pic.assembly.face, [mark!.xMm, mark!.y0Mm, 0])));
      const b = px(projectToPicture(pic.view, faceToWorld(pic.assembly.face, [mark!.xMm, mark!.y1Mm, 0])));
      const f = px(projectToPicture(pic.view, faceToWorld(pic.assembly.face, [far[0], far[1], 0])));
      const dist = Math.abs((b[0] - a[0]) * (f[1] - a[1]) - (b[1] - a[1]) * (f[0] - a[0])) / Math.hypot(b[0] - a[0], b[1] - a[1]);
      expect(dist, 'shadow edge to mark line in the picture, px').toBeLessThanOrEqual(1);

      // 2. Pixels: render with the marks left out, scan a row across the mark's middle and find the lit/shadow edge.
      const svg = toAssemblySvg(pic).replace(/<path class="mark"[^>]*>.*?<\/path>\n?/g, '');
      const img = decodePng(toPng(svg, { pxPerMm: ppm }));
      const yMid = (a[1] + b[1]) / 2;
      const row = Math.floor(yMid);
      const t = (row + 0.5 - a[1]) / (b[1] - a[1]);
      const xLine = a[0] + t * (b[0] - a[0]);
      // Lit plate on the far side from the gnomon, shadow on the near side (the gnomon's x is 0 on the face).
      const gnomonPx = px(projectToPicture(pic.view, faceToWorld(pic.assembly.face, [0, (mark!.y0Mm + mark!.y1Mm) / 2, 0])));
      const toward = Math.sign(gnomonPx[0] - xLine);
      const lit = luminance(img, Math.round(xLine - toward * 6), row);
      const dark = luminance(img, Math.round(xLine + toward * 6), row);
      expect(lit - dark, 'lit plate brighter than the shadow').toBeGreaterThan(40);
      const mid = (lit + dark) / 2;
      let edge = NaN;
      for (let k = -6; k < 6; k++) {
        const x0 = Math.round(xLine - toward * 6) + toward * (k + 6);
        const l0 = luminance(img, x0, row);
        const l1 = luminance(img, x0 + toward, row);
        if ((l0 - mid) * (l1 - mid) <= 0 && l0 !== l1) {
          edge = x0 + 0.5 + toward * ((l0 - mid) / (l0 - l1));
          break;
        }
      }
      expect(Number.isFinite(edge), 'an edge found in the row').toBe(true);
      expect(Math.abs(edge - xLine), `edge at ${edge.toFixed(2)} px, line at ${xLine.toFixed(2)} px`).toBeLessThanOrEqual(1);
    });
  }

  it('refuses a reading when the sun is down', () => {
    const spec = parseSpec({ ...demoRaw(), pictures: { date: '2027-12-21', time: '08:00' } });
    const layout = layoutDial(spec);
    expect(() => sunForPicture(layout, '2027-12-21', '08:00')).toThrow(/pictures\.time.*below the horizon/);
  });
});
