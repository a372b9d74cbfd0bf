// The spec modules only (not the package index, which would bring every builder into `init`).
import { DERIVED_DEFAULTS, SITE_PLACEHOLDER } from '@umbrafab/geometry/derivedDefaults';
import { specSchema } from '@umbrafab/geometry/schema';
import { specToCommentedYaml } from './serve/specYaml.ts';

/**
 * The commented starter spec written by `umbrafab init`: every field of the
 * schema with its plain default and, beside it, the schema's own describe()
 * text, so it never drifts from what `build` accepts. Fields whose default
 * follows another field (DERIVED_DEFAULTS: kerf and clearance by method,
 * mark widths by method, the gnomon's thickness from the sheet, …) are not
 * written: the header lists each with its rule, so switching the method or
 * the sheet keeps them right. The site is an explicit placeholder
 * (SITE_PLACEHOLDER) that `build` refuses, naming each field, until it is
 * filled in.
 * @param year the calendar year to write (the CLI passes the coming year)
 */
export function starterSpecYaml(year: number): string {
  const filled = specSchema.parse({ name: 'My polar dial', site: { latitude: 0, longitude: 0, timezone: 'UTC' }, calendar: { year } }) as Record<string, unknown>;
  let plain = filled;
  for (const d of DERIVED_DEFAULTS) plain = without(plain, d.key.split('.'));
  const spec = { ...plain, site: { latitude: SITE_PLACEHOLDER, longitude: SITE_PLACEHOLDER, timezone: SITE_PLACEHOLDER } };
  const body = specToCommentedYaml(spec).replace(/^(#[^\n]*\n)+\n?/, '');
  const rules = DERIVED_DEFAULTS.map((d) => `#   ${d.key}: ${d.rule}`).join('\n');
  return `# umbrafab dial spec: one polar sundial. Lengths in mm, angles in degrees.
# First replace each ${SITE_PLACEHOLDER} under site: with your site (latitude north
# positive, longitude east positive, an IANA time zone such as "Europe/Madrid");
# build refuses this file until you do. Add site.place for the title block.
# Every other line shows its default and may be deleted.
# Not written because their defaults follow other fields (write one to set it yourself):
${rules}
# Then: umbrafab build <this file> --out <folder>

${body}`;
}

/** A copy of `o` without the field at `path`, keys in their order. */
function without(o: Record<string, unknown>, path: readonly string[]): Record<string, unknown> {
  const [head, ...rest] = path;
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(o)) {
    if (k !== head) out[k] = v;
    else if (rest.length > 0 && v !== null && typeof v === 'object' && !Array.isArray(v)) out[k] = without(v as Record<string, unknown>, rest);
  }
  return out;
}
