import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import Ajv2020 from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import { buildFiles, readSpecFile } from '@umbrafab/cli';
import { REPORT_SCHEMA_PATH, reportSchemaText } from '../scripts/report-schema.ts';
import { GOLDEN_SPECS } from '../scripts/update-golden.ts';

const ROOT = resolve(import.meta.dirname, '..');
const SPECS = [...GOLDEN_SPECS, 'fixtures/specs/time-nodus.yaml', 'fixtures/specs/parts-print.yaml', 'fixtures/specs/engrave-laser-south.yaml'];

describe('report.json against its JSON Schema (docs/report.schema.json, from the Report type)', () => {
  it('the committed schema is the one the Report type gives (regenerate with pnpm golden or pnpm report-schema)', () => {
    expect(readFileSync(REPORT_SCHEMA_PATH, 'utf8')).toBe(reportSchemaText());
  });

  // Ajv (a general-purpose JSON Schema validator, draft 2020-12): every
  // section a build writes is declared, with its type, and nothing else.
  const validate = new Ajv2020({ allErrors: true, strict: true }).compile(JSON.parse(readFileSync(REPORT_SCHEMA_PATH, 'utf8')));
  it.each(SPECS)('the report of %s validates', async (spec) => {
    const built = await buildFiles(readSpecFile(join(ROOT, spec)));
    const report = JSON.parse(new TextDecoder().decode(built.files.find((f) => f.name === 'report.json')!.bytes));
    const ok = validate(report);
    expect(ok ? [] : validate.errors!.slice(0, 10).map((e) => `${e.instancePath} ${e.message} ${JSON.stringify(e.params)}`)).toEqual([]);
  });
});
