import { SpecError, type DialSpec } from '@umbrafab/geometry';
import type { EngraveJob, EngravePath } from './engraveInput.ts';
import type { EngraveSettings } from './materialPresets.ts';
import { maxEngraveDepthMm, MIN_SKIN_MM } from './toolpaths.ts';
import { vbitDepthMm } from './vbitDepth.ts';

/** The spec field that sets a path's width (for error messages). */
export function widthFieldOf(path: EngravePath): string {
  const word = path.label.split(' ')[0];
  if (path.operation === 'marks' && (word === 'hour' || word === 'half' || word === 'quarter')) return `marks.${word}.width`;
  if (path.operation === 'text') return word === 'numeral' ? 'dial.numeralHeight (numeral stroke width)' : 'dial.textHeight (text stroke width)';
  return `the layout's ${path.label}`;
}

const mm = (v: number): string => String(Math.round(v * 1000) / 1000);

/** Thinnest sheet whose depth limit allows `depthMm` (inverse of maxEngraveDepthMm). */
function minThicknessFor(depthMm: number): number {
  return Math.max(2 * depthMm, depthMm + MIN_SKIN_MM);
}

/**
 * Check a milling job against the spec before any toolpath is built, and
 * throw a SpecError naming the spec field, its value and what is allowed:
 * - `engrave.tool.vbitMaxWidthMm` when the V-bit is narrower than the widest
 *   line it must cut;
 * - `engrave.tool.vbitTipMm` when a line is not wider than the bit's flat tip;
 * - `plate.thickness` when a V-bit groove is deeper than the sheet allows
 *   (depth ≤ thickness − max(0.5 mm, thickness/2), maxEngraveDepthMm);
 * - `engrave.tool.flatDepthMm` when the flat-mill depth is too deep.
 * Tool choice follows buildToolpaths: with a flat end mill, open marks at
 * least flatMinWidthMm (default the mill diameter) wide go to the mill.
 */
export function checkMillJob(job: EngraveJob, s: EngraveSettings, spec: DialSpec): void {
  const flatMin = s.flatMinWidthMm ?? s.flatEndMillMm;
  const isFlat = (p: EngravePath): boolean =>
    s.flatEndMillMm !== undefined && flatMin !== undefined && p.operation === 'marks' && !p.closed && p.widthMm >= flatMin;
  const vbit = job.paths.filter((p) => !isFlat(p));
  const limit = maxEngraveDepthMm(job.stock.thicknessMm);
  if (vbit.length > 0) {
    const widest = vbit.reduce((a, b) => (b.widthMm > a.widthMm ? b : a));
    if (widest.widthMm > s.vbitMaxWidthMm) {
      throw new SpecError(
        'engrave.tool.vbitMaxWidthMm',
        s.vbitMaxWidthMm,
        `allowed: at least ${mm(widest.widthMm)} mm (the widest line, set by ${widthFieldOf(widest)}); or narrower lines, or an engrave.tool.flatEndMillMm for the wide marks`,
        `a ${mm(s.vbitMaxWidthMm)} mm V-bit is too narrow for the ${mm(widest.widthMm)} mm ${widest.label}`,
      );
    }
    const narrowest = vbit.reduce((a, b) => (b.widthMm < a.widthMm ? b : a));
    if (!(narrowest.widthMm > s.vbitTipMm)) {
      throw new SpecError(
        'engrave.tool.vbitTipMm',
        s.vbitTipMm,
        `allowed: a tip narrower than ${mm(narrowest.widthMm)} mm (the narrowest line, set by ${widthFieldOf(narrowest)})`,
        `a V-bit with a ${mm(s.vbitTipMm)} mm flat tip cannot cut the ${mm(narrowest.widthMm)} mm ${narrowest.label}`,
      );
    }
    const depth = vbitDepthMm(widest.widthMm, s.vbitAngleDeg, s.vbitTipMm);
    if (!(depth <= limit + 1e-12)) {
      throw new SpecError(
        'plate.thickness',
        spec.plate.thickness,
        `allowed: a sheet at least ${mm(minThicknessFor(depth))} mm thick for this groove; or narrower lines (${widthFieldOf(widest)}), or a wider engrave.tool.vbitAngleDeg`,
        `the ${mm(widest.widthMm)} mm ${widest.label} needs a ${mm(depth)} mm deep groove with a ${mm(s.vbitAngleDeg)} deg V-bit, deeper than a ${mm(job.stock.thicknessMm)} mm sheet allows (at most ${mm(Math.max(0, limit))} mm, leaving max(${MIN_SKIN_MM} mm, half the thickness) under the groove)`,
      );
    }
  }
  if (job.paths.some(isFlat) && !(s.flatDepthMm <= limit + 1e-12)) {
    throw new SpecError(
      'engrave.tool.flatDepthMm',
      s.flatDepthMm,
      `allowed: at most ${mm(Math.max(0, limit))} mm for a ${mm(job.stock.thicknessMm)} mm sheet (leaving max(${MIN_SKIN_MM} mm, half the thickness) under the groove)`,
      `flat-mill grooves ${mm(s.flatDepthMm)} mm deep are deeper than the sheet allows`,
    );
  }
}
