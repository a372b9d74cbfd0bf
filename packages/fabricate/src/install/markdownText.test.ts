import MarkdownIt from 'markdown-it';
import { describe, expect, it } from 'vitest';
import { escapeMarkdownText } from './markdownText.ts';

// markdown-it 15 (CommonMark 0.31.2 with GFM tables) renders the escaped text as the reference renderer, with raw HTML and linkify ON,
// so anything the escaping missed would come out as HTML or a link.
const render = (src: string) => new MarkdownIt({ html: true, linkify: true }).render(src);
const renderInline = (src: string) => new MarkdownIt({ html: true, linkify: true }).renderInline(src);

describe('escapeMarkdownText', () => {
  it('defaults: ordinary names are kept as typed', () => {
    for (const s of ['Windlecombe Quay', "St. Mary's, east wall", 'Ōtautahi 🌞', 'Dial 2-b']) expect(escapeMarkdownText(s)).toBe(s);
  });
  it('renders back to exactly the text typed, with no HTML, link or emphasis', () => {
    const hostile = ['<img src=x onerror=alert(1)>', '<script>alert(1)</script>', '[click](javascript:alert(1))', '<javascript:alert(1)>', '&lt;b&gt; &amp;', '*bold* _em_ `code` ~~del~~', '![img](x.png)', 'a | b | c', 'back\\slash'];
    for (const s of hostile) {
      const html = renderInline(escapeMarkdownText(s));
      expect(html, s).not.toMatch(/<(img|script|a|em|strong|code|s|del)\b/);
      // The text shown equals the text typed (markdown-it escapes it as HTML text).
      expect(html.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&amp;/g, '&'), s).toBe(s);
    }
  });
  it('a newline, tab or other control character becomes a space: no heading, list or table row of its own', () => {
    expect(escapeMarkdownText('Quay\n# Heading\r\n- item\t| x |')).toBe('Quay \\# Heading - item \\| x \\|');
    const html = render(`# Installing "${escapeMarkdownText('Quay\n# Pwned\n\n<h2>x</h2>')}"\n`);
    expect(html.match(/<h\d/g)).toEqual(['<h1']);
  });
  it('a text that starts a line cannot open a list, a numbered list or a setext underline', () => {
    for (const s of ['- item', '+ item', '1. first', '2) second', '=====', '    code']) {
      const html = render(`${escapeMarkdownText(s)}\n`);
      expect(html, s).toMatch(/^<p>/);
    }
  });
  it('inside a table cell, a | stays in its cell', () => {
    const html = render(`| mark | n |\n|---|---|\n| ${escapeMarkdownText('a | b')} | 1 |\n`);
    expect(html.match(/<td>/g)).toHaveLength(2);
    expect(html).toContain('<td>a | b</td>');
  });
});
