import type { Vec3 } from '../parts/mesh.ts';
import { cross3, dot3, normalize3 } from '../parts/vec3.ts';
import { equatorialStand, equatorialStandApplies } from '../planar/equatorialStand.ts';
import type { PlanarLayout } from '../planar/layoutPlanar.ts';
import { PILLAR_LEVELLING_GAP_MM } from '../planar/pillarFixing.ts';
import { planarGnomonSolid } from '../planar/planarGnomonSolid.ts';
import { WALL_MOUNT_RIM_MM, wallMount } from '../planar/wallMount.ts';
import { screwForHole } from '../stand/metricFasteners.ts';
import type { Circle, Vec2 } from '../types.ts';
import type { FaceFrame, Facet, PlacedPart } from './assemblyTypes.ts';
import { ASSEMBLY_CORNER_SEGMENTS, faceToWorld, meshFacets, prismFacets, rotate } from './placeAssembly.ts';
import { placedPartFacets } from './standFacets.ts';
import { groundBackdrop } from './viewAssembly.ts';
import type { Backdrop, PlacedScene } from './viewScene.ts';
import { roundedRectPolygon } from '../outline/roundedRect.ts';

/** How a planar face stands in its picture. */
export type PlanarMounting = 'pillar' | 'wall' | 'stand';

/** A horizontal, wall, meridian or equatorial face placed at its site, ready for `viewScene`. */
export interface PlanarAssembly extends PlacedScene {
  readonly mounting: PlanarMounting;
}

/** Height of the pillar drawn under a horizontal plate, as a share of the plate's longer side (a picture's proportion, not a building rule). */
export const PICTURE_PILLAR_HEIGHT_PER_PLATE = 0.6;
/** The pillar top's margin around the plate, mm. */
export const PICTURE_PILLAR_MARGIN_MM = 25;
/** The patch of wall drawn beyond the mount on every side, as a share of the mount's longer side, and its thickness, mm. */
export const PICTURE_WALL_MARGIN_PER_MOUNT = 0.15;
export const PICTURE_WALL_THICKNESS_MM = 60;
/** Sides of the round fixings (studs, nuts, screw heads) in the pictures. */
const FIXING_SIDES = 12;

/**
 * A planar face as it stands at its site, in the world frame of the
 * pictures (X east, Y north, Z up, mm), the face frame being the layout's
 * (`layout.face`: x right, y along the substyle, z the outward normal,
 * origin the face origin):
 * - **horizontal**: the plate on its pillar (a block PICTURE_PILLAR_MARGIN_MM
 *   wider than the plate, on the ground), PILLAR_LEVELLING_GAP_MM above its
 *   top on one stud per plate hole with a levelling nut under the plate and a
 *   nut over it (`pillarFixing`);
 * - **vertical, reclining, meridian**: the plate on its wall mount
 *   (`wallMount`: WALL_MOUNT_RIM_MM larger each side, the plate's thickness,
 *   its anchors' heads in the rim), on a patch of the wall square to the
 *   plumb line, the screws' heads over the plate's holes; the wall's face
 *   takes the dial's shadow;
 * - **equatorial**: the plate on its stand (`equatorialStand`, the very
 *   parts and placements stand.stl is built from), on the ground;
 * with the gnomon (`planarGnomonSolid`: the fin with its tabs, or the rod)
 * and the plate as a prism of its rounded outline. The view's front is the
 * face's own horizontal direction (the equator-ward one for a level face).
 * Null for an equatorial face beyond the latitudes its stand is built for.
 *
 * @example placePlanarAssembly(layoutPlanar(spec))?.mounting // 'pillar'
 */
export function placePlanarAssembly(layout: PlanarLayout, groundMm = 30): PlanarAssembly | null {
  const north = layout.hemisphere === 'north';
  switch (layout.faceType) {
    case 'horizontal':
      return onPillar(layout, groundMm, north);
    case 'vertical':
    case 'meridian':
      return onWall(layout, north);
    case 'equatorial':
      return equatorialStandApplies(layout) ? onStand(layout, groundMm, north) : null;
  }
}

/** The plate outline on the face (face coordinates, CCW), as the polar picture draws it. */
function plateOutline(layout: PlanarLayout): Vec2[] {
  const p = layout.plate;
  return roundedRectPolygon({ kind: 'rect', cx: -p.substyleX + p.widthMm / 2, cy: -p.faceOriginY + p.lengthMm / 2, widthMm: p.widthMm, heightMm: p.lengthMm, cornerRadiusMm: p.cornerRadiusMm }, ASSEMBLY_CORNER_SEGMENTS);
}

/** A face frame from the layout's axes at a world origin. */
function frameAt(layout: PlanarLayout, origin: Vec3): FaceFrame {
  const f = layout.face;
  return { origin, xAxis: f.right, yAxis: f.up, normal: f.normal };
}

/** Prism facets in the face frame, moved to the world. */
function onFace(face: FaceFrame, facets: readonly Facet[]): Facet[] {
  return facets.map((f) => ({ points: f.points.map((p) => faceToWorld(face, p)), normal: rotate(face, f.normal) }));
}

/** An n-gon round the point (x, y), CCW. */
function ring([x, y]: Vec2, radiusMm: number, sides = FIXING_SIDES): Vec2[] {
  return Array.from({ length: sides }, (_, k) => [x + radiusMm * Math.cos((2 * Math.PI * k) / sides), y + radiusMm * Math.sin((2 * Math.PI * k) / sides)] as Vec2);
}

/** A rectangle, CCW. */
function rect(x0: number, y0: number, x1: number, y1: number): Vec2[] {
  return [[x0, y0], [x1, y0], [x1, y1], [x0, y1]];
}

/** The plate prism and the gnomon on the face. */
function plateAndGnomon(layout: PlanarLayout, face: FaceFrame): { plate: PlacedPart; gnomon: PlacedPart; outline: Vec2[] } {
  const outline = plateOutline(layout);
  const plate: PlacedPart = { name: 'plate', facets: onFace(face, prismFacets(outline, -layout.plate.thicknessMm, 0)) };
  const gnomon: PlacedPart = { name: 'gnomon', facets: meshFacets(planarGnomonSolid(layout).mesh, (p) => faceToWorld(face, p)) };
  return { plate, gnomon, outline };
}

/** Screw heads over the plate's holes (not the rod's), face frame. */
function screwHeads(holes: readonly Circle[], skip: (h: Circle) => boolean): Facet[] {
  const out: Facet[] = [];
  for (const h of holes) {
    if (skip(h)) continue;
    const s = screwForHole(2 * h.radiusMm);
    if (!s) continue;
    out.push(...prismFacets(ring([h.cx, h.cy], s.washerOdMm * 0.45), 0, s.nutHeightMm * 0.55));
  }
  return out;
}

/** Plate holes in face coordinates. */
function faceHoles(layout: PlanarLayout): Circle[] {
  const p = layout.plate;
  return p.holes.map((h) => ({ ...h, cx: h.cx - p.substyleX, cy: h.cy - p.faceOriginY }));
}

/** The world X/Y box of some points grown by g, CCW seen from above. */
function groundAround(points: readonly Vec3[], g: number): Vec2[] {
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  return rect(Math.min(...xs) - g, Math.min(...ys) - g, Math.max(...xs) + g, Math.max(...ys) + g);
}

/** The view's front: the face normal's horizontal direction, degrees east of north (the equator-ward one for a level face). */
function frontOf(layout: PlanarLayout, north: boolean): number {
  const n = layout.face.normal;
  if (Math.hypot(n[0], n[1]) < 1e-9) return north ? 180 : 0;
  const az = (Math.atan2(n[0], n[1]) * 180) / Math.PI;
  return az < 0 ? az + 360 : az;
}

function onPillar(layout: PlanarLayout, groundMm: number, north: boolean): PlanarAssembly {
  const p = layout.plate;
  const t = p.thicknessMm;
  const pillarH = PICTURE_PILLAR_HEIGHT_PER_PLATE * Math.max(p.widthMm, p.lengthMm);
  const top = -t - PILLAR_LEVELLING_GAP_MM; // the pillar top, below the face
  const face = frameAt(layout, [0, 0, pillarH - top]);
  const { plate, gnomon, outline } = plateAndGnomon(layout, face);
  const m = PICTURE_PILLAR_MARGIN_MM;
  const x0 = -p.substyleX;
  const y0 = -p.faceOriginY;
  const block = onFace(face, prismFacets(rect(x0 - m, y0 - m, x0 + p.widthMm + m, y0 + p.lengthMm + m), top - pillarH, top));
  const under: Facet[] = [];
  const over: Facet[] = [];
  for (const h of faceHoles(layout)) {
    const s = screwForHole(2 * h.radiusMm);
    if (!s) continue;
    under.push(...prismFacets(ring([h.cx, h.cy], s.nominalMm / 2), top, -t));
    under.push(...prismFacets(ring([h.cx, h.cy], s.washerOdMm * 0.45, 6), -t - s.washerMm - s.nutHeightMm, -t));
    over.push(...prismFacets(ring([h.cx, h.cy], s.washerOdMm * 0.45, 6), 0, s.washerMm + s.nutHeightMm));
  }
  const parts: PlacedPart[] = [
    { name: 'pillar', facets: block },
    { name: 'fixings', facets: onFace(face, under) },
    plate,
    { name: 'fixings', facets: onFace(face, over) },
    gnomon,
  ];
  const base = block.flatMap((f) => f.points).filter((q) => Math.abs(q[2]) < 1e-6);
  return { mounting: 'pillar', parts, face, faceOutline: outline, frontAzimuthDeg: frontOf(layout, north), azimuthSense: north ? 1 : -1, backdrop: groundBackdrop(groundAround(base, groundMm)) };
}

function onWall(layout: PlanarLayout, north: boolean): PlanarAssembly {
  const p = layout.plate;
  const t = p.thicknessMm;
  const n = layout.face.normal;
  const face = frameAt(layout, [0, 0, 0]);
  const { plate, gnomon, outline } = plateAndGnomon(layout, face);
  const mount = wallMount(layout);
  const R = mount ? WALL_MOUNT_RIM_MM : 0;
  const tm = mount ? mount.part.thicknessMm : 0;
  const x0 = -p.substyleX - R;
  const y0 = -p.faceOriginY - R;
  const mountRect = rect(x0, y0, x0 + p.widthMm + 2 * R, y0 + p.lengthMm + 2 * R);
  const parts: PlacedPart[] = [];
  // The wall's own axes: its line of steepest ascent (the plumb line on an upright wall) and the level line.
  const zUp: Vec3 = [-n[2] * n[0], -n[2] * n[1], 1 - n[2] * n[2]];
  const up = normalize3(zUp);
  const right = cross3(up, n);
  const front = faceToWorld(face, [0, 0, -t - tm]);
  const corners = mountRect.map(([x, y]) => faceToWorld(face, [x, y, -t - tm]));
  const us = corners.map((c) => dot3([c[0] - front[0], c[1] - front[1], c[2] - front[2]], right));
  const vs = corners.map((c) => dot3([c[0] - front[0], c[1] - front[1], c[2] - front[2]], up));
  const g = PICTURE_WALL_MARGIN_PER_MOUNT * Math.max(Math.max(...us) - Math.min(...us), Math.max(...vs) - Math.min(...vs));
  const patch = rect(Math.min(...us) - g, Math.min(...vs) - g, Math.max(...us) + g, Math.max(...vs) + g);
  const wallFrame: FaceFrame = { origin: front, xAxis: right, yAxis: up, normal: n };
  // The slab behind the wall's face, without that face (the backdrop paints it, with the shadow on it).
  parts.push({ name: 'wall', facets: onFace(wallFrame, prismFacets(patch, -PICTURE_WALL_THICKNESS_MM, 0).slice(1)) });
  if (mount) {
    parts.push({ name: 'mount', facets: onFace(face, prismFacets(mountRect, -t - tm, -t)) });
    const anchors = mount.anchors.map(([ax, ay]) => prismFacets(ring([x0 + ax, y0 + ay], 6), -t, -t + 3.5)).flat();
    parts.push({ name: 'fixings', facets: onFace(face, anchors) });
  }
  parts.push(plate, { name: 'fixings', facets: onFace(face, screwHeads(faceHoles(layout), () => false)) }, gnomon);
  const backdrop: Backdrop = { kind: 'wall', origin: front, uAxis: right, vAxis: up, normal: n, outline: patch };
  return { mounting: 'wall', parts, face, faceOutline: outline, frontAzimuthDeg: frontOf(layout, north), azimuthSense: north ? 1 : -1, backdrop };
}

function onStand(layout: PlanarLayout, groundMm: number, north: boolean): PlanarAssembly {
  const stand = equatorialStand(layout);
  const face = frameAt(layout, stand.faceOriginMm);
  const { plate, gnomon, outline } = plateAndGnomon(layout, face);
  const standFacets = placedPartFacets(stand.parts, stand.instances);
  const heads = screwHeads(faceHoles(layout), (h) => Math.hypot(h.cx, h.cy) < 1e-6);
  const parts: PlacedPart[] = [
    { name: 'stand', facets: standFacets },
    plate,
    { name: 'fixings', facets: onFace(face, heads) },
    gnomon,
  ];
  const onGround = standFacets.flatMap((f) => f.points).filter((q) => Math.abs(q[2]) < 1e-6);
  return { mounting: 'stand', parts, face, faceOutline: outline, frontAzimuthDeg: frontOf(layout, north), azimuthSense: north ? 1 : -1, backdrop: groundBackdrop(groundAround(onGround, groundMm)) };
}
