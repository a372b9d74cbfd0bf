import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

// A reader that stops early (`umbrafab build … | head -1`, common practice in a shell pipeline)
// closes the pipe: the bin drops the rest of its output and still finishes, with its own exit
// code and no stack trace, and the files are whole.

const ROOT = resolve(import.meta.dirname, '..');
const BIN = join(ROOT, 'packages/cli/bin/umbrafab.js');
const work = mkdtempSync(join(tmpdir(), 'umbrafab-pipe-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

/** Run the bin with its stdout's reading end closed at once; its exit code and stderr. */
function withClosedStdout(args: readonly string[]): Promise<{ code: number | null; stderr: string }> {
  return new Promise((done, fail) => {
    const child = spawn(process.execPath, [BIN, ...args], { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'] });
    child.stdout.destroy();
    let stderr = '';
    child.stderr.on('data', (d) => (stderr += d));
    child.on('error', fail);
    child.on('close', (code) => done({ code, stderr }));
  });
}

describe('the bin with a reader that closes its output early', () => {
  it('build: exit 0, no stack trace, every file written', async () => {
    const out = join(work, 'demo');
    const r = await withClosedStdout(['build', join(ROOT, 'fixtures/demo.yaml'), '--out', out]);
    expect(r.stderr).not.toMatch(/EPIPE|Error/);
    expect(r.code).toBe(0);
    expect(readdirSync(out)).toEqual(expect.arrayContaining(['plate.dxf', 'template.pdf', 'engrave.ngc', 'engrave-laser.gcode', 'report.json']));
    expect(existsSync(join(out, 'report.json'))).toBe(true);
  }, 120_000);

  it('a refused spec keeps its exit code 1 and its message on stderr', async () => {
    const r = await withClosedStdout(['build', join(work, 'missing.yaml'), '--out', join(work, 'none')]);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/missing\.yaml/);
    expect(r.stderr).not.toMatch(/EPIPE/);
  });
});
