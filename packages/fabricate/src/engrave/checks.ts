/**
 * Guard helpers for the engraving writers. Each throws an Error that names the
 * field, quotes the value and says what is allowed.
 */

/** Quote a value for an error message (numbers as written, others as JSON). */
export function quote(value: unknown): string {
  if (typeof value === 'number') return String(value);
  try {
    return JSON.stringify(value) ?? String(value);
  } catch {
    return String(value);
  }
}

/** Throw unless `value` is a finite number. */
export function assertFinite(value: unknown, field: string): asserts value is number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new Error(`${field} must be a finite number, got ${quote(value)}`);
  }
}

/** Throw unless `value` is a finite number > 0. */
export function assertPositive(value: unknown, field: string, unit = ''): asserts value is number {
  assertFinite(value, field);
  if (!(value > 0)) throw new Error(`${field} must be > 0${unit ? ` ${unit}` : ''}, got ${quote(value)}`);
}

/** Throw unless `value` is a finite number >= 0. */
export function assertNonNegative(value: unknown, field: string, unit = ''): asserts value is number {
  assertFinite(value, field);
  if (!(value >= 0)) throw new Error(`${field} must be >= 0${unit ? ` ${unit}` : ''}, got ${quote(value)}`);
}

/** Throw unless lo < value <= hi (or lo <= value when `loInclusive`). */
export function assertInRange(
  value: unknown,
  field: string,
  lo: number,
  hi: number,
  { loInclusive = false, hiInclusive = true, unit = '' }: { loInclusive?: boolean; hiInclusive?: boolean; unit?: string } = {},
): asserts value is number {
  assertFinite(value, field);
  const okLo = loInclusive ? value >= lo : value > lo;
  const okHi = hiInclusive ? value <= hi : value < hi;
  if (!okLo || !okHi) {
    const range = `${loInclusive ? '[' : '('}${lo}, ${hi}${hiInclusive ? ']' : ')'}`;
    throw new Error(`${field} must be in ${range}${unit ? ` ${unit}` : ''}, got ${quote(value)}`);
  }
}
