// Preload (node --import) that records every module URL the process loads
// through the ES module loader (the bin, its chunks, and each third-party
// package's entry file) in the file named by UMBRAFAB_LOADED_MODULES, one per
// line. Used by test/lazyLoading.test.ts to see what a command loads.
import { register } from 'node:module';

if (process.env.UMBRAFAB_LOADED_MODULES) {
  register(
    'data:text/javascript,' +
      encodeURIComponent(`import { appendFileSync } from 'node:fs';
export async function load(url, context, next) {
  appendFileSync(${JSON.stringify(process.env.UMBRAFAB_LOADED_MODULES)}, url + '\\n');
  return next(url, context);
}`),
  );
}
