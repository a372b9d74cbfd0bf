import { escapeMarkdownText } from './markdownText.ts';

/** Which sheets of template.pdf show what (for install.md's template section). */
export interface TemplateGuide {
  readonly paper: string;
  readonly pages: number;
  /** each drawing at 1:1 in page order: its name and its first and last sheet */
  readonly drawings: readonly { readonly label: string; readonly firstSheet: number; readonly lastSheet: number }[];
  /** the sheet(s) with the table of measurements, and what it lists (e.g. "the ends of every line and the hole centres, mm from the plate's lower-left corner") */
  readonly tableSheets: readonly [number, number];
  readonly tableLists: string;
  /** the parts are printed, not cut from stock (process.method print): the sheets check them, nothing is scribed */
  readonly printed?: boolean;
  /** the sheet of the 45° check triangle (the polar plate's template), absent where there is none */
  readonly checkSheet?: number;
}

/**
 * install.md's section on template.pdf, shared by every face type: print and
 * check at 1:1, then what each sheet is for, in page order.
 *
 * @example templateSectionMd({ paper: 'A4', pages: 5, drawings: [{ label: 'plate', firstSheet: 1, lastSheet: 4 }], tableSheets: [5, 5], tableLists: 'the ends of every line' })[0] // '## The paper template (template.pdf)'
 */
export function templateSectionMd(t: TemplateGuide): string[] {
  const range = (a: number, b: number) => (a === b ? `sheet ${a}` : `sheets ${a} to ${b}`);
  const entries = [
    ...t.drawings.map((d) => ({
      first: d.firstSheet,
      text: `${range(d.firstSheet, d.lastSheet)}: the ${escapeMarkdownText(d.label)} at 1:1${d.firstSheet === d.lastSheet ? '' : ' (trim and glue the overlaps so the crosses coincide)'}. ${t.printed ? 'Lay the printed part on it to check the outline and the holes.' : 'Lay the cut part on it to check the outline and the holes, or glue it on the stock to scribe, centre-punch and drill by hand.'}`,
    })),
    { first: t.tableSheets[0], text: `${range(t.tableSheets[0], t.tableSheets[1])}: ${t.tableLists}, to check with a rule.` },
    ...(t.checkSheet !== undefined ? [{ first: t.checkSheet, text: `${range(t.checkSheet, t.checkSheet)}: the 45° check triangle at 1:1, to cut out and stand on the face against the style (the Assembly steps say where).` }] : []),
  ].sort((a, b) => a.first - b.first);
  return [
    '## The paper template (template.pdf)',
    '',
    `- Print all ${t.pages} ${t.paper} sheets at 100 % (actual size, no "fit to page"), then measure the calibration bar on each: it must be exactly 100 mm. A sheet printed at another scale is useless for marking out.`,
    ...entries.map((e) => `- ${e.text}`),
    '',
  ];
}
