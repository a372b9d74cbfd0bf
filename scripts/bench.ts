/**
 * `pnpm bench`: wall time and peak memory of umbrafab's main jobs, each
 * against bare Node start-up importing the same libraries, in one run.
 * Every figure is the median of RUNS child processes (each a fresh Node).
 * Targets: a full build ≤ 1.5 × the bare start-up; a 50-latitude
 * batch ≤ 10 × a single build. Prints a Markdown table for the README.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { cpus, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

const ROOT = resolve(import.meta.dirname, '..');
const CHILD = join(ROOT, 'scripts/bench/child.mjs');
const DEMO = join(ROOT, 'fixtures/demo.yaml');
const RUNS = Number(process.env.BENCH_RUNS ?? 5);
const work = mkdtempSync(join(tmpdir(), 'umbrafab-bench-'));

interface Sample {
  readonly ms: number;
  readonly maxRssKb: number;
}

function measure(args: readonly string[]): Sample {
  const t0 = process.hrtime.bigint();
  const r = spawnSync(process.execPath, [CHILD, ...args], { encoding: 'utf8', cwd: ROOT });
  const ms = Number(process.hrtime.bigint() - t0) / 1e6;
  if (r.status !== 0) throw new Error(`bench child failed (${args.join(' ')}): ${r.stderr}`);
  const last = r.stdout.trim().split('\n').pop() ?? '{}';
  return { ms, maxRssKb: JSON.parse(last).maxRssKb };
}

function median(samples: readonly Sample[]): Sample {
  const ms = [...samples.map((s) => s.ms)].sort((a, b) => a - b)[Math.floor(samples.length / 2)];
  const rss = [...samples.map((s) => s.maxRssKb)].sort((a, b) => a - b)[Math.floor(samples.length / 2)];
  return { ms, maxRssKb: rss };
}

function run(label: string, args: readonly string[], runs = RUNS): Sample & { label: string } {
  measure(args); // warm the file cache and tsx's transform cache
  const s = median(Array.from({ length: runs }, () => measure(args)));
  return { label, ...s };
}

const rows: { label: string; ms: number; maxRssKb: number; vs: string; target: string }[] = [];
const bare = run('bare start-up (Node + tsx + every umbrafab import)', ['bare']);
rows.push({ ...bare, vs: '1.00 × bare', target: '' });
const build = run('full build of fixtures/demo.yaml', ['build', DEMO, join(work, 'demo')]);
rows.push({ ...build, vs: `${(build.ms / bare.ms).toFixed(2)} × bare`, target: '≤ 1.5 × bare' });

const hasBatch = existsSync(join(ROOT, 'packages/cli/src/commands/batch.ts'));
if (hasBatch) {
  const lats = Array.from({ length: 50 }, (_, i) => (20 + i * 0.8).toFixed(1)).join(',');
  const batch = run('batch of 50 latitudes (20°–59.2°)', ['cli', 'batch', DEMO, '--latitudes', lats, '--out', join(work, 'batch'), '--force'], 3);
  rows.push({ ...batch, vs: `${(batch.ms / build.ms).toFixed(2)} × build`, target: '≤ 10 × build' });
}
const hasCheck = existsSync(join(ROOT, 'scripts/bench-check.ts'));

console.log(`umbrafab bench — ${cpus()[0]?.model ?? 'cpu'}, ${cpus().length} cores, Node ${process.version}, median of ${RUNS} runs\n`);
console.log('| job | wall time | peak RSS | ratio | target |');
console.log('|---|---|---|---|---|');
for (const r of rows) console.log(`| ${r.label} | ${r.ms.toFixed(0)} ms | ${(r.maxRssKb / 1024).toFixed(0)} MiB | ${r.vs} | ${r.target} |`);
if (hasCheck) {
  console.log('\nshadow check (scripts/bench-check.ts):');
  const r = spawnSync(process.execPath, ['--import', 'tsx', join(ROOT, 'scripts/bench-check.ts')], { encoding: 'utf8', cwd: ROOT });
  process.stdout.write(r.stdout);
  if (r.status !== 0) process.stderr.write(r.stderr);
}
rmSync(work, { recursive: true, force: true });
