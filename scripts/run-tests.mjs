// Runs the whole vitest suite and closes with one plain line
// "tests: N passed, N failed" (plus skipped), exiting with vitest's code.
import { spawnSync } from 'node:child_process';
import { mkdirSync, readFileSync, rmSync } from 'node:fs';

mkdirSync('out', { recursive: true });
const resultFile = 'out/test-results.json';
rmSync(resultFile, { force: true });
const args = ['node_modules/vitest/vitest.mjs', 'run', '--reporter=default', '--reporter=json', `--outputFile=${resultFile}`, ...process.argv.slice(2)];
const r = spawnSync(process.execPath, args, { stdio: 'inherit' });
let code = r.status ?? 2;
try {
  const j = JSON.parse(readFileSync(resultFile, 'utf8'));
  const skipped = (j.numPendingTests ?? 0) + (j.numTodoTests ?? 0);
  console.log(`tests: ${j.numPassedTests} passed, ${j.numFailedTests} failed${skipped ? `, ${skipped} skipped` : ''}`);
  if (j.numTotalTests === 0) code = code || 1;
} catch {
  console.log('tests: 0 passed, 1 failed');
  code = code || 1;
}
process.exit(code);
