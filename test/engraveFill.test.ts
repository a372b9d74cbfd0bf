import { execFileSync } from 'node:child_process';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { buildContext, buildFiles, readSpecFile } from '@umbrafab/cli';
import { parseSpec } from '@umbrafab/geometry';
import { motions, runRs274 } from './helpers/rs274.ts';

// Outside validators: rs274 (Debian linuxcnc-uspace) reads the laser program
// and gives its burn moves; shapely (Debian python3-shapely,
// test/helpers/laser_fill_check.py) measures the area those moves sweep at
// the beam width against the area of the drawn lines at their widths.

const ROOT = resolve(import.meta.dirname, '..');

type Json = Record<string, any>;

interface AreaCheck {
  readonly swept: number;
  readonly drawn: number;
  readonly sweptNotDrawn: number;
  readonly drawnNotSwept: number;
}

function areaCheck(input: Json): AreaCheck {
  const script = fileURLToPath(new URL('./helpers/laser_fill_check.py', import.meta.url));
  return JSON.parse(execFileSync('/usr/bin/python3', [script], { input: JSON.stringify(input), encoding: 'utf8', maxBuffer: 1 << 28 })) as AreaCheck;
}

/** The burn polylines of a laser program, from rs274's canonical moves (beam on = feed moves at S > 0). */
function burns(gcode: string): [number, number][][] {
  const ms = motions(runRs274(gcode, 'engrave-laser.gcode').commands);
  const out: [number, number][][] = [];
  let run: [number, number][] | null = null;
  for (const m of ms) {
    if (m.kind === 'STRAIGHT_FEED' && m.spindleSpeed > 0) {
      run ??= [[m.from.x, m.from.y]];
      run.push([m.to.x, m.to.y]);
    } else if (run) {
      out.push(run);
      run = null;
    }
  }
  if (run) out.push(run);
  return out;
}

const CASES = [
  { name: 'the demo (aluminium, 0.4-0.8 mm marks, 0.15 mm beam)', file: 'fixtures/demo.yaml', patch: {} },
  { name: 'laser, plywood, southern hemisphere, nodus with date lines (0.2 mm beam)', file: 'fixtures/specs/engrave-laser-south.yaml', patch: { engrave: { laserBeamMm: 0.2 } } },
] as const;

function merge(a: Json, b: Json): Json {
  const out: Json = { ...a };
  for (const [k, v] of Object.entries(b)) out[k] = v && typeof v === 'object' && !Array.isArray(v) && typeof a[k] === 'object' ? merge(a[k], v) : v;
  return out;
}

describe.each(CASES)('laser fill: $name', ({ file, patch }) => {
  const spec = parseSpec(merge(readSpecFile(join(ROOT, file)) as unknown as Json, patch));
  const built = buildFiles(spec);
  const { drawing } = buildContext(spec);

  it('burns every line as wide as drawn: swept area within 2 % of the lines\' area (shapely)', async () => {
    const b = await built;
    const gcode = new TextDecoder().decode(b.files.find((f) => f.name === 'engrave-laser.gcode')!.bytes);
    const report = (b.report as Json).engraving.laser;
    expect(report.mode).toBe('fill');
    const beam = spec.engrave.laserBeamMm;
    const strokes = [
      ...drawing.lines.map((l) => ({ points: l.path.points, closed: l.path.closed, width: l.widthMm, round: false })),
      ...drawing.text.flatMap((t) => t.strokes.map((s) => ({ points: s.points, closed: s.closed, width: t.strokeWidthMm, round: true }))),
    ];
    const a = areaCheck({
      beam,
      burns: burns(gcode),
      strokes,
      holes: drawing.holes.map((h) => ({ cx: h.cx, cy: h.cy, r: h.radiusMm })),
      slots: drawing.slots.map((s) => ({ x0: s.cx - s.widthMm / 2, y0: s.cy - s.heightMm / 2, x1: s.cx + s.widthMm / 2, y1: s.cy + s.heightMm / 2 })),
      ...(process.env.FILL_PNG ? { png: process.env.FILL_PNG, zoom: [40, 75, 95, 125] } : {}),
    });
    const err = (a.swept - a.drawn) / a.drawn;
    console.log(
      `${file}: swept ${a.swept.toFixed(2)} mm² vs drawn ${a.drawn.toFixed(2)} mm² (error ${(100 * err).toFixed(3)} %); burned outside the lines ${a.sweptNotDrawn.toFixed(3)} mm², lines left unburned ${a.drawnNotSwept.toFixed(3)} mm² (${(100 * a.drawnNotSwept / a.drawn).toFixed(3)} %); ${report.fill.rings} passes in ${report.fill.regions} regions, ${report.timeEstimateS.toFixed(0)} s`,
    );
    expect(Math.abs(err)).toBeLessThanOrEqual(0.02);
    // Both ways: little burned outside the lines, little of the lines left unburned.
    expect(a.sweptNotDrawn / a.drawn).toBeLessThanOrEqual(0.02);
    expect(a.drawnNotSwept / a.drawn).toBeLessThanOrEqual(0.02);
    // The program's own filled area is the union shapely finds (strokes less through-cuts), within 0.5 %.
    expect(Math.abs(report.fill.filledAreaMm2 - a.drawn) / a.drawn).toBeLessThanOrEqual(0.005);
  });

  it('stays a GRBL laser program: M4, S0 on every travel, no Z', async () => {
    const b = await built;
    const gcode = new TextDecoder().decode(b.files.find((f) => f.name === 'engrave-laser.gcode')!.bytes);
    expect(gcode.split('\n').map((l) => l.replace(/\([^)]*\)/g, '')).some((l) => /z/i.test(l))).toBe(false);
    const ms = motions(runRs274(gcode, 'engrave-laser.gcode').commands);
    for (const m of ms) {
      if (m.kind === 'STRAIGHT_TRAVERSE') expect(m.spindle === 'off' || m.spindleSpeed === 0).toBe(true);
      else expect(m.spindle).toBe('ccw');
    }
  });
});

describe('laser scoring stays an option', () => {
  it('engrave.laserFill: score traces every line once along its centre', async () => {
    const spec = parseSpec(merge(readSpecFile(join(ROOT, 'fixtures/demo.yaml')) as unknown as Json, { engrave: { laserFill: 'score' } }));
    const b = await buildFiles(spec);
    const report = (b.report as Json).engraving.laser;
    expect(report.mode).toBe('score');
    expect(report.fill).toBeUndefined();
    const { drawing } = buildContext(spec);
    const drawnMm = [...drawing.lines.map((l) => l.path), ...drawing.text.flatMap((t) => t.strokes)].reduce((s, p) => {
      let len = 0;
      for (let i = 1; i < p.points.length; i += 1) len += Math.hypot(p.points[i][0] - p.points[i - 1][0], p.points[i][1] - p.points[i - 1][1]);
      return s + len;
    }, 0);
    // Scoring burns at most the drawn length (less what crosses holes and slots).
    expect(report.cuttingLengthMm).toBeLessThanOrEqual(drawnMm + 1e-6);
    expect(report.cuttingLengthMm).toBeGreaterThan(0.95 * drawnMm);
  });
});
