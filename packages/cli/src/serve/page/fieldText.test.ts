import { describe, expect, it } from 'vitest';
import { specFields, type SpecField } from '../specFields.ts';
import { derivedText, emptyChoiceText, fieldId, fieldLabel, hasSlider, helpText, inputText, isChanged, isSet, placeholderOf, readFieldValue, sectionGroups, sectionTitle, sliderStart, sliderText } from './fieldText.ts';

// The form's words for the server's own field list (specFields(), read from the spec schema).
const field = (key: string): SpecField => {
  const f = specFields().find((x) => x.key === key);
  if (!f) throw new Error(`no field ${key}`);
  return f;
};

describe("the form's fields", () => {
  it('groups the fields by their top-level key in schema order, top-level ones under "name"', () => {
    const groups = sectionGroups(specFields());
    expect([...groups.keys()][0]).toBe('');
    expect(groups.get('')?.map((f) => f.key)).toContain('name');
    expect(groups.get('gnomon')?.every((f) => f.key.startsWith('gnomon.'))).toBe(true);
    expect([...groups.values()].flat().length).toBe(specFields().length);
    expect(sectionTitle('')).toBe('name');
    expect(sectionTitle('site')).toBe('site');
  });

  it('names inputs and labels from the key', () => {
    expect(fieldId('engrave.tool.flatEndMillMm')).toBe('f-engrave-tool-flatEndMillMm');
    expect(fieldLabel(field('gnomon.height'))).toBe('height');
    expect(fieldLabel(field('engrave.tool.flatEndMillMm'))).toBe('tool.flatEndMillMm');
    expect(fieldLabel(field('name'))).toBe('name');
  });

  it('reads what an input holds: numbers in number fields, the text as typed otherwise, checkboxes as booleans', () => {
    const height = field('gnomon.height');
    expect(readFieldValue(height, { value: '40' })).toBe(40);
    expect(readFieldValue(height, { value: '4e1' })).toBe(40);
    expect(readFieldValue(height, { value: '' })).toBe('');
    expect(readFieldValue(height, { value: '-' })).toBe('-'); // half-typed: kept as text, the server names the problem
    expect(readFieldValue({ kind: 'text' }, { value: '12' })).toBe('12');
    expect(readFieldValue({ kind: 'numberOrAuto' }, { value: '12' })).toBe('12');
    expect(readFieldValue({ kind: 'boolean' }, { value: 'on', checked: true })).toBe(true);
    expect(readFieldValue({ kind: 'boolean' }, { value: 'on', checked: false })).toBe(false);
    expect(inputText(undefined)).toBe('');
    expect(inputText(50)).toBe('50');
  });

  it('marks a field changed by its text, and set unless empty', () => {
    expect(isChanged(40, 40)).toBe(false);
    expect(isChanged(40, '40')).toBe(false);
    expect(isChanged(41, 40)).toBe(true);
    expect(isChanged('', undefined)).toBe(true);
    expect(isSet('')).toBe(false);
    expect(isSet(undefined)).toBe(false);
    expect(isSet(0)).toBe(true);
    expect(isSet(false)).toBe(true);
  });

  it('puts a slider beside a number field with both bounds, starting at the value or the default', () => {
    const latitude = field('site.latitude');
    expect(hasSlider(latitude)).toBe(true);
    expect(hasSlider(field('name'))).toBe(false);
    expect(sliderStart(latitude, 50.62)).toBe('50.62');
    expect(sliderStart({ ...latitude, default: undefined }, '')).toBe(String(latitude.min));
    expect(sliderStart({ ...latitude, default: 12 }, '')).toBe('12');
    expect(sliderText('40.00000001')).toBe('40');
    expect(sliderText('12.3456789')).toBe('12.3457');
  });

  it("words the help line, placeholders and empty choices from the schema's defaults", () => {
    const height = field('gnomon.height');
    expect(helpText(height)).toBe(`${height.description} · default ${String(height.default)} mm`);
    expect(helpText(field('site.latitude'))).toMatch(/ · required$/);
    expect(helpText({ ...height, description: '', default: undefined, required: false })).toBe('optional');
    expect(helpText({ ...height, description: '', default: [1, 2] })).toBe('default [1,2]');
    expect(placeholderOf(height)).toBeUndefined();
    expect(placeholderOf(field('gnomon.thickness'))).toBe('derived');
    expect(placeholderOf({ ...height, kind: 'numberOrAuto', default: undefined })).toBe('auto or a number');
    expect(placeholderOf({ ...height, default: undefined, required: false })).toBe('default');
    expect(emptyChoiceText({ ...height, required: true })).toBe('— choose —');
    expect(emptyChoiceText(field('process.kerf'))).toBe('— derived —');
    expect(emptyChoiceText({ ...height, required: false })).toBe('— default —');
  });

  it("words a derived field's current value and what it follows", () => {
    const kerf = field('process.kerf');
    if (!kerf.derived) throw new Error('process.kerf is derived (derivedDefaults.ts)');
    const k = { ...kerf, derived: kerf.derived };
    const d = { value: 3.175, follows: kerf.derived.follows, rule: kerf.derived.rule };
    expect(derivedText(k, d, false)).toEqual({ placeholder: '3.175 mm (derived)', note: `derived: 3.175 mm now, follows process.method (${kerf.derived.rule})` });
    expect(derivedText(k, d, true).note).toMatch(/^set here; when empty: 3\.175 mm now, follows process\.method/);
    expect(derivedText(k, undefined, false)).toEqual({ placeholder: 'derived', note: `derived: follows process.method (${kerf.derived.rule})` });
  });
});
