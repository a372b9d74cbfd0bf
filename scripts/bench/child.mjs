// One measured process for scripts/bench.ts. Modes:
//   bare            start Node, register tsx, import every umbrafab package (no work)
//   build SPEC OUT  the same, then run `umbrafab build SPEC --out OUT --force`
//   cli ARGS...     the same, then run `umbrafab ARGS...`
// Prints one JSON line: {"maxRssKb": n, "code": n}
import { register } from 'tsx/esm/api';

register();
const [mode, ...rest] = process.argv.slice(2);
await import('../../packages/geometry/src/index.ts');
await import('../../packages/fabricate/src/index.ts');
const { main } = await import('../../packages/cli/src/main.ts');
let code = 0;
const quiet = { out: () => {}, err: (l) => process.stderr.write(l + '\n') };
if (mode === 'build') code = await main(['build', rest[0], '--out', rest[1], '--force'], quiet);
else if (mode === 'cli') code = await main(rest, quiet);
process.stdout.write(JSON.stringify({ maxRssKb: process.resourceUsage().maxRSS, code }) + '\n');
process.exitCode = code;
