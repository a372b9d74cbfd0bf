import { countMarks, type CheckResult, type CurveCheck, type MarkCheck } from '@umbrafab/geometry';

/** Fixed-decimals text of a number, "-0.000" shown as "0.000". */
function fx(v: number, d: number): string {
  const s = v.toFixed(d);
  return /^-0\.?0*$/.test(s) ? s.slice(1) : s;
}

function signed(v: number, d: number): string {
  const s = fx(v, d);
  return s.startsWith('-') ? s : `+${s}`;
}

/** Signed, with 4 decimals, or in exponent form when smaller than that shows. */
function tiny(v: number): string {
  if (v !== 0 && Math.abs(v) < 5e-5) return `${v < 0 ? '' : '+'}${v.toExponential(1)}`;
  return signed(v, 4);
}

const COLUMNS = ['mark', 'lit days', 'worst mm', 'worst s', 'mean mm', 'worst day', 'penumbra mm', 'clock-label min', 'tilt 1° min', 'az 1° min'] as const;

function row(m: MarkCheck): string[] {
  return [
    `${m.label} ${m.style}`,
    `${m.litDays}`,
    signed(m.errorMm.worst, 4),
    signed(m.errorS.worst, 2),
    fx(m.errorMm.meanAbs, 4),
    m.worstDate ?? '-',
    `${fx(m.penumbraMm.min, 2)}-${fx(m.penumbraMm.max, 2)}`,
    `${signed(m.clockOffsetMin.min, 1)}..${signed(m.clockOffsetMin.max, 1)}`,
    signed(m.tiltShiftMinPerDeg.worst, 2),
    signed(m.azimuthShiftMinPerDeg.worst, 2),
  ];
}

const CURVE_COLUMNS = ['curve', 'samples', 'worst mm', 'worst s', 'worst day'] as const;

function curveRow(c: CurveCheck): string[] {
  return [c.label, `${c.samples}`, tiny(c.worstMm).replace(/^\+/, ''), fx(c.worstS, 3), c.worstDate ?? '-'];
}

/** Rows padded to their columns: the first column left-aligned, the `left` ones too, the others right-aligned; a rule under the header. */
function tableLines(header: readonly string[], body: readonly string[][], left: readonly number[]): string[] {
  const rows = [header, ...body];
  const widths = header.map((_, c) => Math.max(...rows.map((r) => r[c].length)));
  const lines = rows.map((r) => r.map((cell, c) => (c === 0 || left.includes(c) ? cell.padEnd(widths[c]) : cell.padStart(widths[c]))).join('  ').trimEnd());
  lines.splice(1, 0, widths.map((w) => '-'.repeat(w)).join('  '));
  return lines;
}

/**
 * The terminal table of `umbrafab check`: one row per mark (worst and mean
 * geometric error in mm and seconds, the worst day, lit days, penumbra width,
 * the clock-minus-label offset over the year, the shift per degree of tilt and
 * azimuth error), with a nodus one row per date line and mean-time curve
 * (its worst distance from the nodus shadow in mm and seconds, and the day),
 * then a verdict line. Plain text, columns padded with spaces,
 * no colour codes; lines joined with "\n".
 *
 * @example checkTableText(checkDial(layout)).split('\n')[0] // header
 */
export function checkTableText(result: CheckResult): string {
  const lines = tableLines(COLUMNS, result.marks.map(row), [5]);
  if (result.curves.length) lines.push('', ...tableLines(CURVE_COLUMNS, result.curves.map(curveRow), [4]));
  const days = result.days.length;
  lines.push('');
  lines.push(
    `${countMarks(result.marks).marks} engraved marks measured (${result.source === 'plate' ? 'read from the plate drawing' : 'from the layout'}) x ${days} days of ${result.year}, ${result.sunPositions} sun positions; gnomon h ${fx(result.gnomon.heightMm, 2)} mm, t ${fx(result.gnomon.thicknessMm, 2)} mm; refraction ${result.refraction}; installed tilt error ${signed(result.tiltErrorDeg, 2)}°, azimuth error ${signed(result.azimuthErrorDeg, 2)}°`,
  );
  lines.push(
    result.reads === 'standard'
      ? 'clock-label: standard clock time when the sun reaches the mark minus the mark\'s label: the equation-of-time offset, kept apart from the geometric error'
      : 'clock-label: standard clock time when the sun reaches the mark minus its solar-time label: equation of time and longitude, kept apart from the geometric error',
  );
  const w = result.worst;
  if (w) lines.push(`worst geometric error: ${tiny(w.errorMm)} mm (${tiny(w.errorS)} s) at ${w.label} ${w.style} on ${w.date}; tolerance ${fx(result.toleranceMm, 3)} mm`);
  const curves = result.curves;
  if (curves.length) {
    const wc = curves.reduce((a, c) => (c.worstMm > a.worstMm ? c : a), curves[0]);
    lines.push(`worst curve: ${tiny(wc.worstMm).replace(/^\+/, '')} mm (${fx(wc.worstS, 3)} s) on ${wc.label}${wc.worstDate ? ` on ${wc.worstDate}` : ''}; ${curves.length} date line(s) and curve(s) (${result.curveSource === 'plate' ? 'read from the plate drawing' : 'from the layout'}), tolerance ${fx(result.curveToleranceMm, 3)} mm`);
  }
  if (result.pass) lines.push(`PASS: every lit mark${curves.length ? ', date line and mean-time curve' : ''} lies within the tolerance of the simulated shadow on every day`);
  else {
    for (const f of result.failures) {
      lines.push(`FAIL: mark ${f.label} ${f.style}: shadow ${signed(f.errorMm, 3)} mm (${signed(f.errorS, 1)} s) off the line on ${f.date}; ${f.daysOverTolerance} day(s) beyond ${fx(result.toleranceMm, 3)} mm`);
    }
    for (const c of curves.filter((k) => !k.pass)) {
      lines.push(`FAIL: curve ${c.label}: nodus shadow ${fx(c.worstMm, 4)} mm (${fx(c.worstS, 1)} s) off the drawn curve on ${c.worstDate ?? '-'}; beyond ${fx(result.curveToleranceMm, 3)} mm`);
    }
  }
  return lines.join('\n');
}
