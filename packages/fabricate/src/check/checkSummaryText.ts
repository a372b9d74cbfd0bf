import type { CheckSummary, CurveCheck, MarkFailure } from '@umbrafab/geometry';

/** Fixed-decimals text of a number, "-0.000" shown as "0.000". */
export function fx(v: number, d: number): string {
  const s = v.toFixed(d);
  return /^-0\.?0*$/.test(s) ? s.slice(1) : s;
}

/** Fixed decimals with the sign always shown. */
export function signed(v: number, d: number): string {
  const s = fx(v, d);
  return s.startsWith('-') ? s : `+${s}`;
}

/** Signed, with 4 decimals, or in exponent form when smaller than that shows. */
export function tiny(v: number): string {
  if (v !== 0 && Math.abs(v) < 5e-5) return `${v < 0 ? '' : '+'}${v.toExponential(1)}`;
  return signed(v, 4);
}

/** Rows padded to their columns: the first column left-aligned, the `left` ones too, the others right-aligned; a rule under the header. */
export function tableLines(header: readonly string[], body: readonly string[][], left: readonly number[]): string[] {
  const rows = [header, ...body];
  const widths = header.map((_, c) => Math.max(...rows.map((r) => r[c].length)));
  const lines = rows.map((r) => r.map((cell, c) => (c === 0 || left.includes(c) ? cell.padEnd(widths[c]) : cell.padStart(widths[c]))).join('  ').trimEnd());
  lines.splice(1, 0, widths.map((w) => '-'.repeat(w)).join('  '));
  return lines;
}

const CURVE_COLUMNS = ['curve', 'samples', 'worst mm', 'worst s', 'worst day'] as const;

function curveRow(c: CurveCheck): string[] {
  return [c.label, `${c.samples}`, tiny(c.worstMm).replace(/^\+/, ''), fx(c.worstS, 3), c.worstDate ?? '-'];
}

/** The drawn curve of largest worst distance (the first of equals), or null without curves. */
export function worstCurve(curves: readonly CurveCheck[]): CurveCheck | null {
  return curves.length ? curves.reduce((a, c) => (c.worstMm > a.worstMm ? c : a), curves[0]) : null;
}

/**
 * The part of `umbrafab check`'s text both checks (polar and planar) write
 * alike from a `CheckSummary`: the table of date lines and mean-time curves
 * (samples, worst distance from the nodus shadow in mm and seconds, its day;
 * nothing without curves) and the summary lines under it: the worst curve
 * with the curve tolerance, and one FAIL line per curve beyond it.
 * `source` says where the curves were read ('layout' or 'plate'), when known.
 *
 * @example curveSectionLines(checkPlanar(layout)).table
 */
export function curveSectionLines(r: CheckSummary, source?: 'layout' | 'plate'): { readonly table: string[]; readonly worst: string[]; readonly failures: string[] } {
  const wc = worstCurve(r.curves);
  if (!wc) return { table: [], worst: [], failures: [] };
  const from = source === undefined ? '' : ` (${source === 'plate' ? 'read from the plate drawing' : 'from the layout'})`;
  return {
    table: tableLines(CURVE_COLUMNS, r.curves.map(curveRow), [4]),
    worst: [`worst curve: ${tiny(wc.worstMm).replace(/^\+/, '')} mm (${fx(wc.worstS, 3)} s) on ${wc.label}${wc.worstDate ? ` on ${wc.worstDate}` : ''}; ${r.curves.length} date line(s) and curve(s)${from}, tolerance ${fx(r.curveToleranceMm, 3)} mm`],
    failures: r.curves
      .filter((k) => !k.pass)
      .map((c) => `FAIL: curve ${c.label}: nodus shadow ${fx(c.worstMm, 4)} mm (${fx(c.worstS, 1)} s) off the drawn curve on ${c.worstDate ?? '-'}; beyond ${fx(r.curveToleranceMm, 3)} mm`),
  };
}

/**
 * The one line `umbrafab check` writes to stderr when a check fails, polar
 * or planar alike: the first mark beyond the tolerance (its label, the style
 * edge that casts it, `where` it is, e.g. " on the lower face", its error in
 * mm to 4 decimals, a tenth of the 0.001 mm the checks hold a mark to, and
 * its day), how many marks fail, and how many date lines or curves fail with
 * the first of them; without failing marks, the curves alone with the curve
 * tolerance.
 *
 * @example checkFailureLine(result, (f) => f.style) // "umbrafab check: mark 10:00 west is 0.5012 mm off the simulated shadow on 2027-06-21 (tolerance 0.001 mm); 1 mark(s) fail"
 */
export function checkFailureLine<F extends MarkFailure>(r: CheckSummary & { readonly failures: readonly F[] }, casterOf: (f: F) => string, where = ''): string {
  const f = r.failures[0];
  const bad = r.curves.filter((c) => !c.pass);
  const curves = bad.length ? `${bad.length} date line(s) or curve(s) fail, first ${bad[0].label}${where}: ${fx(bad[0].worstMm, 4)} mm off the nodus shadow on ${bad[0].worstDate ?? '-'}` : '';
  if (!f) return `umbrafab check: ${curves || `a date line or curve${where} lies beyond its tolerance`} (tolerance ${r.curveToleranceMm} mm)`;
  return `umbrafab check: mark ${f.label} ${casterOf(f)}${where} is ${fx(Math.abs(f.errorMm), 4)} mm off the simulated shadow on ${f.date} (tolerance ${r.toleranceMm} mm); ${r.failures.length} mark(s) fail${curves ? `; ${curves}` : ''}`;
}
