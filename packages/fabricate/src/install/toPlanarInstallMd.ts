import type { PlanarInstallSheet } from '@umbrafab/geometry';
import { escapeMarkdownText } from './markdownText.ts';
import { fastenerSectionMd } from './fastenerSectionMd.ts';

/** Which sheets of template.pdf show what (for install.md's template section). */
export interface PlanarTemplateGuide {
  readonly paper: string;
  readonly pages: number;
  /** each drawing at 1:1 in page order: its name and its first and last sheet */
  readonly drawings: readonly { readonly label: string; readonly firstSheet: number; readonly lastSheet: number }[];
  /** the sheet(s) with the table of line ends and holes */
  readonly tableSheets: readonly [number, number];
}

/**
 * install.md for a horizontal, wall, meridian or equatorial face: the
 * cautions first, then the paper template (when template.pdf is written),
 * the fasteners to buy (when the face's carrier has them), the numbered steps, the hours left out and the face's figures (CommonMark).
 */
export function toPlanarInstallMd(sheet: PlanarInstallSheet, template?: PlanarTemplateGuide): string {
  const out: string[] = [`# Installing ${escapeMarkdownText(sheet.title)} (${sheet.faceType} face)`, ''];
  out.push('## Safety first', '');
  for (const c of sheet.cautions) out.push(`- ${c}`);
  out.push('- Work on a wall from a secured ladder or scaffold; check for buried cables and pipes before drilling.', '');
  if (template) out.push(...templateSection(template));
  if (sheet.fasteners.length) out.push(...fastenerSectionMd(sheet.fasteners));
  out.push('## Steps', '');
  sheet.steps.forEach((s, i) => out.push(`${i + 1}. ${s}`));
  out.push('', '## The face', '');
  out.push(`- site latitude ${sheet.latitudeDeg.toFixed(4)}°, longitude ${sheet.longitudeDeg.toFixed(4)}°`);
  out.push(`- style height ${sheet.styleHeightDeg.toFixed(2)}° above the face; the substyle's hour angle H0 ${sheet.substyleHourAngleDeg.toFixed(2)}°`);
  if (sheet.leftOut.length) {
    out.push('', '## Hours left out', '', 'The face never sees the Sun at these times of the hours grid, so they carry no line:', '');
    for (const l of sheet.leftOut) out.push(`- ${l}`);
  }
  out.push('');
  return out.join('\n');
}

/** The template.pdf section: print and check at 1:1, then what each sheet is for, in page order. */
function templateSection(t: PlanarTemplateGuide): string[] {
  const range = (a: number, b: number) => (a === b ? `sheet ${a}` : `sheets ${a} to ${b}`);
  const entries = [
    ...t.drawings.map((d) => ({
      first: d.firstSheet,
      text: `${range(d.firstSheet, d.lastSheet)}: the ${escapeMarkdownText(d.label)} at 1:1${d.firstSheet === d.lastSheet ? '' : ' (trim and glue the overlaps so the crosses coincide)'}. Lay the cut part on it to check the outline and the holes, or glue it on the stock to scribe, centre-punch and drill by hand.`,
    })),
    { first: t.tableSheets[0], text: `${range(t.tableSheets[0], t.tableSheets[1])}: the ends of every line and the hole centres, mm from the plate's lower-left corner, to check with a rule.` },
  ].sort((a, b) => a.first - b.first);
  return [
    '## The paper template (template.pdf)',
    '',
    `- Print all ${t.pages} ${t.paper} sheets at 100 % (actual size, no "fit to page"), then measure the calibration bar on each: it must be exactly 100 mm. A sheet printed at another scale is useless for marking out.`,
    ...entries.map((e) => `- ${e.text}`),
    '',
  ];
}
