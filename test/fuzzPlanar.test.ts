import { mkdirSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { isSpecError, parseSpec } from '@umbrafab/geometry';
import { buildAnyFiles } from '@umbrafab/cli';
import { stringify } from 'yaml';
import { runCli } from './helpers/runCli.ts';
import { expectBuiltFilesValid } from './helpers/validateBuilt.ts';

/**
 * Property-based tests over the planar dial types (fast-check, seeded): a
 * stranger's horizontal, wall, meridian or equatorial spec either builds
 * files that the outside validators accept, or is refused with a SpecError
 * naming a field. A plain Error from geometry (a bug) fails the property.
 * Outside validators: ezdxf audit (Debian python3-ezdxf), admesh, rs274
 * (LinuxCNC's standalone RS274NGC interpreter).
 */
const RUNS = Number(process.env.FUZZ_PLANAR_RUNS ?? 200);
const BAD_RUNS = Math.max(40, Math.round(RUNS / 2));
const SEED = 20273;
const work = mkdtempSync(join(tmpdir(), 'umbrafab-fuzz-planar-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

/** Zones with their standard meridian, degrees east: the site's longitude is drawn near its zone's, as a real site's is. */
const zones = [
  ['UTC', 0],
  ['Europe/London', 0],
  ['Europe/Zurich', 15],
  ['America/Denver', -105],
  ['Asia/Kolkata', 82.5],
  ['Australia/Hobart', 150],
  ['Pacific/Auckland', 180],
  ['America/Sao_Paulo', -45],
  ['Africa/Nairobi', 45],
] as const;
const clockAt = (m: number) => `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
const round1 = (x: number) => Math.round(x * 10) / 10;

const faceArb = fc.oneof(
  fc.constant({ type: 'horizontal' }),
  fc.record({ type: fc.constant('vertical'), wallDeclination: fc.double({ min: -180, max: 180, noNaN: true }).map(round1), reclination: fc.oneof(fc.constant(0), fc.double({ min: -75, max: 75, noNaN: true }).map(round1)) }),
  fc.record({ type: fc.constant('meridian'), facing: fc.constantFrom('east', 'west') }),
  fc.record({ type: fc.constant('equatorial'), side: fc.constantFrom('upper', 'lower', 'both') }),
);

const specArb = fc
  .record({
    name: fc.stringMatching(/^[A-Za-z][A-Za-z0-9 .-]{0,16}$/),
    site: fc
      .record({ latitude: fc.double({ min: -80, max: 80, noNaN: true }).map(round1), zone: fc.constantFrom(...zones), east: fc.double({ min: -25, max: 25, noNaN: true }) })
      .map(({ latitude, zone, east }) => ({ latitude, longitude: round1(((zone[1] + east + 540) % 360) - 180), timezone: zone[0] })),
    face: faceArb,
    gnomon: fc.record({ height: fc.integer({ min: 30, max: 120 }), thickness: fc.constantFrom(2, 3, 4, 6), nodus: fc.boolean() }),
    curves: fc.boolean(),
    hours: fc
      .record({ from: fc.integer({ min: 5, max: 10 }), to: fc.integer({ min: 14, max: 19 }), step: fc.constantFrom(15, 30, 60) })
      .map((h) => ({ from: clockAt(h.from * 60), to: clockAt(h.to * 60), step: h.step })),
    plate: fc.record({ thickness: fc.constantFrom(3, 5, 6), material: fc.constantFrom('aluminium', 'brass', 'acrylic', 'slate', 'stainless') }),
    process: fc.record({ method: fc.constantFrom('laser', 'waterjet', 'router', 'print') }),
  })
  // Date lines and mean-time curves only with a nodus (without one the spec is refused, a case the bad-input tests cover).
  .map(({ curves, gnomon, ...rest }) => ({
    ...rest,
    gnomon,
    ...(gnomon.nodus ? { calendar: { lines: ['solstices', 'equinox'] }, dial: { meanTimeCurves: curves } } : {}),
    pictures: { write: false },
    template: { write: false },
  }));

describe('fuzzed planar specs', () => {
  it(`every valid planar spec builds files that pass ezdxf, admesh and rs274; others fail with a SpecError (${RUNS} cases)`, async () => {
    const dxfDir = join(work, 'dxf');
    const otherDir = join(work, 'other');
    mkdirSync(dxfDir);
    mkdirSync(otherDir);
    let built = 0;
    const refusedFields = new Map<string, number>();
    const types = new Map<string, number>();
    const others: string[] = [];
    await fc.assert(
      fc.asyncProperty(specArb, async (raw) => {
        let result;
        try {
          result = await buildAnyFiles(parseSpec(raw));
        } catch (e) {
          if (!isSpecError(e)) throw e; // a plain Error is a bug, not bad input: the property fails
          refusedFields.set(e.field, (refusedFields.get(e.field) ?? 0) + 1);
          if (process.env.FUZZ_SHOW) console.log(e.message);
          return;
        }
        types.set(raw.face.type, (types.get(raw.face.type) ?? 0) + 1);
        const id = String(built++).padStart(4, '0');
        for (const f of result.files) {
          if (f.name.endsWith('.dxf')) writeFileSync(join(dxfDir, `${id}-${f.name}`), f.bytes);
          else if (/\.(stl|ngc|gcode)$/.test(f.name)) {
            const file = join(otherDir, `${id}-${f.name}`);
            writeFileSync(file, f.bytes);
            others.push(file);
          }
        }
      }),
      { numRuns: RUNS, seed: SEED },
    );
    const audited = expectBuiltFilesValid(dxfDir, others, work);
    expect(audited).toBeGreaterThanOrEqual(built);
    console.log(`fuzz planar: ${RUNS} specs, ${built} built ${JSON.stringify(Object.fromEntries(types))} (${audited} DXF audited, ${others.length} STL/NGC checked), refused by field: ${JSON.stringify(Object.fromEntries(refusedFields))}`);
    // Every type must be built often enough for the property to mean something.
    for (const t of ['horizontal', 'vertical', 'meridian', 'equatorial']) expect(types.get(t) ?? 0, t).toBeGreaterThanOrEqual(RUNS / 20);
  }, 1_500_000);

  it(`every planar spec with a bad face field exits 1 naming it, with no stack trace and no file written (${BAD_RUNS} cases)`, async () => {
    const specFile = join(work, 'bad.yaml');
    const out = join(work, 'bad-out');
    const breakArb = fc.record({
      base: specArb,
      field: fc.constantFrom('type', 'wallDeclination', 'reclination', 'facing', 'side', 'tilt'),
      value: fc.oneof(fc.constant(null), fc.constant('x'), fc.constant(-400), fc.constant(1e9), fc.constant(true), fc.constant([]), fc.constant({}), fc.constant('west-ish'), fc.double({ noNaN: false })),
    });
    let cases = 0;
    await fc.assert(
      fc.asyncProperty(breakArb, async ({ base, field, value }) => {
        const spec = { ...base, face: { ...base.face, [field]: value } };
        try {
          parseSpec(spec);
          return; // a substitution that happens to stay valid is not this property's case
        } catch (e) {
          if (!isSpecError(e)) throw e;
          expect(e.field, JSON.stringify(value)).toMatch(/^face\./);
        }
        cases++;
        writeFileSync(specFile, stringify(spec));
        const r = await runCli(['build', specFile, '--out', out]);
        expect(r.code).toBe(1);
        expect(r.err).toMatch(/^umbrafab: [A-Za-z(][^:]*: /);
        expect(r.err).toContain('face.');
        expect(r.err).not.toMatch(/\n\s+at /);
        expect(() => readdirSync(out)).toThrow();
      }),
      { numRuns: BAD_RUNS, seed: SEED + 1 },
    );
    console.log(`fuzz planar: ${cases} specs with a bad face field refused with exit 1`);
    expect(cases).toBeGreaterThan(BAD_RUNS / 2);
  }, 600_000);
});
