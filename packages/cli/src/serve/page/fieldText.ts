// The form's words and values for one spec field: pure functions of the
// server's field list (specFields.ts), no DOM, unit-tested beside.
import type { DerivedValue } from '../derivedValues.ts';
import type { FormValue } from '../formValues.ts';
import type { SpecField } from '../specFields.ts';

/** The sections the form opens at first ("" holds the top-level fields, e.g. name). */
export const OPEN_SECTIONS: ReadonlySet<string> = new Set(['', 'site', 'dial', 'gnomon', 'hours']);

/** The fields grouped by their top-level key, in field order ("" for top-level fields). */
export function sectionGroups(fields: readonly SpecField[]): Map<string, SpecField[]> {
  const groups = new Map<string, SpecField[]>();
  for (const f of fields) {
    const top = f.key.includes('.') ? f.key.split('.')[0] : '';
    const group = groups.get(top);
    if (group) group.push(f);
    else groups.set(top, [f]);
  }
  return groups;
}

/** A section's heading. */
export const sectionTitle = (top: string): string => (top === '' ? 'name' : top);

/** The input's element id: "gnomon.height" → "f-gnomon-height". */
export const fieldId = (key: string): string => `f-${key.replace(/\./g, '-')}`;

/** The label: the key without its section ("gnomon.height" → "height"; "engrave.tool.flatEndMillMm" → "tool.flatEndMillMm"). */
export const fieldLabel = (f: SpecField): string => f.key.split('.').slice(f.section ? 1 : 0).join('.');

/** Whether a number field gets a slider beside its box: both bounds known. */
export const hasSlider = (f: SpecField): boolean => (f.kind === 'number' || f.kind === 'integer') && Number.isFinite(f.min) && Number.isFinite(f.max);

/** The empty first choice of a select with no plain default. */
export const emptyChoiceText = (f: SpecField): string => (f.required ? '— choose —' : f.derived ? '— derived —' : '— default —');

/** A text or number box's placeholder, or undefined for none. */
export function placeholderOf(f: SpecField): string | undefined {
  if (f.derived) return 'derived';
  if (f.kind === 'numberOrAuto') return `${f.default ?? 'auto'} or a number`;
  if (f.default === undefined && !f.required) return 'default';
  return undefined;
}

/** The line under the input: the description and the default (or required/optional). */
export function helpText(f: SpecField): string {
  const shown = typeof f.default === 'object' ? JSON.stringify(f.default) : f.default;
  const dflt = f.derived ? '' : f.default === undefined ? (f.required ? 'required' : 'optional') : `default ${shown}${f.unit && typeof f.default === 'number' ? ` ${f.unit}` : ''}`;
  return `${f.description}${f.description && dflt ? ' · ' : ''}${dflt}`;
}

/** What an input holds as a form value: a checkbox's state, a number typed in a number field, else the text as typed. */
export function readFieldValue(f: Pick<SpecField, 'kind'>, input: { readonly value: string; readonly checked?: boolean }): FormValue {
  if (f.kind === 'boolean') return input.checked === true;
  if ((f.kind === 'number' || f.kind === 'integer') && input.value !== '' && Number.isFinite(Number(input.value))) return Number(input.value);
  return input.value;
}

/** A form value as an input shows it (nothing for no value). */
export const inputText = (v: FormValue | undefined): string => (v === undefined ? '' : String(v));

/** Where a field's slider starts: the value, or the default, or the lower bound for an empty field. */
export const sliderStart = (f: SpecField, v: FormValue | undefined): string => String(v === '' ? (f.default ?? f.min) : v);

/** The box's text for a slider's position: six significant digits, no trailing zeros. */
export const sliderText = (position: string): string => String(Number(Number(position).toPrecision(6)));

/** Whether a field differs from the value it opened (or was last saved) with. */
export const isChanged = (v: FormValue | undefined, initial: FormValue | undefined): boolean => String(v) !== String(initial);

/** Whether the user has given a field a value (an empty box leaves it out of the spec). */
export const isSet = (v: FormValue | undefined): boolean => v !== '' && v !== undefined;

/**
 * A derived field's words: the box's placeholder (its current value) and the
 * note under it (what it follows, and whether the typed value overrides it).
 */
export function derivedText(f: SpecField & { readonly derived: NonNullable<SpecField['derived']> }, d: DerivedValue | undefined, set: boolean): { placeholder: string; note: string } {
  const now = d && d.value !== undefined ? `${d.value}${f.unit && typeof d.value === 'number' ? ` ${f.unit}` : ''}` : null;
  return {
    placeholder: now === null ? 'derived' : `${now} (derived)`,
    note: `${set ? 'set here; when empty: ' : 'derived: '}${now === null ? '' : `${now} now, `}follows ${f.derived.follows.join(', ')} (${f.derived.rule})`,
  };
}
