import type { DrawnLine, DrawnText, LowerFaceDrawing } from '../plate/plateDrawing.ts';
import type { Circle, Path } from '../types.ts';

/**
 * One flat part cut from sheet stock (the plate, a sheet gnomon, a stand
 * cheek or cross member), drawn at nominal size (as it must come out, no kerf)
 * in its own frame: mm, origin at the part's lower-left corner, z = 0.
 * The sheet layout (sheet.dxf), the part drawings and the router cutting
 * program all read parts in this shape.
 */
export interface SheetPart {
  /** Short name, used for the file and the label on the reference layer, e.g. 'plate', 'gnomon', 'stand-cheek-1'. */
  readonly name: string;
  /** Stock material name as the spec gives it, e.g. 'aluminium'. */
  readonly material: string;
  readonly thicknessMm: number;
  /** How many of this part the job needs (default 1). */
  readonly quantity?: number;
  /** Closed outer profile, nominal, counter-clockwise. */
  readonly outer: Path;
  /** Inner cut-outs (holes, slots, joints), nominal: closed paths clockwise, or circles. */
  readonly inner: readonly (Path | Circle)[];
  /** Engraved lines and text on the part (single-stroke centre lines), if any. */
  readonly lines?: readonly DrawnLine[];
  readonly text?: readonly DrawnText[];
  /** The plate's lower face (an equatorial plate engraved on both faces), drawn as seen from below once the part is turned over about its flip axis. */
  readonly lowerFace?: LowerFaceDrawing;
  /** Lines for checking, never cut (the plate's substyle, the gnomon's face line), if any. */
  readonly reference?: readonly { readonly label: string; readonly path: Path }[];
}
