import { SpecError } from '../errors.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import type { GnomonSource, PartFile } from '../spec/sections/partsSection.ts';
import type { Hemisphere } from '../types.ts';
import type { GnomonOptions } from './gnomonSolid.ts';
import type { WedgeOptions } from './wedgeSolid.ts';
import { isFilament, type Filament } from './materials.ts';
import type { BedSize } from './splitForBed.ts';

/** Processes that cut the plate from sheet (and so, by default, the gnomon too). */
const CUT_METHODS = new Set(['laser', 'waterjet', 'router']);

/** Everything the part builders need, resolved from one layout: plain data. */
export interface PartsPlan {
  /** the part files this build writes, in a fixed order */
  readonly files: readonly PartFile[];
  readonly gnomonFrom: GnomonSource;
  /**
   * the pole the wedge rises toward and its arrow points to: true (geographic)
   * north in the northern hemisphere, true south in the southern one
   */
  readonly elevatedPole: Hemisphere;
  /** seat tilt = |latitude|, degrees */
  readonly tiltDeg: number;
  /** how far the tabs reach below the face, mm (= plate thickness for a through tab) */
  readonly tabDepthMm: number;
  /** fit clearance per side, mm: already in the plate's slots (slot = tab + 2 · clearance) */
  readonly clearanceMm: number;
  /**
   * gnomonSolid options in the fin's own frame (y centred on the fin); add
   * `gnomonCentreYMm` to a fin y to get the face y
   */
  readonly gnomon: GnomonOptions;
  readonly gnomonCentreYMm: number;
  /** wedgeSolid options: seat = plate + 2 · clearance each way, payload = plate thickness + gnomon height */
  readonly wedge: WedgeOptions;
  /** body.stl: groove depth for lines, numerals and text, mm, and whether the wedge is fused on */
  readonly body: { readonly grooveDepthMm: number; readonly withWedge: boolean };
  /** printed parts: the bed they must fit, the hollow wedge, insert pockets, the filament */
  readonly print: {
    readonly bed: BedSize;
    /** skin and rib thickness of the printed wedge, mm (0: solid); the hollow wedge is made for process print */
    readonly shellWallMm: number;
    readonly ribSpacingMm: number;
    /** heat-set insert pockets in the seat under the plate holes (process print) */
    readonly inserts: boolean;
    /** filament of every printed part */
    readonly filament: Filament;
    readonly filamentDiameterMm: number;
  };
}

/**
 * Resolve the spec's `parts:` section against a layout (docs/design.md §5 fits):
 * which files to write, the gnomon fin (length y0..y1 of the layout's
 * gnomon, its tabs at the layout's tab centres and lengths, tab depth =
 * plate thickness for a through tab, the nodus notch at the face origin),
 * and the latitude wedge. The plate's slots already carry the clearance
 * (slot = tab + 2 · clearance per side), so the tabs are nominal.
 *
 * Bad inputs throw a SpecError naming the spec field:
 * - parts.tabDepth deeper than plate.thickness (a tab longer than the sheet is thick);
 * - process.clearance not less than half the tab's smaller side
 *   (min(gnomon.thickness, gnomon.tabLength)): the gap would be wider than the tab;
 * - a nodus notch that does not fit the style (parts.nodusSize).
 * The wedge's own printability is checked when it is built (see `dialWedge`).
 *
 * @example partsPlan(layoutDial(parseSpec(raw))).files // ['gnomon.dxf', 'wedge.stl']
 */
export function partsPlan(layout: DialLayout): PartsPlan {
  const spec = layout.spec;
  const parts = spec.parts;
  const method = spec.process.method;
  const gnomonFrom: GnomonSource = parts.gnomonFrom ?? (CUT_METHODS.has(method) ? 'sheet' : 'separate');
  const T = layout.plate.thicknessMm;
  const g = layout.gnomon;

  let tabDepthMm = T;
  if (parts.tabDepth !== 'through') {
    if (parts.tabDepth > T) {
      throw new SpecError('parts.tabDepth', parts.tabDepth, `allowed: at most plate.thickness = ${T} mm (or "through")`, `a ${parts.tabDepth} mm tab is longer than the ${T} mm sheet is thick`);
    }
    tabDepthMm = parts.tabDepth;
  }
  const c = spec.process.clearance;
  const tabSide = Math.min(g.thicknessMm, spec.gnomon.tabLength);
  if (!(2 * c < tabSide)) {
    throw new SpecError(
      'process.clearance',
      c,
      `allowed: less than ${tabSide / 2} mm per side, half the tab's smaller side (gnomon.thickness ${g.thicknessMm} mm, gnomon.tabLength ${spec.gnomon.tabLength} mm)`,
      `a ${c} mm clearance per side leaves a gap around the tab at least as wide as the tab itself`,
    );
  }

  const centre = (g.y0Mm + g.y1Mm) / 2;
  const halfL = (g.y1Mm - g.y0Mm) / 2;
  const nodus = nodusAt(layout);
  let nodusOpt: GnomonOptions['nodus'];
  if (nodus !== null) {
    const s = parts.nodusSize;
    const y = nodus - centre;
    if (!(s / 2 < g.heightMm) || !(y - s / 2 > -halfL && y + s / 2 < halfL)) {
      throw new SpecError('parts.nodusSize', s, `allowed: a notch that fits the style: opening under ${Math.min(2 * g.heightMm, 2 * (halfL - Math.abs(y))).toFixed(2)} mm here`);
    }
    nodusOpt = { kind: 'notch', yMm: y, sizeMm: s };
  }
  const gnomon: GnomonOptions = {
    heightMm: g.heightMm,
    thicknessMm: g.thicknessMm,
    lengthMm: g.y1Mm - g.y0Mm,
    tabs: g.tabs.map((t) => ({ centerYMm: t.centerYMm - centre, lengthMm: t.lengthMm, depthMm: tabDepthMm })),
    ...(nodusOpt ? { nodus: nodusOpt } : {}),
    plateThicknessMm: T,
    tabClearanceMm: 0,
  };

  const w = parts.wedge;
  const wedge: WedgeOptions = {
    latitudeDeg: spec.site.latitude,
    seatWidthMm: layout.plate.widthMm + 2 * c,
    seatLengthMm: layout.plate.lengthMm + 2 * c,
    minBaseMm: w.base,
    lipMm: w.lipHeight,
    lipWidthMm: w.lipWidth,
    payloadHeightMm: T + g.heightMm,
    wallMm: w.wall,
    holes: {
      count: w.holes,
      diameterMm: w.holeDiameter,
      countersink: w.countersink > 0 ? { diameterMm: w.countersink, angleDeg: 90 } : null,
      segments: 32,
    },
    arrow: w.arrow ? { lengthMm: 12, shaftWidthMm: 1.6, headWidthMm: 5, headLengthMm: 4, depthMm: 0.6 } : null,
    backShelfMm: 0,
  };
  const pr = parts.print;
  const plateMaterial: string = spec.plate.material;
  const filament: Filament = pr.filament !== 'auto' ? pr.filament : isFilament(plateMaterial) ? plateMaterial : 'petg';

  return {
    files: partFiles(parts.write, method, parts.body),
    gnomonFrom,
    elevatedPole: layout.hemisphere,
    tiltDeg: Math.abs(spec.site.latitude),
    tabDepthMm,
    clearanceMm: c,
    gnomon,
    gnomonCentreYMm: centre,
    wedge,
    body: { grooveDepthMm: parts.grooveDepth, withWedge: parts.bodyWedge },
    print: {
      bed: { widthMm: pr.bed.width, depthMm: pr.bed.depth, heightMm: pr.bed.height },
      shellWallMm: pr.wall,
      ribSpacingMm: pr.ribSpacing,
      inserts: pr.inserts,
      filament,
      filamentDiameterMm: pr.filamentDiameter,
    },
  };
}

/** Fixed file order for "auto" and for explicit lists alike. */
const ORDER: readonly PartFile[] = ['gnomon.stl', 'gnomon.dxf', 'plate.stl', 'wedge.stl', 'stand.dxf', 'stand.stl', 'body.stl'];

function partFiles(write: 'auto' | readonly PartFile[], method: string, body: boolean): PartFile[] {
  if (write !== 'auto') return ORDER.filter((f) => write.includes(f));
  // Cut processes cut the gnomon too (from the plate's sheet, or from other
  // stock of its thickness), and a flat-pack stand from sheet instead of the
  // solid wedge no wood or metal shop could make (wedge.stl only on request).
  // Print: the plate is printed too (plate.stl, grooved like body.stl).
  const out: PartFile[] = method === 'print' ? ['gnomon.stl', 'plate.stl', 'wedge.stl'] : ['gnomon.dxf', 'stand.dxf', 'stand.stl'];
  if (body) out.push('body.stl');
  return ORDER.filter((f) => out.includes(f));
}

/**
 * Face y of the nodus, or null for none. The date-line work's
 * `gnomon.nodus: true` (with `gnomon.nodusY`, face y in mm, default 0) or
 * `parts.nodus: true` (at the face origin, the middle of the hour marks)
 * turns the notch on. Read defensively: the gnomon fields may be absent.
 */
function nodusAt(layout: DialLayout): number | null {
  const g = layout.spec.gnomon as Record<string, unknown>;
  const y = typeof g.nodusY === 'number' ? g.nodusY : 0;
  if (g.nodus === true) return y;
  return layout.spec.parts.nodus ? y : null;
}
