import { assertFinite, assertPositive, formatValue } from '@umbrafab/geometry';

/**
 * The engraving writers' input, decoupled from the layout code.
 *
 * Coordinates are plate coordinates: millimetres, origin at the plate's
 * lower-left corner, x to the right, y up, exactly as plate.dxf uses; the top
 * of the stock is Z = 0 and cuts go to negative Z.
 */

/** A point `[x, y]` in mm. */
export type Vec2 = readonly [number, number];

/** What a path engraves; used for labels, grouping and the flat-mill rule. */
export type EngraveOperation = 'marks' | 'text' | 'curves';

/** One engraving stroke: a polyline traced by the tool centre. */
export interface EngravePath {
  readonly points: readonly Vec2[];
  /** true: the last point joins the first (a loop). */
  readonly closed: boolean;
  /** Wanted groove width on the face, mm. Text glyphs carry the text's stroke width. */
  readonly widthMm: number;
  readonly operation: EngraveOperation;
  /** Human label, e.g. 'hour 09' or 'numeral IX'; goes into comments. */
  readonly label: string;
}

/** Everything to engrave on one plate. */
export interface EngraveJob {
  readonly paths: readonly EngravePath[];
  readonly stock: {
    readonly widthMm: number;
    readonly lengthMm: number;
    readonly thicknessMm: number;
    readonly material: string;
  };
  /** Spec summary lines for header comments. */
  readonly title: readonly string[];
  /** One side of a plate engraved on both faces: the program's file name and the header lines on the side and the turn. */
  readonly side?: { readonly fileName: string; readonly lines: readonly string[] };
}

const ON_STOCK_TOL_MM = 1e-6;

/** Throw unless `p` lies on the stock's XY rectangle [0, widthMm] × [0, lengthMm]. */
export function assertOnStock(p: Vec2, field: string, stock: EngraveJob['stock']): void {
  const t = ON_STOCK_TOL_MM;
  if (p[0] < -t || p[1] < -t || p[0] > stock.widthMm + t || p[1] > stock.lengthMm + t) {
    throw new Error(
      `${field} [${p[0]}, ${p[1]}] lies off the stock; allowed: 0 <= x <= stock.widthMm ${stock.widthMm}, 0 <= y <= stock.lengthMm ${stock.lengthMm} (plate coordinates, origin at the lower-left corner)`,
    );
  }
}

const OPERATIONS: readonly EngraveOperation[] = ['marks', 'text', 'curves'];

/**
 * Check a job's invariants and throw naming the first bad field (a plain
 * Error for the shape of a path, which the code builds from the clipped
 * drawing; the number guards throw a SpecError):
 * finite points, at least 2 points per path (3 for a loop), a positive width,
 * a known operation, a positive stock size, every point on the stock
 * (0 ≤ x ≤ stock.widthMm, 0 ≤ y ≤ stock.lengthMm, within 1e-6 mm).
 */
export function validateEngraveJob(job: EngraveJob): void {
  assertPositive('stock.widthMm', job.stock.widthMm);
  assertPositive('stock.lengthMm', job.stock.lengthMm);
  assertPositive('stock.thicknessMm', job.stock.thicknessMm);
  job.paths.forEach((path, i) => {
    const at = `paths[${i}]`;
    const min = path.closed ? 3 : 2;
    if (!Array.isArray(path.points) || path.points.length < min) {
      throw new Error(
        `${at}.points must hold at least ${min} points for a${path.closed ? ' closed' : 'n open'} path, got ${path.points?.length ?? formatValue(path.points)}`,
      );
    }
    path.points.forEach((p, j) => {
      assertFinite(`${at}.points[${j}][0]`, p[0]);
      assertFinite(`${at}.points[${j}][1]`, p[1]);
      assertOnStock(p, `${at}.points[${j}]`, job.stock);
    });
    assertPositive(`${at}.widthMm`, path.widthMm);
    if (!OPERATIONS.includes(path.operation)) {
      throw new Error(`${at}.operation must be one of ${OPERATIONS.join(', ')}, got ${formatValue(path.operation)}`);
    }
  });
}
