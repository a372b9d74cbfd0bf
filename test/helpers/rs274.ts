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
        out.push({ kind: name });
        break;
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
}

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
