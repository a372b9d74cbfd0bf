// Benchmark of `umbrafab check`'s simulation: a full year at
// 1-minute sampling for a ten-hour dial (07:00–17:00, about 220,000 Sun
// positions). Not a test: run it by hand and copy the figure into the README.
//
//   npx tsx scripts/bench-check.ts
//
// Prints the cold first run (track building, JIT warm-up) and the median of
// five warm runs, all on one core (the simulation is single-threaded).
import { checkDial, layoutDial, parseSpec } from '@umbrafab/geometry';

const spec = parseSpec({
  name: 'Bench dial',
  site: { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' },
  dial: { reads: 'solar' },
  hours: { from: '07:00', to: '17:00', step: 15 },
  calendar: { year: 2027 },
  check: { sampling: { stepMinutes: 1, everyDays: 1 } },
});
const layout = layoutDial(spec);

function run(): { ms: number; positions: number; worstMm: number } {
  const t0 = performance.now();
  const r = checkDial(layout);
  const ms = performance.now() - t0;
  return { ms, positions: r.sunPositions, worstMm: Math.abs(r.worst?.errorMm ?? 0) };
}

const cold = run();
const warm = Array.from({ length: 5 }, run).sort((a, b) => a.ms - b.ms);
const median = warm[2];
console.log(`bench-check: ${layout.marks.length} marks, 365 days, step 1 min, ${median.positions} sun positions (sweep + per-mark instants)`);
console.log(`  cold first run: ${cold.ms.toFixed(0)} ms (includes ${'~731'} astronomy-engine calls for the track)`);
console.log(`  warm median of 5: ${median.ms.toFixed(0)} ms  (${((median.positions / median.ms) * 1000 / 1e6).toFixed(2)} M positions/s), worst error ${median.worstMm.toExponential(2)} mm`);
console.log(`  node ${process.version}, ${process.platform}/${process.arch}`);
