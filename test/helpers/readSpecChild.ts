// Child process for the spec-reading limits test: reads one spec file with
// readSpecFile and prints, as one JSON line, how long the read took, the
// message it ended with and the process's peak resident memory
// (process.resourceUsage().maxRSS, KiB).
import { readSpecFile } from '@umbrafab/cli';

const path = process.argv[2];
const t0 = performance.now();
let message = 'read';
try {
  readSpecFile(path);
} catch (e) {
  message = `${(e as Error).name}: ${(e as Error).message}`;
}
const ms = performance.now() - t0;
process.stdout.write(JSON.stringify({ ms, message, maxRssKiB: process.resourceUsage().maxRSS }) + '\n');
