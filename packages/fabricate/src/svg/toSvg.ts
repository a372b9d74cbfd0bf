import type { Path, PlateDrawing, RoundedRect } from '@umbrafab/geometry';
import { rectVertices } from '../process/rectVertices.ts';
import { roundTo } from '../process/roundTo.ts';
import { previewFrame } from './previewFrame.ts';

export interface SvgOptions {
  /** Decimal places for coordinates (default 3, i.e. 1 µm). */
  readonly decimals?: number;
  /** Extra paint around the plate, mm (default PREVIEW_PADDING_MM = 5). */
  readonly paddingMm?: number;
  /** A caption drawn under the plate (plain text, escaped). */
  readonly caption?: string;
}

/**
 * preview.svg: the plate face at true scale (width and height in mm, one
 * user unit = 1 mm), seen face-on with the pole-ward end up: nominal outline,
 * holes and slots, every mark at its real width, numerals and title as the
 * same single strokes that are engraved, and the reference lines dashed.
 * SVG 1.1 (W3C Recommendation); y is flipped so plate y runs upward.
 */
export function toSvg(drawing: PlateDrawing, options: SvgOptions = {}): string {
  const dec = options.decimals ?? 3;
  const frame = previewFrame(drawing, options);
  const pad = frame.padMm;
  const n = (v: number) => String(roundTo(v, dec));
  const W = frame.viewWidthMm;
  const H = frame.viewHeightMm;
  // Plate y up → SVG y down (plateToPreview).
  const X = (x: number) => n(x + pad);
  const Y = (y: number) => n(drawing.lengthMm - y + pad);
  const d = (p: Path) => p.points.map(([x, y], i) => `${i === 0 ? 'M' : 'L'}${X(x)} ${Y(y)}`).join(' ') + (p.closed ? ' Z' : '');
  const rect = (r: RoundedRect) => {
    const c = Math.min(r.cornerRadiusMm, r.widthMm / 2, r.heightMm / 2);
    const v = rectVertices(r);
    return v
      .map(([x, y, b], i) => {
        const cmd = i === 0 ? `M${X(x)} ${Y(y)}` : '';
        const [nx, ny] = v[(i + 1) % v.length];
        // A bulge of tan(22.5°) is a quarter arc of radius c; with y flipped it runs counter-clockwise on screen, hence sweep-flag 0.
        const seg = b !== 0 ? `A${n(c)} ${n(c)} 0 0 0 ${X(nx)} ${Y(ny)}` : `L${X(nx)} ${Y(ny)}`;
        return cmd + ' ' + seg;
      })
      .join(' ')
      .trim() + ' Z';
  };
  const out: string[] = [];
  out.push('<?xml version="1.0" encoding="UTF-8"?>');
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="${n(W)}mm" height="${n(H)}mm" viewBox="0 0 ${n(W)} ${n(H)}">`);
  out.push(`<rect x="0" y="0" width="${n(W)}" height="${n(H)}" fill="#ffffff"/>`);
  out.push(`<g id="plate" fill="#e9e4d8" stroke="#7a1f1f" stroke-width="0.3">`);
  out.push(`<path d="${rect(drawing.outline)}"/>`);
  out.push('</g>');
  out.push(`<g id="cutouts" fill="#ffffff" stroke="#7a1f1f" stroke-width="0.3">`);
  for (const s of drawing.slots) out.push(`<path d="${rect(s)}"/>`);
  for (const c of drawing.holes) out.push(`<circle cx="${X(c.cx)}" cy="${Y(c.cy)}" r="${n(c.radiusMm)}"/>`);
  out.push('</g>');
  out.push(`<g id="reference" fill="none" stroke="#8a8a8a" stroke-width="0.2" stroke-dasharray="2 1.5">`);
  for (const r of drawing.reference) out.push(`<path d="${d(r.path)}"><title>${esc(r.label)}</title></path>`);
  out.push('</g>');
  out.push(`<g id="lines" fill="none" stroke="#1b1b1b" stroke-linecap="butt">`);
  for (const l of drawing.lines) out.push(`<path d="${d(l.path)}" stroke-width="${n(l.widthMm)}"><title>${esc(l.label)}</title></path>`);
  out.push('</g>');
  out.push(`<g id="text" fill="none" stroke="#1b1b1b" stroke-linecap="round" stroke-linejoin="round">`);
  for (const t of drawing.text) {
    out.push(`<g stroke-width="${n(t.strokeWidthMm)}"><title>${esc(t.text)}</title>`);
    for (const s of t.strokes) out.push(`<path d="${d(s)}"/>`);
    out.push('</g>');
  }
  out.push('</g>');
  if (options.caption) {
    out.push(`<text x="${n(pad)}" y="${n(H - 3)}" font-family="sans-serif" font-size="4" fill="#333333">${esc(options.caption)}</text>`);
  }
  out.push('</svg>');
  return out.join('\n') + '\n';
}

function esc(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}
