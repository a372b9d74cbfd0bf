// What `umbrafab check` needs, loaded by its run() only (a dynamic import of
// this file), so that `--help`, `--version` and the other commands never
// load the simulation. Named re-exports, not whole packages: the bundle
// (scripts/build.mjs) then keeps this chunk to what check uses.
export { checkDial, checkPlanar, countMarks, curvesFromPlate, drawnCurvesFromLayout, faceOrientationOf, layoutDial, layoutPlanar, lowerFacePlateLines, markCountText, marksFromPlate, parseSpec, planarMarksFromPlate } from '@umbrafab/geometry';
export { checkFailureLine, checkTableText, planarCheckText, toCheckJson, toCheckSvg, toPlanarCheckSvg } from '@umbrafab/fabricate';
export { readRawSpec } from '../readSpec.ts';
export { writeFilesAtomic } from '../writeFilesAtomic.ts';
