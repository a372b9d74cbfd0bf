import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseSpec } from '@umbrafab/geometry';
import { buildFiles, parseSpecText, readSpecFile } from '@umbrafab/cli';
import { runAdmesh } from './helpers/admesh.ts';
import { readFileSync } from 'node:fs';

const ROOT = resolve(import.meta.dirname, '..');
const demoRaw = parseSpecText(readFileSync(join(ROOT, 'fixtures/demo.yaml'), 'utf8')) as Record<string, unknown>;

/** Every STL that `umbrafab build` writes for these specs goes through admesh. */
const SPECS = [
  { name: 'demo, wedge.stl asked for (laser)', spec: () => parseSpec({ ...demoRaw, parts: { write: ['gnomon.dxf', 'wedge.stl'] } }), expect: ['wedge.stl'] },
  { name: 'demo, every part file', spec: () => parseSpec({ ...demoRaw, parts: { write: ['gnomon.stl', 'gnomon.dxf', 'wedge.stl', 'body.stl'] } }), expect: ['gnomon.stl', 'wedge.stl', 'body-1-of-2.stl', 'body-2-of-2.stl'] },
  { name: 'print, north, body and nodus (fixtures/specs/parts-print.yaml)', spec: () => readSpecFile(join(ROOT, 'fixtures/specs/parts-print.yaml')), expect: ['gnomon.stl', 'plate.stl', 'wedge.stl', 'body.stl'] },
  { name: 'print, south, body on its wedge (fixtures/specs/parts-south.yaml)', spec: () => readSpecFile(join(ROOT, 'fixtures/specs/parts-south.yaml')), expect: ['gnomon.stl', 'wedge.stl', 'body.stl'] },
];

const dir = mkdtempSync(join(tmpdir(), 'umbrafab-parts-stl-'));
const built = await Promise.all(SPECS.map(async (s) => ({ ...s, result: await buildFiles(s.spec()) })));

describe.each(built)('STL files of $name', ({ name, result, expect: names }) => {
  const stls = result.files.filter((f) => f.name.endsWith('.stl'));

  it('writes the STL files the process and parts.write call for', () => {
    expect(stls.map((f) => f.name)).toEqual(names);
  });

  it.each(names)('%s passes admesh with no repair, positive volume, volume as report.json', (file) => {
    // Outside check: Debian's admesh (ADMesh 0.98) reads the binary STL and
    // runs its default check-and-repair pass; a clean part needs none of it.
    const f = stls.find((s) => s.name === file)!;
    const path = join(dir, `${name.replace(/[^a-z0-9]+/gi, '_')}_${file}`);
    writeFileSync(path, f.bytes);
    const r = runAdmesh(path);
    expect(r.fileType).toBe('Binary STL file');
    expect(r.header).toMatch(/^umbrafab /);
    expect(r.facetsFinal).toBe(r.facets);
    expect(r.disconnectedFacets).toBe(0);
    expect(r.facetsWith1DisconnectedEdge + r.facetsWith2DisconnectedEdges + r.facetsWith3DisconnectedEdges).toBe(0);
    expect(r.parts).toBe(1);
    expect(r.degenerateFacets).toBe(0);
    expect([r.edgesFixed, r.facetsRemoved, r.facetsAdded, r.facetsReversed, r.backwardsEdges, r.normalsFixed]).toEqual([0, 0, 0, 0, 0, 0]);
    expect(r.volumeMm3).toBeGreaterThan(0);
    // A part split to fit the print bed reports each piece under its split section.
    const key = file.replace(/(-\d+-of-\d+)?\.stl$/, '') as 'gnomon' | 'plate' | 'wedge' | 'body';
    type Figures = { volumeMm3: number; facets: number };
    const whole = (result.report.parts as unknown as Record<string, Figures & { split?: { pieces: (Figures & { file: string })[] } }>)[key];
    const reported = whole.split ? whole.split.pieces.find((p) => p.file === file)! : whole;
    expect(r.facets).toBe(reported.facets);
    // admesh sums float32 corners in float32: agree with the float64 mesh volume to 0.01 %.
    expect(Math.abs(r.volumeMm3 - reported.volumeMm3)).toBeLessThanOrEqual(1e-4 * reported.volumeMm3);
    console.log(`${name} ${file}: ${r.facets} facets, 0 disconnected, 0 degenerate, 0 repairs, admesh volume ${r.volumeMm3} mm³ (mesh ${reported.volumeMm3.toFixed(1)} mm³)`);
  });
});
