import { indexOf, relieveAlong } from './standJoinery.ts';
import type { Vec2 } from '../types.ts';

/** A member between a stand's two cheeks: its relieved outline and the root corners of its two end tabs. */
export interface CrossMemberOutline {
  /** counter-clockwise, the member's own drawing: x along it from its −x tab's end, y across from 0 to its height, mm */
  readonly outline: readonly Vec2[];
  /** corner index of the −x end tab's root (the tab runs down, −y) and of the +x end tab's root (it runs up) */
  readonly tabVertex: readonly [number, number];
}

/**
 * The member that holds a stand's cheeks square and parallel (the polar
 * stand's cross member, the equatorial stand's hub): a body between the
 * cheeks' inner faces (x = T to 2·xc) with an end tab one sheet long
 * through each cheek, over the middle half of its height; the tabs' inside
 * corners, on the cheeks' inner faces, relieved for the tool.
 * @param cheekOffsetMm xc: each cheek's mid-plane from the stand's middle, mm
 * @example crossMemberOutline(60, 6, 40, 0, 0.01).outline.length // 12
 */
export function crossMemberOutline(cheekOffsetMm: number, thicknessMm: number, heightMm: number, toolRadiusMm: number, toleranceMm: number): CrossMemberOutline {
  const xc = cheekOffsetMm;
  const T = thicknessMm;
  const Lc = 2 * xc + T;
  const y0 = heightMm / 4;
  const y1 = (3 * heightMm) / 4;
  const outer: Vec2[] = [[T, 0], [2 * xc, 0], [2 * xc, y0], [Lc, y0], [Lc, y1], [2 * xc, y1], [2 * xc, heightMm], [T, heightMm], [T, y1], [0, y1], [0, y0], [T, y0]];
  // The tabs' inside corners lie on the cheeks' inner faces: x = T (walked down) and x = 2·xc (walked up).
  const outline = relieveAlong(relieveAlong(outer, [T, 0], [0, -1], toolRadiusMm, toleranceMm), [2 * xc, 0], [0, 1], toolRadiusMm, toleranceMm);
  return { outline, tabVertex: [indexOf(outline, [T, y1]), indexOf(outline, [2 * xc, y0])] };
}
