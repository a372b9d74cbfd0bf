import { z } from 'zod';
import { SpecError, formatValue } from '../errors.ts';
import { didYouMean } from './didYouMean.ts';
import { METHOD_DEFAULTS, specSchema, type DialSpec } from './schema.ts';
import { isValidTimeZone } from '../sun/zoneOffsets.ts';
import { parseClock } from './parseClock.ts';
import { normaliseGnomonStock } from './sections/partsSection.ts';

type Issue = z.core.$ZodIssue;

/**
 * Validate a raw spec object (parsed from YAML or JSON) and fill in defaults.
 *
 * Throws a SpecError for the first problem found, naming the dotted field, the
 * value given and what is allowed; unknown fields get a did-you-mean
 * suggestion. Cross-field rules checked here: a known IANA zone and
 * `hours.from` before `hours.to`. Layout rules (hour angles, plate fit) are
 * checked by the layout, which knows the geometry.
 *
 * @example parseSpec({ site: { latitude: 41.2, longitude: -8.6, timezone: 'Europe/Lisbon' } })
 */
export function parseSpec(raw: unknown): DialSpec {
  if (raw === null || typeof raw !== 'object' || Array.isArray(raw)) {
    throw new SpecError('(spec)', raw, 'allowed: a mapping of fields such as site:, gnomon:, hours:', `the spec must be a mapping of fields, got ${formatValue(raw)}`);
  }
  const result = specSchema.safeParse(raw);
  if (!result.success) throw issueToError(result.error.issues, raw);
  const s = result.data;
  if (!isValidTimeZone(s.site.timezone)) {
    throw new SpecError('site.timezone', s.site.timezone, 'allowed: an IANA time zone name such as "Europe/Lisbon" or "America/Denver"', `unknown time zone ${JSON.stringify(s.site.timezone)}`);
  }
  if (parseClock('hours.from', s.hours.from) >= parseClock('hours.to', s.hours.to)) {
    throw new SpecError('hours.to', s.hours.to, `allowed: a time later than hours.from (${s.hours.from})`, `${s.hours.to} is not after hours.from ${s.hours.from}`);
  }
  const fallback = METHOD_DEFAULTS[s.process.method];
  return {
    ...s,
    // Gnomon cut from the plate's sheet: t = plate.thickness (rule in partsSection.ts).
    ...normaliseGnomonStock(s, raw),
    marks: methodMarkWidths(s.marks, s.process.method, raw as Record<string, unknown>),
    process: {
      method: s.process.method,
      kerf: s.process.kerf ?? fallback.kerf,
      clearance: s.process.clearance ?? fallback.clearance,
    },
  };
}

/**
 * A waterjet cannot make a line narrower than its jet (docs/design.md §5: kerf about
 * 0.8–1.0 mm), so mark widths the user did not set default wider for it.
 */
export const WATERJET_MARK_WIDTHS = { hour: 2, half: 1.6, quarter: 1.2 } as const;

function methodMarkWidths<M extends Record<'hour' | 'half' | 'quarter', { length: number; width: number }>>(marks: M, method: string, raw: Record<string, unknown>): M {
  if (method !== 'waterjet') return marks;
  const given = (raw.marks ?? {}) as Record<string, Record<string, unknown> | undefined>;
  const out = { ...marks };
  for (const kind of ['hour', 'half', 'quarter'] as const) {
    if (given[kind]?.width === undefined) out[kind] = { ...marks[kind], width: WATERJET_MARK_WIDTHS[kind] };
  }
  return out;
}

/** Turn zod's first issue into a SpecError with field, value and allowed text. */
function issueToError(issues: readonly Issue[], raw: unknown): SpecError {
  const issue = issues[0];
  const more = issues.length > 1 ? ` (and ${issues.length - 1} more problem${issues.length > 2 ? 's' : ''})` : '';
  const path = issue.path.map(String);
  if (issue.code === 'unrecognized_keys') {
    const key = issue.keys[0];
    const field = [...path, key].join('.');
    const known = knownKeysAt(path);
    const guess = didYouMean(key, known);
    return new SpecError(field, valueAt(raw, [...path, key]), `known fields here: ${known.join(', ')}${more}`, `unknown field${guess ? ` (did you mean ${[...path, guess].join('.')}?)` : ''}`);
  }
  const field = path.join('.') || '(spec)';
  const value = valueAt(raw, path);
  if (value === undefined && issue.code === 'invalid_type') {
    return new SpecError(field, value, `${issue.message.startsWith('allowed') ? issue.message : 'this field is required'}${more}`, 'missing required field');
  }
  const allowed = issue.message.startsWith('allowed') ? issue.message : `allowed: ${issue.message}`;
  return new SpecError(field, value, allowed + more);
}

/** The field names the schema accepts at a dotted path (for suggestions). */
function knownKeysAt(path: readonly string[]): string[] {
  let node: z.ZodType = specSchema;
  for (const key of path) {
    const shape = objectShape(node);
    if (!shape || !(key in shape)) return [];
    node = shape[key];
  }
  const shape = objectShape(node);
  return shape ? Object.keys(shape) : [];
}

/** Unwrap defaults/optionals down to an object schema's shape, if any. */
function objectShape(node: z.ZodType): Record<string, z.ZodType> | undefined {
  let cur: z.ZodType = node;
  for (let i = 0; i < 5; i++) {
    if (cur instanceof z.ZodObject) return cur.shape as Record<string, z.ZodType>;
    const inner = (cur as unknown as { def?: { innerType?: z.ZodType } }).def?.innerType;
    if (!inner) return undefined;
    cur = inner;
  }
  return undefined;
}

function valueAt(raw: unknown, path: readonly string[]): unknown {
  let cur: unknown = raw;
  for (const key of path) {
    if (cur === null || typeof cur !== 'object') return undefined;
    cur = (cur as Record<string, unknown>)[key];
  }
  return cur;
}
