import { CST, Lexer, LineCounter, Parser, isAlias, isCollection, isMap, isScalar, parseDocument, visit, type Node } from 'yaml';
import { SpecError, parseSpec, type DialSpec } from '@umbrafab/geometry';
import { CappedReadError, readTextCapped } from './readTextCapped.ts';

/** Largest spec file or spec text read, bytes (a full spec is about 3 KiB). */
export const MAX_SPEC_BYTES = 1024 * 1024;

/** Most YAML nodes (keys, values, lists, maps) a spec may hold (a full spec has about 300). */
export const MAX_SPEC_NODES = 10_000;

/** Most alias expansions (`*name`) the YAML reader follows before calling it an alias bomb (yaml's maxAliasCount). */
export const MAX_SPEC_ALIASES = 100;

/** Lexer tokens that start a node: a scalar (key or value), an alias, a list item, a flow list or map. */
const NODE_TOKENS = new Set<string>(['scalar', 'single-quoted-scalar', 'double-quoted-scalar', 'block-scalar-header', 'alias', 'seq-item-ind', 'explicit-key-ind', 'flow-map-start', 'flow-seq-start']);

/** Deepest nesting of lists and maps a spec may hold (a full spec nests 4 deep); deeper would overflow the YAML reader's stack. */
export const MAX_SPEC_DEPTH = 64;

const KIB = (n: number) => `${Math.round(n / 1024)} KiB`;

/**
 * Read a spec file (YAML, or JSON, which YAML 1.2 reads too) and normalise it
 * with `parseSpec`, the one normaliser. Reading stops at MAX_SPEC_BYTES, so a
 * huge file, a device or a pipe ends at once with bounded memory. Every
 * failure is a SpecError naming the file or the field.
 */
export function readSpecFile(path: string): DialSpec {
  return parseSpec(readRawSpec(path));
}

/**
 * A spec file's contents as written (before validation), for commands that
 * change a field and normalise again (batch, check --year). An empty file
 * (or one of comments only) says so.
 */
export function readRawSpec(path: string): unknown {
  const text = readSpecText(path);
  const raw = parseSpecText(text, path);
  if (raw === null || raw === undefined) {
    throw new SpecError('spec file', path, 'allowed: a dial spec with at least a site: section (umbrafab init writes a starter)', text.trim() === '' ? `${path} is empty` : `${path} holds only comments, no fields`);
  }
  return raw;
}

/** The text of a spec file, at most MAX_SPEC_BYTES; a SpecError naming the file otherwise. */
export function readSpecText(path: string): string {
  try {
    return readTextCapped(path, MAX_SPEC_BYTES);
  } catch (e) {
    if (!(e instanceof CappedReadError)) throw e;
    const allowed = 'allowed: the path of a readable .yaml or .json dial spec (umbrafab init writes one)';
    if (e.reason === 'too-large') throw new SpecError('spec file', path, `allowed: a spec of at most ${KIB(MAX_SPEC_BYTES)} (a full spec is about 3 KiB)`, `too large (${e.message}); reading stopped there`);
    if (e.reason === 'idle') throw new SpecError('spec file', path, allowed, `${e.message} from this pipe or device; reading stopped`);
    const why = e.code === 'ENOENT' ? `no such file: ${path}` : e.code === 'EISDIR' ? `${path} is a folder, not a file` : e.code === 'EACCES' ? `permission denied: ${path}` : e.message;
    throw new SpecError('spec file', path, allowed, why);
  }
}

/**
 * Parse YAML/JSON text to a plain value, in time linear in its length:
 * duplicate keys are found with one set per map (the yaml package's own
 * uniqueKeys check compares every key with every other: 12 s for 40k keys),
 * the text is capped at MAX_SPEC_BYTES and MAX_SPEC_NODES, and an alias bomb
 * stops at MAX_SPEC_ALIASES. Every failure is a SpecError naming `field`
 * (default "spec file") and the source, with line and column where known.
 * @example parseSpecText('site: {latitude: 50}') // { site: { latitude: 50 } }
 */
export function parseSpecText(text: string, source = 'spec', field = 'spec file'): unknown {
  const fail = (allowed: string, why: string): never => {
    throw new SpecError(field, source, allowed, why);
  };
  const bytes = Buffer.byteLength(text);
  if (bytes > MAX_SPEC_BYTES) fail(`allowed: a spec of at most ${KIB(MAX_SPEC_BYTES)} (a full spec is about 3 KiB)`, `too large (${bytes} bytes)`);
  const lines = new LineCounter();
  const at = (offset: number | undefined) => {
    if (offset === undefined) return '';
    const p = lines.linePos(offset);
    return ` at line ${p.line}, column ${p.col}`;
  };
  // Count the nodes from the lexer's tokens first (about 0.1 s per MiB), so a
  // text with a huge number of keys is refused before the slower composer runs.
  let tokens = 0;
  for (const token of new Lexer().lex(text)) {
    if (NODE_TOKENS.has(CST.tokenType(token) ?? '') && ++tokens > MAX_SPEC_NODES) fail(`allowed: at most ${MAX_SPEC_NODES} values (a full spec has about 300)`, `more than ${MAX_SPEC_NODES} values (keys, items, lists and maps)`);
  }
  const depth = deepestNesting(text, MAX_SPEC_DEPTH);
  if (depth !== null) fail(`allowed: lists and maps nested at most ${MAX_SPEC_DEPTH} deep (a full spec nests 4 deep)`, `nested more than ${MAX_SPEC_DEPTH} deep at line ${depth.line}, column ${depth.col}`);
  let doc;
  try {
    doc = parseDocument(text, { prettyErrors: true, uniqueKeys: false, lineCounter: lines });
  } catch (e) {
    if (e instanceof RangeError) fail(`allowed: lists and maps nested at most ${MAX_SPEC_DEPTH} deep`, 'nested too deeply to read');
    throw e;
  }
  const error = doc.errors[0];
  if (error) {
    const pos = error.linePos?.[0];
    fail('allowed: valid YAML or JSON', `not valid YAML${pos ? ` at line ${pos.line}, column ${pos.col}` : ''}: ${error.message.split('\n')[0]}`);
  }
  let problem: string | null = null;
  try {
    visit(doc, (_key, node) => {
      if (!isMap(node)) return undefined;
      const seen = new Set<string>();
      for (const pair of node.items) {
        const k = pair.key as Node | null;
        const name = isScalar(k) ? String(k.value) : isAlias(k) ? `*${k.source}` : isCollection(k) ? String(k) : 'null';
        if (seen.has(name)) {
          problem = `not valid YAML${at(k?.range?.[0])}: the key ${JSON.stringify(name)} appears twice in one map (keys must be unique)`;
          return visit.BREAK;
        }
        seen.add(name);
      }
      return undefined;
    });
    if (problem) fail('allowed: valid YAML or JSON', problem);
    return doc.toJS({ maxAliasCount: MAX_SPEC_ALIASES });
  } catch (e) {
    if (e instanceof SpecError) throw e;
    const message = e instanceof Error ? e.message.split('\n')[0] : '';
    if (/alias count/i.test(message)) fail(`allowed: aliases (*name) that repeat a value at most ${MAX_SPEC_ALIASES} times in all`, `its aliases expand to too many values (a YAML alias bomb); reading stopped`);
    if (e instanceof RangeError) fail(`allowed: lists and maps nested at most ${MAX_SPEC_DEPTH} deep`, 'nested too deeply to read');
    if (e instanceof ReferenceError) fail('allowed: valid YAML or JSON', `not valid YAML: ${message}`);
    throw e;
  }
}

/**
 * The first list or map nested deeper than `limit`, from the yaml package's
 * concrete syntax tree (its parser keeps an explicit stack, so a deep text
 * cannot overflow ours), walked without recursion: linear in the text.
 * Null when the text stays within the limit.
 */
function deepestNesting(text: string, limit: number): { line: number; col: number } | null {
  const lines = new LineCounter();
  const open: { token: CST.Token | undefined; depth: number }[] = [];
  for (const doc of new Parser(lines.addNewLine).parse(text)) open.push({ token: doc.type === 'document' ? doc.value : undefined, depth: 0 });
  while (open.length > 0) {
    const { token, depth } = open.pop()!;
    if (token === undefined) continue;
    if (token.type !== 'block-map' && token.type !== 'block-seq' && token.type !== 'flow-collection') continue;
    if (depth + 1 > limit) return lines.linePos(token.offset);
    for (const item of token.items) {
      if ('key' in item) open.push({ token: item.key ?? undefined, depth: depth + 1 });
      open.push({ token: item.value, depth: depth + 1 });
    }
  }
  return null;
}
