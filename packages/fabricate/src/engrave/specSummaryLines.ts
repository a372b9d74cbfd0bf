/**
 * Spec summary for the engraving programs' header comments, so a program
 * says how to remake it: every field of the normalised spec (defaults filled
 * in), one top-level section per line, written as a YAML flow mapping that
 * can be pasted back into a spec file, e.g.
 *
 *     site: {latitude: 50.62, longitude: -3.41, timezone: "Europe/London"}
 *
 * A section whose line would be longer than `maxChars` is split into one line
 * per field with a dotted key (`engrave.tool: {...}`). Empty sections are
 * left out. Key order is the spec's own (deterministic).
 */

const DEFAULT_MAX_CHARS = 180; // G-code comments are capped at 200 characters (ngcComment)

function flow(value: unknown): string {
  if (value === null || value === undefined) return 'null';
  if (typeof value === 'string') return JSON.stringify(value);
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  if (Array.isArray(value)) return `[${value.map(flow).join(', ')}]`;
  const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
  return `{${entries.map(([k, v]) => `${k}: ${flow(v)}`).join(', ')}}`;
}

function isMapping(v: unknown): v is Record<string, unknown> {
  return v !== null && typeof v === 'object' && !Array.isArray(v);
}

function linesOf(key: string, value: unknown, maxChars: number): string[] {
  if (isMapping(value) && Object.values(value).every((v) => v === undefined)) return [];
  const line = `${key}: ${flow(value)}`;
  if (line.length <= maxChars || !isMapping(value)) return [line];
  return Object.entries(value).flatMap(([k, v]) => (v === undefined ? [] : linesOf(`${key}.${k}`, v, maxChars)));
}

/**
 * @param spec the normalised spec (parseSpec's result); any plain object works
 * @param maxChars longest line before a section is split, default 180
 * @returns lines such as 'name: "Windlecombe Quay"', 'plate: {width: "auto", …}'
 * @example specSummaryLines({ name: 'X', hours: { from: '08:00' } }) // ['name: "X"', 'hours: {from: "08:00"}']
 */
export function specSummaryLines(spec: object, maxChars = DEFAULT_MAX_CHARS): string[] {
  return Object.entries(spec).flatMap(([k, v]) => (v === undefined ? [] : linesOf(k, v, maxChars)));
}
