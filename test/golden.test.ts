import { execFileSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { buildFiles, readSpecFile } from '@umbrafab/cli';
import { GOLDEN_SKIP, GOLDEN_SPECS, goldenDir } from '../scripts/update-golden.ts';
import { runAdmesh } from './helpers/admesh.ts';
import { runRs274 } from './helpers/rs274.ts';

const ROOT = resolve(import.meta.dirname, '..');
const TEXT = /\.(dxf|ngc|gcode|svg|json|md|txt)$/;

/**
 * Where two files first differ, as a reader needs it: for text the first
 * differing line with two lines of context from each side, for binary the
 * first differing byte offset and the sizes.
 */
function firstDifference(name: string, fresh: Buffer, golden: Buffer): string {
  if (!TEXT.test(name)) {
    let i = 0;
    while (i < fresh.length && i < golden.length && fresh[i] === golden[i]) i++;
    return `${name}: first differing byte at offset ${i} (fresh ${fresh.length} bytes, golden ${golden.length} bytes)`;
  }
  const a = fresh.toString('utf8').split('\n');
  const b = golden.toString('utf8').split('\n');
  let i = 0;
  while (i < a.length && i < b.length && a[i] === b[i]) i++;
  const from = Math.max(0, i - 2);
  const show = (lines: string[], mark: string) => lines.slice(from, i + 3).map((l, k) => `${mark}${String(from + k + 1).padStart(6)}| ${l}`).join('\n');
  return `${name}: first difference at line ${i + 1} (fresh ${a.length} lines, golden ${b.length} lines)\n--- golden\n${show(b, '-')}\n+++ fresh\n${show(a, '+')}`;
}

// Byte-stable outputs: each fixture spec's files equal its golden copy byte
// for byte. Regenerate on purpose with `pnpm golden` and review the diff.
describe.each(GOLDEN_SPECS)('golden files of %s', (spec) => {
  const dir = goldenDir(spec);

  it('match byte for byte', async () => {
    expect(existsSync(dir), `${dir} missing: run pnpm golden`).toBe(true);
    const result = await buildFiles(readSpecFile(join(ROOT, spec)));
    const files = result.files.filter((f) => !GOLDEN_SKIP.test(f.name));
    expect(files.map((f) => f.name).sort()).toEqual(readdirSync(dir).sort());
    const differences: string[] = [];
    for (const f of files) {
      const golden = readFileSync(join(dir, f.name));
      const fresh = Buffer.from(f.bytes);
      if (!fresh.equals(golden)) differences.push(firstDifference(f.name, fresh, golden));
    }
    expect(differences, `${differences.join('\n\n')}\n(run pnpm golden if the change is intended)`).toEqual([]);
  });

  // The goldens are what a shop would receive: each must also pass the
  // outside validators — ezdxf's audit (Debian python3-ezdxf), admesh with no
  // repair (Debian admesh), LinuxCNC's rs274 interpreter (linuxcnc-uspace).
  it('pass ezdxf, admesh and rs274 as they are', () => {
    const names = readdirSync(dir);
    const script = fileURLToPath(new URL('./helpers/dxf_audit_many.py', import.meta.url));
    const audit = JSON.parse(execFileSync('/usr/bin/python3', [script, dir], { encoding: 'utf8', maxBuffer: 1 << 28 })) as Record<string, { errors: string[]; insunits: number; nonzero_z: number }>;
    const dxf = names.filter((n) => n.endsWith('.dxf'));
    expect(Object.keys(audit).sort()).toEqual(dxf.sort());
    for (const [name, r] of Object.entries(audit)) {
      expect(r.errors, `${name}: ezdxf audit`).toEqual([]);
      expect(r.insunits, `${name}: $INSUNITS`).toBe(4);
      expect(r.nonzero_z, `${name}: entities off z = 0`).toBe(0);
    }
    for (const name of names.filter((n) => n.endsWith('.stl'))) {
      const r = runAdmesh(join(dir, name));
      const repairs = r.edgesFixed + r.facetsRemoved + r.facetsAdded + r.facetsReversed + r.backwardsEdges + r.normalsFixed + r.degenerateFacets;
      expect({ name, disconnected: r.facetsWith1DisconnectedEdge + r.facetsWith2DisconnectedEdges + r.facetsWith3DisconnectedEdges + r.disconnectedFacets, repairs }).toEqual({ name, disconnected: 0, repairs: 0 });
    }
    for (const name of names.filter((n) => n.endsWith('.ngc'))) {
      const run = runRs274(readFileSync(join(dir, name), 'utf8'), name);
      expect(run.commands.length, `${name}: rs274 canonical commands`).toBeGreaterThan(10);
    }
  });
});
