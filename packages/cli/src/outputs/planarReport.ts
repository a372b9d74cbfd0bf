import type { FaceType, FastenerRow, FinEdge, Hemisphere, LeftOutHour, MarkKind, PillarFixing, PlanarGnomonLayout, TimeLayout, Vec2, Vec3, MountDialFixing, WallMountFixing } from '@umbrafab/geometry';
import type { EngravingReport } from '@umbrafab/fabricate';
import type { CutFileSection } from './cutParts.ts';
import type { MeshFigures } from './meshFigures.ts';
import type { PlanarExtras } from './planarExtras.ts';
import type { EquatorialStandSection } from './planarStandOutputs.ts';
import type { PlateSection } from './plateOutputs.ts';
import type { PlanarPicturesSection } from './planarPictures.ts';
import type { ReportHead, ReportTail } from './report.ts';

/**
 * report.json of a horizontal, wall, meridian or equatorial face
 * (buildPlanarFiles, docs/design.md §8): the normalised spec, the face and
 * its marks, the curves, the plate and its gnomon, the wall mount, how the
 * dial reads, the engraving, the sections of the outputs it shares with the
 * polar plate (`PlanarExtras`: template.pdf, …), the notes and the files. Face coordinates: mm
 * from the face origin, x right in the face drawing, y along the substyle
 * (plate x = substyleX + x, plate y = faceOriginY + y).
 */
export type PlanarReport = ReportHead & PlanarSections & PlanarExtras['report'] & ReportTail;

/** The sections only a planar face's report has, and its own forms of plate, marks and gnomon. */
export interface PlanarSections {
  readonly face: PlanarFaceSection;
  /** the hemisphere the face is drawn for */
  readonly hemisphere: Hemisphere;
  /** every line of the face, engraved or lying under the fin (`underGnomon`) */
  readonly marks: readonly PlanarMarkSection[];
  /** times of the spec's hour grid the face cannot show, each with the reason */
  readonly leftOut: readonly LeftOutHour[];
  /** date lines and mean-time curves as drawn (a nodus on the gnomon; empty without one) */
  readonly curves: readonly PlanarCurveSection[];
  readonly plate: PlateSection;
  readonly gnomon: PlanarGnomonSection;
  /** the fin's own cutting drawing (gnomon.dxf), for sheet work with a fin */
  readonly parts?: { readonly gnomonDxf: CutFileSection };
  /** a wall face's mounting plate (mount.dxf, mount.stl); absent for faces that do not hang on a wall */
  readonly mount?: WallMountSection;
  /** an equatorial face's stand (stand.dxf, stand.stl); absent for other faces */
  readonly stand?: EquatorialStandSection;
  /** a horizontal face's fixing to its pillar top (studs set in resin, levelling nuts); absent for other faces or a plate without holes */
  readonly pillar?: PillarFixing;
  /** assembly.svg / assembly.png as rendered (pictures.write; absent for a face with no placement) */
  readonly pictures?: PlanarPicturesSection;
  /** how the dial reads and the corrections to clock time */
  readonly time: TimeLayout;
  /** the upper face's programs (the only face's, for one face); with both faces, side 1 of 2 */
  readonly engraving: EngravingReport;
  /** an equatorial plate engraved on both faces (face.side both): its lower face; `marks` … `engraving` above are then the upper face's */
  readonly lowerFace?: LowerFaceSection;
}

/**
 * The lower face of an equatorial plate engraved on both faces, in its own
 * face coordinates (seen from below: plate.dxf's _LOWER layers once the
 * plate is turned over about x = flipAxisXMm), with its programs (side 2 of 2,
 * the files ending -lower).
 */
export interface LowerFaceSection {
  readonly marks: readonly PlanarMarkSection[];
  readonly leftOut: readonly LeftOutHour[];
  readonly curves: readonly PlanarCurveSection[];
  /** outward unit normal of the lower face in the site's horizon frame (x east, y north, z up) */
  readonly normalEnu: Vec3;
  /** plate x of the flip axis (the plate's vertical centre line, through the rod hole), mm */
  readonly flipAxisXMm: number;
  readonly engraving: EngravingReport;
}

/** How the face lies at the site. */
export interface PlanarFaceSection {
  readonly type: Exclude<FaceType, 'polar'>;
  /** style height ψ: the angle between the style and the face, degrees */
  readonly styleHeightDeg: number;
  /** H₀: the hour angle whose line lies on the substyle, degrees (0 at apparent noon, negative mornings) */
  readonly substyleHourAngleDeg: number;
  /** angle of the plate's y axis from the face's line of steepest ascent, degrees, clockwise seen from the front */
  readonly plateTurnDeg: number;
  /** outward unit normal of the face in the site's horizon frame (x east, y north, z up) */
  readonly normalEnu: Vec3;
}

/** One straight line of a planar face, face coordinates, mm. */
export interface PlanarMarkSection {
  /** the clock reading the line stands for, e.g. '09:30' */
  readonly label: string;
  readonly kind: MarkKind;
  /** hour angle of the Sun when the style's shadow lies on this line, degrees (0 at apparent noon, negative mornings) */
  readonly hourAngleDeg: number;
  /** the style edge whose shadow it is: root + (t/2)·f ('plusF') or root − (t/2)·f ('minusF'), f = unit(n × p) */
  readonly edge: FinEdge;
  /** the end nearer the root, mm */
  readonly x0Mm: number;
  readonly y0Mm: number;
  /** the far end, mm */
  readonly x1Mm: number;
  readonly y1Mm: number;
  /** engraved line width, mm */
  readonly widthMm: number;
  /** the line lies in the gnomon's footprint (the noon band): listed, not engraved */
  readonly underGnomon?: true;
}

/** A date line or mean-time curve as drawn. */
export interface PlanarCurveSection {
  /** the date line's name (e.g. 'summer solstice') or the clock time of a mean-time curve ('12:00 mean time') */
  readonly label: string;
  readonly kind: 'date' | 'meanTime';
  /** separate polylines it is drawn as (split where the casting edge changes, the face loses the Sun or the field's edge cuts it) */
  readonly pieces: number;
}

/** The gnomon as laid out (PlanarGnomonLayout: in the fin's plane, u along the substyle, v the height above the face, mm), with the figures of its solid. */
export type PlanarGnomonSection = PlanarGnomonLayout & {
  /** area of the fin's side outline with its tabs (or the rod's side view), mm² */
  readonly profileAreaMm2: number;
  /** how deep the fin's tabs (or the rod) reach below the face, mm */
  readonly belowFaceMm: number;
};

/** A wall face's mounting plate: fixed to the wall through its anchors, the dial plate screwed to it (plate.dxf's holes on its tapped holes, or through it into wall plugs). */
export interface WallMountSection {
  readonly widthMm: number;
  readonly lengthMm: number;
  readonly thicknessMm: number;
  readonly material: string;
  /** where the dial plate's lower-left corner sits on the mount, mount frame, mm */
  readonly plateAtMm: Vec2;
  readonly fixings: readonly WallMountFixing[];
  /** 'tapped': screws into threads tapped in the mount; 'through': through plate and mount into wall plugs */
  readonly dialFixing: MountDialFixing;
  /** tapped: thread length in the mount (screw length − plate thickness), mm; through: null */
  readonly threadEngagementMm: number | null;
  /** the wall anchor holes: centre (mount frame) and diameter, mm */
  readonly anchors: readonly { readonly index: number; readonly xMm: number; readonly yMm: number; readonly diameterMm: number }[];
  /** what to buy for the wall and the plate */
  readonly fasteners: readonly FastenerRow[];
  readonly files: {
    /** mount.dxf for sheet work (absent when the process prints) */
    readonly dxf?: CutFileSection;
    /** mount.stl laid flat (+z up, min corner at the origin) */
    readonly stl: MeshFigures;
  };
}
