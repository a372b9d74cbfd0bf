/**
 * The etch-outline union on the 60° N waterjet nodus plate
 * (fixtures/specs/waterjet-nodus-60n.yaml) with manifold-3d's CrossSection,
 * the engine strokeOutlines uses; median of runs. The other candidates
 * (clipper2-js 1.2.4 Union of the same `strokePolygons`, makerjs 0.19.2
 * expandPaths + combineUnion) were measured once from a scratch install
 * (figures in the README): makerjs drags in @types/node 7, which breaks
 * this workspace's type-check, so neither is a dependency.
 *
 * Run: npx -y pnpm@10.34.9 exec tsx scripts/bench-etch.ts  (BENCH_RUNS=N)
 */
import { drawingStrokes, manifoldEngine, strokeOutlines, strokePolygons } from '@umbrafab/geometry';
import { buildContext, readSpecFile } from '@umbrafab/cli';

const runs = Number(process.env.BENCH_RUNS ?? 5);
const spec = readSpecFile(new URL('../fixtures/specs/waterjet-nodus-60n.yaml', import.meta.url).pathname);
const drawing = buildContext(spec).drawing;
const strokes = drawingStrokes(drawing.lines, drawing.text);
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

const t0 = performance.now();
const { CrossSection } = await manifoldEngine();
const loadMs = performance.now() - t0;
const times: number[] = [];
let rings = 0;
for (let i = 0; i < runs; i++) {
  const t = performance.now();
  rings = (await strokeOutlines(strokes, spec.cutFiles.chordTolerance)).rings;
  times.push(performance.now() - t);
}
const pieces = strokePolygons(strokes, spec.cutFiles.chordTolerance, CrossSection);
console.log(`strokes ${strokes.length}, pieces ${pieces.length} (${pieces.reduce((n, p) => n + p.length, 0)} vertices), engine load ${loadMs.toFixed(0)} ms`);
console.log(`manifold-3d CrossSection: union of all ${strokes.length} strokes, median ${median(times).toFixed(0)} ms over ${runs} runs, ${rings} closed outlines`);
