import { SpecError } from './errors.ts';

/** Throw a SpecError unless `value` is a finite number. Returns the value. */
export function assertFinite(field: string, value: unknown): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new SpecError(field, value, 'a finite number is required');
  }
  return value;
}

/** Throw a SpecError unless `value` is a finite number > 0. Returns the value. */
export function assertPositive(field: string, value: unknown): number {
  const v = assertFinite(field, value);
  if (!(v > 0)) throw new SpecError(field, value, 'a number greater than 0 is required');
  return v;
}

/** Throw a SpecError unless lo <= value <= hi. Returns the value. */
export function assertRange(field: string, value: unknown, lo: number, hi: number, unit = ''): number {
  const v = assertFinite(field, value);
  if (v < lo || v > hi) throw new SpecError(field, value, `allowed: ${lo}${unit} to ${hi}${unit}`);
  return v;
}

/** Degrees to radians. */
export const DEG = Math.PI / 180;
