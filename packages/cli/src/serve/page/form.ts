// The form: one input per field of the server's field list (specFields.ts),
// grouped in sections, with the derived defaults and the CLI's messages
// shown beside the fields they name.
import type { DerivedValue } from '../derivedValues.ts';
import type { SpecField } from '../specFields.ts';
import type { ApiError } from './api.ts';
import { byId, make } from './dom.ts';
import {
  OPEN_SECTIONS,
  derivedText,
  emptyChoiceText,
  fieldId,
  fieldLabel,
  hasSlider,
  helpText,
  inputText,
  isChanged,
  isSet,
  placeholderOf,
  readFieldValue,
  sectionGroups,
  sectionTitle,
  sliderStart,
  sliderText,
} from './fieldText.ts';
import { state } from './state.ts';

/** Draw the form from state.fields and state.values; `onChange` runs after each edit has updated state.values. */
export function renderForm(onChange: () => void): void {
  const form = byId('form', HTMLFormElement);
  form.textContent = '';
  for (const [top, fields] of sectionGroups(state.fields)) {
    const det = make('details', { className: 'section' });
    det.open = OPEN_SECTIONS.has(top);
    det.append(make('summary', { text: sectionTitle(top) }));
    for (const f of fields) det.append(renderField(f, onChange));
    form.append(det);
  }
}

function renderField(f: SpecField, onChange: () => void): HTMLElement {
  const wrap = make('div', { className: 'field' });
  wrap.dataset.key = f.key;
  const label = make('label', { text: fieldLabel(f) });
  label.htmlFor = fieldId(f.key);
  if (f.unit) label.append(make('span', { className: 'unit', text: f.unit }));
  label.title = f.description;
  wrap.append(label);

  const v = state.values[f.key];
  let input: HTMLInputElement | HTMLSelectElement;
  if (f.kind === 'choice') {
    const select = document.createElement('select');
    if (f.default === undefined) select.append(new Option(emptyChoiceText(f), ''));
    for (const c of f.choices ?? []) select.append(new Option(String(c), String(c)));
    select.value = String(v);
    input = select;
  } else if (f.kind === 'boolean') {
    const box = document.createElement('input');
    box.type = 'checkbox';
    box.checked = v === true;
    input = box;
  } else {
    const box = document.createElement('input');
    const numeric = f.kind === 'number' || f.kind === 'integer';
    box.type = numeric ? 'number' : 'text';
    if (numeric) {
      box.step = f.kind === 'integer' ? '1' : 'any';
      if (f.min !== undefined) box.min = String(f.min);
      if (f.max !== undefined) box.max = String(f.max);
    }
    const placeholder = placeholderOf(f);
    if (placeholder !== undefined) box.placeholder = placeholder;
    box.value = inputText(v);
    input = box;
  }
  input.id = fieldId(f.key);
  input.name = f.key;
  const edited = () => {
    state.values[f.key] = readFieldValue(f, input instanceof HTMLInputElement ? input : { value: input.value });
    wrap.classList.toggle('changed', isChanged(state.values[f.key], state.initial[f.key]));
    onChange();
  };
  input.addEventListener(f.kind === 'boolean' || f.kind === 'choice' ? 'change' : 'input', edited);
  wrap.append(input);

  if (hasSlider(f) && input instanceof HTMLInputElement) {
    const box = input;
    const range = document.createElement('input');
    range.type = 'range';
    range.min = String(f.min);
    range.max = String(f.max);
    range.step = f.kind === 'integer' ? '1' : 'any';
    range.value = sliderStart(f, v);
    range.setAttribute('aria-label', `${f.key} slider`);
    range.addEventListener('input', () => {
      box.value = sliderText(range.value);
      edited();
    });
    box.addEventListener('input', () => {
      if (box.value !== '') range.value = box.value;
    });
    wrap.append(range);
  }

  wrap.append(make('small', { text: helpText(f) }));
  // A default that follows other fields: shown, never written back (left empty, the build derives it as `umbrafab build` does).
  if (f.derived) wrap.append(make('small', { className: 'derived' }));
  const err = make('p', { className: 'err' });
  err.hidden = true;
  wrap.append(err);
  return wrap;
}

const fieldBox = (key: string): HTMLElement | null => document.querySelector<HTMLElement>(`.field[data-key="${CSS.escape(key)}"]`);

/** Show each derived field's current value and what it follows (empty inputs only; a typed value is the user's). */
export function drawDerived(derived: Readonly<Record<string, DerivedValue>> | null): void {
  state.derived = derived ?? {};
  for (const f of state.fields) {
    if (!f.derived) continue;
    const wrap = fieldBox(f.key);
    if (!wrap) continue;
    const d = state.derived[f.key];
    const set = isSet(state.values[f.key]);
    const text = derivedText({ ...f, derived: f.derived }, d, set);
    const input = wrap.querySelector('input:not([type=range]), select');
    if (input instanceof HTMLInputElement) input.placeholder = text.placeholder;
    const range = wrap.querySelector('input[type=range]');
    if (range instanceof HTMLInputElement && !set && d && typeof d.value === 'number') range.value = String(d.value);
    const note = wrap.querySelector('.derived');
    if (note) note.textContent = text.note;
  }
}

/** Show the CLI's message in the form's head and beside the field it names (opening its section); null clears it. */
export function showFieldError(error: ApiError | null): void {
  for (const el of document.querySelectorAll('.field.bad')) {
    el.classList.remove('bad');
    const e = el.querySelector<HTMLElement>('.err');
    if (e) {
      e.hidden = true;
      e.textContent = '';
    }
  }
  const box = byId('spec-error', HTMLElement);
  if (!error) {
    box.hidden = true;
    return;
  }
  box.hidden = false;
  box.textContent = `umbrafab: ${error.message}`;
  const el = error.field ? fieldBox(error.field) : null;
  if (el) {
    el.classList.add('bad');
    const e = el.querySelector<HTMLElement>('.err');
    if (e) {
      e.hidden = false;
      e.textContent = error.message;
    }
    const det = el.closest('details');
    if (det) det.open = true;
  }
}

/** After a save: the saved values are the new starting point, no field is marked changed. */
export function markAllSaved(): void {
  state.initial = { ...state.values };
  for (const el of document.querySelectorAll('.field.changed')) el.classList.remove('changed');
}
