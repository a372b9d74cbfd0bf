/**
 * The etch-outline union on the 60° N waterjet nodus plate
 * (fixtures/specs/waterjet-nodus-60n.yaml): manifold-3d's CrossSection (the
 * engine strokeOutlines uses) and clipper2-js (pure-JS Clipper2: Union of
 * the same polygons, scaled to integers at 1 nm) on the first M strokes, and
 * makerjs's expandPaths + combineUnion on the first N strokes only (it is
 * orders of magnitude slower); medians of runs.
 *
 * Run: npx -y pnpm@10.34.9 exec tsx scripts/bench-etch.ts  (BENCH_RUNS=N, CLIPPER2_STROKES=M, MAKERJS_STROKES=N)
 */
import makerjs from 'makerjs';
import { Clipper, FillRule, Path64, Paths64, Point64 } from 'clipper2-js';
import { drawingStrokes, manifoldEngine, strokeOutlines, strokePolygons } from '@umbrafab/geometry';
import { buildContext } from '../packages/cli/src/buildFiles.ts';
import { readSpecFile } from '../packages/cli/src/readSpec.ts';

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

// clipper2-js did not finish the whole plate within 300 s on the 2-core machine: time the first M strokes.
const m = Number(process.env.CLIPPER2_STROKES ?? 40);
const cTimes: number[] = [];
let cRings = 0;
for (let i = 0; i < 1; i++) {
  const t = performance.now();
  const subject = new Paths64();
  for (const p of strokePolygons(strokes.slice(0, m), spec.cutFiles.chordTolerance, CrossSection)) {
    const path = new Path64();
    for (const [x, y] of p) path.push(new Point64(Math.round(x * 1e6), Math.round(y * 1e6)));
    subject.push(path);
  }
  cRings = Clipper.Union(subject, undefined, FillRule.Positive).length;
  cTimes.push(performance.now() - t);
}
const mTime = performance.now();
await strokeOutlines(strokes.slice(0, m), spec.cutFiles.chordTolerance);
console.log(`clipper2-js Union (same pieces), first ${m} strokes: ${median(cTimes).toFixed(0)} ms, ${cRings} closed outlines (manifold-3d on the same: ${(performance.now() - mTime).toFixed(0)} ms)`);

const n = Number(process.env.MAKERJS_STROKES ?? 20);
const t = performance.now();
let model: makerjs.IModel = { models: {} };
strokes.slice(0, n).forEach((s, i) => {
  const line: makerjs.IModel = { models: { p: new makerjs.models.ConnectTheDots(s.closed, s.points.map(([x, y]) => [x, y])) } };
  const wide = makerjs.model.expandPaths(line, s.widthMm / 2, 1);
  model = i === 0 ? wide : makerjs.model.combineUnion(model, wide);
});
const makerMs = performance.now() - t;
const chains = makerjs.model.findChains(model) as makerjs.IChain[];
console.log(`makerjs expandPaths + combineUnion: first ${n} strokes in ${makerMs.toFixed(0)} ms (${(makerMs / n).toFixed(0)} ms a stroke; ${chains.length} chains)`);
