/** Symbols written as ASCII words or letters. */
const SYMBOLS: Readonly<Record<string, string>> = {
  '°': ' deg',
  'º': ' deg',
  'µ': 'u',
  'μ': 'u',
  '×': 'x',
  '−': '-',
  '–': '-',
  '—': '-',
  '′': "'",
  '″': '"',
  '‘': "'",
  '’': "'",
  '“': '"',
  '”': '"',
  '±': '+/-',
  '…': '...',
  'ß': 'ss',
  'æ': 'ae',
  'Æ': 'AE',
  'ø': 'o',
  'Ø': 'O',
  'œ': 'oe',
  'Œ': 'OE',
};

/**
 * Make text safe inside one RS-274/NGC comment `( … )`.
 *
 * The NIST RS274NGC interpreter (Kramer, Proctor, Messina, NISTIR 6556, 2000,
 * §3.3.4, memory) ends a comment at the first ')' and rejects a '(' inside one; GRBL
 * does the same. LinuxCNC also gives comments that start with MSG, DEBUG,
 * PRINT, LOG…, PROBE… or ABORT followed by a comma a meaning (LinuxCNC G-code
 * overview, "Messages" and "Logging", memory), so such text is prefixed with '- '.
 *
 * Rules: transliterate common symbols to ASCII (° → ' deg', µ → 'u', × → 'x',
 * − → '-', ′ → "'", ″ → '"', ± → '+/-'), strip accents (é → e), turn any
 * remaining non-ASCII character into '?', parentheses into brackets, control
 * characters and runs of white space into one space, and cap the length at
 * 200 characters (LinuxCNC reads lines up to 255).
 *
 * @returns the text without the surrounding parentheses
 * @example ngcComment('tilt 51.5° (north)') // 'tilt 51.5 deg [north]'
 */
export function ngcComment(text: string): string {
  let out = '';
  for (const ch of text) {
    const first = ch.charCodeAt(0);
    if (first >= 0x20 && first < 0x7f && first !== 0x28 && first !== 0x29) {
      out += ch; // printable ASCII other than parentheses: kept as it is (the rules below leave it so)
      continue;
    }
    const mapped = SYMBOLS[ch] ?? ch.normalize('NFD').replace(/[\u0300-\u036f]/g, '');
    for (const c of mapped) {
      const code = c.codePointAt(0) as number;
      if (c === '(') out += '[';
      else if (c === ')') out += ']';
      else if (code < 0x20 || code === 0x7f) out += ' ';
      else if (code > 0x7e) out += '?';
      else out += c;
    }
  }
  out = out.replace(/\s+/g, ' ').trim();
  if (/^(msg|debug|print|log\w*|probe\w*|abort)\s*,/i.test(out)) out = `- ${out}`;
  return out.length > 200 ? `${out.slice(0, 197)}...` : out;
}
