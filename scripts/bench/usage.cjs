// Preloaded (node --require) into every process scripts/bench.ts measures:
// at exit, writes the process's CPU time and peak RSS (worker threads
// included) as JSON to the file named by UMBRAFAB_BENCH_USAGE.
'use strict';
const { writeFileSync } = require('node:fs');

process.on('exit', () => {
  const u = process.resourceUsage();
  const file = process.env.UMBRAFAB_BENCH_USAGE;
  if (file) writeFileSync(file, JSON.stringify({ cpuMs: (u.userCPUTime + u.systemCPUTime) / 1000, maxRssKb: u.maxRSS }));
});
