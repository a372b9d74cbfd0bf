/**
 * `pnpm bench`: wall time, CPU time and peak memory of umbrafab's commands as
 * a user runs them (whole fresh processes of the real bin), each against the
 * real floor, `node -e 0`, in one run. Every figure is the median of RUNS
 * processes after one warm-up process (the machine's two cores may be shared
 * with other work: medians, not means). Then the page's full build: the time
 * from a field change to the downloadable files, after the first build.
 *
 * Targets: `--version` ≤ 2 × node -e 0; the demo build ≤ 6 ×; the demo check
 * ≤ 8 ×; a 50-latitude batch ≤ 10 × a single build; the demo build's peak
 * RSS ≤ 200 MiB. Prints a Markdown table for the README; asserts nothing.
 *
 *   npx -y pnpm@10.34.9 bench            (BENCH_RUNS=N for more runs)
 */
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { cpus, loadavg, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

const ROOT = resolve(import.meta.dirname, '..');
const BIN = join(ROOT, 'packages/cli/bin/umbrafab.js');
const PROBE = join(ROOT, 'scripts/bench/usage.cjs');
const DEMO = join(ROOT, 'fixtures/demo.yaml');
const RUNS = Math.max(1, Number(process.env.BENCH_RUNS ?? 5));
const work = mkdtempSync(join(tmpdir(), 'umbrafab-bench-'));
const loadAtStart = loadavg()[0];

interface Sample {
  readonly ms: number;
  readonly cpuMs: number;
  readonly maxRssKb: number;
}

/** One fresh Node process; the preloaded probe writes its CPU time and peak RSS (workers included) at exit. */
function measure(args: readonly string[], status = 0): Sample {
  const out = join(work, 'usage.json');
  rmSync(out, { force: true });
  const t0 = process.hrtime.bigint();
  const r = spawnSync(process.execPath, ['--require', PROBE, ...args], { encoding: 'utf8', cwd: ROOT, env: { ...process.env, UMBRAFAB_BENCH_USAGE: out } });
  const ms = Number(process.hrtime.bigint() - t0) / 1e6;
  if (r.status !== status) throw new Error(`bench: node ${args.join(' ')} exited ${r.status}: ${r.stderr}`);
  const u = JSON.parse(readFileSync(out, 'utf8')) as { cpuMs: number; maxRssKb: number };
  return { ms, ...u };
}

const med = (xs: readonly number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

function run(args: readonly string[], runs = RUNS, status = 0): Sample {
  measure(args, status); // warm the file cache
  const s = Array.from({ length: runs }, () => measure(args, status));
  return { ms: med(s.map((x) => x.ms)), cpuMs: med(s.map((x) => x.cpuMs)), maxRssKb: med(s.map((x) => x.maxRssKb)) };
}

const lats = Array.from({ length: 50 }, (_, i) => (20 + i * 0.8).toFixed(1)).join(',');
const floor = run(['-e', '0']);
const version = run([BIN, '--version']);
const build = run([BIN, 'build', DEMO, '--out', join(work, 'demo'), '--force']);
const check = run([BIN, 'check', DEMO]);
const batch = run([BIN, 'batch', DEMO, '--latitudes', lats, '--out', join(work, 'batch'), '--force'], Math.min(RUNS, 3));

// Hostile inputs: a 40k-key spec (the reader counts nodes from the lexer and refuses it), /dev/zero (reading
// stops at the 1 MiB cap), and a 3000 x 3000 mm plate at 20 px/mm (each PNG held to 8 million pixels).
const keysSpec = join(work, 'keys40k.yaml');
writeFileSync(keysSpec, [readFileSync(DEMO, 'utf8'), 'junk:', ...Array.from({ length: 40_000 }, (_, i) => `  k${i}: ${i}`)].join('\n') + '\n');
const bigSpec = join(work, 'plate3000.yaml');
writeFileSync(bigSpec, readFileSync(DEMO, 'utf8').replace(/^plate:\n/m, 'plate:\n  width: 3000\n  length: 3000\n') + 'pictures:\n  pxPerMm: 20\n');
const keys = run([BIN, 'build', keysSpec, '--out', join(work, 'keys')], RUNS, 1);
const zero = run([BIN, 'build', '/dev/zero', '--out', join(work, 'zero')], RUNS, 1);
const big = run([BIN, 'build', bigSpec, '--out', join(work, 'big'), '--force'], 1);

// Wall-time ratios are the targets; CPU-time ratios beside them hold up
// better when other work shares the cores (worker threads count as CPU).
const x = (s: Sample, of: Sample) => `${(s.ms / of.ms).toFixed(2)} × (CPU ${(s.cpuMs / of.cpuMs).toFixed(2)} ×)`;
const rows: [string, Sample, string, string][] = [
  ['`node -e 0` (the floor)', floor, '1.00 ×', ''],
  ['`umbrafab --version`', version, x(version, floor), '≤ 2 ×'],
  ['`umbrafab build` of fixtures/demo.yaml', build, x(build, floor), '≤ 6 ×, ≤ 200 MiB'],
  ['`umbrafab check` of fixtures/demo.yaml', check, x(check, floor), '≤ 8 ×'],
  ['`umbrafab batch`, 50 latitudes (20°–59.2°)', batch, `${x(batch, floor)}; ${x(batch, build)} build`, '≤ 10 × build'],
  ['a 629 KB spec with 40k keys (refused, exit 1)', keys, x(keys, floor), '< 1 s past start-up'],
  ['`/dev/zero` as the spec (refused at 1 MiB, exit 1)', zero, x(zero, floor), '< 2 s, < 300 MiB'],
  ['a 3000 × 3000 mm plate at 20 px/mm (1 run)', big, x(big, floor), '≤ 512 MiB'],
];

console.log(`umbrafab bench — ${cpus()[0]?.model ?? 'cpu'}, ${cpus().length} cores, Node ${process.version}, median of ${RUNS} fresh processes (batch: ${Math.min(RUNS, 3)}), load average ${loadAtStart.toFixed(1)} at the start\n`);
console.log('| job | wall time | CPU time | peak RSS | ratio to `node -e 0` | target |');
console.log('|---|---|---|---|---|---|');
for (const [label, s, ratio, target] of rows) {
  console.log(`| ${label} | ${s.ms.toFixed(0)} ms | ${s.cpuMs.toFixed(0)} ms | ${(s.maxRssKb / 1024).toFixed(0)} MiB | ${ratio} | ${target} |`);
}

console.log('\n' + (await pageFullBuild()));

if (existsSync(join(ROOT, 'scripts/bench-check.ts'))) {
  console.log('\nshadow check (scripts/bench-check.ts):');
  const r = spawnSync(process.execPath, ['--import', 'tsx', join(ROOT, 'scripts/bench-check.ts')], { encoding: 'utf8', cwd: ROOT });
  process.stdout.write(r.stdout);
  if (r.status !== 0) process.stderr.write(r.stderr);
}
rmSync(work, { recursive: true, force: true });

/**
 * `umbrafab serve fixtures/demo.yaml --port 0` as a user starts it; the first
 * view and full build; then, RUNS times, a field change (the gnomon height)
 * and the time until every file of the new build has been downloaded.
 */
async function pageFullBuild(): Promise<string> {
  const child = spawn(process.execPath, [BIN, 'serve', DEMO, '--port', '0'], { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'] });
  let stderr = '';
  child.stderr.on('data', (d) => (stderr += d));
  try {
    const url = await new Promise<string>((ok, fail) => {
      let out = '';
      child.stdout.on('data', (d) => {
        out += d;
        const m = /(http:\/\/127\.0\.0\.1:\d+)\//.exec(out);
        if (m) ok(m[1]);
      });
      child.on('exit', (code) => fail(new Error(`bench: umbrafab serve exited ${code}: ${stderr}`)));
    });
    const get = async (path: string) => {
      const r = await fetch(url + path);
      if (!r.ok) throw new Error(`bench: GET ${path}: ${r.status} ${await r.text()}`);
      return r;
    };
    const post = async (path: string, body: unknown) => {
      const r = await fetch(url + path, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) });
      if (!r.ok) throw new Error(`bench: POST ${path}: ${r.status} ${await r.text()}`);
      return r.json() as Promise<{ filesUrl: string }>;
    };
    const fields = ((await (await get('/api/setup')).json()) as { values: Record<string, unknown> }).values;
    const change = async (height: number): Promise<number> => {
      const t0 = performance.now();
      const v = await post('/api/view', { fields: { ...fields, 'gnomon.height': height } });
      const list = (await (await get(v.filesUrl)).json()) as { files: { url: string }[] };
      await Promise.all(list.files.map(async (f) => (await get(f.url)).arrayBuffer()));
      return performance.now() - t0;
    };
    if (!('gnomon.height' in fields)) throw new Error('bench: the page has no gnomon.height field');
    const first = await change(Number(fields['gnomon.height']));
    const later = Array.from({ length: RUNS }, (_, i) => 40 + i);
    const times: number[] = [];
    for (const h of later) times.push(await change(h));
    return `page (umbrafab serve): the first view and full build ${first.toFixed(0)} ms; after a field change, the downloadable files of the demo in ${med(times).toFixed(0)} ms (median of ${times.length} changes of gnomon.height)`;
  } finally {
    child.kill();
  }
}
