import type { PlanarCheckResult } from '@umbrafab/geometry';
import { curveSectionLines } from './checkSummaryText.ts';

const mm = (x: number) => (Math.abs(x) < 0.0005 ? x.toExponential(1) : x.toFixed(3));

/**
 * The terminal table of `umbrafab check` for a horizontal, wall, meridian or
 * equatorial face: one row per line (lit and reached days, worst error in mm
 * and seconds, its date), then the date lines and curves as the polar table
 * has them (`curveSectionLines`: a row each, the worst curve, a FAIL line
 * naming each curve beyond its tolerance), then the verdict.
 */
export function planarCheckText(r: PlanarCheckResult): string {
  const out: string[] = [];
  out.push(`umbrafab check: ${r.faceType}${r.side ? ` ${r.side}` : ''} face, year ${r.year}, sweep every ${r.stepMinutes} min, every ${r.everyDays} day(s), refraction ${r.refraction}, ${r.sunPositions} sun positions; ${r.litMinutes} lit minutes`);
  out.push(`gnomon: ${r.gnomon.kind} mesh, ${r.gnomon.triangles} triangles, ${r.gnomon.styleEdges} style edges; tolerance ${r.toleranceMm} mm (curves ${r.curveToleranceMm} mm)`);
  out.push('');
  out.push('line     edge    H deg    lit  reached  worst mm     worst s      date');
  for (const m of r.marks) {
    out.push(`${m.label.padEnd(8)} ${m.edge.padEnd(7)} ${m.hourAngleDeg.toFixed(2).padStart(7)} ${String(m.litDays).padStart(5)} ${String(m.reachedDays).padStart(8)}  ${mm(m.errorMm.worst).padStart(10)} ${mm(m.errorS.worst).padStart(10)}  ${m.worstDate ?? '-'}`);
  }
  const curves = curveSectionLines(r);
  if (curves.table.length) out.push('', ...curves.table);
  out.push('', ...curves.worst);
  if (r.pass) out.push(`pass: every line and curve within tolerance${r.worst ? `; worst line ${r.worst.label} ${r.worst.edge} ${mm(r.worst.errorMm)} mm on ${r.worst.date}` : ''}`);
  else {
    if (r.failures.length) out.push(`FAIL: ${r.failures.length} line(s) beyond ${r.toleranceMm} mm`);
    out.push(...curves.failures);
  }
  return `${out.join('\n')}\n`;
}
