import type { Vec2 } from './mesh.ts';

/** Remove repeated points and corners lying on the straight line through their neighbours. */
export function dropCollinear(ring: readonly Vec2[]): Vec2[] {
  let pts = ring.filter((p, k) => {
    const q = ring[(k + 1) % ring.length];
    return p[0] !== q[0] || p[1] !== q[1];
  });
  let changed = true;
  while (changed) {
    changed = false;
    const keep = pts.filter((p, k) => {
      const a = pts[(k - 1 + pts.length) % pts.length];
      const b = pts[(k + 1) % pts.length];
      return (p[0] - a[0]) * (b[1] - a[1]) - (p[1] - a[1]) * (b[0] - a[0]) !== 0;
    });
    if (keep.length !== pts.length) {
      pts = keep;
      changed = true;
    }
  }
  return pts;
}

/** Signed area of a ring, mm² (shoelace formula), positive when CCW. */
export function shoelaceArea(ring: readonly Vec2[]): number {
  let s = 0;
  for (let k = 0; k < ring.length; k++) {
    const a = ring[k];
    const b = ring[(k + 1) % ring.length];
    s += a[0] * b[1] - b[0] * a[1];
  }
  return s / 2;
}
