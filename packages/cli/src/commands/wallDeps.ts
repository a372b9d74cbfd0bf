// What `umbrafab wall` needs, loaded by its run() only (a dynamic import of
// this file), as checkDeps.ts does for check.
export { parseDocument } from 'yaml';
export { SpecError, parseSpec, wallDeclinationFromShadow } from '@umbrafab/geometry';
export { readSpecFile, readSpecText } from '../readSpec.ts';
export { writeFilesAtomic } from '../writeFilesAtomic.ts';
