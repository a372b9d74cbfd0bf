import type { CrossSection, Manifold } from 'manifold-3d';
import { manifoldScope } from './manifoldScope.ts';
import { manifoldFromMesh, meshFromManifold } from './manifoldMesh.ts';
import { meshBounds, type MeshBounds } from './meshBounds.ts';
import type { Mesh } from './mesh.ts';
import { meshVolumeMm3 } from './meshVolumeMm3.ts';
import { validateMesh } from './validateMesh.ts';

/** A print bed, mm: the largest box a printer builds (W along x, D along y, H up). */
export interface BedSize {
  readonly widthMm: number;
  readonly depthMm: number;
  readonly heightMm: number;
}

/**
 * The dovetail key that joins two pieces, in plan: a trapezoid standing on
 * the cut line, `rootHalfMm` half wide there and flaring to `tipHalfMm` at
 * `depthMm` into the neighbour, through the whole height of the part. It is
 * printed upright with its piece (vertical walls, no support), locks the
 * pieces in both plan directions and leaves their faces flush; glue it.
 */
export interface DovetailKey {
  readonly rootHalfMm: number;
  readonly tipHalfMm: number;
  readonly depthMm: number;
}

/** A 10 mm neck flaring to 14 mm over 8 mm (a 1:4 flank, about 14°: common practice for printed jigsaw joints). */
export const DOVETAIL_KEY: DovetailKey = { rootHalfMm: 5, tipHalfMm: 7, depthMm: 8 };
/** Least distance along a cut between keys, mm: one key per this much cut length. */
export const KEY_PITCH_MM = 70;
/** Most pieces along one axis. */
const MAX_PIECES_PER_AXIS = 12;

/** Where a cut must not run: bands [from, to] of x (for cuts x = const) and of y (for cuts y = const), mm. */
export interface ForbiddenBands {
  readonly x: readonly (readonly [number, number])[];
  readonly y: readonly (readonly [number, number])[];
}

/** The cuts of a split: planes x = const and y = const in the part's print frame. */
export interface CutPlan {
  readonly xCutsMm: readonly number[];
  readonly yCutsMm: readonly number[];
}

/** A plan, or why no split serves. */
export type CutPlanResult = { readonly ok: true; readonly plan: CutPlan } | { readonly ok: false; readonly reason: string };

/** True when a box of the given plan size fits the bed, as it lies or turned a quarter turn about z. */
export function fitsBed(dxMm: number, dyMm: number, dzMm: number, bed: BedSize): boolean {
  if (dzMm > bed.heightMm) return false;
  return (dxMm <= bed.widthMm && dyMm <= bed.depthMm) || (dyMm <= bed.widthMm && dxMm <= bed.depthMm);
}

/**
 * Choose the fewest cuts (planes x = const and y = const, pieces printed in
 * the part's own orientation) after which every piece fits the bed,
 * counting the dovetail keys each piece carries into its neighbour (keys
 * stand on a piece's +x and +y cuts). Cuts start evenly spaced and move to
 * the nearest place outside the forbidden bands. No plan when the part is
 * taller than the bed (pieces are never cut across their height: the keys
 * run through it) or when no grid of up to 12 × 12 pieces fits.
 *
 * @example planBedCuts(meshBounds(mesh), { widthMm: 220, depthMm: 220, heightMm: 250 }, { x: [], y: [] })
 */
export function planBedCuts(bounds: MeshBounds, bed: BedSize, forbidden: ForbiddenBands, key: DovetailKey = DOVETAIL_KEY): CutPlanResult {
  const [x0, y0, z0] = bounds.min;
  const [x1, y1, z1] = bounds.max;
  const h = z1 - z0;
  if (h > bed.heightMm) {
    return { ok: false, reason: `it stands ${h.toFixed(1)} mm tall and the bed takes ${bed.heightMm} mm; pieces are cut upright only (their dovetails run through the height), so no split makes it lower` };
  }
  const options: { nx: number; ny: number }[] = [];
  for (let nx = 1; nx <= MAX_PIECES_PER_AXIS; nx++) for (let ny = 1; ny <= MAX_PIECES_PER_AXIS; ny++) options.push({ nx, ny });
  options.sort((a, b) => a.nx * a.ny - b.nx * b.ny || Math.max(a.nx, a.ny) - Math.max(b.nx, b.ny) || a.nx - b.nx);
  for (const { nx, ny } of options) {
    const xs = placeCuts(x0, x1, nx, forbidden.x, key);
    const ys = placeCuts(y0, y1, ny, forbidden.y, key);
    if (xs === null || ys === null) continue;
    const ex = spans(x0, x1, xs, key.depthMm);
    const ey = spans(y0, y1, ys, key.depthMm);
    if (ex.every((dx) => ey.every((dy) => fitsBed(dx, dy, h, bed)))) return { ok: true, plan: { xCutsMm: xs, yCutsMm: ys } };
  }
  return {
    ok: false,
    reason: `no grid of up to ${MAX_PIECES_PER_AXIS} × ${MAX_PIECES_PER_AXIS} pieces fits a ${bed.widthMm} × ${bed.depthMm} mm bed with cuts clear of the holes, slots and fin (part ${(x1 - x0).toFixed(1)} × ${(y1 - y0).toFixed(1)} mm)`,
  };
}

/** Widths of the pieces along one axis, each with the key it carries past its upper cut. */
function spans(lo: number, hi: number, cuts: readonly number[], keyDepth: number): number[] {
  const edges = [lo, ...cuts, hi];
  return edges.slice(1).map((e, i) => e - edges[i] + (i < cuts.length ? keyDepth : 0));
}

/** n − 1 cuts spread so the pieces (with their keys) come out even, each moved out of the forbidden bands; null if one cannot be. */
function placeCuts(lo: number, hi: number, n: number, bands: readonly (readonly [number, number])[], key: DovetailKey): number[] | null {
  const cuts: number[] = [];
  const len = hi - lo;
  const minPiece = 2 * key.tipHalfMm + 2 * key.depthMm;
  for (let i = 1; i < n; i++) {
    // Even pieces when each but the last also carries a key of depth d: cut i at lo + i·(len − (n − 1)d)/n + (i − 1)d.
    const ideal = lo + (i * (len - (n - 1) * key.depthMm)) / n + (i - 1) * key.depthMm;
    const room = len / (2 * n);
    let best: number | null = null;
    for (let s = 0; s <= room * 2; s++) {
      for (const c of [ideal + s / 2, ideal - s / 2]) {
        if (best === null && !bands.some(([a, b]) => c >= a && c <= b)) best = c;
      }
      if (best !== null) break;
    }
    if (best === null) return null;
    const prev = cuts.length ? cuts[cuts.length - 1] : lo;
    if (best - prev < minPiece || hi - best < minPiece) return null;
    cuts.push(best);
  }
  return cuts;
}

/** One piece of a split part. */
export interface SplitPiece {
  /** 1-based, row by row: x fastest, then y */
  readonly index: number;
  /** grid cell (column along x, row along y), 0-based */
  readonly cell: readonly [number, number];
  readonly mesh: Mesh;
  readonly volumeMm3: number;
  readonly bounds: MeshBounds;
}

/** A part cut into pieces. */
export interface SplitPart {
  readonly plan: CutPlan;
  readonly pieces: readonly SplitPiece[];
  readonly keys: number;
  /** the fit clearance round each key, per side, mm */
  readonly clearanceMm: number;
  /** volume of the whole part, mm³ */
  readonly wholeVolumeMm3: number;
  /** part volume lost to the keys' clearance gaps (the whole ∩ the gap regions, computed on its own), mm³ */
  readonly gapVolumeMm3: number;
}


/**
 * Cut a closed mesh into the pieces of a cut plan (manifold-3d booleans, so
 * every piece stays 2-manifold). Each piece is the part ∩ a vertical prism
 * over its grid cell, plus the dovetail keys it carries on its +x and +y
 * cuts, minus the sockets of its neighbours' keys (each key grown by the fit
 * clearance per side). Keys sit evenly along each cut segment, one per
 * KEY_PITCH_MM, clear of the segment's ends. The pieces keep the part's
 * frame, so loading them together shows the part assembled.
 * Volumes: Σ pieces + gap = whole, where gap is the part inside the
 * clearance bands round the keys.
 *
 * @example (await splitForBed(mesh, plan, 0.2)).pieces.length
 */
export async function splitForBed(mesh: Mesh, plan: CutPlan, clearanceMm: number, key: DovetailKey = DOVETAIL_KEY): Promise<SplitPart> {
  return manifoldScope(async (wasm, keep) => {
    const { CrossSection, Manifold } = wasm;
    const whole = keep(manifoldFromMesh(wasm, mesh));
    const b = meshBounds(mesh);
    const far = 10;
    const xe = [b.min[0] - far, ...plan.xCutsMm, b.max[0] + far];
    const ye = [b.min[1] - far, ...plan.yCutsMm, b.max[1] + far];
    const nx = xe.length - 1;
    const ny = ye.length - 1;
    const own: CrossSection[][] = Array.from({ length: nx * ny }, () => []);
    const sockets: CrossSection[][] = Array.from({ length: nx * ny }, () => []);
    const gaps: CrossSection[] = [];
    const cellId = (i: number, j: number) => j * nx + i;
    const cellRect = (i: number, j: number) => keep(CrossSection.square([xe[i + 1] - xe[i], ye[j + 1] - ye[j]]).translate([xe[i], ye[j]]));
    let keys = 0;
    const addKey = (poly: [number, number][], owner: number, neighbour: number, nRect: CrossSection) => {
      const k = keep(new CrossSection([poly], 'Positive'));
      const s = keep(k.offset(clearanceMm, 'Miter'));
      own[owner].push(k);
      sockets[neighbour].push(s);
      gaps.push(keep(CrossSection.intersection(keep(CrossSection.difference(s, k)), nRect)));
      keys++;
    };
    const { rootHalfMm: r0, tipHalfMm: r1, depthMm: d } = key;
    // Keys on the cuts x = const: between cell (i, j) and (i + 1, j), pointing +x.
    for (let i = 0; i < nx - 1; i++) {
      const xc = xe[i + 1];
      for (let j = 0; j < ny; j++) {
        const lo = Math.max(ye[j], b.min[1]);
        const hi = Math.min(ye[j + 1], b.max[1]);
        for (const yk of keyCentres(lo, hi, r1 + clearanceMm + 2)) {
          addKey([[xc - 1, yk - r0], [xc + d, yk - r1], [xc + d, yk + r1], [xc - 1, yk + r0]], cellId(i, j), cellId(i + 1, j), cellRect(i + 1, j));
        }
      }
    }
    // Keys on the cuts y = const: between cell (i, j) and (i, j + 1), pointing +y.
    for (let j = 0; j < ny - 1; j++) {
      const yc = ye[j + 1];
      for (let i = 0; i < nx; i++) {
        const lo = Math.max(xe[i], b.min[0]);
        const hi = Math.min(xe[i + 1], b.max[0]);
        for (const xk of keyCentres(lo, hi, r1 + clearanceMm + 2)) {
          addKey([[xk + r0, yc - 1], [xk + r1, yc + d], [xk - r1, yc + d], [xk - r0, yc - 1]], cellId(i, j), cellId(i, j + 1), cellRect(i, j + 1));
        }
      }
    }
    const zLo = b.min[2] - far;
    const zH = b.max[2] - b.min[2] + 2 * far;
    const prism = (s: CrossSection): Manifold => keep(keep(s.extrude(zH)).translate([0, 0, zLo]));
    const pieces: SplitPiece[] = [];
    for (let j = 0; j < ny; j++) {
      for (let i = 0; i < nx; i++) {
        const id = cellId(i, j);
        let region = keep(CrossSection.union([cellRect(i, j), ...own[id]]));
        if (sockets[id].length > 0) region = keep(CrossSection.difference([region, ...sockets[id]]));
        const piece = keep(Manifold.intersection(whole, prism(region)));
        if (piece.status() !== 'NoError') throw new Error(`splitForBed: manifold-3d reports ${piece.status()} for piece (${i}, ${j})`);
        if (piece.isEmpty()) continue;
        const m = validateMesh(meshFromManifold(piece));
        pieces.push({ index: pieces.length + 1, cell: [i, j], mesh: m, volumeMm3: meshVolumeMm3(m), bounds: meshBounds(m) });
      }
    }
    const gapVolumeMm3 = gaps.length > 0 ? keep(Manifold.intersection(whole, prism(keep(CrossSection.union(gaps))))).volume() : 0;
    return { plan, pieces, keys, clearanceMm, wholeVolumeMm3: meshVolumeMm3(mesh), gapVolumeMm3 };
  });
}

/** Key centres along a cut segment [lo, hi]: one per KEY_PITCH_MM, evenly, at least `margin` from each end; none if it is too short. */
function keyCentres(lo: number, hi: number, margin: number): number[] {
  const len = hi - lo;
  if (len < 2 * margin) return [];
  const n = Math.max(1, Math.floor(len / KEY_PITCH_MM));
  return Array.from({ length: n }, (_, k) => lo + (len * (k + 0.5)) / n);
}

