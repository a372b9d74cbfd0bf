import type { PlateDrawing } from '@umbrafab/geometry';

/** Results already computed in this process, by plate drawing (identity) and key. */
const memo = new WeakMap<PlateDrawing, Map<string, unknown>>();

/**
 * `make()` once per plate drawing and key: a producer's work that depends
 * only on the drawing and the spec fields named in `key` (JSON text) is done
 * once for every latitude of a batch that shares the drawing (umbrafab batch
 * hands the same drawing object to every latitude whose face is the same).
 * A promise is kept as it is, so a failure is the same failure each time.
 * Entries go with their drawing (a WeakMap), so a long-running page server
 * keeps none of an old build's.
 *
 * @example perDrawing(drawing, `engrave ${engravingPlanKey(spec)}`, () => planEngraving(spec, drawing))
 */
export function perDrawing<T>(drawing: PlateDrawing, key: string, make: () => T): T {
  let byKey = memo.get(drawing);
  if (!byKey) memo.set(drawing, (byKey = new Map()));
  if (!byKey.has(key)) byKey.set(key, make());
  return byKey.get(key) as T;
}
