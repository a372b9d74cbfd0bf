// The 2D face view: the server's preview.svg at true scale, with the
// gnomon's shadow laid over it (clipped to the plate).
import type { View } from './api.ts';
import { byId } from './dom.ts';
import { emit } from './events.ts';
import { shadowPathData } from './format.ts';
import { state } from './state.ts';

const SVG_NS = 'http://www.w3.org/2000/svg';

/** Draw the build's preview.svg with an empty shadow layer, in the SVG's own user units (mm). */
export function drawFace(r: View): void {
  const face = byId('face', HTMLElement);
  const text = r.svg.replace(/^<\?xml[^>]*>\s*/, '');
  const doc = new DOMParser().parseFromString(text, 'image/svg+xml');
  const svg = document.importNode(doc.documentElement, true);
  const fr = r.frame;
  const defs = document.createElementNS(SVG_NS, 'defs');
  const clip = document.createElementNS(SVG_NS, 'clipPath');
  clip.id = 'plate-clip';
  const rect = document.createElementNS(SVG_NS, 'rect');
  rect.setAttribute('x', String(fr.padMm));
  rect.setAttribute('y', String(fr.padMm));
  rect.setAttribute('width', String(fr.plateWidthMm));
  rect.setAttribute('height', String(fr.plateLengthMm));
  clip.append(rect);
  defs.append(clip);
  const layer = document.createElementNS(SVG_NS, 'g');
  layer.id = 'shadow-layer';
  layer.setAttribute('clip-path', 'url(#plate-clip)');
  const path = document.createElementNS(SVG_NS, 'path');
  path.id = 'shadow';
  path.setAttribute('fill', '#2f4858');
  path.setAttribute('fill-opacity', '0.42');
  path.setAttribute('stroke', 'none');
  layer.append(path);
  svg.append(defs, layer);
  face.textContent = '';
  face.append(svg);
  fitFace();
}

/** Fit the face to its panel, or show it 1:1 when the box is ticked; then the scale line. */
export function fitFace(): void {
  byId('face', HTMLElement).classList.toggle('fit', !byId('one-to-one', HTMLInputElement).checked);
  updateScale();
}

/** The "1 mm = … px" line (after a resize, a fit change or a new face). */
export function updateScale(): void {
  const svg = byId('face', HTMLElement).querySelector('svg');
  if (!svg || !state.build) return;
  const pxPerMm = svg.getBoundingClientRect().width / state.build.frame.viewWidthMm;
  byId('scale', HTMLElement).textContent = `1 mm = ${pxPerMm.toFixed(3)} px`;
  emit({ type: 'scale', pxPerMm });
}

/** The shadow polygons (preview coordinates, from the server) on the face; none hides it. */
export function drawShadow(polys: readonly (readonly (readonly number[])[])[]): void {
  const path = document.getElementById('shadow');
  if (!path) return;
  const d = shadowPathData(polys);
  path.setAttribute('d', d || 'M0 0');
  path.style.display = d ? '' : 'none';
}

/** Mark both views as out of date (the spec has a problem) or current. */
export function markStale(stale: boolean): void {
  for (const id of ['face', 'model']) byId(id, HTMLElement).classList.toggle('stale', stale);
}
