import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/**
 * Run Debian's standalone RS274NGC interpreter (`rs274`, package
 * linuxcnc-uspace) on a program and parse its canonical machine commands.
 *
 * `rs274 -g file` prints one canonical command per line, e.g.
 *     "   17 N..... STRAIGHT_TRAVERSE(0.0000, 0.0000, 5.0000, 0.0000, 0.0000, 0.0000)"
 * (sequence number, N word or "N.....", command(arguments); coordinates are
 * X, Y, Z, A, B, C with 4 decimals), exits 0 on success and 1 on an error, with
 * the message and the offending block on stderr. It must be given a file:
 * from stdin it exits 0 even on errors. It may write ~/.rs274, so it runs with
 * HOME and the working directory in a fresh temporary folder.
 */

export type CanonCommand =
  | { readonly kind: 'STRAIGHT_TRAVERSE' | 'STRAIGHT_FEED'; readonly x: number; readonly y: number; readonly z: number }
  | { readonly kind: 'SET_FEED_RATE'; readonly feed: number }
  | { readonly kind: 'SET_SPINDLE_SPEED'; readonly speed: number }
  | { readonly kind: 'START_SPINDLE_CLOCKWISE' | 'START_SPINDLE_COUNTERCLOCKWISE' | 'STOP_SPINDLE_TURNING' }
  | { readonly kind: 'COMMENT' | 'MESSAGE'; readonly text: string }
  | { readonly kind: 'CHANGE_TOOL' | 'SELECT_TOOL'; readonly tool: number }
  | { readonly kind: 'PROGRAM_END' }
  | { readonly kind: 'DWELL'; readonly seconds: number }
  | { readonly kind: 'FLOOD_ON' | 'FLOOD_OFF' | 'MIST_ON' | 'MIST_OFF' }
  /** XY-plane arc or helix: end (x, y), centre (cx, cy), rotation (−1 cw, +1 ccw; |rotation| > 1 adds full turns), end z. */
  | { readonly kind: 'ARC_FEED'; readonly x: number; readonly y: number; readonly cx: number; readonly cy: number; readonly rotation: number; readonly z: number }
  /** Anything else, kept verbatim. */
  | { readonly kind: 'OTHER'; readonly name: string; readonly args: string };

export interface Rs274Result {
  readonly commands: readonly CanonCommand[];
  /** The raw canonical text. */
  readonly stdout: string;
}

const LINE = /^\s*\d+\s+N\S*\s+([A-Z_0-9]+)\((.*)\)\s*$/;

/** Parse `rs274 -g` canonical output. */
export function parseCanon(stdout: string): CanonCommand[] {
  const out: CanonCommand[] = [];
  for (const line of stdout.split('\n')) {
    const m = LINE.exec(line);
    if (!m) continue;
    const [, name, args] = m;
    const nums = (): number[] => args.split(/[,\s]+/).filter(Boolean).map(Number);
    switch (name) {
      case 'STRAIGHT_TRAVERSE':
      case 'STRAIGHT_FEED': {
        const [x, y, z] = nums();
        out.push({ kind: name, x, y, z });
        break;
      }
      case 'SET_FEED_RATE':
        out.push({ kind: name, feed: nums()[0] });
        break;
      case 'SET_SPINDLE_SPEED':
        out.push({ kind: name, speed: nums()[1] }); // (spindle number, speed)
        break;
      case 'START_SPINDLE_CLOCKWISE':
      case 'START_SPINDLE_COUNTERCLOCKWISE':
      case 'STOP_SPINDLE_TURNING':
      case 'PROGRAM_END':
      case 'FLOOD_ON':
      case 'FLOOD_OFF':
      case 'MIST_ON':
      case 'MIST_OFF':
        out.push({ kind: name });
        break;
      case 'DWELL':
        out.push({ kind: name, seconds: nums()[0] });
        break;
      case 'ARC_FEED': {
        const [x, y, cx, cy, rotation, z] = nums();
        out.push({ kind: name, x, y, cx, cy, rotation, z });
        break;
      }
      case 'COMMENT':
      case 'MESSAGE':
        out.push({ kind: name, text: args.replace(/^"|"$/g, '') });
        break;
      case 'CHANGE_TOOL':
      case 'SELECT_TOOL':
        out.push({ kind: name, tool: nums()[0] });
        break;
      default:
        out.push({ kind: 'OTHER', name, args });
    }
  }
  return out;
}

/**
 * Write `program` to a temporary file, run `rs274 -g` on it and parse the
 * output. Throws with rs274's stderr when it exits non-zero.
 */
export function runRs274(program: string, fileName = 'program.ngc'): Rs274Result {
  const dir = mkdtempSync(join(tmpdir(), 'umbrafab-rs274-'));
  try {
    const file = join(dir, fileName);
    writeFileSync(file, program, 'utf8');
    let stdout: string;
    try {
      stdout = execFileSync('rs274', ['-g', file], {
        cwd: dir,
        env: { ...process.env, HOME: dir },
        encoding: 'utf8',
        stdio: ['ignore', 'pipe', 'pipe'],
        maxBuffer: 64 * 1024 * 1024,
      });
    } catch (err) {
      const e = err as { status?: number; stderr?: string; message: string };
      throw new Error(`rs274 -g ${fileName} failed (exit ${e.status ?? '?'}): ${e.stderr?.trim() || e.message}`);
    }
    return { commands: parseCanon(stdout), stdout };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** A motion with the spindle state at that moment. */
export interface CanonMotion {
  readonly kind: 'STRAIGHT_TRAVERSE' | 'STRAIGHT_FEED';
  readonly from: { readonly x: number; readonly y: number; readonly z: number };
  readonly to: { readonly x: number; readonly y: number; readonly z: number };
  readonly feed: number;
  readonly spindle: 'cw' | 'ccw' | 'off';
  readonly spindleSpeed: number;
  /** Index in the command list. */
  readonly at: number;
  /** Set on the straight pieces an ARC_FEED is split into (ARC_STEPS per turn). */
  readonly arc?: true;
}

/** Straight pieces per full turn when an arc is followed (chord error r·(1 − cos(π/720)) < 1e-5·r). */
const ARC_STEPS = 720;

/** Follow the commands and list the motions with the modal state (start X0 Y0 Z0, as rs274 does). */
export function motions(commands: readonly CanonCommand[]): CanonMotion[] {
  let pos = { x: 0, y: 0, z: 0 };
  let feed = 0;
  let spindle: CanonMotion['spindle'] = 'off';
  let spindleSpeed = 0;
  const out: CanonMotion[] = [];
  commands.forEach((c, at) => {
    switch (c.kind) {
      case 'STRAIGHT_TRAVERSE':
      case 'STRAIGHT_FEED': {
        const to = { x: c.x, y: c.y, z: c.z };
        out.push({ kind: c.kind, from: pos, to, feed, spindle, spindleSpeed, at });
        pos = to;
        break;
      }
      case 'ARC_FEED': {
        const a0 = Math.atan2(pos.y - c.cy, pos.x - c.cx);
        const a1 = Math.atan2(c.y - c.cy, c.x - c.cx);
        const r = Math.hypot(pos.x - c.cx, pos.y - c.cy);
        const turns = Math.abs(c.rotation) - 1;
        let sweep = c.rotation < 0 ? a0 - a1 : a1 - a0;
        while (sweep <= 1e-9) sweep += 2 * Math.PI;
        sweep += 2 * Math.PI * turns;
        const n = Math.max(1, Math.ceil((sweep / (2 * Math.PI)) * ARC_STEPS));
        const sign = c.rotation < 0 ? -1 : 1;
        const z0 = pos.z;
        for (let k = 1; k <= n; k += 1) {
          const a = a0 + (sign * sweep * k) / n;
          const to = k === n ? { x: c.x, y: c.y, z: c.z } : { x: c.cx + r * Math.cos(a), y: c.cy + r * Math.sin(a), z: z0 + ((c.z - z0) * k) / n };
          out.push({ kind: 'STRAIGHT_FEED', from: pos, to, feed, spindle, spindleSpeed, at, arc: true });
          pos = to;
        }
        break;
      }
      case 'SET_FEED_RATE':
        feed = c.feed;
        break;
      case 'SET_SPINDLE_SPEED':
        spindleSpeed = c.speed;
        break;
      case 'START_SPINDLE_CLOCKWISE':
        spindle = 'cw';
        break;
      case 'START_SPINDLE_COUNTERCLOCKWISE':
        spindle = 'ccw';
        break;
      case 'STOP_SPINDLE_TURNING':
        spindle = 'off';
        break;
      default:
        break;
    }
  });
  return out;
}

/** XY length of one motion, mm. */
export const xyLength = (m: CanonMotion): number => Math.hypot(m.to.x - m.from.x, m.to.y - m.from.y);

/** Runs of consecutive feed moves, split by traverses. */
export function feedRuns(ms: readonly CanonMotion[]): CanonMotion[][] {
  const runs: CanonMotion[][] = [];
  let run: CanonMotion[] = [];
  for (const m of ms) {
    if (m.kind === 'STRAIGHT_FEED') run.push(m);
    else if (run.length > 0) {
      runs.push(run);
      run = [];
    }
  }
  if (run.length > 0) runs.push(run);
  return runs;
}

/** Time of a program from its canonical commands, s: feeds at their F over the XYZ length, traverses at `rapidMmPerMin`, dwells. */
export function canonTimes(commands: readonly CanonCommand[], rapidMmPerMin: number): { totalS: number; cuttingS: number; plungeS: number; rapidS: number; dwellS: number } {
  const t = { totalS: 0, cuttingS: 0, plungeS: 0, rapidS: 0, dwellS: 0 };
  for (const m of motions(commands)) {
    const len = Math.hypot(m.to.x - m.from.x, m.to.y - m.from.y, m.to.z - m.from.z);
    if (m.kind === 'STRAIGHT_TRAVERSE') t.rapidS += (60 * len) / rapidMmPerMin;
    else if (xyLength(m) > 0) t.cuttingS += (60 * len) / m.feed;
    else t.plungeS += (60 * len) / m.feed;
  }
  for (const c of commands) if (c.kind === 'DWELL') t.dwellS += c.seconds;
  t.totalS = t.cuttingS + t.plungeS + t.rapidS + t.dwellS;
  return t;
}

/** The machine settings a milling program's start and end follow. */
export interface MillStartEnd {
  readonly safeZMm: number;
  readonly spindleRpm: number;
  readonly spindleDwellS: number;
  readonly park: readonly [number, number];
  readonly coolant?: 'off' | 'mist' | 'flood';
}

/**
 * The start and end every milling program must have (common practice for
 * RS-274/NGC jobs; read from rs274's canonical commands): '%' on the first and
 * last lines; the first motion straight up to the safe height; M3 at the
 * spindle speed followed at once by a dwell (G4) of spindleDwellS (and the
 * coolant when asked) before any feed; every feed with the spindle on; the
 * last two motions up to safe height and the park move at safe height; then
 * coolant off, spindle off and program end.
 */
export function checkMillStartEnd(text: string, commands: readonly CanonCommand[], m: MillStartEnd, expect: (cond: boolean, what: string) => void): void {
  const lines = text.trimEnd().split('\n');
  expect(lines[0] === '%' && lines[lines.length - 1] === '%', "'%' on the first and last lines");
  const ms = motions(commands);
  expect(ms[0].kind === 'STRAIGHT_TRAVERSE' && Math.abs(ms[0].to.z - m.safeZMm) < 1e-4 && ms[0].to.x === ms[0].from.x && ms[0].to.y === ms[0].from.y, 'first motion straight up to safe Z');
  const on = commands.findIndex((c) => c.kind === 'START_SPINDLE_CLOCKWISE');
  const firstFeed = ms.find((k) => k.kind === 'STRAIGHT_FEED');
  expect(on >= 0 && firstFeed !== undefined && on < firstFeed.at, 'M3 before the first feed');
  const next = commands[on + 1];
  expect(next?.kind === 'DWELL' && Math.abs(next.seconds - m.spindleDwellS) < 1e-9, `G4 P${m.spindleDwellS} right after M3`);
  if (m.coolant && m.coolant !== 'off') {
    expect(commands[on + 2]?.kind === (m.coolant === 'mist' ? 'MIST_ON' : 'FLOOD_ON'), 'coolant on after the dwell');
  }
  for (const f of ms.filter((k) => k.kind === 'STRAIGHT_FEED')) {
    if (f.spindle !== 'cw') {
      expect(false, `feed at command ${f.at} with the spindle ${f.spindle}`);
      break;
    }
  }
  const last = ms[ms.length - 1];
  const before = ms[ms.length - 2];
  expect(before.kind === 'STRAIGHT_TRAVERSE' && Math.abs(before.to.z - m.safeZMm) < 1e-4 && before.to.x === before.from.x && before.to.y === before.from.y, 'up to safe Z before the park move');
  expect(
    last.kind === 'STRAIGHT_TRAVERSE' && Math.abs(last.to.z - m.safeZMm) < 1e-4 && Math.abs(last.to.x - m.park[0]) < 1e-3 && Math.abs(last.to.y - m.park[1]) < 1e-3,
    `park at X${m.park[0]} Y${m.park[1]} at safe Z last`,
  );
  const after = commands.slice(last.at + 1).map((c) => c.kind);
  const spindleStop = after.indexOf('STOP_SPINDLE_TURNING');
  expect(spindleStop >= 0 && after.includes('PROGRAM_END'), 'M5 and M2 after the park move');
  if (m.coolant && m.coolant !== 'off') expect(after.slice(0, spindleStop).some((k) => k === 'MIST_OFF' || k === 'FLOOD_OFF'), 'M9 before M5');
}

/**
 * Of the given polylines, the length (mm, by sampling every `stepMm`) that no
 * feed move at the bottom of its run passes within `tolMm` of: what a program
 * leaves uncut at the final depth. Each run of feeds (between traverses) is
 * one cut; its deepest Z is its final depth.
 */
export function uncutAtFinalDepthMm(ms: readonly CanonMotion[], lines: readonly { readonly points: readonly (readonly [number, number])[]; readonly closed: boolean }[], stepMm = 0.05, tolMm = 2e-3): number {
  const CELL = 1;
  const grid = new Map<string, [number, number, number, number][]>();
  for (const run of feedRuns(ms)) {
    const bottom = Math.min(...run.map((m) => m.to.z));
    for (const m of run) {
      if (Math.abs(m.from.z - bottom) > 1e-4 || Math.abs(m.to.z - bottom) > 1e-4) continue;
      const seg: [number, number, number, number] = [m.from.x, m.from.y, m.to.x, m.to.y];
      const x0 = Math.floor((Math.min(m.from.x, m.to.x) - tolMm) / CELL);
      const x1 = Math.floor((Math.max(m.from.x, m.to.x) + tolMm) / CELL);
      const y0 = Math.floor((Math.min(m.from.y, m.to.y) - tolMm) / CELL);
      const y1 = Math.floor((Math.max(m.from.y, m.to.y) + tolMm) / CELL);
      for (let i = x0; i <= x1; i += 1) for (let j = y0; j <= y1; j += 1) {
        const key = `${i},${j}`;
        const list = grid.get(key);
        if (list) list.push(seg);
        else grid.set(key, [seg]);
      }
    }
  }
  const near = (x: number, y: number): boolean => {
    for (const [ax, ay, bx, by] of grid.get(`${Math.floor(x / CELL)},${Math.floor(y / CELL)}`) ?? []) {
      const dx = bx - ax;
      const dy = by - ay;
      const l2 = dx * dx + dy * dy;
      const t = l2 === 0 ? 0 : Math.max(0, Math.min(1, ((x - ax) * dx + (y - ay) * dy) / l2));
      if (Math.hypot(x - ax - t * dx, y - ay - t * dy) <= tolMm) return true;
    }
    return false;
  };
  let uncut = 0;
  for (const line of lines) {
    const pts = line.closed ? [...line.points, line.points[0]] : line.points;
    for (let i = 1; i < pts.length; i += 1) {
      const [a, b] = [pts[i - 1], pts[i]];
      const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
      const n = Math.max(1, Math.ceil(len / stepMm));
      for (let k = 0; k <= n; k += 1) {
        const t = k / n;
        if (!near(a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t)) uncut += len / n;
      }
    }
  }
  return uncut;
}
