import { readFileSync } from 'node:fs';
import { parse as parseYaml, YAMLParseError } from 'yaml';
import { SpecError, parseSpec, type DialSpec } from '@umbrafab/geometry';

/**
 * Read a spec file (YAML, or JSON, which YAML 1.2 reads too) and normalise it
 * with `parseSpec`, the one normaliser. Every failure is a SpecError naming
 * the file or the field.
 */
export function readSpecFile(path: string): DialSpec {
  return parseSpec(readRawSpec(path));
}

/**
 * A spec file's contents as written (before validation), for commands that
 * change a field and normalise again (batch, check --year). File problems
 * name the path; an empty file (or one of comments only) says so.
 */
export function readRawSpec(path: string): unknown {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? `no such file: ${path}` : code === 'EISDIR' ? `${path} is a folder, not a file` : code === 'EACCES' ? `permission denied: ${path}` : `cannot read ${path}: ${String((e as Error).message)}`;
    throw new SpecError('spec file', path, 'allowed: the path of a readable .yaml or .json dial spec (umbrafab init writes one)', why);
  }
  const raw = parseSpecText(text, path);
  if (raw === null || raw === undefined) {
    throw new SpecError('spec file', path, 'allowed: a dial spec with at least a site: section (umbrafab init writes a starter)', text.trim() === '' ? `${path} is empty` : `${path} holds only comments, no fields`);
  }
  return raw;
}

/** Parse YAML/JSON text to a plain value; syntax errors name the file, line and column. */
export function parseSpecText(text: string, source = 'spec'): unknown {
  try {
    return parseYaml(text, { prettyErrors: true, uniqueKeys: true });
  } catch (e) {
    if (e instanceof YAMLParseError) {
      const pos = e.linePos?.[0];
      const where = pos ? ` at line ${pos.line}, column ${pos.col}` : '';
      throw new SpecError('spec file', source, 'allowed: valid YAML or JSON', `not valid YAML${where}: ${e.message.split('\n')[0]}`);
    }
    throw e;
  }
}
