import { SpecError } from '../errors.ts';
import type { DialSpec } from '../spec/schema.ts';

/** A gnomon tab through the plate: face y of its centre and its length along the substyle, mm. */
export interface GnomonTab {
  readonly centerYMm: number;
  readonly lengthMm: number;
}

/**
 * `gnomon.tabs` tabs of `gnomon.tabLength` spread evenly along the stretch
 * from face y `y0` to `y1` (each centred in its 1/n of it), for the polar
 * plate's style and a planar fin's footprint alike.
 * @param what the stretch named in the refusal ('style' or 'footprint')
 * @throws SpecError naming `gnomon.tabLength` when the tabs take more than 80 % of the stretch
 * @example gnomonTabs(spec, -40, 40, 'style') // two tabs centred at −20 and 20 with the default spec
 */
export function gnomonTabs(spec: DialSpec, y0: number, y1: number, what: 'style' | 'footprint'): GnomonTab[] {
  const L = y1 - y0;
  const n = spec.gnomon.tabs;
  const tl = spec.gnomon.tabLength;
  if (n * tl > L * 0.8) {
    throw new SpecError('gnomon.tabLength', tl, `allowed: tabs taking at most 80 % of the ${L.toFixed(1)} mm ${what}, i.e. up to ${((L * 0.8) / n).toFixed(1)} mm each for ${n} tabs`);
  }
  return Array.from({ length: n }, (_, i) => ({ centerYMm: y0 + (L * (2 * i + 1)) / (2 * n), lengthMm: tl }));
}
