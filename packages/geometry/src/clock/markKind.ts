import type { MarkKind } from '../types.ts';

/**
 * Which of the three line lengths a clock time gets on any face: whole
 * hours 'hour', half hours 'half', every other grid time 'quarter'.
 * @param minutes clock time, minutes after midnight
 * @example markKindAt(9 * 60 + 30) // 'half'
 */
export function markKindAt(minutes: number): MarkKind {
  return minutes % 60 === 0 ? 'hour' : minutes % 30 === 0 ? 'half' : 'quarter';
}
