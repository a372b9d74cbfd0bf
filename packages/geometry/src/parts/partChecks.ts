/**
 * Input guards for the part builders: each throws an Error that names the
 * field, quotes the value and says what is allowed.
 */

export function assertFiniteNumber(field: string, value: unknown): asserts value is number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new Error(`${field} = ${String(value)} is not allowed: it must be a finite number`);
  }
}

export function assertPositive(field: string, value: unknown, unit = 'mm'): asserts value is number {
  assertFiniteNumber(field, value);
  if (!(value > 0)) throw new Error(`${field} = ${value} ${unit} is not allowed: it must be greater than 0`);
}

export function assertNonNegative(field: string, value: unknown, unit = 'mm'): asserts value is number {
  assertFiniteNumber(field, value);
  if (!(value >= 0)) throw new Error(`${field} = ${value} ${unit} is not allowed: it must be 0 or more`);
}

export function assertInteger(field: string, value: unknown, min: number, max: number): asserts value is number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < min || value > max) {
    throw new Error(`${field} = ${String(value)} is not allowed: it must be an integer from ${min} to ${max}`);
  }
}
