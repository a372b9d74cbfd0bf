// What `umbrafab batch` needs, loaded by its run() only (a dynamic import of
// this file), so that `--help`, `--version` and the other commands never
// load the builders. Named re-exports, not whole packages: the bundle
// (scripts/build.mjs) then keeps this chunk to what batch uses.
export { default as cliProgress } from 'cli-progress';
export { WEDGE_MAX_TILT_DEG } from '@umbrafab/geometry';
export { toReportJson } from '@umbrafab/fabricate';
export { buildContext, GENERATOR } from '../buildFiles.ts';
export { partsOutputs } from '../outputs/partsOutputs.ts';
export { plateOutputs } from '../outputs/plateOutputs.ts';
export { readSpecFile } from '../readSpec.ts';
export { writeFilesAtomic } from '../writeFilesAtomic.ts';
