import { gnomonSolid } from '../parts/gnomonSolid.ts';
import type { Mesh, Vec3 } from '../parts/mesh.ts';
import { cross3, normalize3, sub3 } from '../parts/vec3.ts';
import { wedgeSolid, type WedgePart } from '../parts/wedgeSolid.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import type { Hemisphere, Vec2 } from '../types.ts';
import type { FaceFrame, Facet, PlacedPart } from './assemblyTypes.ts';

/** The dial as it stands: wedge on level ground, plate on the wedge's seat, gnomon in the plate's slots. */
export interface Assembly {
  readonly hemisphere: Hemisphere;
  /** the seat's (and the plate's) tilt from the horizontal, radians: |latitude| (DESIGN §4) */
  readonly tiltRad: number;
  readonly parts: readonly PlacedPart[];
  readonly face: FaceFrame;
  /** the plate outline on the face, face coordinates, CCW */
  readonly faceOutline: readonly Vec2[];
  /** the wedge as built, in its own frame (for reports) */
  readonly wedge: WedgePart;
}

/** Segments per quarter circle of the plate's rounded corners in the picture. */
const CORNER_SEGMENTS = 6;

/**
 * Place the three parts of a dial in the world frame (X east, Y north, Z up,
 * ground Z = 0, mm) for its spec's site:
 * - the latitude wedge (`wedgeSolid`, seat = the plate's width and length,
 *   payload = plate thickness + gnomon height, other sizes WEDGE_DEFAULTS),
 *   its seat rising toward the elevated pole: +Y (north) in the north, −Y in
 *   the south, tilted by |latitude|;
 * - the plate lying on the seat, its lower edge against the wedge's lip, its
 *   top face the dial face;
 * - the gnomon (`gnomonSolid`) standing on the face over the layout's style,
 *   tabs down into the slots.
 * The face frame of DESIGN §2 maps to world by `face`: x across (east in the
 * north, west in the south: seen face-on, pole-ward up, east is on the right
 * in the north), y up the slope toward the pole, z the outward normal.
 *
 * @example placeAssembly(layoutDial(spec)).face.normal // [0, -sin φ, cos φ] in the north
 */
export function placeAssembly(layout: DialLayout): Assembly {
  const { plate, gnomon } = layout;
  const t = plate.thicknessMm;
  const wedge = wedgeSolid({
    latitudeDeg: layout.spec.site.latitude,
    seatWidthMm: Math.max(20, plate.widthMm),
    seatLengthMm: Math.max(20, plate.lengthMm),
    payloadHeightMm: t + gnomon.heightMm,
  });
  const sign = layout.hemisphere === 'north' ? 1 : -1;
  // Wedge frame (x across, y toward the elevated pole, z up) to world: a half turn about Z in the south.
  const toWorld = (p: Vec3): Vec3 => [sign * p[0], sign * p[1], p[2]];
  const dirToWorld = toWorld;

  const [lowerLeft, lowerRight, , upperLeft] = wedge.seatCorners;
  const xAxisW = normalize3(sub3(lowerRight, lowerLeft));
  const yAxisW = normalize3(sub3(upperLeft, lowerLeft));
  const nW = wedge.seatNormal;
  // Plate lower-left corner on the seat's lower-left corner, centred across the seat.
  const inset = (Math.max(20, plate.widthMm) - plate.widthMm) / 2;
  const originW: Vec3 = [0, 1, 2].map((i) => lowerLeft[i] + (inset + plate.substyleX) * xAxisW[i] + plate.faceOriginY * yAxisW[i] + t * nW[i]) as unknown as Vec3;
  const face: FaceFrame = { origin: toWorld(originW), xAxis: dirToWorld(xAxisW), yAxis: dirToWorld(yAxisW), normal: dirToWorld(nW) };
  const onFace = (p: Vec3): Vec3 => faceToWorld(face, p);

  // Plate: the rounded outline as a prism from z = −t to the face (z = 0).
  const faceOutline = roundedRectOutline(-plate.substyleX, -plate.faceOriginY, plate.widthMm, plate.lengthMm, plate.cornerRadiusMm);
  const plateFacets = prismFacets(faceOutline, -t, 0).map((f) => ({ points: f.points.map(onFace), normal: rotate(face, f.normal) }));

  // Gnomon: centred on the style's middle, tabs as laid out.
  const yc = (gnomon.y0Mm + gnomon.y1Mm) / 2;
  const fin = gnomonSolid({
    heightMm: gnomon.heightMm,
    thicknessMm: gnomon.thicknessMm,
    lengthMm: gnomon.y1Mm - gnomon.y0Mm,
    tabs: gnomon.tabs.map((tab) => ({ centerYMm: tab.centerYMm - yc, lengthMm: tab.lengthMm, depthMm: t })),
    plateThicknessMm: t,
  });
  const gnomonFacets = meshFacets(fin.mesh, (p) => onFace([p[0], p[1] + yc, p[2]]));
  const wedgeFacets = meshFacets(wedge.mesh, toWorld);

  return {
    hemisphere: layout.hemisphere,
    tiltRad: wedge.tiltRad,
    parts: [
      { name: 'wedge', facets: wedgeFacets },
      { name: 'plate', facets: plateFacets },
      { name: 'gnomon', facets: gnomonFacets },
    ],
    face,
    faceOutline,
    wedge,
  };
}

/** Face coordinates to world. */
export function faceToWorld(face: FaceFrame, p: Vec3): Vec3 {
  return [0, 1, 2].map((i) => face.origin[i] + p[0] * face.xAxis[i] + p[1] * face.yAxis[i] + p[2] * face.normal[i]) as unknown as Vec3;
}

/** A world direction in face coordinates (the frame is orthonormal). */
export function worldToFaceDirection(face: FaceFrame, d: Vec3): Vec3 {
  const dot = (a: Vec3) => a[0] * d[0] + a[1] * d[1] + a[2] * d[2];
  return [dot(face.xAxis), dot(face.yAxis), dot(face.normal)];
}

function rotate(face: FaceFrame, d: Vec3): Vec3 {
  return [0, 1, 2].map((i) => d[0] * face.xAxis[i] + d[1] * face.yAxis[i] + d[2] * face.normal[i]) as unknown as Vec3;
}

/** Every triangle of a mesh as a facet, moved by `move` (a rigid motion), normal from its winding. */
function meshFacets(mesh: Mesh, move: (p: Vec3) => Vec3): Facet[] {
  return mesh.triangles.map(([a, b, c]) => {
    const pts = [mesh.positions[a], mesh.positions[b], mesh.positions[c]].map(move);
    return { points: pts, normal: normalize3(cross3(sub3(pts[1], pts[0]), sub3(pts[2], pts[0]))) };
  });
}

/** A CCW rounded rectangle from its lower-left corner, corners as CORNER_SEGMENTS-gons. */
export function roundedRectOutline(x0: number, y0: number, w: number, h: number, r: number): Vec2[] {
  const rr = Math.min(r, w / 2, h / 2);
  if (rr <= 0) return [[x0, y0], [x0 + w, y0], [x0 + w, y0 + h], [x0, y0 + h]];
  const centres: Vec2[] = [[x0 + w - rr, y0 + rr], [x0 + w - rr, y0 + h - rr], [x0 + rr, y0 + h - rr], [x0 + rr, y0 + rr]];
  const out: Vec2[] = [];
  centres.forEach(([cx, cy], k) => {
    for (let s = 0; s <= CORNER_SEGMENTS; s++) {
      const a = (-Math.PI / 2) + (k * Math.PI) / 2 + (s * Math.PI) / 2 / CORNER_SEGMENTS;
      out.push([cx + rr * Math.cos(a), cy + rr * Math.sin(a)]);
    }
  });
  return out;
}

/** Faces of a prism over a CCW outline from z0 to z1 (face frame), with outward normals. */
function prismFacets(outline: readonly Vec2[], z0: number, z1: number): Facet[] {
  const top: Facet = { points: outline.map(([x, y]) => [x, y, z1] as Vec3), normal: [0, 0, 1] };
  const bottom: Facet = { points: [...outline].reverse().map(([x, y]) => [x, y, z0] as Vec3), normal: [0, 0, -1] };
  const sides: Facet[] = outline.map((a, i) => {
    const b = outline[(i + 1) % outline.length];
    const n = normalize3([b[1] - a[1], -(b[0] - a[0]), 0]);
    return { points: [[a[0], a[1], z0], [b[0], b[1], z0], [b[0], b[1], z1], [a[0], a[1], z1]] as Vec3[], normal: n };
  });
  return [top, bottom, ...sides];
}
