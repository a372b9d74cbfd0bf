import { Document, isMap, isPair, isScalar, visit } from 'yaml';
import type { DialSpec } from '@umbrafab/geometry';
import { specFields } from './specFields.ts';

/**
 * The spec as commented YAML, for the starter spec of `umbrafab init` (the
 * page's "save spec" edits the user's own file instead: editSpecText.ts): every field with
 * its value and, beside it, the schema's describe() text (unit included).
 * Sections left empty by the schema (no fields yet) are left out. The text
 * reads back through `umbrafab build` to the same spec.
 * @example specToCommentedYaml(parseSpec(raw)).startsWith('# umbrafab dial spec')
 */
export function specToCommentedYaml(spec: DialSpec | Record<string, unknown>): string {
  const help = new Map(specFields().map((f) => [f.key, f.description]));
  const doc = new Document(dropEmpty(spec as Record<string, unknown>));
  doc.commentBefore = ' umbrafab dial spec, saved from the page (umbrafab serve).\n Lengths in mm, angles in degrees; the comments come from the spec schema.';
  visit(doc, {
    Pair(_, pair, path) {
      if (!isPair(pair) || !isScalar(pair.key) || !isScalar(pair.value)) return;
      const keys = path.filter(isPair).map((p) => (isScalar(p.key) ? String(p.key.value) : ''));
      const key = [...keys, String(pair.key.value)].join('.');
      const text = help.get(key);
      if (text) pair.value.comment = ` ${text}`;
    },
  });
  // Sections on their own, one blank line apart.
  if (isMap(doc.contents)) doc.contents.items.forEach((p, i) => i > 0 && isScalar(p.key) && !isScalar(p.value) && (p.key.spaceBefore = true));
  return doc.toString({ lineWidth: 0 });
}

function dropEmpty(o: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(o)) {
    if (v === undefined) continue;
    if (v !== null && typeof v === 'object' && !Array.isArray(v)) {
      const inner = dropEmpty(v as Record<string, unknown>);
      if (Object.keys(inner).length) out[k] = inner;
    } else out[k] = v;
  }
  return out;
}
