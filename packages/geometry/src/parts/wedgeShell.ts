import type { Manifold, ManifoldToplevel, Vec3 as MVec3 } from 'manifold-3d';
import { manifoldScope, type Keep } from './manifoldScope.ts';
import { manifoldFromMesh, meshFromManifold } from './manifoldMesh.ts';
import type { Mesh, Vec3 } from './mesh.ts';
import { meshVolumeMm3 } from './meshVolumeMm3.ts';
import type { SeatPocket } from './seatPockets.ts';
import { validateMesh } from './validateMesh.ts';
import type { WedgePart } from './wedgeSolid.ts';
import { cross3 } from './vec3.ts';

/** A band of the wedge kept solid (where a bed split's dovetails run), wedge frame. */
export interface SolidBand {
  readonly axis: 'x' | 'y';
  readonly fromMm: number;
  readonly toMm: number;
}

export interface WedgeShellOptions {
  /** skin and rib thickness, mm; 0 keeps the wedge solid (only the pockets are cut) */
  readonly wallMm: number;
  /** largest clear gap between ribs across x, mm */
  readonly ribSpacingMm: number;
  /** blind insert pockets into the seat */
  readonly pockets: readonly SeatPocket[];
  /** bands left solid (dovetail joints of a bed split) */
  readonly solidBands: readonly SolidBand[];
  /** diameter of the drain hole through the floor of each hollow cell, mm */
  readonly drainDiameterMm: number;
}

export const WEDGE_SHELL_DEFAULTS: WedgeShellOptions = { wallMm: 3, ribSpacingMm: 40, pockets: [], solidBands: [], drainDiameterMm: 4 };

/** The printed wedge as plain data. */
export interface WedgeShellPart {
  readonly kind: 'wedgeShell';
  readonly mesh: Mesh;
  /** the solid wedge's volume (wedgeSolid, no pockets), mm³ */
  readonly solidVolumeMm3: number;
  readonly volumeMm3: number;
  /** 1 − volume / solid volume */
  readonly savingFraction: number;
  readonly wallMm: number;
  /** rib planes x = const inside the cavity, wedge frame, mm */
  readonly ribXsMm: readonly number[];
  /** hollow cells (each with its drain hole) */
  readonly cells: number;
  readonly drainHoles: readonly Vec3[];
  readonly pockets: readonly SeatPocket[];
}

/** Sides of the round pockets, bosses and drains. */
const ROUND_SEGMENTS = 32;
/** How far cutters reach past the surface they open, mm (no coplanar cut). */
const OVERSHOOT_MM = 1;
/** A cell smaller than this in section is left solid, mm² (nothing worth hollowing). */
const MIN_CELL_AREA_MM2 = 100;

/**
 * The latitude wedge for printing: the solid of wedgeSolid hollowed to a
 * shell, with inner ribs, bosses under the insert pockets and one drain hole
 * per hollow cell (manifold-3d booleans; DEPS.md).
 *
 * - Cavity: the wedge's (y, z) profile offset inward by the wall, kept
 *   behind the lip (y ≥ seat lower edge + wall, so the toe with its ground
 *   holes and arrow stays solid), over x ∈ [−W/2 + wall, W/2 − wall].
 * - Ribs: vertical plates x = const, wall thick, as few as keep every clear
 *   gap ≤ ribSpacing. Printed base down, each layer of the sloping seat skin
 *   then bridges from rib to rib (≤ ribSpacing), and everything else is
 *   vertical or faces up: no support inside (common practice: bridges of
 *   40–50 mm print clean in PLA and PETG).
 * - Solid bands (a bed split's dovetail joints) are not hollowed.
 * - Bosses: round the pockets, the convex hull of the pocket grown by the
 *   wall and its shadow on the floor, so each boss stands on the floor with
 *   vertical sides (nothing overhangs) and surrounds its insert with at least
 *   a wall of plastic.
 * - Drain holes: one through the floor of every cell, so rain water or
 *   condensation that gets in runs out; this also makes the part one shell.
 * - Pockets: blind round holes along the seat normal from the seat, for the
 *   heat-set inserts (seatPockets).
 *
 * @example (await wedgeShell(dialWedge(plan, layout), { ...WEDGE_SHELL_DEFAULTS })).savingFraction
 */
export async function wedgeShell(wedge: WedgePart, options: Partial<WedgeShellOptions> = {}): Promise<WedgeShellPart> {
  const o: WedgeShellOptions = { ...WEDGE_SHELL_DEFAULTS, ...options };
  return manifoldScope(async (wasm, keep) => {
    const solid = keep(manifoldFromMesh(wasm, wedge.mesh));
    const solidVolumeMm3 = meshVolumeMm3(wedge.mesh);
    let part: Manifold = solid;
    let ribXsMm: number[] = [];
    const drainHoles: Vec3[] = [];
    let cells = 0;
    if (o.wallMm > 0) {
      const hollow = cavity(wasm, keep, wedge, o);
      if (hollow !== null) {
        ribXsMm = hollow.ribXs;
        const parts = hollow.cavity.decompose().map(keep);
        const cutters: Manifold[] = [];
        const r = o.drainDiameterMm / 2;
        for (const cell of parts) {
          const at = drainPoint(wasm, keep, cell, o.wallMm, r);
          if (at === null) continue;
          cells++;
          drainHoles.push([at[0], at[1], 0]);
          cutters.push(cell, keep(keep(wasm.Manifold.cylinder(o.wallMm + 2 * OVERSHOOT_MM, r, r, ROUND_SEGMENTS)).translate([at[0], at[1], -OVERSHOOT_MM])));
        }
        if (cutters.length > 0) part = keep(wasm.Manifold.difference([part, ...cutters]));
      }
    }
    if (o.pockets.length > 0) {
      const cutters = o.pockets.map((p) => pocketCutter(wasm, keep, p));
      part = keep(wasm.Manifold.difference([part, ...cutters]));
    }
    const status = part.status();
    if (status !== 'NoError') throw new Error(`wedgeShell: manifold-3d reports ${status}`);
    const mesh = validateMesh(meshFromManifold(part));
    const volumeMm3 = meshVolumeMm3(mesh);
    return {
      kind: 'wedgeShell',
      mesh,
      solidVolumeMm3,
      volumeMm3,
      savingFraction: 1 - volumeMm3 / solidVolumeMm3,
      wallMm: o.wallMm,
      ribXsMm,
      cells,
      drainHoles,
      pockets: o.pockets,
    };
  });
}


/** The cavity: inset profile, minus ribs, solid bands and bosses; null when nothing is left to hollow. */
function cavity(wasm: ManifoldToplevel, keep: Keep, wedge: WedgePart, o: WedgeShellOptions): { cavity: Manifold; ribXs: number[] } | null {
  const { CrossSection, Manifold } = wasm;
  const w = o.wallMm;
  const { xMinMm, xMaxMm, yMinMm, yMaxMm } = wedge.footprint;
  const zTop = Math.max(...wedge.profile.map((p) => p[1]));
  const profile = keep(new CrossSection([wedge.profile.map(([y, z]): [number, number] => [y, z])], 'Positive'));
  const inset = keep(profile.offset(-w, 'Miter'));
  const yFrom = wedge.seatCorners[0][1] + w;
  const behindLip = keep(CrossSection.square([yMaxMm - yFrom + 10, zTop + 10]).translate([yFrom, -5]));
  const section = keep(CrossSection.intersection(inset, behindLip));
  if (section.area() < MIN_CELL_AREA_MM2) return null;
  const x0 = xMinMm + w;
  const x1 = xMaxMm - w;
  // (u, v, w) of the extrusion → (x, y, z) = (w + x0, u, v): a cyclic permutation, so a rotation.
  const body = keep(keep(section.extrude(x1 - x0)).transform([0, 1, 0, 0, 0, 0, 1, 0, 1, 0, 0, 0, x0, 0, 0, 1]));

  // Ribs: n cells of equal clear width ≤ ribSpacing.
  const inner = x1 - x0;
  const n = Math.max(1, Math.ceil((inner + w) / (o.ribSpacingMm + w)));
  const clear = (inner - (n - 1) * w) / n;
  const ribXs: number[] = [];
  for (let k = 1; k < n; k++) ribXs.push(x0 + k * clear + (k - 0.5) * w);
  const yLo = yMinMm - 10;
  const ySpan = yMaxMm - yMinMm + 20;
  const zLo = -10;
  const zSpan = zTop + 20;
  const keepSolid: Manifold[] = ribXs.map((x) => keep(keep(Manifold.cube([w, ySpan, zSpan])).translate([x - w / 2, yLo, zLo])));
  for (const b of o.solidBands) {
    const xLo = xMinMm - 10;
    const xSpan = xMaxMm - xMinMm + 20;
    keepSolid.push(
      b.axis === 'x'
        ? keep(keep(Manifold.cube([b.toMm - b.fromMm, ySpan, zSpan])).translate([b.fromMm, yLo, zLo]))
        : keep(keep(Manifold.cube([xSpan, b.toMm - b.fromMm, zSpan])).translate([xLo, b.fromMm, zLo])),
    );
  }
  for (const p of o.pockets) keepSolid.push(boss(wasm, keep, p, w));
  const hollow = keepSolid.length > 0 ? keep(Manifold.difference([body, ...keepSolid])) : body;
  if (hollow.isEmpty()) return null;
  return { cavity: hollow, ribXs };
}

/** Two unit vectors square to a unit axis. */
function basis(axis: Vec3): [Vec3, Vec3] {
  const e1: Vec3 = Math.abs(axis[0]) < 0.9 ? [1, 0, 0] : [0, 1, 0];
  const u = cross3(axis, e1);
  const ul = Math.hypot(...u);
  const uu: Vec3 = [u[0] / ul, u[1] / ul, u[2] / ul];
  return [uu, cross3(axis, uu)];
}

/** Ring of points round an axis point, radius r (circumscribing polygon), in the plane square to the axis. */
function ring(centre: Vec3, axis: Vec3, r: number): MVec3[] {
  const [u, v] = basis(axis);
  const R = r / Math.cos(Math.PI / ROUND_SEGMENTS);
  return Array.from({ length: ROUND_SEGMENTS }, (_, k) => {
    const t = (2 * Math.PI * k) / ROUND_SEGMENTS;
    const c = Math.cos(t);
    const s = Math.sin(t);
    return [centre[0] + R * (c * u[0] + s * v[0]), centre[1] + R * (c * u[1] + s * v[1]), centre[2] + R * (c * u[2] + s * v[2])] as MVec3;
  });
}

function along(p: Vec3, d: Vec3, t: number): Vec3 {
  return [p[0] + t * d[0], p[1] + t * d[1], p[2] + t * d[2]];
}

/** The pocket as a cutter: a round prism from OVERSHOOT_MM above the seat to its depth. */
function pocketCutter(wasm: ManifoldToplevel, keep: Keep, p: SeatPocket): Manifold {
  const r = p.diameterMm / 2;
  const top = ring(along(p.mouthMm, p.axis, -OVERSHOOT_MM), p.axis, r);
  const bottom = ring(along(p.mouthMm, p.axis, p.depthMm), p.axis, r);
  return keep(wasm.Manifold.hull([...top, ...bottom]));
}

/** The boss round a pocket: hull of the pocket grown by the wall and its shadow on z = 0. */
function boss(wasm: ManifoldToplevel, keep: Keep, p: SeatPocket, wall: number): Manifold {
  const r = p.diameterMm / 2 + wall;
  const top = ring(p.mouthMm, p.axis, r);
  const bottom = ring(along(p.mouthMm, p.axis, p.depthMm + wall), p.axis, r);
  const pts = [...top, ...bottom];
  const shadow = pts.map(([x, y]) => [x, y, -OVERSHOOT_MM] as MVec3);
  return keep(wasm.Manifold.hull([...pts, ...shadow]));
}

/**
 * Where a cell's drain hole goes: a point of the cell's floor (z = wall)
 * whose disc of the drain radius plus a margin lies wholly inside the cell,
 * nearest the cell's middle; null for a cell with no such point.
 */
function drainPoint(wasm: ManifoldToplevel, keep: Keep, cell: Manifold, wall: number, r: number): [number, number] | null {
  const floor = keep(cell.slice(wall + 0.01));
  if (floor.isEmpty()) return null;
  const b = floor.bounds();
  const cx = (b.min[0] + b.max[0]) / 2;
  const cy = (b.min[1] + b.max[1]) / 2;
  const need = r + 1;
  const disc = keep(wasm.CrossSection.circle(need, ROUND_SEGMENTS));
  const full = disc.area();
  const candidates: [number, number][] = [];
  const steps = 24;
  for (let i = 0; i <= steps; i++) {
    for (let j = 0; j <= steps; j++) candidates.push([b.min[0] + ((b.max[0] - b.min[0]) * i) / steps, b.min[1] + ((b.max[1] - b.min[1]) * j) / steps]);
  }
  candidates.sort((p, q) => Math.hypot(p[0] - cx, p[1] - cy) - Math.hypot(q[0] - cx, q[1] - cy) || p[0] - q[0] || p[1] - q[1]);
  for (const [x, y] of candidates) {
    const inside = keep(floor.intersect(keep(disc.translate([x, y])))).area();
    if (inside >= full * (1 - 1e-9)) return [x, y];
  }
  return null;
}
