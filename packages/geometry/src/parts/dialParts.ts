import { SpecError, formatValue, isSpecError } from '../errors.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import type { Mesh, Vec3 } from './mesh.ts';
import { gnomonSolid, type GnomonPart } from './gnomonSolid.ts';
import type { PartsPlan } from './partsPlan.ts';
import { wedgeSolid, type WedgePart } from './wedgeSolid.ts';

/**
 * Part-builder option names and the spec fields they come from (partsPlan),
 * longest first so the most specific prefix wins.
 */
const SPEC_FIELD: readonly (readonly [string, string])[] = [
  ['wedge.holes.countersink', 'parts.wedge.countersink'],
  ['wedge.holes.diameterMm', 'parts.wedge.holeDiameter'],
  ['wedge.holes.count', 'parts.wedge.holes'],
  ['wedge.latitudeDeg', 'site.latitude'],
  ['wedge.seatWidthMm', 'plate.width'],
  ['wedge.seatLengthMm', 'plate.length'],
  ['wedge.minBaseMm', 'parts.wedge.base'],
  ['wedge.lipWidthMm', 'parts.wedge.lipWidth'],
  ['wedge.lipMm', 'parts.wedge.lipHeight'],
  ['wedge.wallMm', 'parts.wedge.wall'],
  ['wedge.arrow', 'parts.wedge.arrow'],
  ['gnomon.nodus', 'parts.nodusSize'],
  ['gnomon.tabs', 'parts.tabDepth'],
  ['gnomon.tabClearanceMm', 'process.clearance'],
  ['gnomon.heightMm', 'gnomon.height'],
  ['gnomon.thicknessMm', 'gnomon.thickness'],
];

/** Re-throw a part builder's SpecError (named by builder option) as a SpecError naming the spec field it came from. */
function asSpecError(e: unknown, values: Readonly<Record<string, unknown>>): never {
  if (!isSpecError(e)) throw e;
  const hit = SPEC_FIELD.find(([opt]) => e.field.startsWith(opt));
  if (!hit) throw e;
  const [opt, field] = hit;
  // the builder's own words without its allowed part: "wedge.holes.count: got 3"
  const what = e.message.endsWith(`; ${e.allowed}`) ? e.message.slice(0, -`; ${e.allowed}`.length) : e.field;
  const part = opt.startsWith('wedge') ? 'the latitude wedge' : 'the gnomon';
  throw new SpecError(field, values[field], e.allowed.startsWith('allowed: ') ? e.allowed : `allowed: ${e.allowed}`, `got ${formatValue(values[field])}, so ${part} cannot be made (${what})`);
}

/**
 * The gnomon fin of a plan, in its own frame (gnomonSolid: face z = 0, the
 * style edges at z = gnomon height, y centred on the fin), with builder
 * errors reported against the spec's fields.
 */
export function dialGnomon(plan: PartsPlan, layout: DialLayout): GnomonPart {
  try {
    return gnomonSolid(plan.gnomon);
  } catch (e) {
    return asSpecError(e, { 'parts.nodusSize': layout.spec.parts.nodusSize, 'parts.tabDepth': layout.spec.parts.tabDepth, 'process.clearance': layout.spec.process.clearance, 'gnomon.height': layout.spec.gnomon.height, 'gnomon.thickness': layout.spec.gnomon.thickness });
  }
}

/**
 * The latitude wedge of a plan (wedgeSolid: base on z = 0, seat tilted by
 * |latitude| rising toward +y, the elevated pole). A wedge that cannot be
 * printed (|latitude| above 89°, walls under 0.8 mm, holes that do not fit,
 * a countersink deeper than the base) is a SpecError naming the spec field.
 */
export function dialWedge(plan: PartsPlan, layout: DialLayout): WedgePart {
  try {
    return wedgeSolid(plan.wedge);
  } catch (e) {
    const s = layout.spec;
    return asSpecError(e, {
      'site.latitude': s.site.latitude,
      'plate.width': s.plate.width,
      'plate.length': s.plate.length,
      'parts.wedge.base': s.parts.wedge.base,
      'parts.wedge.lipHeight': s.parts.wedge.lipHeight,
      'parts.wedge.lipWidth': s.parts.wedge.lipWidth,
      'parts.wedge.wall': s.parts.wedge.wall,
      'parts.wedge.holes': s.parts.wedge.holes,
      'parts.wedge.holeDiameter': s.parts.wedge.holeDiameter,
      'parts.wedge.countersink': s.parts.wedge.countersink,
      'parts.wedge.arrow': s.parts.wedge.arrow,
    });
  }
}

/** Apply a point map to every corner of a mesh (a new mesh; the map must keep orientation). */
export function mapMesh(mesh: Mesh, f: (p: Vec3) => Vec3): Mesh {
  return { positions: mesh.positions.map(f), triangles: mesh.triangles.map((t) => [t[0], t[1], t[2]] as const) };
}

/**
 * The fin placed as assembled, in the face frame (docs/design.md §2): its centre
 * plane on x = 0, its ends at the layout's gnomon y0..y1, resting on the
 * face (z = 0, the plate's top surface) with its tabs through the slots, so
 * the style edges sit gnomon height above the face and the tab bottoms at
 * z = −tab depth (the plate's underside for a through tab).
 */
export function gnomonOnPlate(part: GnomonPart, plan: PartsPlan): Mesh {
  const dy = plan.gnomonCentreYMm;
  return mapMesh(part.mesh, ([x, y, z]) => [x, y + dy, z]);
}

/**
 * Map from the face frame to the wedge's frame for the plate lying on the
 * seat: plate coordinates (x + substyleX, y + faceOriginY, z + thickness,
 * z from the plate's underside) are laid along the seat from its lower edge
 * (the plate's equator-ward edge against the lip), centred across it:
 * P = P0 + (xp − W/2)·x̂ + yp·û + zp·n̂, with û = (0, cos a, sin a) up the
 * slope and n̂ = (0, −sin a, cos a) the seat normal (a rotation about x by
 * the tilt a, so orientation is kept).
 */
export function faceToWedge(layout: DialLayout, wedge: WedgePart): (p: Vec3) => Vec3 {
  const { substyleX, faceOriginY, thicknessMm, widthMm } = layout.plate;
  const a = wedge.tiltRad;
  const [, y0, z0] = wedge.seatCorners[0];
  const ca = Math.cos(a);
  const sa = Math.sin(a);
  return ([x, y, z]) => {
    const yp = y + faceOriginY;
    const zp = z + thicknessMm;
    return [x + substyleX - widthMm / 2, y0 + yp * ca - zp * sa, z0 + yp * sa + zp * ca];
  };
}
