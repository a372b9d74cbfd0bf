import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildFiles } from '../packages/cli/src/buildFiles.ts';
import { readSpecFile } from '../packages/cli/src/readSpec.ts';
import { GOLDEN_SKIP, GOLDEN_SPECS, goldenDir } from '../scripts/update-golden.ts';

const ROOT = resolve(import.meta.dirname, '..');

// Byte-stable outputs: each fixture spec's files equal its golden copy byte
// for byte. Regenerate on purpose with `pnpm golden` and review the diff.
describe.each(GOLDEN_SPECS)('golden files of %s', (spec) => {
  it('match byte for byte', async () => {
    const dir = goldenDir(spec);
    expect(existsSync(dir), `${dir} missing: run pnpm golden`).toBe(true);
    const result = await buildFiles(readSpecFile(join(ROOT, spec)));
    const files = result.files.filter((f) => !GOLDEN_SKIP.test(f.name));
    expect(files.map((f) => f.name).sort()).toEqual(readdirSync(dir).sort());
    for (const f of files) {
      const golden = readFileSync(join(dir, f.name));
      expect(Buffer.from(f.bytes).equals(golden), `${f.name} differs from fixtures/golden (run pnpm golden if the change is intended)`).toBe(true);
    }
  });
});
