import type { InstallSheet } from '@umbrafab/geometry';
import { roundTo } from '../process/roundTo.ts';
import { escapeMarkdownText as md } from './markdownText.ts';
import { fastenerSectionMd } from './fastenerSectionMd.ts';
import { templateSectionMd, type TemplateGuide } from './templateSectionMd.ts';

/** Fixed decimals, rounded through roundTo (no −0). */
function fx(v: number, decimals: number): string {
  return roundTo(v, decimals).toFixed(decimals);
}

function signed(v: number, decimals: number): string {
  const r = roundTo(v, decimals);
  return `${r > 0 ? '+' : r < 0 ? '−' : '±'}${Math.abs(r).toFixed(decimals)}`;
}

function utcOffset(hours: number): string {
  const m = Math.round(Math.abs(hours) * 60);
  return `UTC${hours < 0 ? '−' : '+'}${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
}

/**
 * install.md: the installation sheet as CommonMark text (headings, lists and
 * pipe tables, GitHub-flavoured table syntax), from the plain data of
 * `installSheet`, with a guide to template.pdf's sheets when one is written. No solar math here; numbers are rounded for reading
 * (angles 0.1°, lengths 1 mm, times 1 s, E 0.1 min). Free text from the
 * spec (name, place, mark labels) goes through `escapeMarkdownText`; the zone is
 * an IANA name checked by the spec.
 * @example toInstallMd(installSheet(layout)).startsWith('# Installing')
 */
export function toInstallMd(sheet: InstallSheet, template?: TemplateGuide): string {
  const s = sheet.site;
  const ns = (v: number, pos: string, neg: string) => `${fx(Math.abs(v), 4)}° ${v >= 0 ? pos : neg}`;
  const pole = sheet.hemisphere === 'north' ? 'north' : 'south';
  const out: string[] = [];
  out.push(`# Installing "${md(sheet.dialName)}"`, '');
  out.push(`Site: ${s.place ? `${md(s.place)}, ` : ''}${ns(s.latitudeDeg, 'N', 'S')}, ${ns(s.longitudeDeg, 'E', 'W')}, time zone ${s.timezone}. Figures for installation on ${sheet.date}.`, '');

  out.push('## Safety first', '');
  for (const c of sheet.cautions) out.push(`- ${c}`);
  out.push('');
  if (template) out.push(...templateSectionMd(template));

  const a = sheet.assembly;
  out.push(`## Parts and weights (on its ${a.carrier})`, '');
  out.push('| part | material | pieces | each (kg) | together (kg) |', '|---|---|---|---|---|');
  for (const w of a.weights.parts) out.push(`| ${w.part} | ${w.material} | ${w.quantity} | ${fx(w.massKgEach, 2)} | ${fx(w.massKg, 2)} |`);
  out.push(`| **total to lift and ship** | | | | **${fx(a.weights.totalKg, 2)}** |`, '');
  out.push(`Heaviest piece ${fx(a.weights.heaviestPieceKg, 2)} kg; ${a.weights.note}.`, '');
  out.push(...fastenerSectionMd(a.fasteners));
  out.push('## Assembly', '');
  a.steps.forEach((st, i) => out.push(`${i + 1}. **${st.title}.** ${st.text}`));
  out.push('');
  if (a.nodus !== null) out.push(`The nodus: ${a.nodus}`, '');
  for (const c of a.cautions) out.push(`- ${c}`);
  out.push('');

  out.push('## 1. Tilt', '');
  out.push(`- Tilt the plate **${fx(sheet.tilt.angleDeg, 1)}°** from the horizontal (equal to the latitude); check with a digital level laid along the style.`);
  out.push(`- Over the plate's length of ${fx(sheet.tilt.plateLengthMm, 0)} mm the raised end stands **${fx(sheet.tilt.riseMm, 0)} mm** above the lower end (horizontal run ${fx(sheet.tilt.runMm, 0)} mm).`);
  out.push(`- The raised end (the end away from the numerals) points to the geographic ${pole}; the face looks up toward the celestial equator.`, '');

  out.push(`## 2. True ${pole}`, '');
  const d = sheet.trueNorth.magneticDeclinationDeg;
  if (d === null) {
    out.push(`- Compass: ${sheet.trueNorth.sentence}.`);
  } else {
    out.push(`- Magnetic declination at the site on ${sheet.date} (${sheet.trueNorth.model}): ${fx(Math.abs(d), 1)}° ${d >= 0 ? 'east' : 'west'}.`);
    out.push(`- Compass: ${sheet.trueNorth.sentence}.`);
    out.push('- Keep the compass away from steel, cars and the dial itself if it is steel; read it a few metres off and sight along a string.');
  }
  out.push(`- The style must lie in the geographic meridian, its raised end toward the ${pole} celestial pole.`, '');

  out.push('## 3. Fine alignment at local apparent noon', '');
  out.push('At the clock times below the Sun crosses the site\'s meridian: the shadow of a plumb line then falls exactly north–south. Align the style on it (or turn the dial until the shadow lies in the noon band). Clock times are local, with daylight saving when in force.', '');
  out.push('| date | local apparent noon | clock |', '|---|---|---|');
  if (sheet.noon.length === 0) out.push('| – | no local apparent noon falls on these local dates (the site lies about 12 h from its zone\'s meridian) | – |');
  for (const r of sheet.noon) out.push(`| ${r.date} | ${r.clock} | ${utcOffset(r.utcOffsetHours)}${r.daylightSaving ? ' (summer time)' : ''} |`);
  out.push('');

  out.push('## 4. Reading the dial', '');
  const rd = sheet.reading;
  const corr = rd.longitudeCorrectionMin;
  if (rd.reads === 'standard') {
    out.push(`- The lines are set for standard time (${utcOffset(rd.standardOffsetHours)}): clock time = dial − E.`);
  } else {
    out.push(`- The dial shows apparent solar time: clock time = dial − E ${corr >= 0 ? '+' : '−'} ${fx(Math.abs(corr), 1)} min (longitude correction), standard time ${utcOffset(rd.standardOffsetHours)}.`);
  }
  if (rd.daylightShiftHours > 0) out.push(`- Add ${fx(rd.daylightShiftHours, 0)} h while summer time is in force.`);
  out.push('- E is the equation of time (apparent − mean solar time), at 12:00 UT:', '');
  out.push('| date | E (min) | date | E (min) |', '|---|---|---|---|');
  for (let i = 0; i + 1 < rd.equationOfTime.length; i += 2) {
    const a = rd.equationOfTime[i];
    const b = rd.equationOfTime[i + 1];
    out.push(`| ${a.date} | ${signed(a.minutes, 1)} | ${b.date} | ${signed(b.minutes, 1)} |`);
  }
  out.push('');

  for (const line of a.reading) out.push(`- ${line}`);
  if (a.reading.length > 0) out.push('');

  out.push('## 5. Which marks the Sun reaches here', '');
  const never = sheet.reach.filter((r) => !r.reached);
  out.push(never.length === 0
    ? `All ${sheet.reach.length} marks are reached on some day of the year (Sun above the horizon and in front of the face).`
    : `Never reached at this site: ${never.map((r) => md(r.label)).join(', ')}.`, '');
  out.push('| mark | hour angle | days of the year reached |', '|---|---|---|');
  for (const r of sheet.reach) out.push(`| ${md(r.label)} | ${signed(r.hourAngleDeg, 2)}° | ${r.daysReached} |`);
  out.push('');
  return out.join('\n');
}
