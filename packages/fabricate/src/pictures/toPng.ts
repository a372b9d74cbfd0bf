import { createRequire } from 'node:module';
import type * as ResvgJs from '@resvg/resvg-js';
import { assertRange } from '@umbrafab/geometry';

/**
 * The rasteriser (resvg, a native module) loads on the first picture, not
 * with this package: commands that write no PNG never load it.
 */
let resvgJs: Promise<typeof ResvgJs> | undefined;
const loadResvg = (): Promise<typeof ResvgJs> => (resvgJs ??= import('@resvg/resvg-js'));

/** Options of `toPng`. */
export interface PngOptions {
  /** pixels per millimetre of the SVG's width and height (default 4, about 100 dpi) */
  readonly pxPerMm: number;
}

export const PNG_DEFAULTS: PngOptions = { pxPerMm: 4 };

/** Millimetres per CSS inch and CSS pixels per inch (CSS Values and Units Level 3, §5.2: 1in = 96px = 25.4mm). */
const MM_PER_IN = 25.4;
const PX_PER_IN = 96;

/**
 * Render an SVG (whose root `width` is given in mm, px or unitless px) to a
 * PNG of round(widthMm × pxPerMm) pixels across, with resvg
 * (@resvg/resvg-js 2.6.2). No system fonts are loaded so the bytes are the
 * same on every machine: only paths are drawn (the umbrafab SVGs draw their
 * letters as single strokes; a `<text>` element would be left out).
 *
 * Synchronous, for tests and scripts run from the sources: its CommonJS
 * load resolves from this file's own folder, which the CLI's bundle
 * (packages/cli/dist/) does not have. Code the bundle runs uses `toPngAsync`,
 * whose `import()` the bundler points at the package.
 *
 * @returns the PNG file bytes (W3C PNG, 2nd ed. / ISO/IEC 15948)
 * @example toPng(svg, { pxPerMm: 4 })
 */
export function toPng(svg: string, options: Partial<PngOptions> = {}): Uint8Array {
  const o = { ...PNG_DEFAULTS, ...options };
  assertRange('pxPerMm', o.pxPerMm, 0, 50, '', 'lo');
  const { Resvg } = createRequire(import.meta.url)('@resvg/resvg-js') as typeof ResvgJs; // sync: a CommonJS load from this file's own dependencies
  const r = new Resvg(svg, resvgOptions(svg, o));
  return new Uint8Array(r.render().asPng());
}

/**
 * The same PNG as `toPng`, rendered on a libuv worker thread (resvg's
 * renderAsync), so several pictures can render at once on a multi-core CPU.
 */
export async function toPngAsync(svg: string, options: Partial<PngOptions> = {}): Promise<Uint8Array> {
  const o = { ...PNG_DEFAULTS, ...options };
  assertRange('pxPerMm', o.pxPerMm, 0, 50, '', 'lo');
  const { renderAsync } = await loadResvg();
  const img = await renderAsync(svg, resvgOptions(svg, o));
  return new Uint8Array(img.asPng());
}

function resvgOptions(svg: string, o: PngOptions) {
  const widthPx = Math.max(1, Math.round(svgWidthMm(svg) * o.pxPerMm));
  return {
    fitTo: { mode: 'width' as const, value: widthPx },
    font: { loadSystemFonts: false },
    background: '#ffffff',
  };
}

/** The root element's width in mm (mm, cm, in, px or unitless px). */
export function svgWidthMm(svg: string): number {
  return svgLengthMm(svg, 'width');
}

/** The root element's height in mm (mm, cm, in, px or unitless px). */
export function svgHeightMm(svg: string): number {
  return svgLengthMm(svg, 'height');
}

function svgLengthMm(svg: string, attr: 'width' | 'height'): number {
  const root = /<svg\b[^>]*>/.exec(svg);
  const m = root ? new RegExp(`\\s${attr}="([\\d.]+)(mm|cm|in|px)?"`).exec(root[0]) : null;
  if (!m) throw new Error(`svg: the root <svg> element has no numeric ${attr} attribute; allowed: ${attr}="123mm" (or cm, in, px)`);
  const v = Number(m[1]);
  switch (m[2]) {
    case 'mm':
      return v;
    case 'cm':
      return v * 10;
    case 'in':
      return v * MM_PER_IN;
    default:
      return (v * MM_PER_IN) / PX_PER_IN;
  }
}
