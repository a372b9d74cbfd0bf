import { dialGnomon, dialWedge, faceToWedge, gnomonOnPlate } from '../parts/dialParts.ts';
import type { Mesh, Vec3 } from '../parts/mesh.ts';
import { partsPlan } from '../parts/partsPlan.ts';
import { cross3, normalize3, sub3 } from '../parts/vec3.ts';
import type { WedgePart } from '../parts/wedgeSolid.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import type { Hemisphere, Vec2 } from '../types.ts';
import type { FaceFrame, Facet, PlacedPart } from './assemblyTypes.ts';
import { flatStand, type SizedStand } from '../stand/flatStand.ts';
import { placePoint } from '../stand/placeStandPart.ts';
import { standFacets } from './standFacets.ts';
import { roundedRectPolygon } from '../outline/roundedRect.ts';

/** The dial as it stands: wedge on level ground, plate on the wedge's seat, gnomon in the plate's slots. */
export interface Assembly {
  readonly hemisphere: Hemisphere;
  /** the seat's (and the plate's) tilt from the horizontal, radians: |latitude| (docs/design.md §4) */
  readonly tiltRad: number;
  readonly parts: readonly PlacedPart[];
  readonly face: FaceFrame;
  /** the plate outline on the face, face coordinates, CCW */
  readonly faceOutline: readonly Vec2[];
  /** the wedge as built, in its own frame (for reports), or null on a flat-pack stand */
  readonly wedge: WedgePart | null;
  /** the flat-pack stand (cut processes), or null on a printed wedge */
  readonly stand: SizedStand | null;
  /** what stands on the ground, in the wedge's or stand's frame (x across, y toward the pole), mm */
  readonly footprint: { readonly xMinMm: number; readonly xMaxMm: number; readonly yMinMm: number; readonly yMaxMm: number };
}

/** Segments per quarter circle of the plate's rounded corners in the picture. */
export const ASSEMBLY_CORNER_SEGMENTS = 6;

/**
 * Place the three parts of a dial in the world frame (X east, Y north, Z up,
 * ground Z = 0, mm) for its spec's site:
 * - the flat-pack stand (cut processes: as stand.stl, with its anchors and
 *   the plate's screws, washers and nuts) or the latitude wedge (print),
 *   and the gnomon exactly as stand.stl, wedge.stl and gnomon.stl
 *   are built (`partsPlan`, `dialWedge`, `dialGnomon`), placed with the parts'
 *   own maps (`faceToWedge`: the plate on the seat against the lip;
 *   `gnomonOnPlate`: the fin on the face, tabs in the slots);
 * - the wedge frame turned to the world: its seat rises toward the elevated
 *   pole, +Y (north) in the north, −Y (a half turn about Z) in the south;
 * - the plate as a prism of its rounded outline and thickness.
 * The face frame of docs/design.md §2 maps to world by `face`: x across (east in the
 * north, west in the south: seen face-on, pole-ward up, east is on the right
 * in the north), y up the slope toward the pole, z the outward normal.
 *
 * @example placeAssembly(layoutDial(spec)).face.normal // [0, -sin φ, cos φ] in the north
 */
export function placeAssembly(layout: DialLayout): Assembly {
  const { plate } = layout;
  const t = plate.thicknessMm;
  // The very parts gnomon.stl and wedge.stl are written from, and their placement (parts/dialParts.ts).
  const plan = partsPlan(layout);
  // Cut processes stand on the flat-pack stand (stand.dxf / stand.stl), printed dials on the wedge.
  const stand = plan.files.includes('stand.dxf') || plan.files.includes('stand.stl') ? flatStand(layout) : null;
  const wedge = stand === null ? dialWedge(plan, layout) : null;
  const fin = dialGnomon(plan, layout);
  const faceToWedgeFrame = wedge !== null ? faceToWedge(layout, wedge) : faceToSeat(layout, stand!);
  const sign = layout.hemisphere === 'north' ? 1 : -1;
  // Wedge frame (x across, y toward the elevated pole, z up) to world: a half turn about Z in the south.
  const toWorld = (p: Vec3): Vec3 => [sign * p[0], sign * p[1], p[2]];
  const o = toWorld(faceToWedgeFrame([0, 0, 0]));
  const axis = (p: Vec3): Vec3 => normalize3(sub3(toWorld(faceToWedgeFrame(p)), o));
  const face: FaceFrame = { origin: o, xAxis: axis([1, 0, 0]), yAxis: axis([0, 1, 0]), normal: axis([0, 0, 1]) };
  const onFace = (p: Vec3): Vec3 => faceToWorld(face, p);

  // Plate: the rounded outline as a prism from z = −t to the face (z = 0).
  const faceOutline = roundedRectPolygon(
    { kind: 'rect', cx: -plate.substyleX + plate.widthMm / 2, cy: -plate.faceOriginY + plate.lengthMm / 2, widthMm: plate.widthMm, heightMm: plate.lengthMm, cornerRadiusMm: plate.cornerRadiusMm },
    ASSEMBLY_CORNER_SEGMENTS,
  );
  const plateFacets = prismFacets(faceOutline, -t, 0).map((f) => ({ points: f.points.map(onFace), normal: rotate(face, f.normal) }));
  const gnomonFacets = meshFacets(gnomonOnPlate(fin, plan), onFace);
  const turn = (d: Vec3): Vec3 => [sign * d[0], sign * d[1], d[2]];
  const worldFacets = (fs: readonly { points: readonly Vec3[]; normal: Vec3 }[]): Facet[] => fs.map((f) => ({ points: f.points.map(toWorld), normal: turn(f.normal) }));
  const sf = stand !== null ? standFacets(layout, stand) : null;
  const parts: PlacedPart[] = sf !== null
    ? [
        { name: 'stand', facets: worldFacets(sf.stand) },
        { name: 'plate', facets: plateFacets },
        { name: 'fixings', facets: worldFacets(sf.fixings) },
        { name: 'gnomon', facets: gnomonFacets },
      ]
    : [
        { name: 'wedge', facets: meshFacets(wedge!.mesh, toWorld) },
        { name: 'plate', facets: plateFacets },
        { name: 'gnomon', facets: gnomonFacets },
      ];
  const fp = stand !== null ? stand.footprint : wedge!.footprint;
  return {
    hemisphere: layout.hemisphere,
    tiltRad: stand !== null ? stand.dims.tiltRad : wedge!.tiltRad,
    parts,
    face,
    faceOutline,
    wedge,
    stand,
    footprint: fp,
  };
}

/**
 * Map from the face frame to the stand's frame for the plate lying on the
 * seat rails: plate coordinates (x + substyleX, y + faceOriginY, z from the
 * plate's underside) laid on the seat from the point under the plate's
 * lower-left corner (its lower edge flush with the lower rail's, its sides
 * flush with the rails' ends), as the installation sheet says.
 */
export function faceToSeat(layout: DialLayout, stand: SizedStand): (p: Vec3) => Vec3 {
  const { substyleX, faceOriginY, thicknessMm } = layout.plate;
  return ([x, y, z]) => placePoint(stand.seat, [x + substyleX, y + faceOriginY, z + thicknessMm]);
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

/** A face-frame direction in the world. */
export function rotate(face: FaceFrame, d: Vec3): Vec3 {
  return [0, 1, 2].map((i) => d[0] * face.xAxis[i] + d[1] * face.yAxis[i] + d[2] * face.normal[i]) as unknown as Vec3;
}

/** Every triangle of a mesh as a facet, moved by `move` (a rigid motion), normal from its winding. */
export function meshFacets(mesh: Mesh, move: (p: Vec3) => Vec3): Facet[] {
  return mesh.triangles.map(([a, b, c]) => {
    const pts = [mesh.positions[a], mesh.positions[b], mesh.positions[c]].map(move);
    return { points: pts, normal: normalize3(cross3(sub3(pts[1], pts[0]), sub3(pts[2], pts[0]))) };
  });
}

/** Faces of a prism over a CCW outline from z0 to z1 (face frame), with outward normals. */
export function prismFacets(outline: readonly Vec2[], z0: number, z1: number): Facet[] {
  const top: Facet = { points: outline.map(([x, y]) => [x, y, z1] as Vec3), normal: [0, 0, 1] };
  const bottom: Facet = { points: [...outline].reverse().map(([x, y]) => [x, y, z0] as Vec3), normal: [0, 0, -1] };
  const sides: Facet[] = outline.map((a, i) => {
    const b = outline[(i + 1) % outline.length];
    const n = normalize3([b[1] - a[1], -(b[0] - a[0]), 0]);
    return { points: [[a[0], a[1], z0], [b[0], b[1], z0], [b[0], b[1], z1], [a[0], a[1], z1]] as Vec3[], normal: n };
  });
  return [top, bottom, ...sides];
}
