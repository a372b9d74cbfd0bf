import { derivedDefault } from '@umbrafab/geometry/derivedDefaults';
import { specSchema } from '@umbrafab/geometry/schema';

/**
 * One field of the dial spec as the page's form shows it, read from the ONE
 * zod schema (geometry/src/spec/schema.ts) through zod v4's JSON Schema
 * export: its dotted key, its kind of input, the describe() text (which
 * carries the unit), the default and the bounds. Nothing here is written by
 * hand per field, so a field added to the schema appears in the form.
 */
export interface SpecField {
  /** dotted spec path, e.g. "gnomon.height" */
  readonly key: string;
  /** the section heading the form groups it under ("" for top-level fields) */
  readonly section: string;
  /**
   * number/integer: a number input; text: a text input; choice: a select;
   * numberOrAuto: a number or one word (e.g. "auto"); boolean: a checkbox;
   * value: anything else (lists, mixed unions), edited as one line of YAML.
   */
  readonly kind: 'number' | 'integer' | 'text' | 'choice' | 'numberOrAuto' | 'boolean' | 'value';
  /** the schema's describe() text, unit included */
  readonly description: string;
  /** short unit label taken from the description: "mm", "°", "min", "mm/min", "rpm", "%" or "" */
  readonly unit: string;
  /** the schema's plain default, if any (absent for required site fields and for defaults that follow other fields) */
  readonly default?: unknown;
  /**
   * set when the default follows other fields (DERIVED_DEFAULTS): the form
   * shows the current value and what it follows, and leaves the field out of
   * the spec unless the user types a value
   */
  readonly derived?: { readonly follows: readonly string[]; readonly rule: string };
  /** true when the spec must give it (no default, not optional) */
  readonly required: boolean;
  readonly min?: number;
  readonly max?: number;
  /** true when min itself is not allowed (min < value) */
  readonly exclusiveMin?: boolean;
  /** for choice fields: the allowed values, in schema order */
  readonly choices?: readonly (string | number)[];
  /** for text fields: the regular expression the schema checks, if any */
  readonly pattern?: string;
}

/** A JSON Schema node, as far as the spec schema uses it. */
interface Node {
  readonly type?: string;
  readonly properties?: Record<string, Node>;
  readonly required?: readonly string[];
  readonly description?: string;
  readonly default?: unknown;
  readonly minimum?: number;
  readonly maximum?: number;
  readonly exclusiveMinimum?: number;
  readonly enum?: readonly (string | number)[];
  readonly const?: string | number;
  readonly anyOf?: readonly Node[];
  readonly pattern?: string;
}

let cached: readonly SpecField[] | undefined;

/**
 * Every leaf field of the spec schema, in schema order (input side: defaults
 * not yet applied, so optional and defaulted fields are not required).
 * @example specFields().find((f) => f.key === 'gnomon.height') // {kind: 'number', unit: 'mm', default: 50, ...}
 */
export function specFields(): readonly SpecField[] {
  cached ??= Object.freeze(walk(specSchema.toJSONSchema({ io: 'input', unrepresentable: 'any' }) as Node, [], true));
  return cached;
}

function walk(node: Node, path: readonly string[], parentRequired: boolean): SpecField[] {
  const out: SpecField[] = [];
  for (const [name, child] of Object.entries(node.properties ?? {})) {
    const p = [...path, name];
    const required = parentRequired && (node.required ?? []).includes(name) && child.default === undefined;
    if (child.type === 'object' && child.properties) {
      out.push(...walk(child, p, required));
      continue;
    }
    const field = leaf(child, p, required);
    if (field) out.push(field);
  }
  return out;
}

function leaf(n: Node, path: readonly string[], required: boolean): SpecField | undefined {
  const description = n.description ?? '';
  const key = path.join('.');
  const derived = derivedDefault(key);
  const base = {
    key,
    section: path.length > 1 ? path.slice(0, -1).join('.') : '',
    description,
    unit: unitOf(description),
    required,
    ...(derived ? { derived: { follows: derived.follows, rule: derived.rule } } : n.default !== undefined ? { default: n.default } : {}),
  };
  if (n.anyOf) {
    const consts = n.anyOf.map((a) => a.const ?? (a.enum?.length === 1 ? a.enum[0] : undefined));
    if (consts.every((c) => c !== undefined)) return { ...base, kind: 'choice', choices: consts as (string | number)[] };
    const numeric = n.anyOf.filter((a) => a.type === 'number' || a.type === 'integer');
    const words = n.anyOf.filter((a) => a.type === 'string' && (a.const !== undefined || a.enum?.length === 1));
    if (numeric.length === 1 && words.length === n.anyOf.length - 1) return { ...base, kind: 'numberOrAuto', ...bounds(numeric[0]) };
    return { ...base, kind: 'value' };
  }
  if (n.enum) return { ...base, kind: 'choice', choices: n.enum };
  if (n.type === 'number' || n.type === 'integer') return { ...base, kind: n.type === 'integer' ? 'integer' : 'number', ...bounds(n) };
  if (n.type === 'string') return { ...base, kind: 'text', ...(n.pattern ? { pattern: n.pattern } : {}) };
  if (n.type === 'boolean') return { ...base, kind: 'boolean' };
  return { ...base, kind: 'value' };
}

function bounds(n: Node): { min?: number; max?: number; exclusiveMin?: boolean } {
  if (n.exclusiveMinimum !== undefined) return { min: n.exclusiveMinimum, exclusiveMin: true, ...(n.maximum !== undefined ? { max: n.maximum } : {}) };
  return { ...(n.minimum !== undefined ? { min: n.minimum } : {}), ...(n.maximum !== undefined ? { max: n.maximum } : {}) };
}

/** The unit a describe() text names: "…, mm" → "mm", "…, degrees …" → "°", "… in minutes" → "min", "mm/min", "rpm", "%". */
export function unitOf(description: string): string {
  if (/\bmm\/min\b/.test(description)) return 'mm/min';
  if (/\brpm\b/i.test(description)) return 'rpm';
  if (/\bpercent\b|%/.test(description)) return '%';
  if (/\bmm\b/.test(description)) return 'mm';
  if (/\bdegrees\b/.test(description)) return '°';
  if (/\bminutes\b/.test(description)) return 'min';
  return '';
}
