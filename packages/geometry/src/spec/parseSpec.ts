import { z } from 'zod';
import { SpecError, combineSpecErrors, formatValue } from '../errors.ts';
import { didYouMean } from './didYouMean.ts';
import { METHOD_DEFAULTS, specSchema, type DialSpec } from './schema.ts';
import { isValidTimeZone, standardMeridianDeg } from '../sun/zoneOffsets.ts';
import { parseClock } from './parseClock.ts';
import { CLOCK_PATTERN } from './textFields.ts';
import { normaliseGnomonStock } from './sections/partsSection.ts';

type Issue = z.core.$ZodIssue;

import { SITE_PLACEHOLDER } from './derivedDefaults.ts';

const SITE_HELP: Readonly<Record<string, string>> = {
  latitude: 'your site\'s latitude, a number from -90° to 90° (north positive), e.g. 43.55',
  longitude: 'your site\'s longitude, a number from -180° to 180° (east positive), e.g. -5.92',
  timezone: 'your site\'s IANA time zone name in quotes, e.g. "Europe/Madrid"',
};

/**
 * A zone whose standard meridian lies further than this from the site's
 * longitude is refused: the clock tables would fall on another calendar
 * day (real zones stay within about 3.5 h of their land; 9 h leaves room for
 * a site kept on UTC on purpose).
 */
export const MAX_ZONE_LONGITUDE_GAP_DEG = 135;

/**
 * The one normaliser: validate a raw spec object (parsed from YAML or JSON)
 * and fill in every default, including those that follow other fields
 * (DERIVED_DEFAULTS: kerf and clearance by method, mark widths by method,
 * the gnomon's thickness from the sheet). `build`, `batch`, `check` and the
 * local page all turn a spec into the normalised spec through this function.
 *
 * Throws one SpecError listing every problem found (up to a cap), each naming
 * the dotted field, the value given and what is allowed; unknown fields get a
 * did-you-mean suggestion, unknown time zones too. Cross-field rules checked
 * here: the starter's site placeholder, a known IANA zone near the
 * longitude, and `hours.from` before `hours.to`. Layout rules (hour angles,
 * plate fit) are checked by the layout, which knows the geometry.
 *
 * @example parseSpec({ site: { latitude: 41.2, longitude: -8.6, timezone: 'Europe/Lisbon' } })
 */
export function parseSpec(raw: unknown): DialSpec {
  if (raw === null || typeof raw !== 'object' || Array.isArray(raw)) {
    throw new SpecError('(spec)', raw, 'allowed: a mapping of fields such as site:, gnomon:, hours:', raw === null || raw === undefined ? 'the spec is empty' : `the spec must be a mapping of fields, got ${formatValue(raw)}`);
  }
  const problems: SpecError[] = [];
  const skip = new Set<string>();
  const site = (raw as { site?: unknown }).site;
  if (site !== null && typeof site === 'object') {
    for (const key of Object.keys(SITE_HELP)) {
      if ((site as Record<string, unknown>)[key] !== SITE_PLACEHOLDER) continue;
      skip.add(`site.${key}`);
      problems.push(new SpecError(`site.${key}`, SITE_PLACEHOLDER, `allowed: ${SITE_HELP[key]}`, `still the starter spec's placeholder ${JSON.stringify(SITE_PLACEHOLDER)}: fill in your site`));
    }
  }
  const result = specSchema.safeParse(raw);
  if (!result.success) {
    for (const issue of result.error.issues) {
      for (const e of issueToErrors(issue, raw)) if (!skip.has(e.field)) problems.push(e);
    }
  }
  problems.push(...crossFieldProblems(raw as Record<string, unknown>, result.success ? result.data : undefined, skip));
  if (problems.length) throw combineSpecErrors(problems);
  // A polar face is the default: `face: {type: polar}` written out is the same dial as no face section.
  const data = result.data!;
  const { face: _polar, ...withoutFace } = data;
  const s = data.face?.type === 'polar' ? withoutFace : data;
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

let zoneNames: readonly string[] | undefined;

/** Rules between fields: a known zone (with a suggestion), its meridian near the longitude, hours in order. */
function crossFieldProblems(raw: Record<string, unknown>, s: z.output<typeof specSchema> | undefined, skip: ReadonlySet<string>): SpecError[] {
  const out: SpecError[] = [];
  const site = (raw.site ?? {}) as Record<string, unknown>;
  const tz = site.timezone;
  const tzOk = typeof tz === 'string' && isValidTimeZone(tz);
  if (typeof tz === 'string' && !tzOk && !skip.has('site.timezone')) {
    zoneNames ??= [...Intl.supportedValuesOf('timeZone'), 'UTC'];
    const guess = didYouMean(tz, zoneNames);
    out.push(new SpecError('site.timezone', tz, 'allowed: an IANA time zone name such as "Europe/Lisbon" or "America/Denver"', `unknown time zone ${JSON.stringify(tz)}${guess ? ` (did you mean ${JSON.stringify(guess)}?)` : ''}`));
  }
  if (s && tzOk) {
    const meridian = standardMeridianDeg(s.site.timezone, s.calendar.year);
    const gap = Math.abs(((((s.site.longitude - meridian) % 360) + 540) % 360) - 180);
    if (gap > MAX_ZONE_LONGITUDE_GAP_DEG) {
      out.push(
        new SpecError(
          'site.timezone',
          s.site.timezone,
          `allowed: the site's own time zone, whose standard meridian lies within ${MAX_ZONE_LONGITUDE_GAP_DEG}° (${MAX_ZONE_LONGITUDE_GAP_DEG / 15} h) of site.longitude`,
          `${JSON.stringify(s.site.timezone)} keeps clocks on the ${meridian}° meridian, ${Number(gap.toFixed(2))}° (${Number((gap / 15).toFixed(2))} h) from site.longitude ${s.site.longitude}°: its clock tables would fall on another day`,
        ),
      );
    }
  }
  const hours = (raw.hours ?? {}) as Record<string, unknown>;
  const from = s?.hours.from ?? (typeof hours.from === 'string' ? hours.from : '07:00');
  const to = s?.hours.to ?? (typeof hours.to === 'string' ? hours.to : '17:00');
  if (CLOCK_PATTERN.test(from) && CLOCK_PATTERN.test(to) && parseClock('hours.from', from) >= parseClock('hours.to', to)) {
    out.push(new SpecError('hours.to', to, `allowed: a time later than hours.from (${from})`, `${to} is not after hours.from ${from}`));
  }
  return out;
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

/** Turn one zod issue into SpecErrors (one per unknown key) with field, value and allowed text. */
function issueToErrors(issue: Issue, raw: unknown): SpecError[] {
  const path = issue.path.map(String);
  if (issue.code === 'unrecognized_keys') {
    const known = knownKeysAt(path);
    return issue.keys.map((key) => {
      const field = [...path, key].join('.');
      const guess = didYouMean(key, known);
      return new SpecError(field, valueAt(raw, [...path, key]), `known fields here: ${known.join(', ')}`, `unknown field${guess ? ` (did you mean ${[...path, guess].join('.')}?)` : ''}`);
    });
  }
  const field = path.join('.') || '(spec)';
  const value = valueAt(raw, path);
  if (value === undefined && issue.code === 'invalid_type') {
    return [new SpecError(field, value, issue.message.startsWith('allowed') ? issue.message : 'this field is required', 'missing required field')];
  }
  const allowed = issue.message.startsWith('allowed') ? issue.message : `allowed: ${issue.message}`;
  return [new SpecError(field, value, allowed)];
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
