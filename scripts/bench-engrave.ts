/**
 * The engraving programs of the demo spec (engraveFromSpec: toolpaths,
 * laser fill, ordering, program texts) in one process, after a first
 * warm-up run: median wall and CPU (user + system) time per run.
 *
 * Run: npx -y pnpm@10.34.9 exec tsx scripts/bench-engrave.ts  (BENCH_RUNS=N)
 */
import { engraveFromSpec } from '@umbrafab/fabricate';
import { buildContext, readSpecFile } from '@umbrafab/cli';
import { cpuUsage } from 'node:process';

const runs = Number(process.env.BENCH_RUNS ?? 9);
const spec = readSpecFile(new URL('../fixtures/demo.yaml', import.meta.url).pathname);
const drawing = buildContext(spec).drawing;
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const wall: number[] = [];
const cpu: number[] = [];
for (let i = 0; i < runs + 1; i++) {
  const t = performance.now();
  const c = cpuUsage();
  await engraveFromSpec(spec, drawing);
  const d = cpuUsage(c);
  if (i > 0) {
    wall.push(performance.now() - t);
    cpu.push((d.user + d.system) / 1000);
  }
}
console.log(`engraveFromSpec demo warm: wall median ${median(wall).toFixed(1)} ms, cpu median ${median(cpu).toFixed(1)} ms over ${runs} runs`);
