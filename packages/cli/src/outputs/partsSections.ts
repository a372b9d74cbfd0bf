import type { FilamentUse, MaterialDensity, PartMass, Vec3 } from '@umbrafab/geometry';
import type { CutFileSection } from './cutParts.ts';
import type { MeshFigures } from './meshFigures.ts';

/** The report.json sections of the parts: the stand's geometry and every part file's figures. */
export interface PartsSections {
  readonly wedge: WedgeSection;
  readonly parts: PartsSection;
  readonly weights: WeightsSection;
}

/** A printed part cut into pieces that fit the print bed (splitForBed). */
export interface BedSplitSection {
  readonly bedMm: { readonly widthMm: number; readonly depthMm: number; readonly heightMm: number };
  /** cut planes x = const and y = const in the part file's frame, mm */
  readonly xCutsMm: readonly number[];
  readonly yCutsMm: readonly number[];
  readonly dovetailKeys: number;
  readonly keyClearancePerSideMm: number;
  readonly wholeVolumeMm3: number;
  /** part volume inside the keys' clearance gaps, computed on its own, mm³: Σ pieces + this = whole */
  readonly keyGapVolumeMm3: number;
  readonly piecesVolumeMm3: number;
  readonly pieces: readonly (MeshFigures & { readonly file: string; readonly cell: readonly number[] })[];
}

/** The hollow printed wedge against the solid one. */
export interface WedgeShellSection {
  readonly wallMm: number;
  readonly ribSpacingMm: number;
  /** rib planes x = const, wedge frame, mm */
  readonly ribXsMm: readonly number[];
  readonly hollowCells: number;
  /** one drain hole through the floor of each cell, wedge frame, mm */
  readonly drainHolesMm: readonly Vec3[];
  readonly solidVolumeMm3: number;
  readonly volumeMm3: number;
  /** 100 · (1 − shell / solid) */
  readonly savingPercent: number;
}

/** The heat-set insert pockets in the printed wedge's seat. */
export interface InsertsSection {
  readonly kind: string;
  /** thread of the insert, e.g. 'M5' */
  readonly thread: string;
  readonly holeDiameterMm: number;
  readonly insertLengthMm: number;
  readonly pocketDepthMm: number | null;
  /** each pocket: the plate hole it serves (plate coordinates) and its mouth on the seat and axis (wedge frame), mm */
  readonly pockets: readonly { readonly plateHoleMm: readonly number[]; readonly seatMouthMm: Vec3; readonly axis: Vec3 }[];
}

/** Weights and amounts: every part's mass, filament for printed parts, the total to lift and ship. */
export interface WeightsSection {
  /** how the masses are found */
  readonly basis: string;
  /** the density rows used, with their sources */
  readonly densities: Readonly<Record<string, MaterialDensity>>;
  readonly parts: readonly (PartMass & { readonly massKg: number })[];
  /** parts made instead of others (body.stl for plate and gnomon), not in the total */
  readonly alternatives?: Readonly<Record<string, PartMass & { readonly massKg: number; readonly replaces: readonly string[] }>>;
  readonly filament: {
    readonly material: string;
    readonly diameterMm: number;
    readonly parts: Readonly<Record<string, FilamentUse & { readonly file: string | readonly string[] }>>;
  };
  readonly totalMassG: number;
  readonly totalMassKg: number;
}

/** The latitude wedge: its tilt and which way it rises; its geometry when it is built. */
export interface WedgeSection {
  /** the seat's tilt from the horizontal = |latitude|, degrees */
  readonly angleDeg: number;
  /** 'true north' or 'true south': the elevated pole */
  readonly risesToward: string;
  readonly arrowPointsTo: string;
  /** 'slab' below 5° tilt, 'stand' above */
  readonly design?: 'slab' | 'stand';
  readonly seatWidthMm?: number;
  readonly seatLengthMm?: number;
  /** outward unit normal of the seat, wedge frame (x across, y toward the pole, z up) */
  readonly seatNormal?: readonly number[];
  readonly toeLengthMm?: number;
  /** the wedge's footprint on the ground, wedge frame, mm */
  readonly footprintMm?: { readonly xMinMm: number; readonly xMaxMm: number; readonly yMinMm: number; readonly yMaxMm: number };
  readonly mountingHoles?: number;
  /** printed wedge: the base and back shelf as built (thickened to hold the insert pockets), mm */
  readonly baseMm?: number;
  readonly backShelfMm?: number;
}

/** The parts plan and the figures of each part file written. */
export interface PartsSection {
  /** part files written */
  readonly files: readonly string[];
  /** 'sheet': the gnomon is cut from the plate's stock; 'separate': its own stock or printed */
  readonly gnomonFrom: string;
  /** depth of the tabs below the face, mm */
  readonly tabDepthMm: number;
  /** fit clearance per side of a tab in its slot, mm */
  readonly fitClearancePerSideMm: number;
  /** each slot with the tab it takes, mm */
  readonly slots: readonly { readonly widthMm: number; readonly lengthMm: number; readonly tabWidthMm: number; readonly tabLengthMm: number }[];
  readonly gnomon: MeshFigures & {
    /** the style edges' height above the face when assembled, mm */
    readonly styleHeightAboveFaceMm: number;
    /** the tab bottoms' depth below the face when assembled, mm */
    readonly tabBottomBelowFaceMm: number;
    readonly thicknessMm: number;
    /** length of the style, mm */
    readonly lengthMm: number;
    /** area of the fin's side profile, mm² (volume = area × thickness) */
    readonly profileAreaMm2: number;
    /** face y of the nodus, mm (with a nodus) */
    readonly nodusFaceYMm?: number;
  };
  /** gnomon.dxf, when written */
  readonly gnomonDxf?: CutFileSection;
  /** plate.stl (process print), when written: the whole plate, and its pieces if split */
  readonly plate?: MeshFigures & { readonly grooveDepthMm: number; readonly areasMm2: { readonly plate: number; readonly grooves: number }; readonly split?: BedSplitSection };
  /** wedge.stl, when written (process print: the hollow wedge with insert pockets, and its pieces if split) */
  readonly wedge?: MeshFigures & { readonly shell?: WedgeShellSection; readonly inserts?: InsertsSection | null; readonly split?: BedSplitSection };
  /** body.stl, when written */
  readonly body?: MeshFigures & { readonly grooveDepthMm: number; readonly withWedge: boolean; readonly split?: BedSplitSection };
}
