import type { Vec2 } from '../types.ts';

/**
 * A closed polyline's points without consecutive (and closing) repeats, within 1e-9 mm.
 * @example dropRepeats([[0, 0], [0, 0], [1, 0], [0, 0]]) // [[0, 0], [1, 0]]
 */
export function dropRepeats(pts: readonly Vec2[]): Vec2[] {
  const out: Vec2[] = [];
  for (const p of pts) {
    const q = out[out.length - 1];
    if (!q || Math.hypot(p[0] - q[0], p[1] - q[1]) > 1e-9) out.push(p);
  }
  while (out.length > 1 && Math.hypot(out[0][0] - out[out.length - 1][0], out[0][1] - out[out.length - 1][1]) <= 1e-9) out.pop();
  return out;
}
