// What `umbrafab batch` needs, loaded by its run() only (a dynamic import of
// this file), so that `--help`, `--version` and the other commands never
// load the builders. Named re-exports, not whole packages: the bundle
// (scripts/build.mjs) then keeps this chunk to what batch uses.
export { default as cliProgress } from 'cli-progress';
export { SpecError, WEDGE_MAX_TILT_DEG, faceOrientationOf, isSpecError, layoutDial, parseSpec } from '@umbrafab/geometry';
export { toReportJson } from '@umbrafab/fabricate';
export { buildAnyFiles, buildContext, buildFiles, GENERATOR } from '../buildFiles.ts';
export { readRawSpec } from '../readSpec.ts';
export { writeFilesAtomic } from '../writeFilesAtomic.ts';
