/**
 * Free text (a dial name, a place, a label: anything a spec's author typed)
 * made safe to insert into a CommonMark / GitHub-flavoured Markdown line, in
 * a heading, a paragraph, a list item or a table cell. The one function every
 * free-text insertion into install.md goes through.
 *
 * - Line breaks, tabs and other control characters become one space, so the
 *   text cannot start a heading, a list or a table row of its own; leading
 *   and trailing spaces are dropped (four leading spaces would start code).
 * - Every ASCII punctuation character with a meaning inline is escaped with a
 *   backslash (CommonMark 0.31.2 §2.4: any ASCII punctuation may be), so
 *   `<b>` and `<javascript:…>` stay text (no raw HTML, no autolink, §6.5 and
 *   §6.6), `[x](javascript:…)` is no link (§6.3), `&amp;` no entity (§2.5),
 *   and `|` does not split a table cell (GFM tables, §4.10).
 * - A leading `-`, `+`, `=` or `1.` / `1)` is escaped, so the text cannot
 *   open a list or underline a heading where it starts a line.
 * Other characters (letters, digits, `.`, `'`, `,`, `-` inside) are kept, so
 * ordinary names read as typed in the Markdown source.
 * @example escapeMarkdownText('Quay <b>east</b>\n# x') // 'Quay \\<b\\>east\\</b\\> \\# x'
 */
export function escapeMarkdownText(text: string): string {
  return text
    .replace(/[\u0000-\u001f\u007f-\u009f\u2028\u2029]+/g, ' ')
    .trim()
    .replace(/[\\`*_{}[\]<>()#|!~&]/g, (c) => `\\${c}`)
    .replace(/^([-+=])/, '\\$1')
    .replace(/^(\d+)([.)])/, '$1\\$2');
}
