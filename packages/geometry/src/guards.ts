import { SpecError } from './errors.ts';

/**
 * The one set of input guards (geometry, part builders, engraving writers).
 * Each takes the dotted field name first, then the value, and throws a
 * SpecError naming the field, quoting the value and saying what is allowed
 * (the CLI turns it into exit 1). Each returns the value, so a guard can
 * stand where the value is used.
 */

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

/** Throw a SpecError unless `value` is a finite number >= 0. Returns the value. */
export function assertNonNegative(field: string, value: unknown): number {
  const v = assertFinite(field, value);
  if (!(v >= 0)) throw new SpecError(field, value, 'a number 0 or greater is required');
  return v;
}

/**
 * Throw a SpecError unless lo <= value <= hi. Returns the value.
 * `open` leaves an end out: 'lo' (lo < value <= hi), 'hi' (lo <= value < hi)
 * or 'both' (lo < value < hi); default 'none' (both ends allowed).
 * @example assertRange('site.latitude', 50, -90, 90, '°') // 50
 */
export function assertRange(field: string, value: unknown, lo: number, hi: number, unit = '', open: 'none' | 'lo' | 'hi' | 'both' = 'none'): number {
  const v = assertFinite(field, value);
  const loOpen = open === 'lo' || open === 'both';
  const hiOpen = open === 'hi' || open === 'both';
  if ((loOpen ? v <= lo : v < lo) || (hiOpen ? v >= hi : v > hi)) {
    const lower = loOpen ? `more than ${lo}${unit}` : `${lo}${unit}`;
    const allowed = { none: `${lower} to ${hi}${unit}`, lo: `${lower}, up to ${hi}${unit}`, hi: `${lower} or more, less than ${hi}${unit}`, both: `${lower} and less than ${hi}${unit}` }[open];
    throw new SpecError(field, value, `allowed: ${allowed}`);
  }
  return v;
}

/** Throw a SpecError unless `value` is a whole number from min to max. Returns the value. */
export function assertInteger(field: string, value: unknown, min: number, max: number): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < min || value > max) {
    throw new SpecError(field, value, `allowed: a whole number from ${min} to ${max}`);
  }
  return value;
}

/** Degrees to radians. */
export const DEG = Math.PI / 180;
