import { countMarks, type CheckResult, type MarkCheck } from '@umbrafab/geometry';
import { curveSectionLines, fx, signed, tableLines, tiny } from './checkSummaryText.ts';

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
  const curveText = curveSectionLines(result, result.curveSource);
  if (curveText.table.length) lines.push('', ...curveText.table);
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
  lines.push(...curveText.worst);
  if (result.pass) lines.push(`PASS: every lit mark${result.curves.length ? ', date line and mean-time curve' : ''} lies within the tolerance of the simulated shadow on every day`);
  else {
    for (const f of result.failures) {
      lines.push(`FAIL: mark ${f.label} ${f.style}: shadow ${signed(f.errorMm, 3)} mm (${signed(f.errorS, 1)} s) off the line on ${f.date}; ${f.daysOverTolerance} day(s) beyond ${fx(result.toleranceMm, 3)} mm`);
    }
    lines.push(...curveText.failures);
  }
  return lines.join('\n');
}
