import { describe, expect, it } from 'vitest';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import { canonTimes, checkMillStartEnd, feedRuns, motions, runRs274, uncutAtFinalDepthMm, xyLength, type CanonMotion } from '../../../../test/helpers/rs274.ts';
import type { EngraveJob } from './engraveInput.ts';
import { resolveEngraveSettings, type EngraveSettings } from './materialPresets.ts';
import { polylineLengthMm } from './polylineLength.ts';
import { SAMPLE_PLATE_JOB, SAMPLE_WIDE_MARK_JOB } from './sampleEngraveJobs.ts';
import { planNgc, toNgc } from './toNgc.ts';
import { vbitDepthMm } from './vbitDepth.ts';

// Outside validator: Debian's linuxcnc-uspace `rs274 -g`, the standalone
// RS274NGC interpreter (docs/design.md §7). Every program below must pass it, and
// its canonical output is what the checks read.

const EPS_MM = 1e-4; // rs274 prints 4 decimals

function checkMillProgram(job: EngraveJob, s: EngraveSettings, text: string): { ms: CanonMotion[]; finalDepthLengthMm: number; deepestMm: number; uncutMm: number } {
  const { commands } = runRs274(text, 'engrave.ngc');
  const ms = motions(commands);
  expect(ms.length).toBeGreaterThan(0);

  // '%' delimiters, up to safe Z first, M3 then G4, park at safe Z last, M5, M2.
  checkMillStartEnd(text, commands, { safeZMm: s.safeZMm, spindleRpm: s.spindleRpm, spindleDwellS: s.spindleDwellS, park: [s.parkXMm ?? 0, s.parkYMm ?? job.stock.lengthMm], coolant: s.coolant }, (c, what) => expect(c, what).toBe(true));

  // The spindle runs (at the preset speed) during every feed below Z 0.
  for (const m of ms.filter((k) => k.kind === 'STRAIGHT_FEED' && k.to.z < 0)) {
    expect(m.spindle).toBe('cw');
    expect(m.spindleSpeed).toBe(s.spindleRpm);
  }

  // No feed move leaves the stock's XY rectangle (tool-centre lines).
  for (const m of ms.filter((k) => k.kind === 'STRAIGHT_FEED')) {
    for (const p of [m.from, m.to]) {
      expect(p.x).toBeGreaterThanOrEqual(-EPS_MM);
      expect(p.y).toBeGreaterThanOrEqual(-EPS_MM);
      expect(p.x).toBeLessThanOrEqual(job.stock.widthMm + EPS_MM);
      expect(p.y).toBeLessThanOrEqual(job.stock.lengthMm + EPS_MM);
    }
  }
  // Rapids move in XY only at or above the clearance height and never
  // descend below the entry height (retracts start in the stock, so they are
  // exempt); feeds move in XY only in the stock. ms[0] starts from rs274's assumed Z0.
  for (const m of ms.slice(1)) {
    if (m.kind === 'STRAIGHT_TRAVERSE') {
      if (xyLength(m) > 0) expect(Math.min(m.from.z, m.to.z)).toBeGreaterThanOrEqual(s.clearanceZMm - EPS_MM);
      if (m.to.z < m.from.z) expect(m.to.z).toBeGreaterThanOrEqual(s.entryZMm - EPS_MM);
    } else if (xyLength(m) > 0) expect(m.to.z).toBeLessThan(0);
  }
  // Every feed at the cutting feed; no plunge into the stock (a feed along Z
  // alone stays at or above Z0); every ramp descends no faster than the plunge feed.
  for (const m of ms.filter((k) => k.kind === 'STRAIGHT_FEED')) {
    expect(m.feed).toBeLessThanOrEqual(s.feedMmPerMin + 1e-6);
    if (xyLength(m) === 0 && m.to.z < m.from.z) expect(m.to.z).toBeGreaterThanOrEqual(-EPS_MM);
    const dz = m.from.z - m.to.z;
    if (dz > 0 && xyLength(m) > 0) {
      const len = Math.hypot(xyLength(m), dz);
      expect((m.feed * dz) / len).toBeLessThanOrEqual(s.plungeMmPerMin * 1.01 + 1e-6); // 4-decimal rounding of short ramps
    }
  }
  // No lift inside a cut: every run of feeds (between traverses) goes down, then stays down.
  for (const run of feedRuns(ms)) {
    for (const m of run) if (m.to.z > m.from.z + EPS_MM) expect.fail(`a feed rises inside a cut at command ${m.at}`);
  }

  // Cutting length at each cut's final depth, and what the final depth leaves uncut.
  let finalDepthLengthMm = 0;
  let deepestMm = 0;
  for (const run of feedRuns(ms)) {
    const bottom = Math.min(...run.map((m) => m.to.z));
    deepestMm = Math.max(deepestMm, -bottom);
    for (const m of run) {
      if (Math.abs(m.from.z - bottom) < EPS_MM && Math.abs(m.to.z - bottom) < EPS_MM) finalDepthLengthMm += xyLength(m);
    }
  }
  const uncutMm = uncutAtFinalDepthMm(ms, job.paths);
  return { ms, finalDepthLengthMm, deepestMm, uncutMm };
}

describe('toNgc', () => {
  const s = resolveEngraveSettings('aluminium');
  const text = toNgc(SAMPLE_PLATE_JOB, s);

  it('is accepted by rs274 and meets the safety and geometry checks', () => {
    const { finalDepthLengthMm, deepestMm, uncutMm } = checkMillProgram(SAMPLE_PLATE_JOB, s, text);
    // Deepest cut = V-bit depth of the widest (0.5 mm) line: 0.25 mm for 90°.
    expectClose(deepestMm, vbitDepthMm(0.5, s.vbitAngleDeg), 0.001, 'deepest cut', ' mm');
    const inputMm = SAMPLE_PLATE_JOB.paths.reduce((sum, p) => sum + polylineLengthMm(p.points, p.closed), 0);
    // Every line cut at its final depth along its whole length (sampled every 0.05 mm);
    // the extra final-depth length is the run back over each ramp.
    console.log(`toNgc sample: final-depth length ${finalDepthLengthMm.toFixed(4)} mm vs geometry ${inputMm.toFixed(4)} mm, uncut ${uncutMm.toFixed(4)} mm`);
    expect(uncutMm).toBe(0);
    expect(finalDepthLengthMm).toBeGreaterThanOrEqual(inputMm - 1e-3);
    expect(finalDepthLengthMm).toBeLessThanOrEqual(inputMm * 1.1);
  });

  it('is byte-stable, ASCII only, with valid comments and no negative zero', () => {
    expect(toNgc(SAMPLE_PLATE_JOB, s)).toBe(text);
    expect(/^[\x20-\x7e\n]*$/.test(text)).toBe(true);
    expect(text).not.toMatch(/-0\.0+(?![0-9])/);
    for (const line of text.trimEnd().split('\n')) {
      if (line.startsWith('(')) expect(line).toMatch(/^\([^()]*\)$/);
      else expect(line).not.toMatch(/[()]/);
    }
    expect(text).toContain('(spec: latitude 51.5 deg N [invented])');
    expect(text.trimEnd().split('\n').slice(-5)).toEqual(['G0 Z10.000', 'G0 X0.000 Y150.000', 'M5', 'M2', '%']);
  });

  it('writes the whole expected program for one mark (golden text)', () => {
    // 90° bit, width 0.5 → 0.25 mm, aluminium step-down 0.15 → passes 0.125 and 0.25;
    // ramps at asin(100 / 400) = 14.48°: 0.125 mm of depth over 0.125 / tan 14.48° = 0.484 mm;
    // the last ramp is run back over at full depth before the final pass.
    const job: EngraveJob = {
      stock: { widthMm: 50, lengthMm: 40, thicknessMm: 3, material: 'aluminium' },
      title: ['one mark'],
      paths: [{ points: [[10, 5], [10, 35]], closed: false, widthMm: 0.5, operation: 'marks', label: 'hour 12' }],
    };
    expect(toNgc(job, s)).toBe(
      [
        '%',
        '(umbrafab engrave.ngc: engraving program, RS-274/NGC)',
        '(units: millimetres [G21], absolute coordinates [G90], XY plane [G17], feed in mm/min [G94])',
        '(work origin: X0 Y0 = lower-left corner of the plate [as in plate.dxf], Z0 = top of the stock)',
        '(stock: 50.000 x 40.000 x 3.000 mm, material aluminium)',
        '(CAUTION: dry-run this program above the stock and cut a test groove on scrap first)',
        '(CAUTION: clamp the stock, guard the machine, wear eye and hearing protection)',
        '(CAUTION: feeds and speeds are common-practice starting points, not tuned to your machine)',
        '(T1: V-bit 90 deg included angle, tip 0.000 mm, diameter 3.175 mm - load before start)',
        '(spindle 16000 rpm, feed 400 mm/min, plunge 100 mm/min, step-down at most 0.150 mm)',
        '(safe Z 10.000 mm, clearance Z 1.000 mm, entry Z 0.200 mm, ramp 14.5 deg into the cut, no plunges into the stock)',
        '(spindle start: dwell G4 P3 s to reach speed; no T M6 at the start: load the tool by hand; no coolant words)',
        '(end: park at X0 Y40 at safe Z)',
        '(1 cuts, deepest 0.250 mm [limit 1.500 mm], at most 2 passes)',
        '(estimated time: 14 s [14 s: cutting 9 s, plunges 0 s, rapids 1 s, dwells 3 s; ignores acceleration and tool changes, so the job takes longer])',
        '(rapid travel XY: 11.2 mm [input order 11.2 mm, lower bound 11.2 mm])',
        '(spec: one mark)',
        'G21 G90 G17 G94 G40 G49 G80 G54',
        'G0 Z10.000',
        'S16000 M3',
        'G4 P3',
        '(cut 1/1: marks hour 12, width 0.500 mm, depth 0.250 mm in 2 passes)',
        'G0 X10.000 Y5.000',
        'G0 Z1.000',
        'G0 Z0.200',
        'G1 Z0.000 F400',
        'G1 X10.000 Y5.484 Z-0.125',
        'G1 X10.000 Y35.000',
        'G1 X10.000 Y34.516 Z-0.250',
        'G1 X10.000 Y35.000',
        'G1 X10.000 Y5.000',
        'G0 Z1.000',
        'G0 Z10.000',
        'G0 X0.000 Y40.000',
        'M5',
        'M2',
        '%',
        '',
      ].join('\n'),
    );
  });

  it('keeps the input order when optimizeOrder is false, and still passes rs274', () => {
    const plain = toNgc(SAMPLE_PLATE_JOB, s, { optimizeOrder: false });
    const plan = planNgc(SAMPLE_PLATE_JOB, s, { optimizeOrder: false });
    expect(plan.toolpaths.cuts.map((c) => c.sourceIndex)).toEqual(SAMPLE_PLATE_JOB.paths.map((_, i) => i));
    checkMillProgram(SAMPLE_PLATE_JOB, s, plain);
  });

  it('writes other decimals on request', () => {
    expect(toNgc(SAMPLE_PLATE_JOB, s, { decimals: 4 })).toMatch(/^G1 X\d+\.\d{4} Y\d+\.\d{4} Z-0\.\d{4}$/m);
    expect(() => toNgc(SAMPLE_PLATE_JOB, s, { decimals: 1.5 })).toThrow(/decimals .*1\.5/);
  });

  it('passes the same checks on a busier job (60 strokes, 1–5 passes, loops, 60° bit)', () => {
    // Deterministic pseudo-random strokes (Park–Miller LCG), invented test data.
    let x = 12345;
    const r = (): number => (x = (x * 48271) % 2147483647) / 2147483647;
    const widths = [0.2, 0.35, 0.5, 0.7, 0.9];
    const paths = Array.from({ length: 60 }, (_, i) => {
      const cx = 20 + r() * 160;
      const cy = 20 + r() * 110;
      const n = 2 + Math.floor(r() * 5);
      const points = Array.from({ length: n }, (): readonly [number, number] => [cx + (r() - 0.5) * 30, cy + (r() - 0.5) * 30]);
      return { points, closed: i % 7 === 0 && n >= 3, widthMm: widths[i % widths.length], operation: 'text' as const, label: `stroke ${i}` };
    });
    const job: EngraveJob = { ...SAMPLE_PLATE_JOB, paths, stock: { ...SAMPLE_PLATE_JOB.stock, material: 'hardwood', thicknessMm: 6 } };
    const sh = resolveEngraveSettings('hardwood', { vbitAngleDeg: 60, stepDownMm: 0.2 });
    const prog = toNgc(job, sh);
    const { finalDepthLengthMm, deepestMm, uncutMm } = checkMillProgram(job, sh, prog);
    expectClose(deepestMm, vbitDepthMm(0.9, 60), 0.001, 'deepest cut', ' mm');
    const inputMm = paths.reduce((sum, p) => sum + polylineLengthMm(p.points, p.closed), 0);
    const relErr = (finalDepthLengthMm - inputMm) / inputMm;
    const t = planNgc(job, sh).toolpaths.rapidTravelMm;
    console.log(
      `toNgc busy job: final-depth length ${finalDepthLengthMm.toFixed(3)} vs ${inputMm.toFixed(3)} mm (extra ${relErr.toExponential(2)}, uncut ${uncutMm.toFixed(4)} mm); travel input ${t.inputOrder.toFixed(1)}, ordered ${t.ordered.toFixed(1)}, bound ${t.lowerBound.toFixed(1)} mm`,
    );
    expect(uncutMm).toBe(0);
    expect(relErr).toBeGreaterThanOrEqual(-1e-6);
    expect(t.ordered).toBeLessThanOrEqual(t.inputOrder);
    expect(t.ordered).toBeGreaterThanOrEqual(t.lowerBound);
  });

  it('cuts wide marks with a flat end mill after a tool change, accepted by rs274', () => {
    const sb = resolveEngraveSettings('brass', { flatEndMillMm: 1 });
    const prog = toNgc(SAMPLE_WIDE_MARK_JOB, sb);
    const { commands } = runRs274(prog, 'wide.ngc');
    const kinds = commands.map((c) => c.kind);
    expect(kinds).toContain('CHANGE_TOOL');
    const change = kinds.indexOf('CHANGE_TOOL');
    const ms = motions(commands);
    // Spindle stopped and at safe height at the tool change.
    const before = ms.filter((m) => m.at < change);
    expectClose(before[before.length - 1].to.z, sb.safeZMm, EPS_MM, 'Z at tool change', ' mm');
    // After the change: grooves at the flat depth, spread across the 2.4 mm width (centre ±0.7 mm for a 1 mm mill).
    const flatFeeds = ms.filter((m) => m.at > change && m.kind === 'STRAIGHT_FEED');
    expectClose(Math.min(...flatFeeds.map((m) => m.to.z)), -sb.flatDepthMm, 0.001, 'flat depth', ' mm');
    const xs = flatFeeds.filter((m) => m.to.x < 60).map((m) => m.to.x);
    expectClose(Math.min(...xs), 55 - 0.7, 0.001, 'west groove edge pass', ' mm');
    expectClose(Math.max(...xs), 55 + 0.7, 0.001, 'east pass of the west groove', ' mm');
    for (const m of flatFeeds) expect(m.spindle).toBe('cw');
  });
});

describe('toNgc machine options', () => {
  it('writes T1 M6, flood coolant on and off, a longer dwell and a chosen park position, accepted by rs274', () => {
    const so = resolveEngraveSettings('aluminium', { toolWords: true, coolant: 'flood', spindleDwellS: 5, parkXMm: 20, parkYMm: 30, safeZMm: 15 });
    const prog = toNgc(SAMPLE_PLATE_JOB, so);
    checkMillProgram(SAMPLE_PLATE_JOB, so, prog);
    const { commands } = runRs274(prog, 'options.ngc');
    const kinds = commands.map((c) => c.kind);
    expect(commands.find((c) => c.kind === 'CHANGE_TOOL')).toEqual({ kind: 'CHANGE_TOOL', tool: 1 });
    expect(kinds.indexOf('CHANGE_TOOL')).toBeLessThan(kinds.indexOf('START_SPINDLE_CLOCKWISE'));
    expect(prog).toMatch(/^G4 P5\nM8$/m);
    expect(prog).toMatch(/^G0 X20\.000 Y30\.000\nM9\nM5\nM2\n%$/m);
  });

  it('writes mist coolant as M7 and no tool words by default', () => {
    const prog = toNgc(SAMPLE_PLATE_JOB, resolveEngraveSettings('aluminium', { coolant: 'mist' }));
    expect(prog).toMatch(/^M7$/m);
    expect(prog).not.toMatch(/^T\d/m);
  });

  it('takes at most 1.05 x its cutting time on the sample plate (rs274 canonical output)', () => {
    const { commands } = runRs274(text0(), 'engrave.ngc');
    const t = canonTimes(commands, s0.rapidMmPerMin);
    console.log(`toNgc sample: ${t.totalS.toFixed(1)} s for ${t.cuttingS.toFixed(1)} s of cutting (${(t.totalS / t.cuttingS).toFixed(4)})`);
    expect(t.totalS).toBeLessThanOrEqual(1.05 * t.cuttingS);
    expectClose(t.totalS, planNgc(SAMPLE_PLATE_JOB, s0).estimate.totalS, 0.01 * t.totalS, 'estimate vs rs274 time', ' s');
  });
});

const s0 = resolveEngraveSettings('aluminium');
const text0 = (): string => toNgc(SAMPLE_PLATE_JOB, s0);

describe('rs274 helper', () => {
  it('throws with the interpreter message on a bad program', () => {
    // rs274 rejects G1 with zero feed ("Cannot do g1 with zero feed rate").
    expect(() => runRs274('G21\nG1 X1 F0\nM2\n')).toThrow(/zero feed rate/);
  });
});
