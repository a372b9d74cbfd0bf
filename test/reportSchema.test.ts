import { readdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import Ajv2020 from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import { buildAnyFiles, readSpecFile } from '@umbrafab/cli';
import { REPORT_SCHEMA_PATH, reportSchemaText } from '../scripts/report-schema.ts';
import { GOLDEN_SPECS } from '../scripts/update-golden.ts';

const ROOT = resolve(import.meta.dirname, '..');
const POLAR_SPECS = [...GOLDEN_SPECS, 'fixtures/specs/time-nodus.yaml', 'fixtures/specs/parts-print.yaml', 'fixtures/specs/engrave-laser-south.yaml'];
/** Every planar fixture: horizontal, wall (declining, reclining), meridian, equatorial upper and lower faces. */
const PLANAR_SPECS = readdirSync(join(ROOT, 'fixtures/planar')).filter((f) => f.endsWith('.yaml')).sort().map((f) => `fixtures/planar/${f}`);
const SPECS = [...POLAR_SPECS, ...PLANAR_SPECS];

async function reportOf(spec: string): Promise<Record<string, unknown>> {
  const built = await buildAnyFiles(readSpecFile(join(ROOT, spec)));
  return JSON.parse(new TextDecoder().decode(built.files.find((f) => f.name === 'report.json')!.bytes));
}

describe('report.json against its JSON Schema (docs/report.schema.json, from the Report type)', () => {
  it('the committed schema is the one the Report type gives (regenerate with pnpm golden or pnpm report-schema)', () => {
    expect(readFileSync(REPORT_SCHEMA_PATH, 'utf8')).toBe(reportSchemaText());
  });

  // Ajv (a general-purpose JSON Schema validator, draft 2020-12): every
  // section a build writes is declared, with its type, and nothing else.
  const validate = new Ajv2020({ allErrors: true, strict: true }).compile(JSON.parse(readFileSync(REPORT_SCHEMA_PATH, 'utf8')));
  const problems = (report: unknown) => (validate(report) ? [] : validate.errors!.slice(0, 10).map((e) => `${e.instancePath} ${e.message} ${JSON.stringify(e.params)}`));
  it('lists the planar fixtures (seven faces)', () => {
    expect(PLANAR_SPECS).toHaveLength(7);
  });
  it.each(SPECS)('the report of %s validates', async (spec) => {
    expect(problems(await reportOf(spec))).toEqual([]);
  });

  // A field the type does not declare fails, at the top and deep inside, in either kind of report.
  it.each([POLAR_SPECS[0], 'fixtures/planar/wall-declining.yaml'])('a field no type declares fails the report of %s', async (spec) => {
    const report = await reportOf(spec);
    expect(problems({ ...report, extra: 1 })).not.toEqual([]);
    const marks = report.marks as Record<string, unknown>[];
    expect(problems({ ...report, marks: [{ ...marks[0], extraMm: 1 }, ...marks.slice(1)] })).not.toEqual([]);
    const plate = report.plate as Record<string, unknown>;
    expect(problems({ ...report, plate: { ...plate, cut: { ...(plate.cut as object), extra: 'x' } } })).not.toEqual([]);
  });

  it('a planar report with a polar section mixed in fails (the two kinds do not blend)', async () => {
    const planar = await reportOf('fixtures/planar/garden-horizontal.yaml');
    const polar = await reportOf(POLAR_SPECS[0]);
    expect(problems({ ...planar, wedge: polar.wedge })).not.toEqual([]);
    const { face: _face, ...noFace } = planar;
    expect(problems(noFace)).not.toEqual([]);
  });
});
