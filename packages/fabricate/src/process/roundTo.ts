/**
 * Round to `decimals` places for byte-stable output, mapping −0 to 0.
 * Every writer rounds through here (STYLE habit 9: round in one place).
 */
export function roundTo(value: number, decimals = 6): number {
  const f = 10 ** decimals;
  const r = Math.round(value * f) / f;
  return r === 0 ? 0 : r;
}
