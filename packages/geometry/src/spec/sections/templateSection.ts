import { z } from 'zod';
import { boundedNumber } from '../boundedNumber.ts';

/**
 * The `template:` section of the dial spec: the printable 1:1 paper template
 * (template.pdf) a maker glues on the stock to scribe and drill by hand.
 * Every field has a default and a describe() text with its unit.
 */

/** Paper sizes the template can be printed on (ISO 216 A4, ANSI/ASME Y14.1 Letter). */
export const TEMPLATE_PAPERS = ['A4', 'Letter'] as const;
export type TemplatePaper = (typeof TEMPLATE_PAPERS)[number];

export const TEMPLATE_ORIENTATIONS = ['auto', 'portrait', 'landscape'] as const;
export type TemplateOrientation = (typeof TEMPLATE_ORIENTATIONS)[number];

/** A bounded length in mm (see boundedNumber). */
const mm = (min: number, max: number) => boundedNumber({ min, max, unit: 'mm' });

export const templateSection = z
  .strictObject({
    write: z.boolean({ error: 'allowed: true or false' }).default(true).describe('write template.pdf'),
    paper: z
      .enum(TEMPLATE_PAPERS, { error: `allowed: ${TEMPLATE_PAPERS.map((p) => JSON.stringify(p)).join(', ')}` })
      .default('A4')
      .describe('paper size of template.pdf: "A4" (210 x 297 mm) or "Letter" (8.5 x 11 in)'),
    orientation: z
      .enum(TEMPLATE_ORIENTATIONS, { error: `allowed: ${TEMPLATE_ORIENTATIONS.map((p) => JSON.stringify(p)).join(', ')}` })
      .default('auto')
      .describe('page orientation: "auto" (whichever needs fewer sheets, portrait on a tie), "portrait" or "landscape"'),
    overlap: mm(5, 50).default(15).describe('overlap between neighbouring sheets when the plate needs more than one, mm (alignment marks sit in it)'),
    margin: mm(5, 30).default(10).describe('blank border kept at every paper edge, which most printers cannot reach, mm'),
  })
  .prefault({});

export type TemplateSpec = z.output<typeof templateSection>;
