import { DERIVED_DEFAULTS, defaultPictureDate, type DialLayout, type DialSpec } from '@umbrafab/geometry';
import { MATERIAL_NAMES, MATERIAL_PRESETS } from '@umbrafab/fabricate';

/** A field whose default follows other fields, as the form shows it while the user has not set it. */
export interface DerivedValue {
  /** the value the build uses now (absent when nothing uses it, e.g. a preset of a material without one) */
  readonly value?: string | number;
  readonly follows: readonly string[];
  readonly rule: string;
}

/**
 * The current value of every field whose default follows other fields, read
 * from the normalised spec (the value `umbrafab build` uses) or, for the
 * engraving presets and the picture date, from the same functions the
 * writers call. The page shows these beside empty inputs and never posts
 * them back, so an unchanged form builds exactly what the file builds.
 * @example derivedValues(spec, layout)['process.kerf'] // { value: 0.9, follows: ['process.method'], rule: '…' } for waterjet
 */
export function derivedValues(spec: DialSpec, layout?: Pick<DialLayout, 'spec' | 'hemisphere'>): Record<string, DerivedValue> {
  const out: Record<string, DerivedValue> = {};
  const material = spec.plate.material as (typeof MATERIAL_NAMES)[number];
  const preset = (MATERIAL_NAMES as readonly string[]).includes(material) ? (MATERIAL_PRESETS[material] as unknown as Record<string, number>) : undefined;
  for (const d of DERIVED_DEFAULTS) {
    let value = valueAt(spec, d.key.split('.'));
    if (value === undefined && d.key.startsWith('engrave.') && preset) value = preset[d.key.slice('engrave.'.length)];
    if (value === undefined && d.key === 'install.date') value = `${spec.calendar.year}-04-01`;
    if (value === undefined && d.key === 'pictures.date' && layout) value = defaultPictureDate(layout);
    if (value === undefined && d.key === 'engrave.tool.flatMinWidthMm') value = spec.engrave.tool.flatEndMillMm;
    out[d.key] = { ...(typeof value === 'string' || typeof value === 'number' ? { value } : {}), follows: d.follows, rule: d.rule };
  }
  return out;
}

function valueAt(o: unknown, path: readonly string[]): unknown {
  let cur = o;
  for (const k of path) {
    if (cur === null || typeof cur !== 'object') return undefined;
    cur = (cur as Record<string, unknown>)[k];
  }
  return cur;
}
