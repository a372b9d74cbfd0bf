import { drawingBounds, type CutDrawing } from '../cut/cutDrawing.ts';
import { DXF_LAYERS } from '../dxf/cutLayers.ts';
import { roundTo } from '../process/roundTo.ts';

/**
 * A cutting drawing as true-scale SVG for hobby-laser software: width and
 * height in mm, one user unit = 1 mm (SVG 1.1, W3C Recommendation, §7.10
 * units), drawing y up (flipped for SVG), origin at the drawing's lower-left
 * extent. One `<g>` per operation, id = the DXF layer name, with its own
 * stroke colour (the DXF layer colours in RGB: cut red, score blue, etch
 * magenta, text green), hairline strokes (0.05 mm), no fill. Reference
 * layers and notes are left out (the notes head the file as comments).
 * @example toCutSvg(cutDrawing(part, { profiles: nominalProfiles(part), strokes: 'centre-lines', notes: [] }))
 */
export function toCutSvg(drawing: CutDrawing, options: { readonly decimals?: number } = {}): string {
  const dec = options.decimals ?? 4;
  const n = (v: number) => String(roundTo(v, dec));
  const plotting = drawing.entities.filter((e) => DXF_LAYERS[e.layer].plots && e.kind !== 'note');
  const [x0, y0, x1, y1] = drawingBounds(plotting);
  const W = x1 - x0;
  const H = y1 - y0;
  const X = (x: number) => n(x - x0);
  const Y = (y: number) => n(y1 - y);
  const out: string[] = ['<?xml version="1.0" encoding="UTF-8"?>'];
  for (const note of drawing.notes) out.push(`<!-- ${note.replace(/--/g, '- -').replace(/[<>&]/g, '?')} -->`);
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="${n(W)}mm" height="${n(H)}mm" viewBox="0 0 ${n(W)} ${n(H)}">`);
  for (const key of drawing.layers) {
    const layer = DXF_LAYERS[key];
    if (!layer.plots) continue;
    const items = plotting.filter((e) => e.layer === key);
    if (items.length === 0) continue;
    out.push(`<g id="${layer.name}" fill="none" stroke="${SVG_COLOURS[layer.color] ?? '#000000'}" stroke-width="0.05">`);
    for (const e of items) {
      if (e.kind === 'circle') out.push(`<circle cx="${X(e.cx)}" cy="${Y(e.cy)}" r="${n(e.r)}"/>`);
      else if (e.kind === 'polyline') out.push(`<path d="${e.points.map(([x, y], i) => `${i === 0 ? 'M' : 'L'}${X(x)} ${Y(y)}`).join(' ')}${e.closed ? ' Z' : ''}"/>`);
    }
    out.push('</g>');
  }
  out.push('</svg>');
  return out.join('\n') + '\n';
}

/** RGB of the AutoCAD Color Index entries the layers use (ACI 1 red, 3 green, 5 blue, 6 magenta). */
const SVG_COLOURS: Readonly<Record<number, string>> = { 1: '#ff0000', 3: '#00ff00', 5: '#0000ff', 6: '#ff00ff' };
