// What `umbrafab build` needs, loaded by its run() only (a dynamic import of
// this file), so that `--help`, `--version` and the other commands never
// load the builders. Named re-exports, not whole packages: the bundle
// (scripts/build.mjs) then keeps this chunk to what build uses.
export { countMarks, markCountText } from '@umbrafab/geometry';
export { engraveProgramsFor } from '@umbrafab/fabricate';
export { buildAnyFiles } from '../buildFiles.ts';
export { engraveOnWorker } from '../engraveOnWorker.ts';
export { readSpecFile } from '../readSpec.ts';
export { writeFilesAtomic } from '../writeFilesAtomic.ts';
