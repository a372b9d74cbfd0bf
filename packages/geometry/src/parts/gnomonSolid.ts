import type { Mesh, Vec2 } from './mesh.ts';
import { extrudeProfileX } from './extrudeProfileX.ts';
import { finishMesh, newDraft } from './meshDraft.ts';
import { dropCollinear, shoelaceArea } from './ring2d.ts';
import { assertFinite, assertNonNegative, assertPositive } from '../guards.ts';
import { SpecError } from '../errors.ts';

/** A locating tab hanging below the face through a slot in the plate. */
export interface GnomonTab {
  /** centre of the tab along the style, mm (face frame y) */
  readonly centerYMm: number;
  /** nominal tab length along y, mm (before `tabClearanceMm`) */
  readonly lengthMm: number;
  /** how far the tab hangs below the face (z = 0), mm; at most `plateThicknessMm` */
  readonly depthMm: number;
}

/** A nodus made as a 90° V-notch cut down into the style edge. */
export interface GnomonNotch {
  readonly kind: 'notch';
  /** position of the nodus along the style, mm (face frame y) */
  readonly yMm: number;
  /** opening width of the notch at the style edge, mm; its depth is sizeMm / 2 */
  readonly sizeMm: number;
}

export interface GnomonOptions {
  /** style height above the face, mm: the style edges lie at z = heightMm */
  readonly heightMm: number;
  /** fin thickness t, mm: the fin spans x ∈ [−t/2, t/2]; the styles are its two top edges */
  readonly thicknessMm: number;
  /** fin length along the style, mm: y ∈ [−L/2, L/2] */
  readonly lengthMm: number;
  readonly tabs: readonly GnomonTab[];
  /** optional nodus notch in the style edge */
  readonly nodus?: GnomonNotch;
  /** thickness of the plate the tabs pass through, mm; a tab may not hang deeper */
  readonly plateThicknessMm: number;
  /**
   * fit clearance taken off each end of every tab, mm. Default 0 because the
   * plate's slots already carry the fit clearance (docs/design.md §5); set it when
   * the slots are cut at nominal size. Must be less than half a tab's length.
   */
  readonly tabClearanceMm: number;
}

/**
 * Defaults: a 120 mm fin, 20 mm high, 3 mm thick, with two 15 mm tabs 3 mm
 * deep at y = ±30 mm for a 3 mm plate, no nodus, no tab clearance.
 */
export const GNOMON_DEFAULTS: GnomonOptions = {
  heightMm: 20,
  thicknessMm: 3,
  lengthMm: 120,
  tabs: [
    { centerYMm: -30, lengthMm: 15, depthMm: 3 },
    { centerYMm: 30, lengthMm: 15, depthMm: 3 },
  ],
  plateThicknessMm: 3,
  tabClearanceMm: 0,
};

/** The printable gnomon fin as plain data. */
export interface GnomonPart {
  readonly kind: 'gnomon';
  readonly mesh: Mesh;
  /** the (y, z) outline that was extruded, counter-clockwise, mm */
  readonly profile: readonly Vec2[];
  /** area of that outline, mm² (shoelace formula) */
  readonly profileAreaMm2: number;
  readonly styleHeightMm: number;
  readonly thicknessMm: number;
  /** the two style edges (x = ∓t/2, z = heightMm) run from y = −L/2 to +L/2 */
  readonly styleXMm: readonly [number, number];
  /** nodus point on the style edge (centre plane), if a notch was asked for */
  readonly nodusMm?: readonly [number, number, number];
}

/**
 * Build the gnomon fin with its tabs (and optional nodus notch) as one
 * closed polyhedron in the face frame (docs/design.md §2): the face is z = 0,
 * x across (the fin spans x ∈ [−t/2, t/2]), y along the style from −L/2 to
 * +L/2, the style edges at z = heightMm exactly, tabs hanging below z = 0.
 *
 * The solid is the (y, z) outline — rectangle L × h, tabs below, notch
 * above — extruded over x. Side faces are ear-clipped from the outline's own
 * corners (no added vertex, no T-junction); every outline edge becomes one
 * flat two-triangle wall. Corners that would be collinear (a tab flush with an
 * end of the fin) are dropped, so no triangle is needless.
 *
 * @param options merged over GNOMON_DEFAULTS (lengths in mm)
 * @example gnomonSolid({ heightMm: 13.4, thicknessMm: 3 }).mesh
 */
export function gnomonSolid(options: Partial<GnomonOptions> = {}): GnomonPart {
  const o: GnomonOptions = { ...GNOMON_DEFAULTS, ...options };
  assertPositive('gnomon.heightMm', o.heightMm);
  assertPositive('gnomon.thicknessMm', o.thicknessMm);
  assertPositive('gnomon.lengthMm', o.lengthMm);
  assertPositive('gnomon.plateThicknessMm', o.plateThicknessMm);
  assertNonNegative('gnomon.tabClearanceMm', o.tabClearanceMm);
  if (!Array.isArray(o.tabs)) throw new SpecError('gnomon.tabs', o.tabs, 'allowed: a list of tabs');

  const halfL = o.lengthMm / 2;
  const h = o.heightMm;
  const tabs = o.tabs
    .map((tab, i) => {
      assertFinite(`gnomon.tabs[${i}].centerYMm`, tab.centerYMm);
      assertPositive(`gnomon.tabs[${i}].lengthMm`, tab.lengthMm);
      assertPositive(`gnomon.tabs[${i}].depthMm`, tab.depthMm);
      if (tab.depthMm > o.plateThicknessMm) {
        throw new SpecError(`gnomon.tabs[${i}].depthMm`, tab.depthMm, `allowed: at most plateThicknessMm = ${o.plateThicknessMm} mm`);
      }
      if (2 * o.tabClearanceMm >= tab.lengthMm) {
        throw new SpecError('gnomon.tabClearanceMm', o.tabClearanceMm, `allowed: less than half of gnomon.tabs[${i}].lengthMm = ${tab.lengthMm} mm`);
      }
      const y0 = tab.centerYMm - tab.lengthMm / 2 + o.tabClearanceMm;
      const y1 = tab.centerYMm + tab.lengthMm / 2 - o.tabClearanceMm;
      if (y0 < -halfL || y1 > halfL) {
        throw new SpecError(`gnomon.tabs[${i}]`, tab, `allowed: a tab within the fin, y = ${-halfL}…${halfL} mm`, `spans y = ${y0}…${y1} mm`);
      }
      return { i, y0, y1, depth: tab.depthMm };
    })
    .sort((a, b) => a.y0 - b.y0);
  for (let k = 1; k < tabs.length; k++) {
    if (tabs[k].y0 <= tabs[k - 1].y1) {
      throw new SpecError(
        `gnomon.tabs[${tabs[k].i}]`,
        o.tabs[tabs[k].i],
        `allowed: tabs apart from each other`,
        `y from ${tabs[k].y0} mm overlaps or touches gnomon.tabs[${tabs[k - 1].i}] (up to ${tabs[k - 1].y1} mm)`,
      );
    }
  }

  // Counter-clockwise outline in (y, z): along the bottom toward +y with the
  // tabs, up the +y end, back along the style edge with the notch, down the −y end.
  const outline: Vec2[] = [[-halfL, 0]];
  for (const t of tabs) {
    outline.push([t.y0, 0], [t.y0, -t.depth], [t.y1, -t.depth], [t.y1, 0]);
  }
  outline.push([halfL, 0], [halfL, h]);
  let nodusMm: readonly [number, number, number] | undefined;
  if (o.nodus !== undefined) {
    const nd = o.nodus;
    if (nd.kind !== 'notch') throw new SpecError('gnomon.nodus.kind', nd.kind, "allowed: 'notch'");
    assertFinite('gnomon.nodus.yMm', nd.yMm);
    assertPositive('gnomon.nodus.sizeMm', nd.sizeMm);
    if (nd.yMm - nd.sizeMm / 2 <= -halfL || nd.yMm + nd.sizeMm / 2 >= halfL) {
      throw new SpecError('gnomon.nodus', nd, `allowed: a notch strictly within the style, y = ${-halfL}…${halfL} mm`, `yMm = ${nd.yMm}, sizeMm = ${nd.sizeMm}`);
    }
    if (nd.sizeMm / 2 >= h) {
      throw new SpecError('gnomon.nodus.sizeMm', nd.sizeMm, `allowed: less than twice heightMm = ${h} mm (the notch is sizeMm/2 deep)`);
    }
    // 90° V-notch: opening sizeMm, apex sizeMm/2 below the style edge.
    outline.push([nd.yMm + nd.sizeMm / 2, h], [nd.yMm, h - nd.sizeMm / 2], [nd.yMm - nd.sizeMm / 2, h]);
    nodusMm = [0, nd.yMm, h];
  }
  outline.push([-halfL, h]);
  const profile = dropCollinear(outline);

  const draft = newDraft();
  extrudeProfileX(draft, profile, -o.thicknessMm / 2, o.thicknessMm / 2);
  return {
    kind: 'gnomon',
    mesh: finishMesh(draft),
    profile,
    profileAreaMm2: shoelaceArea(profile),
    styleHeightMm: h,
    thicknessMm: o.thicknessMm,
    styleXMm: [-o.thicknessMm / 2, o.thicknessMm / 2],
    ...(nodusMm ? { nodusMm } : {}),
  };
}
