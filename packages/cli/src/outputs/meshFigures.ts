import { meshBounds, meshVolumeMm3, type Mesh } from '@umbrafab/geometry';

/** Volume, bounding box and facet count of a part's mesh as written (its file's frame), mm³ and mm. */
export interface MeshFigures {
  readonly volumeMm3: number;
  readonly bbox: { readonly minMm: readonly number[]; readonly maxMm: readonly number[] };
  readonly facets: number;
}

/**
 * Volume, bounding box and facet count of a written part, as report.json
 * gives them for the printed parts.
 * @example meshFigures(gnomon.mesh).volumeMm3
 */
export function meshFigures(mesh: Mesh): MeshFigures {
  const b = meshBounds(mesh);
  return { volumeMm3: meshVolumeMm3(mesh), bbox: { minMm: b.min, maxMm: b.max }, facets: mesh.triangles.length };
}
