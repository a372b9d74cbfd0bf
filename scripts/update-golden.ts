/**
 * Regenerate the golden files on purpose: `pnpm golden`.
 * Builds every spec listed in GOLDEN_SPECS in memory and writes its files to
 * fixtures/golden/<spec name>/. test/golden.test.ts compares fresh builds
 * with these byte for byte; review the diff before committing new goldens.
 * It also rewrites docs/report.schema.json from the Report type, which
 * follows every change of the spec or of a report section.
 */
import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { buildFiles, readSpecFile } from '@umbrafab/cli';
import { REPORT_SCHEMA_PATH, reportSchemaText } from './report-schema.ts';

export const GOLDEN_SPECS = ['fixtures/demo.yaml', 'fixtures/golden-specs/south-waterjet.yaml', 'fixtures/golden-specs/router-brass.yaml', 'fixtures/golden-specs/print-body.yaml'];

const ROOT = resolve(import.meta.dirname, '..');

/**
 * Files kept out of the goldens: PNG bytes come from resvg's native
 * rasteriser, whose float rounding may follow the CPU's vector unit; they are
 * checked for determinism on one machine by test/pictures.test.ts instead.
 */
export const GOLDEN_SKIP = /\.png$/;

export function goldenDir(spec: string): string {
  const name = spec.split('/').pop()!.replace(/\.ya?ml$/, '');
  return join(ROOT, 'fixtures/golden', name);
}

if (process.argv[1] && resolve(process.argv[1]) === resolve(import.meta.filename)) {
  for (const spec of GOLDEN_SPECS) {
    const dir = goldenDir(spec);
    rmSync(dir, { recursive: true, force: true });
    mkdirSync(dir, { recursive: true });
    const result = await buildFiles(readSpecFile(join(ROOT, spec)));
    for (const f of result.files) if (!GOLDEN_SKIP.test(f.name)) writeFileSync(join(dir, f.name), f.bytes);
    console.log(`golden: ${spec} → ${dir} (${result.files.length} files)`);
  }
  writeFileSync(REPORT_SCHEMA_PATH, reportSchemaText());
  console.log(`golden: report schema → ${REPORT_SCHEMA_PATH}`);
}
