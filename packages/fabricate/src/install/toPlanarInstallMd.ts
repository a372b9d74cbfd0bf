import type { PlanarInstallSheet } from '@umbrafab/geometry';
import { escapeMarkdownText } from './markdownText.ts';
import { fastenerSectionMd } from './fastenerSectionMd.ts';
import { templateSectionMd, type TemplateGuide } from './templateSectionMd.ts';

/**
 * install.md for a horizontal, wall, meridian or equatorial face: the
 * cautions first, then the paper template (when template.pdf is written),
 * the fasteners to buy (when the face's carrier has them), the numbered steps, the hours left out and the face's figures (CommonMark).
 */
export function toPlanarInstallMd(sheet: PlanarInstallSheet, template?: TemplateGuide): string {
  const out: string[] = [`# Installing ${escapeMarkdownText(sheet.title)} (${sheet.faceType} face)`, ''];
  out.push('## Safety first', '');
  for (const c of sheet.cautions) out.push(`- ${c}`);
  out.push('- Work on a wall from a secured ladder or scaffold; check for buried cables and pipes before drilling.', '');
  if (template) out.push(...templateSectionMd(template));
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
