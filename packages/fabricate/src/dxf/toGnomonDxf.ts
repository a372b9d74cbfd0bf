import Drawing from 'dxf-writer';
import Handle from 'dxf-writer/src/Handle.js';
import { SpecError, type Vec2 } from '@umbrafab/geometry';
import { roundTo } from '../process/roundTo.ts';
import { offsetRingMiter } from './offsetRingMiter.ts';
import { DXF_LAYERS } from './toDxf.ts';

/** The gnomon fin's side outline, as the geometry's GnomonPart gives it. */
export interface GnomonOutline {
  /** counter-clockwise outline in the fin's (y, z) plane, mm: y along the style, z up from the face (tabs below 0) */
  readonly profile: readonly Vec2[];
  /** style height above the face, mm (the face is z = 0 of the profile) */
  readonly styleHeightMm: number;
}

export interface GnomonDxfOptions {
  /** cut width, mm; the profile is grown by kerf/2 */
  readonly kerfMm: number;
  /** decimal places for coordinates (default 6) */
  readonly decimals?: number;
}

/** One entity of gnomon.dxf before serialisation. */
type GnomonRecord = { readonly kind: 'polyline'; readonly layer: string; readonly points: readonly Vec2[]; readonly closed: boolean };

/**
 * The drawing of gnomon.dxf in sheet coordinates, mm: the fin laid flat,
 * its style along +x, its height along +y, origin at the lower-left corner
 * of the nominal part (the tab bottoms on y = 0, the −y end of the style on
 * x = 0), so x = profile y − min y and y = profile z − min z.
 * - CUT_PROFILE: the outline with its tabs (and nodus notch) as one closed
 *   polyline, grown outward by kerf/2 with mitred corners (docs/design.md §5), so
 *   the fin comes out at nominal size.
 * - REFERENCE_NO_CUT: the face line (where the fin stands on the plate; the
 *   style edge is exactly styleHeightMm above it), not for cutting.
 */
export function gnomonDxfRecords(outline: GnomonOutline, options: GnomonDxfOptions): GnomonRecord[] {
  const k = options.kerfMm / 2;
  const ys = outline.profile.map((p) => p[0]);
  const zs = outline.profile.map((p) => p[1]);
  const y0 = Math.min(...ys);
  const z0 = Math.min(...zs);
  const sheet = outline.profile.map(([y, z]): Vec2 => [y - y0, z - z0]);
  // An outward mitred offset shortens only the edges between two inside
  // (reflex) corners, by kerf; they must stay longer than that.
  const n = sheet.length;
  const reflex = sheet.map((p, i) => {
    const a = sheet[(i - 1 + n) % n];
    const b = sheet[(i + 1) % n];
    return (p[0] - a[0]) * (b[1] - p[1]) - (p[1] - a[1]) * (b[0] - p[0]) < 0;
  });
  let shortest = Infinity;
  sheet.forEach((p, i) => {
    const q = sheet[(i + 1) % n];
    if (reflex[i] && reflex[(i + 1) % n]) shortest = Math.min(shortest, Math.hypot(q[0] - p[0], q[1] - p[1]));
  });
  if (!(options.kerfMm < shortest)) {
    throw new SpecError('process.kerf', options.kerfMm, `allowed: a kerf narrower than ${shortest.toFixed(3)} mm, the shortest gnomon edge between two inside corners (between tabs, or a tab and the nodus)`);
  }
  const faceY = -z0;
  const length = Math.max(...ys) - y0;
  return [
    { kind: 'polyline', layer: DXF_LAYERS.cut.name, points: offsetRingMiter(sheet, k), closed: true },
    { kind: 'polyline', layer: DXF_LAYERS.reference.name, points: [[0, faceY], [length, faceY]], closed: false },
  ];
}

/**
 * gnomon.dxf: the fin to cut from the plate's own sheet (laser, waterjet,
 * router), same conventions as plate.dxf: ASCII DXF (AC1021, as written by
 * dxf-writer), millimetres ($INSUNITS = 4), every entity at z = 0, layers
 * CUT_PROFILE and REFERENCE_NO_CUT; see gnomonDxfRecords for the geometry.
 * Group codes per the AutoCAD DXF Reference (LWPOLYLINE 10/20, 70 = 1 closed).
 *
 * @example toGnomonDxf({ profile: gnomonSolid().profile, styleHeightMm: 20 }, { kerfMm: 0.15 })
 */
export function toGnomonDxf(outline: GnomonOutline, options: GnomonDxfOptions): string {
  const records = gnomonDxfRecords(outline, options);
  const decimals = options.decimals ?? 6;
  // Restart dxf-writer's module-wide handle counter: byte-identical files.
  Handle.seed = 0;
  const d = new Drawing();
  d.setUnits('Millimeters');
  for (const layer of [DXF_LAYERS.cut, DXF_LAYERS.reference]) d.addLayer(layer.name, layer.color, 'CONTINUOUS');
  const r = (v: number) => roundTo(v, decimals);
  for (const rec of records) {
    d.setActiveLayer(rec.layer);
    d.drawPolyline(rec.points.map(([x, y]) => [r(x), r(y)]) as [number, number][], rec.closed);
  }
  return d.toDxfString();
}
