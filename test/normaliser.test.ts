import { describe, expect, it } from 'vitest';
import { DERIVED_DEFAULTS, METHODS, parseSpec } from '@umbrafab/geometry';
import { specFields, formValuesToSpec, specToFormValues } from '@umbrafab/cli';

const site = { latitude: 47.3, longitude: 8.5, timezone: 'Europe/Zurich' };

function withField(o: Record<string, unknown>, key: string, value: unknown): Record<string, unknown> {
  const copy = structuredClone(o);
  const path = key.split('.');
  let node = copy;
  for (const k of path.slice(0, -1)) node = (node[k] ??= {}) as Record<string, unknown>;
  node[path.at(-1)!] = value;
  return copy;
}

describe('the one normaliser', () => {
  // Guards every field, including those other sections add later: a default
  // that follows another field must be declared in DERIVED_DEFAULTS, or the
  // page (which shows plain defaults filled in) would build another dial.
  it.each(METHODS)('%s: writing any plain default out gives the same normalised spec as leaving it out', (method) => {
    // A sheet other than the 3 mm default, so a gnomon thickness that follows it shows.
    const base = { site, process: { method }, plate: { thickness: 5 } };
    const setByBase = new Set(['process.method', 'plate.thickness']);
    const plain = parseSpec(base);
    const checked: string[] = [];
    for (const f of specFields()) {
      if (f.default === undefined || setByBase.has(f.key)) continue;
      expect(f.derived, f.key).toBeUndefined();
      expect(parseSpec(withField(base, f.key, f.default)), `${f.key} = ${JSON.stringify(f.default)}`).toEqual(plain);
      checked.push(f.key);
    }
    expect(checked.length).toBeGreaterThan(60);
  });

  it('every derived default names a field of the schema and the fields it follows', () => {
    const keys = new Set(specFields().map((f) => f.key));
    for (const d of DERIVED_DEFAULTS) {
      expect(keys.has(d.key), d.key).toBe(true);
      for (const k of d.follows) expect(keys.has(k), `${d.key} follows ${k}`).toBe(true);
      expect(specFields().find((f) => f.key === d.key)?.derived?.rule).toBe(d.rule);
    }
  });

  it('the form leaves derived fields empty, so they follow their field as in the file', () => {
    for (const method of METHODS) {
      const raw = { site, process: { method }, plate: { thickness: 6 } };
      const form = specToFormValues(raw);
      for (const d of DERIVED_DEFAULTS) expect(form[d.key], d.key).toBe('');
      expect(parseSpec(formValuesToSpec(form))).toEqual(parseSpec(raw));
    }
    const wj = parseSpec({ site, process: { method: 'waterjet' }, plate: { thickness: 6 } });
    expect(wj.gnomon.thickness).toBe(6); // cut from the 6 mm sheet
    expect(wj.marks.quarter.width).toBeGreaterThanOrEqual(wj.process.kerf);
  });

  it('"7:00" and "07:00" are the same dial', () => {
    expect(parseSpec({ site, hours: { from: '7:00', to: '17:00' } })).toEqual(parseSpec({ site, hours: { from: '07:00' } }));
    expect(parseSpec({ site, pictures: { time: '9:30' } }).pictures.time).toBe('09:30');
  });
});
