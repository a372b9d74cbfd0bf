import { z } from 'zod';

/**
 * Characters a free-text field may not hold: C0 and C1 control characters
 * (tab and newline included: every free-text field is one line), DEL, lone
 * UTF-16 surrogates and the noncharacters U+FFFE/U+FFFF (not allowed in XML
 * 1.0, §2.2 Char, so they would break preview.svg and the assembly SVG), and
 * the bidirectional embedding, override and isolate controls (U+202A–U+202E,
 * U+2066–U+2069: Unicode UAX #9), which reorder the text shown in the job
 * sheet away from the text engraved.
 */
export const NOT_FREE_TEXT = /[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069\ufffe\uffff]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;

/** The first character of `text` a free-text field refuses, as "U+0007 at character 3", or null. */
export function firstNotFreeText(text: string): string | null {
  const m = NOT_FREE_TEXT.exec(text);
  if (!m) return null;
  const code = m[0].charCodeAt(0).toString(16).toUpperCase().padStart(4, '0');
  return `U+${code} at character ${[...text.slice(0, m.index)].length + 1}`;
}

/**
 * A zod field for one line of free text (a name, a place, a label) of 1 or
 * `minLength` to `maxLength` characters. A control character is refused with
 * its code point and position, so the message says exactly what to delete.
 * @example freeText({ maxLength: 60 }).default('Polar dial')
 */
export function freeText(opts: { readonly minLength?: number; readonly maxLength: number }) {
  const { minLength = 0, maxLength } = opts;
  const length = minLength > 0 ? `${minLength} to ${maxLength} characters` : `at most ${maxLength} characters`;
  let s = z.string({ error: 'allowed: a text in quotes' });
  if (minLength > 0) s = s.min(minLength, { error: `allowed: ${length}` });
  return s.max(maxLength, { error: `allowed: ${length}` }).superRefine((text, ctx) => {
    const bad = firstNotFreeText(text);
    if (bad) ctx.addIssue({ code: 'custom', message: `allowed: one line of text of ${length}, without control characters (found ${bad})` });
  });
}
