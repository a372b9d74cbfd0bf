import { readFileSync } from 'node:fs';
import { parse as parseYaml, YAMLParseError } from 'yaml';
import { SpecError, parseSpec, type DialSpec } from '@umbrafab/geometry';

/**
 * Read a spec file (YAML, or JSON, which YAML 1.2 reads too) and validate it.
 * Every failure is a SpecError naming the file or the field.
 */
export function readSpecFile(path: string): DialSpec {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'this is a folder, not a file' : code === 'EACCES' ? 'permission denied' : String((e as Error).message);
    throw new SpecError('spec file', path, 'allowed: the path of a readable .yaml or .json dial spec (umbrafab init writes one)', why);
  }
  return parseSpec(parseSpecText(text, path));
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
