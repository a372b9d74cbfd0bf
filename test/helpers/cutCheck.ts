import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import type { SheetPart } from '@umbrafab/geometry';
import type { CanonMotion } from './rs274.ts';

/** One feed run of a cutting program measured by test/helpers/cut_check.py (shapely, Debian python3-shapely). */
export interface RunCheck {
  readonly part: string;
  readonly side: 'inside' | 'outside';
  readonly distMin: number | null;
  readonly distMax: number | null;
  readonly inPart: number;
  readonly area: number;
  readonly points: number;
}

/** Every feed run against the nominal parts at their origins: tool-centre distances from the edge cut, points inside a part. */
export function shapelyCheck(parts: readonly { part: SheetPart; originMm: readonly [number, number] }[], runs: readonly CanonMotion[][], finalZ: number): RunCheck[] {
  const script = fileURLToPath(new URL('./cut_check.py', import.meta.url));
  const move = (o: readonly [number, number]) => (p: readonly [number, number]) => [p[0] + o[0], p[1] + o[1]];
  const input = {
    finalZ,
    parts: parts.map(({ part, originMm }) => ({
      name: part.name,
      outer: part.outer.points.map(move(originMm)),
      inner: part.inner.map((f) => (f.kind === 'circle' ? { cx: f.cx + originMm[0], cy: f.cy + originMm[1], r: f.radiusMm } : f.points.map(move(originMm)))),
    })),
    // Every run without its last move (the lead-out into the waste, or out to a hole's centre).
    runs: runs.map((run) => [[run[0].from.x, run[0].from.y, run[0].from.z], ...run.slice(0, run.length > 1 ? -1 : undefined).map((m) => [m.to.x, m.to.y, m.to.z])]),
  };
  return JSON.parse(execFileSync('/usr/bin/python3', [script], { input: JSON.stringify(input), encoding: 'utf8', maxBuffer: 256 * 1024 * 1024 })) as RunCheck[];
}
