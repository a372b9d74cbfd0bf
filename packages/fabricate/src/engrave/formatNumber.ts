import { assertFinite } from '@umbrafab/geometry';

/**
 * The one place where G-code numbers are rounded, so output is byte-stable:
 * `toFixed(decimals)` (exactly specified by ECMA-262, the same on every
 * machine), with a negative zero written as zero ('-0.000' → '0.000').
 * With `trim`, trailing zeros and a bare point are dropped ('400.000' → '400').
 *
 * @example formatNumber(-0.0001, 3) // '0.000'
 * @example formatNumber(12.5, 3, true) // '12.5'
 */
export function formatNumber(value: number, decimals: number, trim = false): string {
  assertFinite('value', value);
  let text = value.toFixed(decimals);
  if (text.charCodeAt(0) === 0x2d && /^-0(\.0*)?$/.test(text)) text = text.slice(1);
  if (trim && text.includes('.')) text = text.replace(/0+$/, '').replace(/\.$/, '');
  return text;
}
