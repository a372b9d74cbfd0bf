import { DEG } from '../guards.ts';
import type { Vec3 } from '../parts/mesh.ts';
import { cross3, dot3, normalize3 } from '../parts/vec3.ts';
import type { PlateDrawing } from '../plate/plateDrawing.ts';
import type { Vec2 } from '../types.ts';
import type { AssemblyView, FaceFrame, Facet, PictureItem, PlacedPart } from './assemblyTypes.ts';
import { shoelaceArea } from '../parts/ring2d.ts';
import { clipPolygonAbovePlane, clipPolygonConvex } from './clipPolygon.ts';
import { ASSEMBLY_CORNER_SEGMENTS, faceToWorld } from './placeAssembly.ts';
import { roundedRectPolygon } from '../outline/roundedRect.ts';

/** Options of the assembly pictures (`viewScene`, `viewAssembly`, `viewPlanarAssembly`). */
export interface AssemblyViewOptions {
  /** viewpoint azimuth, degrees east of the equator-ward direction (default 35) */
  readonly viewAzimuthDeg: number;
  /** viewpoint elevation above the horizon, degrees (default 30) */
  readonly viewElevationDeg: number;
  /** free border around the picture, mm (default 6) */
  readonly marginMm: number;
  /** ground shown around the wedge's footprint, mm (default 30) */
  readonly groundMm: number;
}

export const ASSEMBLY_VIEW_DEFAULTS: AssemblyViewOptions = { viewAzimuthDeg: 35, viewElevationDeg: 30, marginMm: 6, groundMm: 30 };

/** Share of the light a face gets when it faces away from the sun (sky light), 0..1. */
const AMBIENT = 0.45;

/**
 * The plane that takes the whole dial's shadow: the ground (Z = 0) under a
 * free-standing dial, the wall's face behind a wall dial. A point (u, v) of
 * it is origin + u·uAxis + v·vAxis; normal = uAxis × vAxis points to the
 * dial's side.
 */
export interface Backdrop {
  readonly kind: 'ground' | 'wall';
  readonly origin: Vec3;
  readonly uAxis: Vec3;
  readonly vAxis: Vec3;
  readonly normal: Vec3;
  /** the part of the plane drawn, (u, v) mm, counter-clockwise seen from the normal's side */
  readonly outline: readonly Vec2[];
}

/** What an assembly picture draws: the parts placed in the world (X east, Y north, Z up, mm), the dial face on one of them, the plane behind. */
export interface PlacedScene {
  readonly parts: readonly PlacedPart[];
  readonly face: FaceFrame;
  /** the plate outline on the face, face coordinates, CCW */
  readonly faceOutline: readonly Vec2[];
  /** the horizontal direction the dial is seen from before the view azimuth turns it, degrees east of north */
  readonly frontAzimuthDeg: number;
  /** +1: a positive view azimuth turns the viewer toward smaller azimuths (the east of a south front), −1 the other way */
  readonly azimuthSense: 1 | -1;
  readonly backdrop: Backdrop;
}

/** The scene seen at an angle: everything to paint, in order, in picture mm (x right, y down). */
export interface ScenePicture {
  readonly widthMm: number;
  readonly heightMm: number;
  readonly view: AssemblyView;
  readonly items: readonly PictureItem[];
}

/** A world point in picture mm. */
export function projectToPicture(view: AssemblyView, p: Vec3): Vec2 {
  return [dot3(p, view.right) - view.left, view.top - dot3(p, view.up)];
}

/**
 * A placed scene as an orthographic view (true mm at the picture's scale)
 * from a viewpoint above the ground on the face's side, with
 * - faces shaded by the sun: AMBIENT + (1 − AMBIENT)·max(0, n·s) (Lambert's
 *   cosine law), back faces culled;
 * - painter's order: the backdrop (ground or wall), the whole dial's shadow
 *   on it (every sun-facing facet in front of it projected along the rays
 *   onto its plane and painted in one colour: their union is the shadow),
 *   then the parts in the scene's order (each part's faces far to near), the
 *   face's engraving after the plate and the gnomon's shadow on the face
 *   just before the gnomon; parts are listed so that none hides an earlier
 *   one (each stands in front of the one before, seen from the face's side);
 * - the face engraving taken from the plate drawing (marks as their true
 *   width, numerals and title as strokes foreshortened by √|n·v|).
 *
 * @param sun unit vector toward the sun, world frame
 * @param faceShadow the gnomon's shadow on the face, face coordinates (clipped to the plate)
 * @example viewScene(scene, drawing, sun.direction, shadow.polygons).items.length
 */
export function viewScene(scene: PlacedScene, drawing: PlateDrawing, sun: Vec3, faceShadow: readonly (readonly Vec2[])[], options: Partial<AssemblyViewOptions> = {}): ScenePicture {
  const o = { ...ASSEMBLY_VIEW_DEFAULTS, ...options };
  const basis = viewBasis(scene, o.viewAzimuthDeg, o.viewElevationDeg);
  const s = sun;
  const P = (p: Vec3): Vec2 => [dot3(p, basis.right), -dot3(p, basis.up)];
  const painted: Placed[] = [...backdropItems(scene.backdrop, backdropShadow(scene, s), s, P)];
  for (const part of scene.parts) {
    painted.push(...partFaceItems(part, scene.face, basis.toViewer, s, P));
    if (part.name === 'plate') for (const it of faceEngraving(drawing, scene.face, basis.toViewer, P)) painted.push({ item: it, pts: [] });
  }
  const items = withFaceShadow(painted, faceShadow, scene.face, P);
  const frame = pictureFrame(items, o.marginMm);
  const view: AssemblyView = { ...basis, left: frame.left, top: -frame.topEdge };
  const shift = (p: Vec2): Vec2 => [p[0] - frame.left, p[1] - frame.topEdge];
  const moved = items.map(({ item }) => moveItem(item, shift));
  return { widthMm: frame.widthMm, heightMm: frame.heightMm, view, items: moved };
}

/** A picture item before the frame is known, with the unshifted points that size the frame (none for shadows and engraving). */
interface Placed {
  readonly item: PictureItem;
  readonly pts: readonly Vec2[];
}

/** The viewer's axes: toward the viewer (the front azimuth turned by the view azimuth, and the elevation), picture right and up. */
function viewBasis(scene: PlacedScene, viewAzimuthDeg: number, viewElevationDeg: number): { toViewer: Vec3; right: Vec3; up: Vec3 } {
  const azDeg = scene.frontAzimuthDeg - scene.azimuthSense * viewAzimuthDeg;
  const az = azDeg * DEG;
  const el = viewElevationDeg * DEG;
  const toViewer: Vec3 = [Math.sin(az) * Math.cos(el), Math.cos(az) * Math.cos(el), Math.sin(el)];
  const forward: Vec3 = [-toViewer[0], -toViewer[1], -toViewer[2]];
  const right = normalize3(cross3(forward, [0, 0, 1]));
  const up = cross3(right, forward);
  return { toViewer, right, up };
}

/** A backdrop point (u, v) in the world. */
function onBackdrop(b: Backdrop, [u, v]: Vec2): Vec3 {
  return [0, 1, 2].map((i) => b.origin[i] + u * b.uAxis[i] + v * b.vAxis[i]) as unknown as Vec3;
}

/**
 * The dial's shadow on the backdrop: every sun-facing facet in front of its
 * plane projected along −s onto it, (u, v), CCW, clipped to its outline;
 * none when the sun is behind the plane.
 */
function backdropShadow(scene: PlacedScene, s: Vec3): Vec2[][] {
  const b = scene.backdrop;
  const ns = dot3(b.normal, s);
  if (!(ns > 1e-9)) return [];
  const height = (p: Vec3) => dot3(b.normal, [p[0] - b.origin[0], p[1] - b.origin[1], p[2] - b.origin[2]]);
  const out: Vec2[][] = [];
  for (const part of scene.parts) {
    for (const f of part.facets) {
      if (dot3(f.normal, s) <= 1e-9) continue;
      if (f.points.every((p) => height(p) <= 1e-9)) continue;
      let q: Vec2[] = f.points.map((p) => {
        const k = height(p) / ns;
        const d: Vec3 = [p[0] - k * s[0] - b.origin[0], p[1] - k * s[1] - b.origin[1], p[2] - k * s[2] - b.origin[2]];
        return [dot3(d, b.uAxis), dot3(d, b.vAxis)];
      });
      const a = shoelaceArea(q);
      if (Math.abs(a) < 1e-9) continue;
      if (a < 0) q = q.reverse();
      q = clipPolygonConvex(q, b.outline);
      if (q.length >= 3) out.push(q);
    }
  }
  return out;
}

/** The backdrop and the dial's shadow on it, the first two items painted (the shadow does not size the frame). */
function backdropItems(b: Backdrop, shadow: readonly Vec2[][], s: Vec3, P: (p: Vec3) => Vec2): Placed[] {
  const outline = b.outline.map((p) => P(onBackdrop(b, p)));
  const shadowPolygons = shadow.map((poly) => poly.map((p) => P(onBackdrop(b, p))));
  const surface: PictureItem = b.kind === 'ground'
    ? { kind: 'ground', polygon: outline }
    : { kind: 'wall', shade: round6(AMBIENT + (1 - AMBIENT) * Math.max(0, dot3(b.normal, s))), polygon: outline };
  return [
    { item: surface, pts: outline },
    { item: { kind: 'shadow', on: b.kind, polygons: shadowPolygons }, pts: [] },
  ];
}

/** One part's faces toward the viewer (the gnomon's clipped at the face), grouped by plane, far to near, shaded by the sun. */
function partFaceItems(part: PlacedPart, face: FaceFrame, toViewer: Vec3, s: Vec3, P: (p: Vec3) => Vec2): Placed[] {
  const heightOverFace = (p: Vec3) => dot3([p[0] - face.origin[0], p[1] - face.origin[1], p[2] - face.origin[2]], face.normal) + 1e-9;
  const facets: Facet[] = [];
  for (const f of part.facets) {
    if (dot3(f.normal, toViewer) <= 1e-9) continue;
    const pts = part.name === 'gnomon' ? clipPolygonAbovePlane(f.points, heightOverFace) : [...f.points];
    if (pts.length >= 3) facets.push({ points: pts, normal: f.normal });
  }
  const groups = coplanarGroups(facets)
    .map((group) => ({ group, d: meanDepth(group, toViewer) }))
    .sort((a, b) => a.d - b.d);
  return groups.map(({ group }) => {
    const shade = AMBIENT + (1 - AMBIENT) * Math.max(0, dot3(group[0].normal, s));
    const polys = group.map((f) => f.points.map(P));
    return { item: { kind: 'face', part: part.name, shade: round6(shade), polygons: polys }, pts: polys.flat() };
  });
}

/** The mean distance toward the viewer of a group's points (larger is nearer). */
function meanDepth(group: readonly Facet[], toViewer: Vec3): number {
  let sum = 0;
  let count = 0;
  for (const f of group) for (const p of f.points) (sum += dot3(p, toViewer)), count++;
  return sum / count;
}

/** The items with the gnomon's shadow on the face put just before the gnomon's own faces (or last without a gnomon). */
function withFaceShadow(items: readonly Placed[], shadow: readonly (readonly Vec2[])[], face: FaceFrame, P: (p: Vec3) => Vec2): Placed[] {
  const firstGnomon = items.findIndex((e) => e.item.kind === 'face' && e.item.part === 'gnomon');
  const shadowItem: Placed = { item: { kind: 'shadow', on: 'face', polygons: shadow.map((poly) => poly.map(([x, y]) => P(faceToWorld(face, [x, y, 0])))) }, pts: [] };
  const at = firstGnomon < 0 ? items.length : firstGnomon;
  return [...items.slice(0, at), shadowItem, ...items.slice(at)];
}

/** The picture frame from everything but the (clipped) shadows and engraving, with the margin, on whole mm. */
function pictureFrame(items: readonly Placed[], marginMm: number): { left: number; topEdge: number; widthMm: number; heightMm: number } {
  const all = items.flatMap((e) => e.pts);
  const minX = Math.min(...all.map((p) => p[0])) - marginMm;
  const maxX = Math.max(...all.map((p) => p[0])) + marginMm;
  const minY = Math.min(...all.map((p) => p[1])) - marginMm;
  const maxY = Math.max(...all.map((p) => p[1])) + marginMm;
  const left = Math.floor(minX);
  const topEdge = Math.floor(minY);
  return { left, topEdge, widthMm: Math.ceil(maxX) - left, heightMm: Math.ceil(maxY) - topEdge };
}

/** Holes, slots, marks and text of the plate drawing, on the face in the picture. */
function faceEngraving(drawing: PlateDrawing, face: FaceFrame, toViewer: Vec3, P: (p: Vec3) => Vec2): PictureItem[] {
  const dx = drawing.substyleX;
  const dy = drawing.faceOriginY;
  const onFace = (x: number, y: number): Vec2 => P(faceToWorld(face, [x - dx, y - dy, 0]));
  const foreshorten = Math.sqrt(Math.abs(dot3(face.normal, toViewer)));
  const out: PictureItem[] = [];
  for (const c of drawing.holes) {
    const poly = Array.from({ length: 32 }, (_, k) => onFace(c.cx + c.radiusMm * Math.cos((k * Math.PI) / 16), c.cy + c.radiusMm * Math.sin((k * Math.PI) / 16)));
    out.push({ kind: 'engraving', role: 'hole', label: 'hole', polygon: poly });
  }
  for (const r of drawing.slots) {
    const poly = roundedRectPolygon(r, ASSEMBLY_CORNER_SEGMENTS).map(([x, y]) => onFace(x, y));
    out.push({ kind: 'engraving', role: 'slot', label: 'slot', polygon: poly });
  }
  for (const l of drawing.lines) {
    const pts = l.path.points;
    if (pts.length === 2) {
      const [a, b] = pts;
      const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
      const nx = (-(b[1] - a[1]) / len) * (l.widthMm / 2);
      const ny = ((b[0] - a[0]) / len) * (l.widthMm / 2);
      out.push({ kind: 'engraving', role: 'mark', label: l.label, polygon: [onFace(a[0] - nx, a[1] - ny), onFace(b[0] - nx, b[1] - ny), onFace(b[0] + nx, b[1] + ny), onFace(a[0] + nx, a[1] + ny)] });
    } else {
      out.push({ kind: 'stroke', role: 'label', widthMm: round6(l.widthMm * foreshorten), points: pts.map(([x, y]) => onFace(x, y)) });
    }
  }
  for (const t of drawing.text) {
    for (const st of t.strokes) out.push({ kind: 'stroke', role: t.role, widthMm: round6(t.strokeWidthMm * foreshorten), points: st.points.map(([x, y]) => onFace(x, y)) });
  }
  return out;
}

/** Facets grouped by plane (same normal and offset), in far-to-near order of their centroids. */
function coplanarGroups(facets: readonly Facet[]): Facet[][] {
  const groups = new Map<string, Facet[]>();
  for (const f of facets) {
    const n = f.normal;
    const d = dot3(n, f.points[0]);
    const key = `${n.map((c) => Math.round(c * 1e5)).join(',')}|${Math.round(d * 1e3)}`;
    const list = groups.get(key);
    if (list) list.push(f);
    else groups.set(key, [f]);
  }
  return [...groups.values()];
}

function moveItem(item: PictureItem, m: (p: Vec2) => Vec2): PictureItem {
  switch (item.kind) {
    case 'ground':
    case 'wall':
      return { ...item, polygon: item.polygon.map(m) };
    case 'face':
    case 'shadow':
      return { ...item, polygons: item.polygons.map((p) => p.map(m)) };
    case 'engraving':
      return { ...item, polygon: item.polygon.map(m) };
    case 'stroke':
      return { ...item, points: item.points.map(m) };
  }
}

function round6(v: number): number {
  return Math.round(v * 1e6) / 1e6;
}
