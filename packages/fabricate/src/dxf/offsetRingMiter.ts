import type { Vec2 } from '@umbrafab/geometry';

/**
 * Offset a simple counter-clockwise polygon outward by `distanceMm` (inward
 * for a negative distance) with mitred corners: every edge moves along its
 * outward normal and neighbouring edges meet again at a sharp corner, so a
 * cutter following the result leaves the nominal polygon with sharp corners
 * (kerf compensation, docs/design.md §5). For unit outward normals n1, n2 of the
 * edges meeting at p, the corner moves to p + d · (n1 + n2) / (1 + n1 · n2)
 * (the intersection of the two offset lines; common practice). Corners where
 * the outline folds back (n1 · n2 = −1) are refused.
 *
 * @example offsetRingMiter([[0, 0], [10, 0], [10, 5], [0, 5]], 0.5) // [[-0.5, -0.5], [10.5, -0.5], …]
 */
export function offsetRingMiter(ring: readonly Vec2[], distanceMm: number): Vec2[] {
  const n = ring.length;
  if (n < 3) throw new Error(`offsetRingMiter: ring has ${n} corners; a polygon needs at least 3`);
  const normal = (a: Vec2, b: Vec2): Vec2 => {
    const dx = b[0] - a[0];
    const dy = b[1] - a[1];
    const len = Math.hypot(dx, dy);
    if (!(len > 0)) throw new Error(`offsetRingMiter: repeated corner at [${a.join(', ')}]`);
    // Outward normal of a CCW edge: its right-hand side.
    return [dy / len, -dx / len];
  };
  return ring.map((p, i) => {
    const n1 = normal(ring[(i - 1 + n) % n], p);
    const n2 = normal(p, ring[(i + 1) % n]);
    const c = 1 + n1[0] * n2[0] + n1[1] * n2[1];
    if (!(c > 1e-9)) throw new Error(`offsetRingMiter: the outline folds back at corner ${i} [${p.join(', ')}]`);
    return [p[0] + (distanceMm * (n1[0] + n2[0])) / c, p[1] + (distanceMm * (n1[1] + n2[1])) / c] as Vec2;
  });
}
