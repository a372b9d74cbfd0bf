import { spawnSync } from 'node:child_process';

/**
 * Statistics that Debian's `admesh` (ADMesh 0.98.x, A. D. Martin) prints for
 * an STL file after its default check-and-repair pass (exact, nearby,
 * remove-unconnected, fill-holes, normal-directions, normal-values; the input
 * file is not modified). A clean part shows zero for every repair counter.
 * "Original" values are as read, before any repair.
 */
export interface AdmeshReport {
  readonly fileType: string;
  readonly header: string;
  readonly min: readonly [number, number, number];
  readonly max: readonly [number, number, number];
  readonly facets: number;
  readonly facetsFinal: number;
  readonly facetsWith1DisconnectedEdge: number;
  readonly facetsWith2DisconnectedEdges: number;
  readonly facetsWith3DisconnectedEdges: number;
  readonly disconnectedFacets: number;
  readonly parts: number;
  readonly volumeMm3: number;
  readonly degenerateFacets: number;
  readonly edgesFixed: number;
  readonly facetsRemoved: number;
  readonly facetsAdded: number;
  readonly facetsReversed: number;
  readonly backwardsEdges: number;
  readonly normalsFixed: number;
  readonly raw: string;
}

/**
 * Run `admesh <file>` and parse its results table. A 60 s guard stops a
 * hung run (admesh is known to hang on files whose normals are all zero,
 * DEPS.md); the guard is not a timing check.
 */
export function runAdmesh(file: string): AdmeshReport {
  const run = spawnSync('admesh', [file], { encoding: 'utf8', timeout: 60_000 });
  if (run.error) throw new Error(`admesh ${file}: ${run.error.message}`);
  const raw = `${run.stdout}${run.stderr}`;
  if (run.status !== 0) throw new Error(`admesh ${file} exited with ${run.status}:\n${raw}`);
  return parseAdmesh(raw);
}

/** Parse the text admesh prints (exported for tests of the parser itself). */
export function parseAdmesh(raw: string): AdmeshReport {
  const pick = (label: string): string => {
    const m = new RegExp(`^${label.replace(/[()]/g, '\\$&')}\\s*:\\s*(.*)$`, 'm').exec(raw);
    if (!m) throw new Error(`admesh output has no "${label}" line:\n${raw}`);
    return m[1];
  };
  const num = (label: string): number => {
    const v = Number(pick(label).trim().split(/\s+/)[0]);
    if (!Number.isFinite(v)) throw new Error(`admesh "${label}" is not a number: ${pick(label)}`);
    return v;
  };
  const pair = (label: string): [number, number] => {
    const [a, b] = pick(label).trim().split(/\s+/).map(Number);
    return [a, b];
  };
  const axis = (c: 'X' | 'Y' | 'Z'): [number, number] => {
    const m = new RegExp(`Min ${c} =\\s*(\\S+), Max ${c} =\\s*(\\S+)`).exec(raw);
    if (!m) throw new Error(`admesh output has no size line for ${c}`);
    return [Number(m[1]), Number(m[2])];
  };
  const volume = /Volume\s*:\s*(\S+)/.exec(raw);
  if (!volume) throw new Error(`admesh output has no volume:\n${raw}`);
  const partsM = /Number of parts\s*:\s*(\d+)/.exec(raw);
  const [x, y, z] = [axis('X'), axis('Y'), axis('Z')];
  const [facets, facetsFinal] = pair('Number of facets');
  return {
    fileType: pick('File type').trim(),
    header: pick('Header'),
    min: [x[0], y[0], z[0]],
    max: [x[1], y[1], z[1]],
    facets,
    facetsFinal,
    facetsWith1DisconnectedEdge: num('Facets with 1 disconnected edge'),
    facetsWith2DisconnectedEdges: num('Facets with 2 disconnected edges'),
    facetsWith3DisconnectedEdges: num('Facets with 3 disconnected edges'),
    disconnectedFacets: num('Total disconnected facets'),
    parts: partsM ? Number(partsM[1]) : NaN,
    volumeMm3: Number(volume[1]),
    degenerateFacets: num('Degenerate facets'),
    edgesFixed: num('Edges fixed'),
    facetsRemoved: num('Facets removed'),
    facetsAdded: num('Facets added'),
    facetsReversed: num('Facets reversed'),
    backwardsEdges: num('Backwards edges'),
    normalsFixed: num('Normals fixed'),
    raw,
  };
}
