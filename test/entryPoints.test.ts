import { readdirSync, readFileSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

// Tests and scripts use the packages through their entry points
// (`@umbrafab/geometry`, `@umbrafab/fabricate`, `@umbrafab/cli`, each
// package's `exports`), never through relative paths into a package's
// sources or its node_modules: what they test is then what the packages export.

const ROOT = resolve(import.meta.dirname, '..');

function sources(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = join(dir, e.name);
    if (e.isDirectory()) return e.name === 'node_modules' ? [] : sources(p);
    return /\.(ts|mts|mjs|js)$/.test(e.name) ? [p] : [];
  });
}

describe('entry points', () => {
  it('no test or script imports a package by a relative path', () => {
    const offenders: string[] = [];
    for (const file of [...sources(join(ROOT, 'test')), ...sources(join(ROOT, 'scripts'))]) {
      const text = readFileSync(file, 'utf8');
      for (const m of text.matchAll(/(?:from\s+|import\s*\(\s*)['"]((?:\.\.\/)+packages\/[^'"]+)['"]/g)) offenders.push(`${relative(ROOT, file)}: ${m[1]}`);
    }
    expect(offenders).toEqual([]);
  });

  it('every package exports its entry point, and the entry point exists', () => {
    for (const p of ['geometry', 'fabricate', 'cli']) {
      const pkg = JSON.parse(readFileSync(join(ROOT, 'packages', p, 'package.json'), 'utf8'));
      const entry = typeof pkg.exports['.'] === 'string' ? pkg.exports['.'] : pkg.exports['.'].default;
      expect(pkg.name).toBe(`@umbrafab/${p}`);
      expect(() => readFileSync(join(ROOT, 'packages', p, entry))).not.toThrow();
    }
  });
});
