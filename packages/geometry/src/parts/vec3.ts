import type { Vec3 } from './mesh.ts';

/** a − b */
export function sub3(a: Vec3, b: Vec3): Vec3 {
  return [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
}

/** a × b (right-handed) */
export function cross3(a: Vec3, b: Vec3): Vec3 {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

/** a · b */
export function dot3(a: Vec3, b: Vec3): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}

/** |a| */
export function length3(a: Vec3): number {
  return Math.hypot(a[0], a[1], a[2]);
}

/** a / |a|; throws on a zero vector. */
export function normalize3(a: Vec3): Vec3 {
  const len = length3(a);
  if (!(len > 0)) throw new Error(`normalize3: cannot normalise the zero vector [${a.join(', ')}]`);
  return [a[0] / len, a[1] / len, a[2] / len];
}
