import { isMap, isScalar, parse as parseYaml, parseDocument, type Document, type Scalar } from 'yaml';
import { formValueToRaw, specToFormValues, type FormValue } from './formValues.ts';
import { specFields } from './specFields.ts';

/** One field "save spec" changes in the user's file. */
export interface SpecChange {
  readonly key: string;
  /** the value in the file before, as the form shows it ('' = not in the file) */
  readonly from: FormValue;
  /** the value after ('' = taken out of the file, back to its default) */
  readonly to: FormValue;
}

/**
 * The user's spec text with only the fields the form changed rewritten: the
 * fields whose form value differs from the value the form shows for the
 * file as it is. Comments, key order, layout (block or flow) and every
 * untouched field stay as written (the yaml package's Document API edits the
 * parsed document in place); a field emptied in the form is taken out, so
 * its default (or the default that follows another field) applies again.
 * @returns the changes, and the new text (the old text itself when nothing changed)
 * @example editSpecText('gnomon:\n  height: 50 # mine\n', { ...values, 'gnomon.height': 42 }).text // 'gnomon:\n  height: 42 # mine\n'
 */
export function editSpecText(text: string, raw: unknown, fields: Readonly<Record<string, FormValue>>): { changes: SpecChange[]; text: string } {
  const before = specToFormValues(raw);
  const changes: SpecChange[] = [];
  const doc = parseDocument(text, { uniqueKeys: true });
  // A new scalar over an old one is spliced into the text, so every other byte
  // stays; adding or removing a field goes through the Document (which may
  // respace comments).
  const splices: { start: number; end: number; text: string }[] = [];
  const structural: { path: string[]; value: unknown }[] = [];
  for (const f of specFields()) {
    if (!(f.key in fields)) continue;
    const from = before[f.key];
    const to = fields[f.key];
    const a = formValueToRaw(f, from);
    const b = formValueToRaw(f, to);
    if (JSON.stringify(a) === JSON.stringify(b)) continue;
    changes.push({ key: f.key, from, to });
    const path = f.key.split('.');
    const node = doc.getIn(path, true);
    const scalarText = b === undefined ? undefined : scalarSource(b, node);
    if (isScalar(node) && node.range && scalarText !== undefined) splices.push({ start: node.range[0], end: node.range[1], text: scalarText });
    else structural.push({ path, value: b });
  }
  if (changes.length === 0) return { changes, text };
  let out = text;
  for (const sp of splices.sort((x, y) => y.start - x.start)) out = out.slice(0, sp.start) + sp.text + out.slice(sp.end);
  if (structural.length === 0) return { changes, text: out };
  const edited = parseDocument(out, { uniqueKeys: true });
  for (const { path, value } of structural) {
    if (value === undefined) deleteIn(edited, path);
    else edited.setIn(path, value);
  }
  return { changes, text: edited.toString({ lineWidth: 0 }) };
}

/** The YAML text of a new scalar value where an old scalar stood (its quoting kept when it can be), or undefined for a list or mapping. */
function scalarSource(value: unknown, old: unknown): string | undefined {
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  if (typeof value !== 'string') return undefined;
  const plainOk = /^[A-Za-z_][\w .\/+-]*$/.test(value) && !/\s$/.test(value) && parseYaml(value) === value;
  const wasPlain = isScalar(old) && (old as Scalar).type === 'PLAIN';
  return wasPlain && plainOk ? value : JSON.stringify(value);
}

/** Take a field out, and a section left empty by it. */
function deleteIn(doc: Document, path: readonly string[]): void {
  doc.deleteIn(path);
  for (let n = path.length - 1; n > 0; n--) {
    const parent = doc.getIn(path.slice(0, n), true);
    if (isMap(parent) && parent.items.length === 0) doc.deleteIn(path.slice(0, n));
    else break;
  }
}

/** "gnomon.height: 50 → 42", for the log and the page. */
export function describeChange(c: SpecChange): string {
  const show = (v: FormValue) => (v === '' ? '(not set)' : typeof v === 'string' ? JSON.stringify(v) : String(v));
  return `${c.key}: ${show(c.from)} → ${show(c.to)}`;
}
