import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import MarkdownIt from 'markdown-it';
import { parse as parseYaml, stringify } from 'yaml';
import { afterAll, describe, expect, it } from 'vitest';
import { isSpecError, parseSpec } from '@umbrafab/geometry';
import { buildFiles, parseSpecText } from '@umbrafab/cli';
import { escapeMarkdownText } from '@umbrafab/fabricate';
import { runCli } from './helpers/runCli.ts';
import { expectBuiltFilesValid } from './helpers/validateBuilt.ts';

/**
 * Property-based tests over the whole spec space (fast-check). Seeded, so
 * each run is the same set of cases; FUZZ_RUNS scales the count.
 * Outside validators: ezdxf audit (Debian python3-ezdxf), admesh, rs274.
 */
const RUNS = Number(process.env.FUZZ_RUNS ?? 1100);
const BAD_RUNS = Number(process.env.FUZZ_BAD_RUNS ?? 1000);
const SEED = 20271;
const work = mkdtempSync(join(tmpdir(), 'umbrafab-fuzz-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

const zones = ['UTC', 'Europe/London', 'Europe/Lisbon', 'Europe/Berlin', 'America/Denver', 'America/Phoenix', 'Asia/Kolkata', 'Australia/Hobart', 'Pacific/Auckland', 'America/Sao_Paulo', 'Africa/Nairobi', 'Asia/Tokyo'];
const clockAt = (m: number) => `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
const round2 = (x: number) => Math.round(x * 100) / 100;

const specArb = fc.record({
  name: fc.stringMatching(/^[A-Za-z][A-Za-z0-9 .-]{0,24}$/),
  site: fc.record({
    latitude: fc.double({ min: -89.9, max: 89.9, noNaN: true }).map(round2),
    longitude: fc.double({ min: -180, max: 180, noNaN: true }).map(round2),
    timezone: fc.constantFrom(...zones),
  }),
  dial: fc.record({ reads: fc.constantFrom('solar', 'standard'), numerals: fc.constantFrom('arabic', 'arabic24', 'roman'), numeralHeight: fc.integer({ min: 3, max: 12 }) }),
  gnomon: fc.record({ height: fc.integer({ min: 20, max: 160 }), thickness: fc.constantFrom(0.5, 1, 2, 3, 4, 6, 10) }),
  hours: fc
    .record({ from: fc.integer({ min: 7, max: 11 }), to: fc.integer({ min: 13, max: 17 }), step: fc.constantFrom(15, 30, 60) })
    .map((h) => ({ from: clockAt(h.from * 60), to: clockAt(h.to * 60), step: h.step })),
  plate: fc.record({ margin: fc.integer({ min: 5, max: 25 }), thickness: fc.constantFrom(2, 3, 5, 6, 10), material: fc.constantFrom('aluminium', 'brass', 'acrylic', 'hardwood', 'slate', 'stainless') }),
  holes: fc.record({ count: fc.constantFrom(0, 2, 4) }),
  process: fc.record({ method: fc.constantFrom('laser', 'waterjet', 'router', 'print') }),
  // Pictures and the PDF template are not machine files and cost the most
  // time per build; they have their own tests. Everything else is written.
  pictures: fc.constant({ write: false }),
  template: fc.constant({ write: false }),
});

describe('fuzzed specs', () => {
  it(`every valid spec builds files that pass ezdxf, admesh and rs274; others fail with a SpecError (${RUNS} cases)`, async () => {
    const dxfDir = join(work, 'dxf');
    mkdirSync(dxfDir);
    let built = 0;
    let refused = 0;
    const refusedFields = new Map<string, number>();
    const others: string[] = [];
    await fc.assert(
      fc.asyncProperty(specArb, async (raw) => {
        let result;
        try {
          result = await buildFiles(parseSpec(raw));
        } catch (e) {
          if (!isSpecError(e)) throw e; // an internal error is a failure of the property
          refused++;
          refusedFields.set(e.field, (refusedFields.get(e.field) ?? 0) + 1);
          return;
        }
        const id = String(built++).padStart(5, '0');
        for (const f of result.files) {
          if (f.name.endsWith('.dxf')) writeFileSync(join(dxfDir, `${id}-${f.name}`), f.bytes);
          else if (f.name.endsWith('.stl') || f.name.endsWith('.ngc') || f.name.endsWith('.gcode')) others.push(writeOther(id, f.name, f.bytes));
        }
      }),
      { numRuns: RUNS, seed: SEED },
    );
    // one closed body per part; stand.stl holds the assembled stand's 7 pieces (2 cheeks, 2 feet, 2 or 3 seat rails, 1 cross member), each its own shell
    const audited = expectBuiltFilesValid(dxfDir, others, work, (file) => (file.endsWith('-stand.stl') ? /Number of parts\s*:\s*[78]\b/ : /Number of parts\s*:\s*1\b/));
    expect(audited).toBeGreaterThanOrEqual(built);
    console.log(`fuzz: ${RUNS} specs, ${built} built (${audited} DXF audited, ${others.length} STL/NGC checked), ${refused} refused by field: ${JSON.stringify(Object.fromEntries(refusedFields))}`);
    expect(built).toBeGreaterThan(RUNS / 3);
  }, 900_000);

  function writeOther(id: string, name: string, bytes: Uint8Array): string {
    const dir = join(work, 'other');
    mkdirSync(dir, { recursive: true });
    const file = join(dir, `${id}-${name}`);
    writeFileSync(file, bytes);
    return file;
  }

  it(`every invalid spec exits 1 naming a field, with no stack trace and no file written (${BAD_RUNS} cases)`, async () => {
    const specFile = join(work, 'bad.yaml');
    const out = join(work, 'bad-out');
    const breakArb = fc.record({
      base: specArb,
      path: fc.constantFrom('site.latitude', 'site.longitude', 'site.timezone', 'gnomon.height', 'gnomon.thickness', 'hours.from', 'hours.to', 'hours.step', 'plate.width', 'plate.margin', 'process.method', 'process.kerf', 'dial.numerals', 'holes.count', 'marks.hour.width', 'name'),
      value: fc.oneof(fc.constant(null), fc.constant('x'), fc.constant(-1), fc.constant(1e9), fc.constant(true), fc.constant([]), fc.constant({}), fc.constant('25:99'), fc.double({ noNaN: false })),
      unknown: fc.option(fc.constantFrom('gnomon.hight', 'site.lat', 'proces', 'marks.hours'), { nil: undefined }),
    });
    let cases = 0;
    await fc.assert(
      fc.asyncProperty(breakArb, async ({ base, path, value, unknown }) => {
        const spec = structuredClone(base) as Record<string, any>;
        setPath(spec, unknown ?? path, unknown ? 1 : value);
        // Some substitutions happen to stay valid (e.g. a huge plate width); those are not this property's cases.
        try {
          parseSpec(spec);
          return;
        } catch (e) {
          if (!isSpecError(e)) throw e;
        }
        cases++;
        writeFileSync(specFile, stringify(spec));
        const r = await runCli(['build', specFile, '--out', out]);
        expect(r.code).toBe(1);
        expect(r.err).toMatch(/^umbrafab: [A-Za-z(][^:]*: /);
        expect(r.err).not.toMatch(/\n\s+at /);
        expect(() => readdirSync(out)).toThrow();
      }),
      { numRuns: BAD_RUNS, seed: SEED + 1 },
    );
    console.log(`fuzz: ${cases} invalid specs refused with exit 1`);
    expect(cases).toBeGreaterThan(BAD_RUNS / 2);
  }, 600_000);
});

function setPath(obj: Record<string, any>, path: string, value: unknown): void {
  const keys = path.split('.');
  let node = obj;
  for (const k of keys.slice(0, -1)) node = node[k] = node[k] && typeof node[k] === 'object' ? node[k] : {};
  node[keys.at(-1)!] = value;
}

/**
 * Hostile spec texts, the shapes a probe of the reader used: a huge number of
 * keys, repeated keys, alias chains (bombs), deep nests, control characters
 * and markup in the free-text fields, a byte order mark, arbitrary bytes.
 * Each is read to a spec or refused with a SpecError (exit 1, no stack trace).
 */
describe('fuzzed hostile spec texts', () => {
  const demoText = readFileSync(fileURLToPath(new URL('../fixtures/demo.yaml', import.meta.url)), 'utf8');
  const HOSTILE_RUNS = Math.max(20, Math.round(BAD_RUNS / 5));
  const controlText = fc.string({ unit: fc.oneof(fc.constantFrom('\u0000', '\u0007', '\u000b', '\u001b', '\n', '\t', '\u007f', '\u0085', '\u202e', '\ud800', '\uffff'), fc.constantFrom('<', '>', '&', '[', ']', '(', ')', '|', '#', '*', '_', '`', '\\', 'a', ' ')), maxLength: 20 });
  const textArb = fc.oneof(
    fc.string({ unit: 'binary', maxLength: 400 }),
    fc.record({ n: fc.integer({ min: 0, max: 20_000 }), dup: fc.boolean() }).map(({ n, dup }) => {
      const lines = [demoText, 'junk:'];
      for (let i = 0; i < n; i++) lines.push(`  k${i}: ${i}`);
      if (dup) lines.push('  k0: again');
      return lines.join('\n');
    }),
    fc.record({ depth: fc.integer({ min: 1, max: 9 }), width: fc.integer({ min: 1, max: 12 }) }).map(({ depth, width }) => {
      const lines = [`a0: &a0 [${Array(width).fill('x').join(', ')}]`];
      for (let d = 1; d < depth; d++) lines.push(`a${d}: &a${d} [${Array(width).fill(`*a${d - 1}`).join(', ')}]`);
      return lines.join('\n');
    }),
    fc.record({ depth: fc.integer({ min: 1, max: 6000 }), open: fc.constantFrom('[', '{a: ', '- ') }).map(({ depth, open }) => (open === '- ' ? Array.from({ length: Math.min(depth, 300) }, (_, i) => `${' '.repeat(i * 2)}- x`).join('\n') : `x: ${open.repeat(depth)}`)),
    fc.record({ name: controlText, place: controlText, label: controlText }).map(({ name, place, label }) =>
      stringify({ ...(parseYaml(demoText) as object), name, site: { ...(parseYaml(demoText) as { site: object }).site, place }, gnomon: { nodus: true }, calendar: { year: 2027, dates: [{ date: '06-14', label }] } }),
    ),
    fc.constant('\uFEFF' + demoText),
    fc.jsonValue({ maxDepth: 4 }).map((v) => JSON.stringify(v)),
  );

  it(`every hostile text is read to a spec or refused with a SpecError; a refused file exits 1 without a stack trace (${HOSTILE_RUNS} cases)`, async () => {
    const specFile = join(work, 'hostile.yaml');
    const out = join(work, 'hostile-out');
    let read = 0;
    let refused = 0;
    await fc.assert(
      fc.asyncProperty(textArb, async (text) => {
        try {
          parseSpec(parseSpecText(text));
          read++;
          return;
        } catch (e) {
          if (!isSpecError(e)) throw e;
        }
        refused++;
        writeFileSync(specFile, text);
        const r = await runCli(['build', specFile, '--out', out]);
        expect(r.code).toBe(1);
        expect(r.err).not.toMatch(/\n\s+at |internal error/);
        expect(() => readdirSync(out)).toThrow();
      }),
      { numRuns: HOSTILE_RUNS, seed: SEED + 2 },
    );
    console.log(`fuzz: ${HOSTILE_RUNS} hostile texts, ${read} read, ${refused} refused with exit 1`);
    expect(refused).toBeGreaterThan(HOSTILE_RUNS / 2);
  }, 600_000);

  it(`free text through escapeMarkdownText renders back as the same text, never as HTML, a link or a new block (${HOSTILE_RUNS * 5} cases)`, () => {
    // markdown-it 15 in CommonMark mode with raw HTML on (GFM's www./http:// autolinking is a renderer option, off here).
    const md = new MarkdownIt({ html: true, linkify: false });
    fc.assert(
      fc.property(fc.oneof(controlText, fc.string({ unit: 'grapheme-ascii', maxLength: 40 }), fc.string({ unit: 'binary', maxLength: 40 })), (s) => {
        const html = md.render(`# Installing "${escapeMarkdownText(s)}"\n\nSite: ${escapeMarkdownText(s)}, 50° N\n`);
        expect(html.match(/<[a-z][a-z0-9]*/g)).toEqual(['<h1', '<p']);
        const shown = /<h1>Installing &quot;([\s\S]*)&quot;<\/h1>/.exec(html)?.[1] ?? '';
        const decoded = shown.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&amp;/g, '&');
        // markdown-it replaces NUL by U+FFFD (CommonMark §2.3); escapeMarkdownText turns every control character to a space first.
        const expected = s.replace(/[\u0000-\u001f\u007f-\u009f\u2028\u2029]+/g, ' ').trim().replace(/\u0000/g, '\ufffd');
        expect(decoded).toBe(expected);
      }),
      { numRuns: HOSTILE_RUNS * 5, seed: SEED + 3 },
    );
  });
});
