import { STL_HEADER_BYTES } from './toStl.ts';

/**
 * An STL header from text fields: joined with " | ", any character outside
 * printable ASCII replaced by "?", a leading "solid" (which readers take
 * for the ASCII variant) prefixed with "umbrafab ", cut to the 80-byte
 * header of the binary layout. Fields come first to last in importance.
 *
 * @example stlHeader(['umbrafab gnomon h=50 t=3 mm', 'Quay Garden']) // 'umbrafab gnomon h=50 t=3 mm | Quay Garden'
 */
export function stlHeader(fields: readonly string[]): string {
  let s = fields.join(' | ').replace(/[^\x20-\x7e]/g, '?');
  if (/^\s*solid/i.test(s)) s = `umbrafab ${s}`;
  return s.slice(0, STL_HEADER_BYTES);
}
