/**
 * The one error type for bad input anywhere in umbrafab.
 *
 * `field` is the dotted spec path (e.g. `site.latitude`), `value` the offending
 * value as given, `allowed` a short phrase of what would be accepted. The CLI
 * maps this error to exit code 1 and prints `message`.
 */
export class SpecError extends Error {
  readonly field: string;
  readonly value: unknown;
  readonly allowed: string;

  constructor(field: string, value: unknown, allowed: string, detail?: string) {
    const shown = formatValue(value);
    super(`${field}: ${detail ?? `got ${shown}`}; ${allowed}`);
    this.name = 'SpecError';
    this.field = field;
    this.value = value;
    this.allowed = allowed;
  }
}

/** Is this a SpecError (structural check, survives module duplication)? */
export function isSpecError(e: unknown): e is SpecError {
  return e instanceof Error && e.name === 'SpecError' && 'field' in e;
}

/** Render a value for an error message: strings quoted, objects as JSON, long values cut. */
export function formatValue(value: unknown): string {
  let s: string;
  if (typeof value === 'string') s = JSON.stringify(value);
  else if (value === undefined) s = 'nothing';
  else {
    try {
      s = JSON.stringify(value) ?? String(value);
    } catch {
      s = String(value);
    }
  }
  return s.length > 80 ? `${s.slice(0, 77)}...` : s;
}
