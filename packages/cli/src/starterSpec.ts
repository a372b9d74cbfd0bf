import { parseSpec } from '@umbrafab/geometry';
import { specToCommentedYaml } from './serve/specYaml.ts';

/**
 * The commented starter spec written by `umbrafab init`: every field of the
 * schema with its default and, beside it, the schema's own describe() text,
 * so it never drifts from what `build` accepts. The site is a placeholder of
 * our own (an invented harbour village); change it first.
 * @param year the calendar year to write (the CLI passes the coming year)
 */
export function starterSpecYaml(year: number): string {
  const spec = parseSpec({
    name: 'Harbour Steps dial',
    site: { latitude: 43.55, longitude: -5.92, timezone: 'Europe/Madrid', place: 'Harbour Steps' },
    calendar: { year },
  });
  // Fields whose default follows another field (kerf and clearance follow
  // process.method; the gnomon's stock follows the method and the sheet) are
  // left out, so changing the method or the sheet keeps them right.
  const { kerf: _kerf, clearance: _clearance, ...process } = spec.process;
  const { gnomonFrom: _from, ...parts } = spec.parts as typeof spec.parts & { gnomonFrom?: string };
  const { thickness: _t, ...gnomon } = spec.gnomon;
  const body = specToCommentedYaml({ ...spec, gnomon, parts, process }).replace(/^(#[^\n]*\n)+\n?/, '');
  return `# umbrafab dial spec: one polar sundial. Lengths in mm, angles in degrees.
# Change site: first (latitude north positive, longitude east positive, an
# IANA time zone); every other line shows its default and may be deleted.
# Not written because their defaults follow other fields: process.kerf and
# process.clearance (by process.method), gnomon.thickness (the plate's sheet
# when a laser, waterjet or router cuts the gnomon from it; 3 mm printed).
# Then: umbrafab build <this file> --out <folder>

${body}`;
}
