import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { stringify } from 'yaml';
import { afterAll, describe, expect, it } from 'vitest';
import { assertFinite, assertInteger, assertNonNegative, assertPositive, assertRange, gnomonSolid, isSpecError, parseSpec, wedgeSolid, type DialSpec } from '@umbrafab/geometry';
import { engraveSettingsFromSpec, resolveEngraveSettings, vbitDepthMm } from '@umbrafab/fabricate';
import { parseSpecText } from '@umbrafab/cli';
import { runCli } from './helpers/runCli.ts';

/**
 * The one guard module (geometry's guards.ts, field first) and the errors that
 * used to be plain Errors: bad input is a SpecError naming the field, the
 * value and what is allowed, and the CLI exits 1 on it without a stack trace
 * or any output file.
 */
const ROOT = resolve(import.meta.dirname, '..');
const work = mkdtempSync(join(tmpdir(), 'umbrafab-guards-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function specErrorOf(f: () => unknown): { field: string; value: unknown; message: string } {
  try {
    f();
  } catch (e) {
    expect(isSpecError(e), String(e)).toBe(true);
    return e as { field: string; value: unknown; message: string };
  }
  throw new Error('expected a SpecError');
}

describe('the guards take (field, value) and throw a SpecError', () => {
  it('name the field, quote the value and say what is allowed; return the value when it passes', () => {
    expect(assertFinite('a.b', 2)).toBe(2);
    expect(assertPositive('a.b', 0.5)).toBe(0.5);
    expect(assertNonNegative('a.b', 0)).toBe(0);
    expect(assertRange('a.b', 90, 0, 90, '°', 'lo')).toBe(90);
    expect(assertInteger('a.b', 6, 0, 64)).toBe(6);
    expect(specErrorOf(() => assertFinite('a.b', 'x')).message).toBe('a.b: got "x"; a finite number is required');
    expect(specErrorOf(() => assertPositive('a.b', -1)).message).toBe('a.b: got -1; a number greater than 0 is required');
    expect(specErrorOf(() => assertNonNegative('a.b', -1)).message).toBe('a.b: got -1; a number 0 or greater is required');
    expect(specErrorOf(() => assertRange('a.b', 91, -90, 90, '°')).message).toBe('a.b: got 91; allowed: -90° to 90°');
    expect(specErrorOf(() => assertRange('a.b', 0, 0, 90, '°', 'lo')).message).toBe('a.b: got 0; allowed: more than 0°, up to 90°');
    expect(specErrorOf(() => assertRange('a.b', 1, 0, 1, '', 'hi')).message).toBe('a.b: got 1; allowed: 0 or more, less than 1');
    expect(specErrorOf(() => assertRange('a.b', 180, 0, 180, '°', 'both')).message).toBe('a.b: got 180; allowed: more than 0° and less than 180°');
    expect(specErrorOf(() => assertInteger('a.b', 2.5, 0, 64)).message).toBe('a.b: got 2.5; allowed: a whole number from 0 to 64');
    const e = specErrorOf(() => assertPositive('gnomon.heightMm', Number.NaN));
    expect([e.field, e.value]).toEqual(['gnomon.heightMm', Number.NaN]);
  });

  it('the part builders and the engraving writers use them (formerly plain Errors)', () => {
    expect(specErrorOf(() => gnomonSolid({ heightMm: 0 })).field).toBe('gnomon.heightMm');
    expect(specErrorOf(() => wedgeSolid({ holes: { count: 3 } })).field).toBe('wedge.holes.count');
    expect(specErrorOf(() => vbitDepthMm(0.1, 90, 0.2)).field).toBe('widthMm');
    expect(specErrorOf(() => resolveEngraveSettings('brass', { clearanceZMm: 11 })).field).toBe('clearanceZMm');
  });

  it('the old guard modules are gone: one module, in geometry', () => {
    for (const gone of ['packages/fabricate/src/engrave/checks.ts', 'packages/geometry/src/parts/partChecks.ts']) {
      expect(() => readFileSync(join(ROOT, gone)), gone).toThrow(/ENOENT/);
    }
  });
});

describe('errors reachable from a spec name the spec field', () => {
  const demo = parseSpec(parseSpecText(readFileSync(join(ROOT, 'fixtures/demo.yaml'), 'utf8')));

  it('engraving settings that contradict each other name engrave.<field> (was the whole engrave section with a plain message)', () => {
    // parseSpec refuses these itself; a spec edited after parsing reaches the writers' own checks.
    const edited = (engrave: Partial<DialSpec['engrave']>): DialSpec => ({ ...demo, engrave: { ...demo.engrave, ...engrave } });
    const high = specErrorOf(() => engraveSettingsFromSpec(edited({ clearanceZMm: 20, safeZMm: 5 })));
    expect(high.field).toBe('engrave.clearanceZMm');
    expect(high.message).toBe('engrave.clearanceZMm: got 20; allowed: at most safeZMm (5)');
    const bit = specErrorOf(() => engraveSettingsFromSpec(edited({ tool: { ...demo.engrave.tool, vbitTipMm: 4 } })));
    expect(bit.field).toBe('engrave.tool.vbitMaxWidthMm');
    expect(bit.message).toMatch(/^engrave\.tool\.vbitMaxWidthMm: got [\d.]+; allowed: more than vbitTipMm \(4\)$/);
  });

  it('umbrafab build: a countersink no wider than its bore exits 1 naming parts.wedge.countersink, writing nothing', async () => {
    const spec = {
      name: 'Guard check',
      site: { latitude: 44.2, longitude: 7.1, timezone: 'Europe/Rome' },
      process: { method: 'print' },
      parts: { write: ['wedge.stl'], wedge: { holeDiameter: 20, countersink: 9 } },
    };
    const file = join(work, 'countersink.yaml');
    writeFileSync(file, stringify(spec));
    const out = join(work, 'out');
    mkdirSync(out);
    const r = await runCli(['build', file, '--out', out]);
    expect(r.code, r.err).toBe(1);
    expect(r.err).toMatch(/^umbrafab: parts\.wedge\.countersink: got 9, so the latitude wedge cannot be made \(wedge\.holes\.countersink\.diameterMm: got 9\); allowed: more than wedge\.holes\.diameterMm = 20 mm/);
    expect(r.err).not.toMatch(/\n\s+at |internal error/);
    expect(readdirSync(out)).toEqual([]);
  });
});
