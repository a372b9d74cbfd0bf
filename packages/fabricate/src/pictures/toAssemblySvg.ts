import type { AssemblyPartName, PictureItem, ScenePicture, Vec2 } from '@umbrafab/geometry';
import { roundTo } from '../process/roundTo.ts';

/** Options of `toAssemblySvg`. */
export interface AssemblySvgOptions {
  /** decimals of coordinates, mm (default 2) */
  readonly decimals: number;
  /** text of the SVG <title> element (a tooltip, not drawn), default none */
  readonly title: string;
}

export const ASSEMBLY_SVG_DEFAULTS: AssemblySvgOptions = { decimals: 2, title: '' };

/** Base colours, sRGB, of fully lit faces (a light PLA wedge, a sheet stand, a stone pillar, a rendered wall, an aluminium mount, a bare aluminium plate and gnomon, steel fixings). */
const PART_RGB: Readonly<Record<AssemblyPartName, readonly [number, number, number]>> = {
  wedge: [168, 186, 204],
  stand: [196, 198, 200],
  pillar: [188, 182, 170],
  wall: [206, 196, 180],
  mount: [176, 180, 184],
  plate: [226, 224, 218],
  fixings: [120, 124, 130],
  gnomon: [214, 211, 203],
};

/**
 * assembly.svg: the assembly picture as an SVG 1.1 document (W3C
 * Recommendation), one user unit = 1 mm of the orthographic view, width and
 * height in mm. Items are written in the picture's painter's order; each
 * face is one path (its coplanar triangles as sub-paths, so no seams), its
 * colour the part's base colour times the face's shade. The gnomon's shadow
 * on the face is translucent so the marks under it stay visible.
 *
 * @example toAssemblySvg(viewAssembly(layout, drawing, sun))
 */
export function toAssemblySvg(picture: Pick<ScenePicture, 'widthMm' | 'heightMm' | 'items'>, options: Partial<AssemblySvgOptions> = {}): string {
  const o = { ...ASSEMBLY_SVG_DEFAULTS, ...options };
  const n = (v: number) => String(roundTo(v, o.decimals));
  const poly = (pts: readonly Vec2[]) => pts.map(([x, y], i) => `${i === 0 ? 'M' : 'L'}${n(x)} ${n(y)}`).join(' ') + ' Z';
  const line = (pts: readonly Vec2[]) => pts.map(([x, y], i) => `${i === 0 ? 'M' : 'L'}${n(x)} ${n(y)}`).join(' ');
  const W = picture.widthMm;
  const H = picture.heightMm;
  const out: string[] = [];
  out.push('<?xml version="1.0" encoding="UTF-8"?>');
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="${n(W)}mm" height="${n(H)}mm" viewBox="0 0 ${n(W)} ${n(H)}">`);
  if (o.title) out.push(`<title>${esc(o.title)}</title>`);
  out.push(`<rect x="0" y="0" width="${n(W)}" height="${n(H)}" fill="#ffffff"/>`);
  for (const item of picture.items) out.push(itemSvg(item, poly, line, n));
  out.push('</svg>');
  return out.filter((l) => l !== '').join('\n') + '\n';
}

function itemSvg(item: PictureItem, poly: (p: readonly Vec2[]) => string, line: (p: readonly Vec2[]) => string, n: (v: number) => string): string {
  switch (item.kind) {
    case 'ground':
      return `<path id="ground" d="${poly(item.polygon)}" fill="#eceee6" stroke="#d6d9cf" stroke-width="0.3"/>`;
    case 'wall':
      return `<path id="wall" d="${poly(item.polygon)}" fill="${shaded(PART_RGB.wall, item.shade)}"/>`;
    case 'shadow':
      if (item.polygons.length === 0) return '';
      switch (item.on) {
        case 'ground':
          return `<path id="ground-shadow" d="${item.polygons.map(poly).join(' ')}" fill="#bfc3b8" fill-rule="nonzero"/>`;
        case 'wall':
          return `<path id="wall-shadow" d="${item.polygons.map(poly).join(' ')}" fill="#1d2430" fill-opacity="0.3" fill-rule="nonzero"/>`;
        case 'face':
          return `<path id="face-shadow" d="${item.polygons.map(poly).join(' ')}" fill="#1d2430" fill-opacity="0.42"/>`;
      }
      return '';
    case 'face': {
      const fill = shaded(PART_RGB[item.part], item.shade);
      return `<path class="${item.part}" d="${item.polygons.map(poly).join(' ')}" fill="${fill}" stroke="${fill}" stroke-width="0.15" stroke-linejoin="round"/>`;
    }
    case 'engraving':
      switch (item.role) {
        case 'mark':
          return `<path class="mark" d="${poly(item.polygon)}" fill="#1b1b1b"><title>${esc(item.label)}</title></path>`;
        case 'hole':
          return `<path class="hole" d="${poly(item.polygon)}" fill="#5d6670" stroke="#3d444c" stroke-width="0.2"/>`;
        case 'slot':
          return `<path class="slot" d="${poly(item.polygon)}" fill="#5d6670"/>`;
      }
      return '';
    case 'stroke':
      return `<path class="${item.role}" d="${line(item.points)}" fill="none" stroke="#1b1b1b" stroke-width="${n(item.widthMm)}" stroke-linecap="round" stroke-linejoin="round"/>`;
  }
}

/** A base colour times a shade, as #rrggbb. */
function shaded(rgb: readonly [number, number, number], shade: number): string {
  return `#${rgb.map((c) => Math.round(Math.min(255, c * shade)).toString(16).padStart(2, '0')).join('')}`;
}

function esc(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}
