import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runAdmesh } from '../../../../test/helpers/admesh.ts';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import { gnomonSolid, meshVolumeMm3, validateMesh, wedgeSolid, type Mesh } from '@umbrafab/geometry';
import { toStl } from './toStl.ts';

// Outside check: Debian's admesh reads each STL and runs its full default
// check-and-repair pass; a clean part needs no repair at all (docs/design.md §7).
const dir = mkdtempSync(join(tmpdir(), 'umbrafab-stl-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const PARTS: Array<[string, () => Mesh]> = [
  ['gnomon (defaults)', () => gnomonSolid().mesh],
  ['gnomon with nodus notch, 3 tabs', () =>
    gnomonSolid({
      heightMm: 13.4, thicknessMm: 3, lengthMm: 150, nodus: { kind: 'notch', yMm: 0, sizeMm: 3 },
      tabs: [{ centerYMm: -50, lengthMm: 12, depthMm: 3 }, { centerYMm: 0, lengthMm: 12, depthMm: 3 }, { centerYMm: 50, lengthMm: 12, depthMm: 3 }],
    }).mesh],
  ...[0, 5, 45, 70, -35, 89].map((lat): [string, () => Mesh] => [`wedge lat ${lat} deg`, () => wedgeSolid({ latitudeDeg: lat }).mesh]),
  ['wedge lat 52 deg, 4 holes', () => wedgeSolid({ latitudeDeg: 52, holes: { count: 4 } }).mesh],
  ['wedge lat 20 deg, plain holes, no arrow', () => wedgeSolid({ latitudeDeg: 20, holes: { countersink: null }, arrow: null }).mesh],
];

describe('part STL files pass admesh without repair', () => {
  it.each(PARTS)('%s', (name, build) => {
    const mesh = validateMesh(build());
    const file = join(dir, `${name.replace(/[^a-z0-9]+/gi, '_')}.stl`);
    writeFileSync(file, toStl(mesh, { header: `umbrafab ${name}` }));
    const r = runAdmesh(file);
    expect(r.fileType).toBe('Binary STL file');
    expect(r.facets).toBe(mesh.triangles.length);
    expect(r.facetsFinal).toBe(mesh.triangles.length);
    expect(r.disconnectedFacets).toBe(0);
    expect(r.facetsWith1DisconnectedEdge + r.facetsWith2DisconnectedEdges + r.facetsWith3DisconnectedEdges).toBe(0);
    expect(r.parts).toBe(1);
    expect(r.degenerateFacets).toBe(0);
    expect(r.edgesFixed).toBe(0);
    expect(r.facetsRemoved).toBe(0);
    expect(r.facetsAdded).toBe(0);
    expect(r.facetsReversed).toBe(0);
    expect(r.backwardsEdges).toBe(0);
    expect(r.normalsFixed).toBe(0);
    expect(r.volumeMm3).toBeGreaterThan(0);
    // admesh sums in float32 from float32 corners: agree to 0.01 %.
    const v = meshVolumeMm3(mesh);
    expectClose(r.volumeMm3, v, 1e-4 * v, `${name} admesh volume`, ' mm³');
    console.log(`${name}: ${r.facets} facets, admesh volume ${r.volumeMm3} mm³ (mesh ${v.toFixed(3)})`);
  });
});
