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
  /** every problem found, when more than one (the message lists them, up to a cap); this error is the first */
  problems?: readonly { readonly field: string; readonly message: string }[];

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

/** Most problems one message lists; the rest are counted. */
export const MAX_PROBLEMS_LISTED = 12;

/**
 * One SpecError for several problems: the first one's field, value and
 * allowed text, and a message listing each problem on its own line (up to
 * MAX_PROBLEMS_LISTED, then a count of the rest).
 */
export function combineSpecErrors(errors: readonly SpecError[]): SpecError {
  if (errors.length === 1) return errors[0];
  const first = errors[0];
  const e = new SpecError(first.field, first.value, first.allowed);
  const shown = errors.slice(0, MAX_PROBLEMS_LISTED);
  const rest = errors.length - shown.length;
  e.message = [`${errors.length} problems in the spec:`, ...shown.map((p) => `  ${p.message}`), ...(rest > 0 ? [`  … and ${rest} more`] : [])].join('\n');
  e.problems = errors.map((p) => ({ field: p.field, message: p.message }));
  return e;
}

/** Render a value for an error message: strings quoted, objects as JSON, NaN and infinities by name, long values cut. */
export function formatValue(value: unknown): string {
  let s: string;
  if (typeof value === 'string') s = JSON.stringify(value);
  else if (value === undefined) s = 'nothing';
  else if (value === null) s = 'an empty value';
  else if (typeof value === 'number' && Number.isNaN(value)) s = 'NaN (not a number)';
  else if (value === Infinity) s = 'Infinity (not a finite number)';
  else if (value === -Infinity) s = '-Infinity (not a finite number)';
  else {
    try {
      s = JSON.stringify(value) ?? String(value);
    } catch {
      s = String(value);
    }
  }
  return s.length > 80 ? `${s.slice(0, 77)}...` : s;
}
