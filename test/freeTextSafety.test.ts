import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import MarkdownIt from 'markdown-it';
import { afterAll, describe, expect, it } from 'vitest';
import { parse as parseYaml, stringify } from 'yaml';
import { parseSpec } from '@umbrafab/geometry';
import { buildFiles } from '@umbrafab/cli';
import { runCli } from './helpers/runCli.ts';

const ROOT = resolve(import.meta.dirname, '..');
const demo = parseYaml(readFileSync(join(ROOT, 'fixtures/demo.yaml'), 'utf8')) as Record<string, any>;
const work = mkdtempSync(join(tmpdir(), 'umbrafab-text-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));
const text = (b: Uint8Array) => new TextDecoder().decode(b);

describe('free text from the spec', () => {
  it('a control character (BEL, ESC, NUL, VT) in the name, the place or a date label exits 1 naming the field; nothing is written, pictures on or off', async () => {
    const cases: [string, (s: Record<string, any>, c: string) => void][] = [
      ['name', (s, c) => (s.name = `Quay${c}east`)],
      ['site.place', (s, c) => (s.site.place = `Harbour${c}wall`)],
      ['calendar.dates.0.label', (s, c) => ((s.gnomon = { ...s.gnomon, nodus: true }), (s.calendar = { ...s.calendar, dates: [{ date: '06-14', label: `WED${c}` }] }))],
    ];
    let n = 0;
    for (const [field, set] of cases) {
      for (const c of ['\u0007', '\u001b', '\u0000', '\u000b']) {
        for (const write of [true, false]) {
          const spec = structuredClone(demo);
          set(spec, c);
          spec.pictures = { ...spec.pictures, write };
          const file = join(work, `cc-${n}.yaml`);
          writeFileSync(file, stringify(spec));
          const out = join(work, `cc-out-${n++}`);
          const r = await runCli(['build', file, '--out', out]);
          expect(r.code, `${field} ${JSON.stringify(c)}`).toBe(1);
          const code = `U+${c.charCodeAt(0).toString(16).toUpperCase().padStart(4, '0')}`;
          expect(r.err).toMatch(new RegExp(`^umbrafab: ${field.replace(/\./g, '\\.')}: got ".*"; allowed: one line of text .*without control characters \\(found ${code.replace('+', '\\+')} at character \\d+\\)`));
          expect(r.err).not.toMatch(/internal error|\n\s+at /);
          expect(existsSync(out)).toBe(false);
        }
      }
    }
    expect(n).toBe(24);
  });

  it('HTML, links and Markdown in the name, place and date label stay text in install.md; the SVGs stay well-formed XML', async () => {
    const spec = structuredClone(demo);
    spec.name = '<img src=x onerror=alert(1)> [x](javascript:alert(1))';
    spec.site.place = '<javascript:alert(1)> & | # *b* &amp;';
    spec.gnomon = { ...spec.gnomon, nodus: true };
    spec.calendar = { ...spec.calendar, dates: [{ date: '06-14', label: '<b>|x|</b>' }] };
    const built = await buildFiles(parseSpec(spec));
    const md = text(built.files.find((f) => f.name === 'install.md')!.bytes);
    // markdown-it 15 with raw HTML and linkify on: a missed escape would come out as a tag or a link.
    const html = new MarkdownIt({ html: true, linkify: true }).render(md);
    expect(html).not.toMatch(/<(img|script|a|b|em)\b/);
    expect(html).not.toMatch(/href=/);
    expect(html.match(/<h1/g)).toHaveLength(1);
    expect(html).toContain('<h1>Installing &quot;&lt;img src=x onerror=alert(1)&gt; [x](javascript:alert(1))&quot;</h1>');
    expect(html).toContain('Site: &lt;javascript:alert(1)&gt; &amp; | # *b* &amp;amp;, ');
    // Every SVG parses as XML (Python's xml.etree, Debian python3: an outside parser).
    for (const f of built.files.filter((f) => f.name.endsWith('.svg'))) {
      const file = join(work, f.name);
      writeFileSync(file, f.bytes);
      execFileSync('/usr/bin/python3', ['-c', 'import sys, xml.etree.ElementTree as E; E.parse(sys.argv[1])', file]);
    }
  });
});
