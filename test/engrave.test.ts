import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { layoutDial, plateDrawing, timeFaceExtras, type PlateDrawing, type Vec2 } from '@umbrafab/geometry';
import { buildFiles, readSpecFile } from '@umbrafab/cli';
import { expectClose } from './helpers/closeTo.ts';
import { canonTimes, checkMillStartEnd, feedRuns, motions, runRs274, uncutAtFinalDepthMm, xyLength, type CanonMotion } from './helpers/rs274.ts';
import { clipToPlate } from '@umbrafab/fabricate';

// Outside validator: Debian's linuxcnc-uspace `rs274 -g`, the standalone
// RS274NGC interpreter (docs/design.md §7). Every program `umbrafab build` writes
// must pass it (exit 0), and its canonical machine commands are what the
// checks below read, not the program text.

const ROOT = resolve(import.meta.dirname, '..');
const EPS_MM = 1e-4; // rs274 prints 4 decimals
const XY_EPS_MM = 2e-3; // programs carry 3 decimals, rs274 prints 4

const CASES = [
  { name: 'demo with both programs (laser, aluminium, north)', file: 'fixtures/specs/engrave-demo-both.yaml', programs: ['engrave.ngc', 'engrave-laser.gcode'] },
  { name: 'router on brass, 60 deg V-bit (auto: ngc)', file: 'fixtures/specs/engrave-router-brass.yaml', programs: ['engrave.ngc'] },
  { name: 'waterjet, steel, southern hemisphere (auto: ngc as the second step)', file: 'fixtures/specs/engrave-waterjet-south.yaml', programs: ['engrave.ngc'] },
  { name: 'laser, plywood, southern hemisphere, nodus with date lines, both', file: 'fixtures/specs/engrave-laser-south.yaml', programs: ['engrave.ngc', 'engrave-laser.gcode'] },
] as const;

/** Every engraved path of the drawing (lines at their width, text strokes at the stroke width). */
function engravedPaths(d: PlateDrawing): { points: readonly Vec2[]; closed: boolean; widthMm: number }[] {
  return [
    ...d.lines.map((l) => ({ points: l.path.points, closed: l.path.closed, widthMm: l.widthMm })),
    ...d.text.flatMap((t) => t.strokes.map((s) => ({ points: s.points, closed: s.closed, widthMm: t.strokeWidthMm }))),
  ];
}

function lengthMm(points: readonly Vec2[], closed: boolean): number {
  let sum = 0;
  for (let i = 1; i < points.length; i += 1) sum += Math.hypot(points[i][0] - points[i - 1][0], points[i][1] - points[i - 1][1]);
  if (closed) sum += Math.hypot(points[0][0] - points[points.length - 1][0], points[0][1] - points[points.length - 1][1]);
  return sum;
}

/** Is (x, y) strictly inside a mounting hole or a gnomon slot (a through-cut)? */
function inThroughCut(d: PlateDrawing, x: number, y: number): boolean {
  for (const h of d.holes) if (Math.hypot(x - h.cx, y - h.cy) < h.radiusMm - EPS_MM) return true;
  for (const s of d.slots) if (Math.abs(x - s.cx) < s.widthMm / 2 - EPS_MM && Math.abs(y - s.cy) < s.heightMm / 2 - EPS_MM) return true;
  return false;
}

const SAMPLE_MM = 0.002;

/** Length of a path over holes and slots, mm, by sampling every SAMPLE_MM (an independent check of the clipping). */
function overThroughCutsMm(d: PlateDrawing, points: readonly Vec2[], closed: boolean): number {
  const pts = closed ? [...points, points[0]] : points;
  let sum = 0;
  for (let i = 1; i < pts.length; i += 1) {
    const [a, b] = [pts[i - 1], pts[i]];
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
    const n = Math.ceil(len / SAMPLE_MM);
    for (let k = 0; k < n; k += 1) {
      const t = (k + 0.5) / n;
      if (inThroughCut(d, a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t)) sum += len / n;
    }
  }
  return sum;
}

/** Distance from a point to a polyline, mm. */
function distanceToPolyline(p: Vec2, pts: readonly Vec2[]): number {
  let best = Infinity;
  for (let i = 1; i < pts.length; i += 1) {
    const [a, b] = [pts[i - 1], pts[i]];
    const dx = b[0] - a[0];
    const dy = b[1] - a[1];
    const l2 = dx * dx + dy * dy;
    const t = l2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / l2));
    best = Math.min(best, Math.hypot(p[0] - a[0] - t * dx, p[1] - a[1] - t * dy));
  }
  return best;
}

/** Is (x, y) on the finished plate: inside the rounded outline and outside every hole and slot? */
function onPlate(d: PlateDrawing, x: number, y: number): boolean {
  const o = d.outline;
  const r = o.cornerRadiusMm;
  const hx = o.widthMm / 2 - r;
  const hy = o.heightMm / 2 - r;
  const dx = Math.max(0, Math.abs(x - o.cx) - hx);
  const dy = Math.max(0, Math.abs(y - o.cy) - hy);
  if (Math.abs(x - o.cx) > o.widthMm / 2 + EPS_MM || Math.abs(y - o.cy) > o.heightMm / 2 + EPS_MM) return false;
  if (Math.hypot(dx, dy) > r + EPS_MM) return false;
  for (const h of d.holes) if (Math.hypot(x - h.cx, y - h.cy) < h.radiusMm - EPS_MM) return false;
  for (const s of d.slots) if (Math.abs(x - s.cx) < s.widthMm / 2 - EPS_MM && Math.abs(y - s.cy) < s.heightMm / 2 - EPS_MM) return false;
  return true;
}

const samePoints = (a: readonly Vec2[], b: readonly Vec2[]): boolean =>
  a.length === b.length && a.every((p, i) => Math.abs(p[0] - b[i][0]) < XY_EPS_MM && Math.abs(p[1] - b[i][1]) < XY_EPS_MM);

/** Drop consecutive repeats (a zero-length segment draws nothing). */
const dedupe = (pts: readonly Vec2[]): Vec2[] =>
  pts.filter((p, i) => i === 0 || Math.abs(p[0] - pts[i - 1][0]) > 1e-9 || Math.abs(p[1] - pts[i - 1][1]) > 1e-9);

describe.each(CASES)('umbrafab build engraving: $name', ({ file, programs }) => {
  // Centre-line scoring for the laser here (engrave.laserFill: score): these checks trace every drawn line once;
  // the default fill is checked in engraveFill.test.ts.
  const read = readSpecFile(join(ROOT, file));
  const spec = { ...read, engrave: { ...read.engrave, laserFill: 'score' as const } };
  // The drawing as buildFiles makes it: the layout plus the time work's curves and labels.
  const layout = layoutDial(spec);
  const extras = timeFaceExtras(layout);
  const drawing = plateDrawing(layout, extras.lines, extras.text);
  const paths = engravedPaths(drawing);
  // What is engraved: every path of the drawing, less its parts over holes and slots.
  const overMm = paths.map((p) => overThroughCutsMm(drawing, p.points, p.closed));
  const drawnMm = paths.reduce((s, p) => s + lengthMm(p.points, p.closed), 0);
  const geometryMm = drawnMm - overMm.reduce((s, v) => s + v, 0);
  const built = buildFiles(spec);
  const text = async (name: string): Promise<string> => {
    const f = (await built).files.find((x) => x.name === name);
    expect(f, name).toBeDefined();
    return new TextDecoder().decode(f!.bytes);
  };
  const engraving = async (): Promise<Record<string, any>> => (await built).report.engraving as Record<string, any>;

  it('engraves every line of the drawing: marks, curves and text', async () => {
    const ops = new Set(((await built).report.engraving as { programs: string[] }).programs.length > 0 ? ['marks', 'text', ...(drawing.lines.some((l) => l.kind === 'curve') ? ['curves'] : [])] : []);
    const first = programs[0];
    const comments = (await text(first)).split('\n').filter((l) => /^\((cut|stroke) \d+\//.test(l));
    // One cut per path clear of holes and slots, at least one per path crossing them (its pieces).
    const crossing = overMm.filter((v) => v > 0).length;
    expect(comments.length).toBeGreaterThanOrEqual(paths.length);
    expect(comments.length).toBeLessThanOrEqual(paths.length + 2 * crossing);
    for (const op of ops) expect(comments.some((c) => c.includes(`: ${op} `)), op).toBe(true);
  });

  it('writes exactly the programs engrave.programs asks for', async () => {
    const names = (await built).files.map((f) => f.name).filter((n) => n.startsWith('engrave'));
    expect(names).toEqual([...programs]);
  });

  it.runIf(programs.includes('engrave.ngc' as never))('engrave.ngc passes rs274 and its canonical output meets every check', async () => {
    const ngc = await text('engrave.ngc');
    const report = (await engraving()).ngc;
    const e = spec.engrave;
    const { commands } = runRs274(ngc, 'engrave.ngc');
    const ms = motions(commands);

    // '%' delimiters, up to safe Z first, M3 then a G4 dwell, park at safe Z last, M5, M2.
    checkMillStartEnd(ngc, commands, { safeZMm: e.safeZMm, spindleRpm: report.spindleRpm, spindleDwellS: e.spindleDwellS, park: report.parkMm, coolant: e.coolant }, (c, what) => expect(c, what).toBe(true));
    expect(e.safeZMm).toBeGreaterThanOrEqual(10);

    // No feed move leaves the plate (rounded outline, holes and gnomon slots), sampled along each move.
    let offPlate = 0;
    for (const m of ms.filter((k) => k.kind === 'STRAIGHT_FEED')) {
      for (let k = 0; k <= 8; k += 1) {
        const x = m.from.x + ((m.to.x - m.from.x) * k) / 8;
        const y = m.from.y + ((m.to.y - m.from.y) * k) / 8;
        if (!onPlate(drawing, x, y)) offPlate += 1;
      }
    }
    expect(offPlate).toBe(0);
    // Rapids move in XY only at or above the clearance height.
    for (const m of ms.slice(1)) if (m.kind === 'STRAIGHT_TRAVERSE' && xyLength(m) > 0) expect(Math.min(m.from.z, m.to.z)).toBeGreaterThanOrEqual(e.clearanceZMm - EPS_MM);

    // Deepest cut = the V-bit depth of the widest line: d = (w - tip) / (2 tan(angle/2))
    // (docs/design.md §5; the cone's geometry, common practice).
    const widest = Math.max(...paths.map((p) => p.widthMm));
    const expectedDepth = (widest - e.tool.vbitTipMm) / (2 * Math.tan((e.tool.vbitAngleDeg * Math.PI) / 360));
    const deepest = -Math.min(...ms.map((m) => m.to.z));
    expectClose(deepest, expectedDepth, 0.001, 'deepest cut', ' mm');
    expectClose(report.vbitDepthMmMax, expectedDepth, 0.001, 'report vbitDepthMmMax', ' mm');
    // Nothing deeper than the sheet allows: thickness - max(0.5, thickness / 2) (project rule).
    expect(deepest).toBeLessThanOrEqual(spec.plate.thickness - Math.max(0.5, spec.plate.thickness / 2) + EPS_MM);

    // Every engraved line cut at its final depth along its whole length (sampled
    // every 0.05 mm; the engraving job's paths are the drawing less its parts
    // over holes and slots); the final-depth length exceeds the drawing's only
    // by the runs back over the ramps.
    const job = (await built).report.engraving as Record<string, any>;
    let finalDepthMm = 0;
    for (const run of feedRuns(ms)) {
      const bottom = Math.min(...run.map((m) => m.to.z));
      for (const m of run) if (Math.abs(m.from.z - bottom) < EPS_MM && Math.abs(m.to.z - bottom) < EPS_MM) finalDepthMm += xyLength(m);
    }
    const onPlatePaths = engravedPaths(drawing).flatMap((p) => clipToPlate(p.points, p.closed, drawing.holes, drawing.slots).pieces.map((points) => ({ points, closed: p.closed && points === p.points })));
    const uncut = uncutAtFinalDepthMm(ms, onPlatePaths);
    const extra = (finalDepthMm - geometryMm) / geometryMm;
    console.log(`${file} engrave.ngc: final-depth length ${finalDepthMm.toFixed(3)} mm vs drawing ${geometryMm.toFixed(3)} mm (extra ${extra.toExponential(2)}), uncut ${uncut.toFixed(4)} mm, deepest ${deepest.toFixed(4)} mm vs ${expectedDepth.toFixed(4)} mm`);
    expect(uncut).toBe(0);
    expect(extra).toBeGreaterThanOrEqual(-0.001);
    expect(extra).toBeLessThanOrEqual(0.1);
    void job;

    // The job runs in the cut: total time at most 1.05 x the cutting time (feeds
    // with XY motion), both from rs274's canonical moves at the program's feeds
    // and the spec's rapid rate; and the program's own estimate agrees.
    const times = canonTimes(commands, e.rapidMmPerMin);
    console.log(`${file} engrave.ngc: ${times.totalS.toFixed(1)} s for ${times.cuttingS.toFixed(1)} s of cutting (x${(times.totalS / times.cuttingS).toFixed(4)}); plunges ${times.plungeS.toFixed(1)} s, rapids ${times.rapidS.toFixed(1)} s, dwell ${times.dwellS.toFixed(1)} s; estimate ${report.timeEstimateS.toFixed(1)} s`);
    if (file.endsWith('engrave-demo-both.yaml')) expect(times.totalS).toBeLessThanOrEqual(1.05 * times.cuttingS);
    expectClose(times.totalS, report.timeEstimateS, 0.005 * times.totalS, 'estimate vs rs274 time', ' s');
    expect(Math.abs(report.cuttingLengthMm - geometryMm) / geometryMm).toBeLessThanOrEqual(0.001);
    expect(Math.abs((await engraving()).geometryLengthMm - geometryMm) / geometryMm).toBeLessThanOrEqual(0.001);
  });

  it.runIf(programs.includes('engrave-laser.gcode' as never))('engrave-laser.gcode passes rs274: no Z, beam off in travel, every line traced once', async () => {
    const gcode = await text('engrave-laser.gcode');
    const report = (await engraving()).laser;
    const code = gcode.split('\n').map((line) => line.replace(/\([^)]*\)/g, ''));
    expect(code.some((line) => /z/i.test(line))).toBe(false);
    const { commands } = runRs274(gcode, 'engrave-laser.gcode');
    const ms = motions(commands);
    expect(ms.every((m) => m.to.z === 0)).toBe(true);
    // Beam off (S0 or M5) during every travel, on at the program's power during every burn.
    for (const m of ms.filter((k) => k.kind === 'STRAIGHT_TRAVERSE')) expect(m.spindle === 'off' || m.spindleSpeed === 0).toBe(true);
    for (const m of ms.filter((k) => k.kind === 'STRAIGHT_FEED')) {
      expect(m.spindle).toBe('ccw');
      expect(m.spindleSpeed).toBeCloseTo(report.powerS, 6);
    }
    expect(commands.some((c) => c.kind === 'PROGRAM_END')).toBe(true);
    expect(gcode.trimEnd().split('\n').slice(-4)).toEqual(['S0', `G0 X0.000 Y${drawing.lengthMm.toFixed(3)}`, 'M5', 'M2']);

    // Every engraved path traced exactly once: each burn run after a traverse
    // matches one whole path (either direction) and every path clear of the
    // holes and slots is matched once; the runs left over lie on the paths
    // that cross a hole or slot and add up to their length on the plate.
    const traces: Vec2[][] = [];
    for (const m of ms) {
      if (m.kind === 'STRAIGHT_TRAVERSE') traces.push([[m.to.x, m.to.y]]);
      else traces[traces.length - 1].push([m.to.x, m.to.y]);
    }
    traces.pop(); // the park move
    const crossing = paths.map((_, i) => overMm[i] > 0);
    const wanted = paths.map((p) => dedupe(p.closed ? [...p.points, p.points[0]] : p.points));
    const hits = paths.map(() => 0);
    const leftover: Vec2[][] = [];
    for (const t of traces.map(dedupe)) {
      const i = wanted.findIndex((w, j) => !crossing[j] && hits[j] === 0 && (samePoints(t, w) || samePoints(t, [...w].reverse())));
      if (i >= 0) hits[i] += 1;
      else leftover.push(t);
    }
    expect(hits.filter((_, i) => !crossing[i]).every((h) => h === 1)).toBe(true);
    const crossingPaths = wanted.filter((_, i) => crossing[i]);
    for (const t of leftover) {
      expect(crossingPaths.some((w) => t.every((p) => distanceToPolyline(p, w) < XY_EPS_MM)), `trace at ${t[0]} lies on no path`).toBe(true);
    }
    const leftoverMm = leftover.reduce((s, t) => s + lengthMm(t, false), 0);
    const crossingOnPlateMm = paths.reduce((s, p, i) => (crossing[i] ? s + lengthMm(p.points, p.closed) - overMm[i] : s), 0);
    expectClose(leftoverMm, crossingOnPlateMm, 0.01 + 0.01 * crossingPaths.length, 'length traced on paths crossing holes or slots', ' mm');
    const burnMm = ms.filter((m) => m.kind === 'STRAIGHT_FEED').reduce((s, m) => s + xyLength(m), 0);
    expect(Math.abs(burnMm - geometryMm) / geometryMm).toBeLessThanOrEqual(0.001);
  });

  it('reports the rapid travel: ordered <= input order, with its ratio to the lower bound', async () => {
    const eng = await engraving();
    for (const key of ['ngc', 'laser'] as const) {
      const r = eng[key];
      if (!r) continue;
      const t = r.rapidTravelMm;
      console.log(`${file} ${key}: rapid travel input ${t.inputOrder.toFixed(1)} mm, ordered ${t.ordered.toFixed(1)} mm, bound ${t.lowerBound.toFixed(1)} mm, ratio ${t.ratioToBound.toFixed(3)}; time ${r.timeEstimateS.toFixed(0)} s`);
      expect(t.ordered).toBeLessThanOrEqual(t.inputOrder + 1e-6);
      expect(t.lowerBound).toBeGreaterThan(0);
      expect(t.lowerBound).toBeLessThanOrEqual(t.ordered + 1e-6);
      expectClose(t.ratioToBound, t.ordered / t.lowerBound, 1e-5, 'ratioToBound');
      expect(r.timeEstimateS).toBeGreaterThan(0);
    }
  });

  it('states the work origin, stock, tool and spec summary in the header', async () => {
    for (const name of programs) {
      const head = (await text(name)).split('\n').filter((l) => l.startsWith('('));
      expect(head.some((l) => l.startsWith('(work origin: X0 Y0 = lower-left corner of the plate [as in plate.dxf]'))).toBe(true);
      expect(head).toContain(`(stock: ${drawing.widthMm.toFixed(3)} x ${drawing.lengthMm.toFixed(3)} x ${spec.plate.thickness.toFixed(3)} mm, material ${spec.plate.material})`);
      expect(head).toContain(`(spec: name: ${JSON.stringify(spec.name)})`);
      expect(head.some((l) => l.startsWith(`(spec: site: {latitude: ${spec.site.latitude}, longitude: ${spec.site.longitude}`))).toBe(true);
      expect(head.some((l) => l.startsWith('(estimated time: '))).toBe(true);
      if (name === 'engrave.ngc') {
        expect(head.some((l) => l.startsWith(`(T1: V-bit ${spec.engrave.tool.vbitAngleDeg} deg included angle`))).toBe(true);
        expect(head).toContain('(work origin: X0 Y0 = lower-left corner of the plate [as in plate.dxf], Z0 = top of the stock)');
      }
    }
  });
});
