import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { expect } from 'vitest';

/**
 * Hold a folder of built DXF files and a list of STL / G-code files to the
 * outside validators, as the fuzz tests do in bulk: every DXF audited by
 * ezdxf (Debian python3-ezdxf, one process: dxf_audit_many.py) with no
 * error, millimetre units (INSUNITS 4) and nothing off z = 0; every STL
 * through admesh (closed, no degenerate facet, no edge it had to fix, and
 * the part count `parts(file)` when given); every program through rs274 -g
 * (LinuxCNC's standalone RS274NGC interpreter). Returns how many DXF files
 * were audited.
 */
export function expectBuiltFilesValid(dxfDir: string, others: readonly string[], work: string, parts?: (file: string) => RegExp): number {
  const audit = JSON.parse(execFileSync('/usr/bin/python3', [fileURLToPath(new URL('./dxf_audit_many.py', import.meta.url)), dxfDir], { encoding: 'utf8', maxBuffer: 1 << 28 })) as Record<string, { errors: string[]; insunits: number; nonzero_z: number }>;
  const bad = Object.entries(audit).filter(([, a]) => a.errors.length || a.insunits !== 4 || a.nonzero_z);
  expect(bad.slice(0, 3)).toEqual([]);
  for (const file of others) {
    if (file.endsWith('.stl')) {
      const txt = execFileSync('admesh', [file], { encoding: 'utf8' });
      if (parts) expect(txt, file).toMatch(parts(file));
      expect(txt, file).toMatch(/Total disconnected facets\s*:\s*0\b/);
      expect(txt, file).toMatch(/Degenerate facets\s*:\s*0\b/);
      expect(txt, file).toMatch(/Edges fixed\s*:\s*0\b/);
    } else {
      execFileSync('rs274', ['-g', file], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'], cwd: work, env: { ...process.env, HOME: work }, maxBuffer: 1 << 28 });
    }
  }
  return Object.keys(audit).length;
}
