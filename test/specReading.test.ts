import { execFileSync, spawn, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { isSpecError } from '@umbrafab/geometry';
import { MAX_SPEC_BYTES, MAX_SPEC_DEPTH, MAX_SPEC_NODES, parseSpecText, startServer } from '@umbrafab/cli';
import { runCli } from './helpers/runCli.ts';

/**
 * Reading a spec from a stranger: linear in its size, capped in bytes and in
 * nodes and in nesting depth, bounded in memory, and every refusal a SpecError
 * (exit 1). The time limits below are functional bounds on pathological inputs
 * read from a file or a pipe, wide enough for a loaded 2-core machine.
 */
const ROOT = resolve(import.meta.dirname, '..');
const CHILD = join(ROOT, 'test/helpers/readSpecChild.ts');
const work = mkdtempSync(join(tmpdir(), 'umbrafab-read-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));
const DEMO_TEXT = readFileSync(join(ROOT, 'fixtures/demo.yaml'), 'utf8');

/** A spec with `n` extra keys in one map (the shape that made the old duplicate-key check quadratic). */
function manyKeys(n: number, extra = ''): string {
  const lines = [DEMO_TEXT, 'junk:'];
  for (let i = 0; i < n; i++) lines.push(`  k${i}: ${i}`);
  return lines.join('\n') + '\n' + extra;
}

/** Read a spec in a child process: the read's time (ms), its message and the child's peak RSS (KiB). */
function readInChild(path: string): { ms: number; message: string; maxRssKiB: number } {
  const out = execFileSync(process.execPath, ['--import', 'tsx', CHILD, path], { cwd: ROOT, encoding: 'utf8', timeout: 60_000 });
  return JSON.parse(out.trim().split('\n').pop()!);
}

function specErrorOf(f: () => unknown): Error {
  try {
    f();
  } catch (e) {
    expect(isSpecError(e), String(e)).toBe(true);
    return e as Error;
  }
  throw new Error('expected a SpecError');
}

describe('spec reading is linear and capped', () => {
  it('the 40k-key spec (629 KB, under the byte cap) is refused by its node count, before the YAML composer runs', () => {
    // No clock here: the node-count message is written only by the lexer pass,
    // which runs before the composer, so the quadratic step is never reached.
    const text = manyKeys(40_000);
    expect(Buffer.byteLength(text)).toBeLessThan(MAX_SPEC_BYTES);
    const e = specErrorOf(() => parseSpecText(text, 'keys.yaml'));
    expect(e.message).toBe(`spec file: more than ${MAX_SPEC_NODES} values (keys, items, lists and maps); allowed: at most ${MAX_SPEC_NODES} values (a full spec has about 300)`);
  });

  it('a spec just under the node cap is read whole, and a duplicate key in it is still found, with its line', () => {
    const n = Math.floor(MAX_SPEC_NODES / 2) - 300;
    const value = parseSpecText(manyKeys(n)) as Record<string, Record<string, number>>;
    expect(Object.keys(value.junk)).toHaveLength(n);
    const e = specErrorOf(() => parseSpecText(manyKeys(n, '  k7: again\n')));
    const line = manyKeys(n).split('\n').length;
    expect(e.message).toContain(`not valid YAML at line ${line}, column 3: the key "k7" appears twice in one map`);
    expect(specErrorOf(() => parseSpecText('{"a": 1, "a": 2}')).message).toContain('the key "a" appears twice');
  });

  it('a 50 MB spec and /dev/zero end in under 2 s with peak RSS under 300 MiB (measured in a child)', () => {
    const big = join(work, 'big.yaml');
    writeFileSync(big, Buffer.alloc(50 * 1024 * 1024, 'a'));
    for (const path of [big, '/dev/zero']) {
      const r = readInChild(path);
      expect(r.message, path).toMatch(/^SpecError: spec file: too large .*allowed: a spec of at most 1024 KiB/);
      expect(r.ms, path).toBeLessThan(2000);
      expect(r.maxRssKiB, path).toBeLessThan(300 * 1024);
      console.log(`${path}: refused in ${r.ms.toFixed(1)} ms, peak RSS ${(r.maxRssKiB / 1024).toFixed(0)} MiB`);
    }
  });

  it('a FIFO ends at once: with no writer it reads as empty, with an endless writer it stops at the cap', async () => {
    const fifo = join(work, 'spec.fifo');
    execFileSync('mkfifo', [fifo]);
    const empty = readInChild(fifo);
    expect(empty.message).toMatch(/^SpecError: /);
    expect(empty.ms).toBeLessThan(2000);
    // The writer blocks in open() until the child opens the FIFO, then writes without end.
    const writer = spawn('sh', ['-c', `exec cat /dev/zero > '${fifo}'`], { stdio: 'ignore' });
    try {
      const r = readInChild(fifo);
      expect(r.message).toMatch(/^SpecError: spec file: too large \(more than 1048576 bytes\)/);
      expect(r.ms).toBeLessThan(2000);
      expect(r.maxRssKiB).toBeLessThan(300 * 1024);
    } finally {
      writer.kill('SIGKILL');
    }
  });

  it('a text over the byte cap is refused before parsing; a deep nest or a missing anchor is a SpecError', () => {
    expect(specErrorOf(() => parseSpecText('#'.repeat(MAX_SPEC_BYTES + 1))).message).toMatch(/too large \(1048577 bytes\)/);
    expect(specErrorOf(() => parseSpecText('a: ' + '['.repeat(5000) + ']'.repeat(5000))).message).toMatch(/^spec file: /);
  });

  it(`a nest deeper than ${MAX_SPEC_DEPTH} lists or maps is refused naming the limit, not the reader's stack overflow`, () => {
    const flow = specErrorOf(() => parseSpecText('a: ' + '['.repeat(1000) + ']'.repeat(1000))).message;
    expect(flow).toBe(`spec file: nested more than ${MAX_SPEC_DEPTH} deep at line 1, column 67; allowed: lists and maps nested at most ${MAX_SPEC_DEPTH} deep (a full spec nests 4 deep)`);
    const block = Array.from({ length: 900 }, (_, i) => ' '.repeat(i) + 'k:').join('\n') + ' 1';
    expect(specErrorOf(() => parseSpecText(block)).message).toMatch(new RegExp(`^spec file: nested more than ${MAX_SPEC_DEPTH} deep at line 65, column 65; allowed: lists and maps nested at most ${MAX_SPEC_DEPTH} deep`));
    for (const m of [flow, specErrorOf(() => parseSpecText('- '.repeat(900) + 'x')).message]) expect(m).not.toMatch(/call stack/i);
    // a nest at the limit still reads
    const atLimit = 'a: ' + '['.repeat(MAX_SPEC_DEPTH - 1) + ']'.repeat(MAX_SPEC_DEPTH - 1);
    expect(parseSpecText(atLimit)).toBeTypeOf('object');
    expect(specErrorOf(() => parseSpecText('a: *nowhere')).message).toMatch(/not valid YAML: Unresolved alias/);
  });
});

describe('a YAML alias bomb', () => {
  const bomb = ['a: &a [x, x, x, x, x, x, x, x, x]', ...'bcdefg'.split('').map((k, i) => `${k}: &${k} [${Array(9).fill(`*${'abcdefg'[i]}`).join(', ')}]`)].join('\n') + '\n';
  const bombFile = join(work, 'bomb.yaml');
  const badFile = join(work, 'syntax.yaml');
  writeFileSync(bombFile, bomb);
  writeFileSync(badFile, 'site: {latitude: 50\nname: [\n');

  it('exits 1 with a clear message and no stack trace', async () => {
    const r = await runCli(['build', bombFile, '--out', join(work, 'bomb-out')]);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/^umbrafab: spec file: its aliases expand to too many values \(a YAML alias bomb\)/);
    expect(r.err).not.toMatch(/\n\s+at |internal error/);
  });

  it('serve starts with it, or with a syntax error, and shows the problem on the page the same way', async () => {
    for (const [file, expected] of [
      [bombFile, /^spec file: its aliases expand to too many values/],
      [badFile, /^spec file: not valid YAML at line \d+, column \d+/],
    ] as const) {
      const server = await startServer({ specPath: file, port: 0, log: () => {} });
      try {
        const setup = (await (await fetch(server.url + 'api/setup')).json()) as { initialError: string | null; values: Record<string, unknown> };
        expect(setup.initialError).toMatch(expected);
        expect(setup.values.name).toBeTypeOf('string'); // the page opens on the starter spec
      } finally {
        await server.close();
      }
    }
  });

  it('a form field holding 36k keys (under the body limit) is refused by its node count, before the YAML composer runs', async () => {
    const server = await startServer({ port: 0, log: () => {} });
    try {
      const value = '{' + Array.from({ length: 36_000 }, (_, i) => `a${i.toString(36)}:1`).join(',') + '}';
      const body = JSON.stringify({ fields: { 'calendar.lines': value } });
      expect(Buffer.byteLength(body)).toBeLessThan(256 * 1024);
      const res = await fetch(server.url + 'api/view', { method: 'POST', headers: { 'Content-Type': 'application/json' }, body });
      const json = (await res.json()) as { error: { field: string; message: string } };
      expect(res.status).toBe(422);
      expect(json.error.field).toBe('calendar.lines');
      // the lexer pass alone writes this message, so the quadratic step never ran
      expect(json.error.message).toMatch(/more than 10000 values/);
    } finally {
      await server.close();
    }
  });
});

// mkfifo is in coreutils on every Linux this runs on; keep the check honest elsewhere.
if (spawnSync('sh', ['-c', 'command -v mkfifo']).status !== 0) throw new Error('mkfifo is needed by this test');
