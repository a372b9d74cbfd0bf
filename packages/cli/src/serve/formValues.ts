import { stringify as stringifyYaml } from 'yaml';
import { SpecError, didYouMean } from '@umbrafab/geometry';
import { parseSpecText } from '../readSpec.ts';
import { specFields, type SpecField } from './specFields.ts';

/** What one form input holds: the text of a text box, a number, or a checkbox state. */
export type FormValue = string | number | boolean;

/**
 * The form's values for a raw spec (as read from YAML): each field's value in
 * the spec, else its schema default, else '' (left to the schema or the
 * per-method allowance). Fields of kind "value" (lists, mixed unions) become
 * one line of flow YAML.
 * @example specToFormValues({ site: { latitude: 50 } })['gnomon.height'] // 50 (the default)
 */
export function specToFormValues(raw: unknown): Record<string, FormValue> {
  const out: Record<string, FormValue> = {};
  for (const f of specFields()) {
    const given = valueAt(raw, f.key.split('.'));
    const v = given === undefined ? f.default : given;
    out[f.key] = toFormValue(f, v);
  }
  return out;
}

function toFormValue(f: SpecField, v: unknown): FormValue {
  if (v === undefined || v === null) return f.kind === 'boolean' ? false : '';
  if (f.kind === 'value' || (typeof v === 'object' && v !== null)) return stringifyYaml(v, { collectionStyle: 'flow', lineWidth: 0 }).trim();
  if (typeof v === 'string' || typeof v === 'number' || typeof v === 'boolean') return v;
  return String(v);
}

/**
 * The raw spec (before validation) from the form's values: numbers from
 * number boxes, "auto"-style words kept as text, empty boxes left out (so the
 * schema's default or its "missing required field" message applies), "value"
 * fields read as YAML. The result goes through the same `parseSpec` as the
 * CLI's, so the page shows the CLI's messages.
 * @throws SpecError for a key the schema does not know, or a "value" field that is not YAML
 */
export function formValuesToSpec(values: Readonly<Record<string, unknown>>): Record<string, unknown> {
  const fields = new Map(specFields().map((f) => [f.key, f]));
  const spec: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(values)) {
    const f = fields.get(key);
    if (!f) {
      const guess = didYouMean(key, [...fields.keys()]);
      throw new SpecError(key, value, `allowed: a field of the spec schema${guess ? ` (did you mean ${guess}?)` : ''}`, 'unknown field');
    }
    const v = fromFormValue(f, value);
    if (v !== undefined) setAt(spec, key.split('.'), v);
  }
  return spec;
}

/**
 * One form value as it goes into the raw spec: undefined for an empty box
 * (the field is left out), numbers from number boxes, YAML for "value" fields.
 * @throws SpecError for a "value" field that is not YAML
 */
export function formValueToRaw(f: SpecField, value: unknown): unknown {
  return fromFormValue(f, value);
}

function fromFormValue(f: SpecField, value: unknown): unknown {
  if (typeof value !== 'string') return value;
  const text = value.trim();
  if (text === '') return undefined;
  switch (f.kind) {
    case 'number':
    case 'integer':
    case 'numberOrAuto':
      return /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(text) ? Number(text) : text;
    case 'choice':
      return f.choices?.find((c) => String(c) === text) ?? text;
    case 'boolean':
      return text === 'true' ? true : text === 'false' ? false : text;
    case 'value':
      // The same capped, linear reader as a spec file (a form post comes from anyone who can reach the page).
      return parseSpecText(text, text, f.key);
    case 'text':
      return value;
  }
}

function valueAt(raw: unknown, path: readonly string[]): unknown {
  let cur: unknown = raw;
  for (const key of path) {
    if (cur === null || typeof cur !== 'object' || Array.isArray(cur)) return undefined;
    cur = (cur as Record<string, unknown>)[key];
  }
  return cur;
}

function setAt(o: Record<string, unknown>, path: readonly string[], v: unknown): void {
  let cur = o;
  for (const key of path.slice(0, -1)) {
    const next = cur[key];
    if (next === null || typeof next !== 'object') cur[key] = {};
    cur = cur[key] as Record<string, unknown>;
  }
  cur[path[path.length - 1]] = v;
}
