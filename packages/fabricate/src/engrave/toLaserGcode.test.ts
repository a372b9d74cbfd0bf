import { describe, expect, it } from 'vitest';
import { motions, runRs274, type CanonMotion } from '../../../../test/helpers/rs274.ts';
import type { Vec2 } from './engraveInput.ts';
import { resolveEngraveSettings } from './materialPresets.ts';
import { SAMPLE_PLATE_JOB } from './sampleEngraveJobs.ts';
import { planLaser, toLaserGcode } from './toLaserGcode.ts';

// Outside validator: Debian's linuxcnc-uspace `rs274 -g` (docs/design.md §7). The
// laser dialect uses only words RS274NGC also knows (M4 + S as the spindle),
// so the same interpreter checks it.

const EPS_MM = 1e-3;

const samePoints = (a: readonly Vec2[], b: readonly Vec2[]): boolean =>
  a.length === b.length && a.every((p, i) => Math.abs(p[0] - b[i][0]) < EPS_MM && Math.abs(p[1] - b[i][1]) < EPS_MM);

describe('toLaserGcode', () => {
  const s = resolveEngraveSettings('acrylic');
  const text = toLaserGcode(SAMPLE_PLATE_JOB, s);
  const { commands } = runRs274(text, 'engrave-laser.gcode');
  const ms = motions(commands);

  it('has no Z words at all, and the safe end S0, park, M5 M2', () => {
    const code = text.split('\n').map((line) => line.replace(/\([^)]*\)/g, ''));
    expect(code.some((line) => /z/i.test(line))).toBe(false);
    expect(ms.every((m) => m.to.z === 0)).toBe(true);
    expect(text.trimEnd().split('\n').slice(-4)).toEqual(['S0', `G0 X0.000 Y${SAMPLE_PLATE_JOB.stock.lengthMm.toFixed(3)}`, 'M5', 'M2']);
    expect(commands.some((c) => c.kind === 'PROGRAM_END')).toBe(true);
  });

  it('keeps the beam off during every travel and on during every burn', () => {
    const travels = ms.filter((m) => m.kind === 'STRAIGHT_TRAVERSE');
    expect(travels.length).toBe(SAMPLE_PLATE_JOB.paths.length + 1); // one per stroke and the park move
    for (const m of travels) expect(m.spindle === 'off' || m.spindleSpeed === 0).toBe(true);
    // acrylic preset: 30 % of S1000 → S300, dynamic (M4 = counter-clockwise in RS274 terms).
    for (const m of ms.filter((k) => k.kind === 'STRAIGHT_FEED')) {
      expect(m.spindle).toBe('ccw');
      expect(m.spindleSpeed).toBe(300);
      expect(m.feed).toBe(s.laserSpeedMmPerMin);
    }
    expect(planLaser(SAMPLE_PLATE_JOB, s).powerS).toBe(300);
  });

  it('traces every path exactly once', () => {
    const runs: CanonMotion[][] = [];
    for (const m of ms) {
      if (m.kind === 'STRAIGHT_TRAVERSE') runs.push([]);
      else runs[runs.length - 1].push(m);
    }
    const traced = runs.filter((run) => run.length > 0).map((run): Vec2[] => [[run[0].from.x, run[0].from.y], ...run.map((m): Vec2 => [m.to.x, m.to.y])]);
    const hits = SAMPLE_PLATE_JOB.paths.map(() => 0);
    for (const t of traced) {
      const matches = SAMPLE_PLATE_JOB.paths
        .map((p, i) => {
          const loop = p.closed ? [...p.points, p.points[0]] : p.points;
          return samePoints(t, loop) || samePoints(t, [...loop].reverse()) ? i : -1;
        })
        .filter((i) => i >= 0);
      expect(matches.length).toBe(1);
      hits[matches[0]] += 1;
    }
    expect(hits).toEqual(SAMPLE_PLATE_JOB.paths.map(() => 1));
  });

  it('is byte-stable and ASCII only', () => {
    expect(toLaserGcode(SAMPLE_PLATE_JOB, s)).toBe(text);
    expect(/^[\x20-\x7e\n]*$/.test(text)).toBe(true);
  });

  it('writes laserMaxS and power overrides into the S words', () => {
    const t = toLaserGcode(SAMPLE_PLATE_JOB, resolveEngraveSettings('acrylic', { laserMaxS: 255, laserPowerPct: 50 }));
    expect(t).toContain('\nS127.5\n');
    runRs274(t, 'laser-255.gcode');
  });
});
