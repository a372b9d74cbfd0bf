import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

/** What test/helpers/svg_rows.py reads from a check.svg (Python's xml.etree: a well-formed SVG or a throw). */
export interface SvgRows {
  readonly width: number;
  readonly height: number;
  /** the titled <rect>s: one per worst-error row */
  readonly rows: readonly { readonly cls: string; readonly title: string; readonly x: number; readonly width: number }[];
  readonly texts: readonly { readonly cls: string; readonly text: string }[];
}

/** Parse a check.svg with /usr/bin/python3's XML parser and list its rows and texts. */
export function readSvgRows(file: string): SvgRows {
  const script = fileURLToPath(new URL('./svg_rows.py', import.meta.url));
  return JSON.parse(execFileSync('/usr/bin/python3', [script, file], { encoding: 'utf8' })) as SvgRows;
}
