import type { EngraveJob, EngraveOperation, Vec2 } from './engraveInput.ts';
import { assertOnStock, validateEngraveJob } from './engraveInput.ts';
import { flatGroovePath } from './flatGroove.ts';
import { rampSlope, type EngraveSettings } from './materialPresets.ts';
import { rampedPasses, type Vec3 } from './rampedPasses.ts';
import { orderPaths } from './orderPaths.ts';
import { stepDownPasses } from './stepDownPasses.ts';
import { vbitDepthMm } from './vbitDepth.ts';

/**
 * The toolpath model: plain data, an ordered list of cuts built from an
 * EngraveJob and resolved settings. The G-code writers only serialise it.
 */

/** Tool 1 is the V-bit, tool 2 the optional flat end mill. */
export type EngraveTool = 'vbit' | 'flat';

/** One cut: a polyline engraved in one or more passes at increasing depth. */
export interface EngraveCut {
  readonly tool: EngraveTool;
  /** Tool-centre polyline for the first pass, in cutting order (mm, plate coordinates). */
  readonly points: readonly Vec2[];
  /** true: the cut returns to points[0] at the end of every pass. */
  readonly closed: boolean;
  /**
   * Depths below the stock top of the passes, mm, increasing; the last is the
   * final depth. Open cuts alternate direction: pass 1 runs along `points`,
   * pass 2 back, and so on; closed cuts run the same way every pass.
   */
  readonly depthPassesMm: readonly number[];
  /** The tool-centre path in the cut (rampedPasses): from points[0] on the stock top, ramping down, to the end at the final depth. */
  readonly path: readonly Vec3[];
  readonly feedMmPerMin: number;
  readonly plungeMmPerMin: number;
  readonly operation: EngraveOperation;
  readonly label: string;
  /** The wanted groove width, mm. */
  readonly widthMm: number;
  /** Index of the source path in job.paths. */
  readonly sourceIndex: number;
}

export interface EngraveToolpaths {
  readonly cuts: readonly EngraveCut[];
  /** Deepest final depth of any cut, mm. */
  readonly maxDepthMm: number;
  /** Deepest depth the stock allows (see maxEngraveDepthMm), mm. */
  readonly depthLimitMm: number;
  /** XY rapid travel between cuts, mm: in input order, as ordered, and a lower bound. */
  readonly rapidTravelMm: { readonly inputOrder: number; readonly ordered: number; readonly lowerBound: number };
}

export interface BuildToolpathsOptions {
  /** Order cuts for short travel (orderPaths). false keeps the input order and directions. Default true. */
  readonly optimizeOrder?: boolean;
}

/** Least stock left under the deepest groove, mm (project rule, see maxEngraveDepthMm). */
export const MIN_SKIN_MM = 0.5;

/**
 * Deepest engraving a plate of `thicknessMm` allows: the groove must leave at
 * least half the thickness and never less than MIN_SKIN_MM under it, i.e.
 * depth ≤ thickness − max(0.5 mm, thickness / 2). Engraving is a surface
 * operation; half the plate keeps it flat and stiff (project rule, common
 * practice for decorative engraving).
 */
export function maxEngraveDepthMm(thicknessMm: number): number {
  return thicknessMm - Math.max(MIN_SKIN_MM, thicknessMm / 2);
}

function dedupe(points: readonly Vec2[], closed: boolean): readonly Vec2[] {
  const out = points.filter((p, i) => i === 0 || p[0] !== points[i - 1][0] || p[1] !== points[i - 1][1]);
  if (closed && out.length > 1) {
    const a = out[0];
    const b = out[out.length - 1];
    if (a[0] === b[0] && a[1] === b[1]) return out.slice(0, -1);
  }
  return out;
}

/**
 * Build the ordered cuts for a job.
 *
 * Tool choice: with `settings.flatEndMillMm` set, open 'marks' paths at least
 * `flatMinWidthMm` wide (default: the mill's diameter) are cleared with the
 * flat end mill at `flatDepthMm` in parallel passes (flatGroovePath); every
 * other path is cut with the V-bit at vbitDepthMm(width). V-bit cuts come
 * first, then the flat-mill cuts, each group ordered from where the tool is.
 *
 * @throws Error naming the field and value when a V-bit path is wider than
 *   vbitMaxWidthMm or not wider than vbitTipMm, or when a depth exceeds what
 *   stock.thicknessMm allows (maxEngraveDepthMm)
 */
export function buildToolpaths(job: EngraveJob, settings: EngraveSettings, options: BuildToolpathsOptions = {}): EngraveToolpaths {
  validateEngraveJob(job);
  const s = settings;
  const flatMin = s.flatMinWidthMm ?? s.flatEndMillMm;
  const toolOf = (i: number): EngraveTool => {
    const p = job.paths[i];
    return s.flatEndMillMm !== undefined && flatMin !== undefined && p.operation === 'marks' && !p.closed && p.widthMm >= flatMin
      ? 'flat'
      : 'vbit';
  };

  // The widest V-bit path decides whether the bit is wide enough.
  let widest = -1;
  job.paths.forEach((p, i) => {
    if (toolOf(i) === 'vbit' && (widest < 0 || p.widthMm > job.paths[widest].widthMm)) widest = i;
  });
  // These three are refused by parseSpec first, naming the spec field
  // (engrave.tool.*, plate.thickness); here they guard direct calls.
  if (widest >= 0 && job.paths[widest].widthMm > s.vbitMaxWidthMm) {
    const p = job.paths[widest];
    throw new Error(
      `vbitMaxWidthMm ${s.vbitMaxWidthMm} is too narrow for paths[${widest}].widthMm ${p.widthMm} ('${p.label}'): ` +
        `a V-bit cuts no wider than its diameter; allowed: vbitMaxWidthMm >= ${p.widthMm}, or a flatEndMillMm for wide marks`,
    );
  }

  const limit = maxEngraveDepthMm(job.stock.thicknessMm);
  const slope = rampSlope(s);
  const cuts: Omit<EngraveCut, 'path'>[] = job.paths.map((p, i): Omit<EngraveCut, 'path'> => {
    const tool = toolOf(i);
    if (tool === 'vbit' && !(p.widthMm > s.vbitTipMm)) {
      throw new Error(`paths[${i}].widthMm ${p.widthMm} ('${p.label}') must exceed vbitTipMm ${s.vbitTipMm}: the bit cuts at least its tip width`);
    }
    const depth = tool === 'vbit' ? vbitDepthMm(p.widthMm, s.vbitAngleDeg, s.vbitTipMm) : s.flatDepthMm;
    if (!(depth <= limit + 1e-12)) {
      throw new Error(
        `depth ${depth.toFixed(3)} mm of paths[${i}] ('${p.label}', widthMm ${p.widthMm}) is deeper than stock.thicknessMm ${job.stock.thicknessMm} allows: ` +
          `at most ${limit.toFixed(3)} mm, leaving max(${MIN_SKIN_MM} mm, half the thickness) of skin`,
      );
    }
    const base = dedupe(p.points, p.closed);
    const points = tool === 'flat' ? flatGroovePath(base, p.widthMm, s.flatEndMillMm as number, s.flatStepoverFraction) : base;
    if (tool === 'flat') points.forEach((q, j) => assertOnStock(q, `flat-mill pass point ${j} of paths[${i}] ('${p.label}')`, job.stock));
    return {
      tool,
      points,
      closed: p.closed,
      depthPassesMm: stepDownPasses(depth, s.stepDownMm),
      feedMmPerMin: s.feedMmPerMin,
      plungeMmPerMin: s.plungeMmPerMin,
      operation: p.operation,
      label: p.label,
      widthMm: p.widthMm,
      sourceIndex: i,
    };
  });

  const optimize = options.optimizeOrder !== false;
  const groups = (['vbit', 'flat'] as const).map((tool) => cuts.filter((c) => c.tool === tool));
  let start: Vec2 = [0, 0];
  const ordered: EngraveCut[] = [];
  const travel = { inputOrder: 0, ordered: 0, lowerBound: 0 };
  for (const group of groups) {
    if (group.length === 0) continue;
    // Where a cut ends does not depend on its direction (rampedPasses), so it is found once before ordering.
    const withEnds = group.map((c) => ({ ...c, endsAtStart: rampedPasses(c.points, c.closed, c.depthPassesMm, slope).endsAtStart }));
    const result = orderPaths(withEnds, { start, optimize });
    ordered.push(...result.paths.map(({ endsAtStart: _drop, ...c }): EngraveCut => ({ ...c, path: rampedPasses(c.points, c.closed, c.depthPassesMm, slope).path })));
    travel.inputOrder += result.rapidTravelMm.inputOrder;
    travel.ordered += result.rapidTravelMm.ordered;
    travel.lowerBound += result.rapidTravelMm.lowerBound;
    start = result.end;
  }
  return {
    cuts: ordered,
    maxDepthMm: ordered.reduce((m, c) => Math.max(m, c.depthPassesMm[c.depthPassesMm.length - 1]), 0),
    depthLimitMm: limit,
    rapidTravelMm: travel,
  };
}
