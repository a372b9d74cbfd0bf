import type { DialSpec } from '../spec/schema.ts';
import type { Circle, RoundedRect } from '../types.ts';
import type { GnomonTab } from './gnomonTabs.ts';
import type { DrawnPlate } from './plateDrawing.ts';

/** A face's plate as its layout lays it out (polar `PlateLayout`, planar `PlanarPlateLayout`): the drawn plate and its thickness. */
export interface LaidOutPlate extends DrawnPlate {
  readonly thicknessMm: number;
}

/**
 * The plate both face layouts end with: its size, `plate.thickness`, the
 * corner radius clamped to half the shorter side, where the face origin
 * sits, the holes given, and one slot per gnomon tab (tab plus
 * `process.clearance` on every side, square-cornered, on the substyle).
 * @param at size and face origin in plate coordinates, mm
 * @example laidOutPlate(spec, { widthMm: 120, lengthMm: 200, substyleX: 60, faceOriginY: 90 }, gnomon.tabs, holes)
 */
export function laidOutPlate(
  spec: DialSpec,
  at: { readonly widthMm: number; readonly lengthMm: number; readonly substyleX: number; readonly faceOriginY: number },
  tabs: readonly GnomonTab[],
  holes: readonly Circle[],
): LaidOutPlate {
  const { widthMm, lengthMm, substyleX, faceOriginY } = at;
  const clearance = spec.process.clearance;
  const slots: RoundedRect[] = tabs.map((tab) => ({
    kind: 'rect' as const,
    cx: substyleX,
    cy: faceOriginY + tab.centerYMm,
    widthMm: spec.gnomon.thickness + 2 * clearance,
    heightMm: tab.lengthMm + 2 * clearance,
    cornerRadiusMm: 0,
  }));
  return {
    widthMm,
    lengthMm,
    thicknessMm: spec.plate.thickness,
    cornerRadiusMm: Math.min(spec.plate.cornerRadius, widthMm / 2, lengthMm / 2),
    substyleX,
    faceOriginY,
    holes,
    slots,
  };
}
