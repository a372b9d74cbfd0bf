// Child process for the memory tests: runs the umbrafab CLI in-process with
// the given arguments and prints, as its last line, one JSON object with the
// exit code, the run's time (ms) and the process's peak resident memory
// (process.resourceUsage().maxRSS, KiB).
import { main } from '@umbrafab/cli';

const t0 = performance.now();
const code = await main(process.argv.slice(2), { out: (l) => process.stderr.write(l + '\n'), err: (l) => process.stderr.write(l + '\n') });
process.stdout.write(JSON.stringify({ code, ms: performance.now() - t0, maxRssKiB: process.resourceUsage().maxRSS }) + '\n');
