import { describe, expect, it } from 'vitest';
import { firstNotFreeText, freeText } from './freeText.ts';

describe('freeText', () => {
  const f = freeText({ minLength: 1, maxLength: 24 });
  it('defaults: keeps ordinary text, accented letters, emoji and right-to-left letters', () => {
    for (const s of ['Windlecombe Quay', 'Église Saint-Pierre', 'Ōtautahi 🌞', 'שעון שמש', "St. Mary's (east)"]) expect(f.parse(s)).toBe(s);
  });
  it('refuses each XML-illegal or line-breaking control character, naming it and its position', () => {
    for (const [s, found] of [
      ['a\u0007b', 'U+0007 at character 2'], // BEL
      ['\u001b[31mred', 'U+001B at character 1'], // ESC
      ['nul\u0000', 'U+0000 at character 4'],
      ['v\u000bt', 'U+000B at character 2'], // VT
      ['two\nlines', 'U+000A at character 4'],
      ['tab\there', 'U+0009 at character 4'],
      ['del\u007f', 'U+007F at character 4'],
      ['c1\u0085', 'U+0085 at character 3'],
      ['lone\ud800', 'U+D800 at character 5'],
      ['nonchar\uffff', 'U+FFFF at character 8'],
      ['🌞\u202eevil', 'U+202E at character 2'], // position counts code points
    ] as const) {
      const r = f.safeParse(s);
      expect(r.success, JSON.stringify(s)).toBe(false);
      expect(r.error!.issues[0].message).toBe(`allowed: one line of text of 1 to 24 characters, without control characters (found ${found})`);
    }
  });
  it('option maxLength and minLength: the length message', () => {
    expect(f.safeParse('').error!.issues[0].message).toBe('allowed: 1 to 24 characters');
    expect(freeText({ maxLength: 3 }).safeParse('abcd').error!.issues[0].message).toBe('allowed: at most 3 characters');
    expect(freeText({ maxLength: 3 }).parse('')).toBe('');
  });
  it('firstNotFreeText: null for a valid surrogate pair', () => {
    expect(firstNotFreeText('\ud83c\udf1e')).toBeNull();
  });
});
