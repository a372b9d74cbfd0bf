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

/** The figures report.json gives for a written STL of sheet parts or a mount: volume, facets, the shells it holds (one per part as assembled), bounding box. */
export interface StlFigures {
  readonly volumeMm3: number;
  readonly facets: number;
  readonly shells?: number;
  readonly bbox: { readonly minMm: readonly number[]; readonly maxMm: readonly number[] };
}

/**
 * `StlFigures` of a written mesh (in its file's frame), `shells` only when given.
 * @example stlFigures(mesh, 7).shells // 7
 */
export function stlFigures(mesh: Mesh): Omit<StlFigures, 'shells'>;
export function stlFigures(mesh: Mesh, shells: number): Required<StlFigures>;
export function stlFigures(mesh: Mesh, shells?: number): StlFigures {
  const b = meshBounds(mesh);
  return { volumeMm3: meshVolumeMm3(mesh), facets: mesh.triangles.length, ...(shells !== undefined ? { shells } : {}), bbox: { minMm: b.min, maxMm: b.max } };
}
