import type { Mark } from '../types.ts';

/**
 * Where each whole hour's numeral centres across a polar face: the mean x
 * (face coordinates, mm) of the hour marks with that label (one, or one per
 * style edge), in the order the hours first appear among the marks.
 * @example hourCentres(layoutDial(spec).marks)[0] // { label: '06:00', xMm: -151.2 }
 */
export function hourCentres(marks: readonly Mark[]): { readonly label: string; readonly xMm: number }[] {
  const byLabel = new Map<string, number[]>();
  for (const m of marks) if (m.kind === 'hour') byLabel.set(m.label, [...(byLabel.get(m.label) ?? []), m.xMm]);
  return [...byLabel].map(([label, xs]) => ({ label, xMm: xs.reduce((s, v) => s + v, 0) / xs.length }));
}
