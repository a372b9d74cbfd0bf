import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { flatStand, parseSpec, pieceRows } from '@umbrafab/geometry';
import { buildFiles, parseSpecText } from '@umbrafab/cli';
import { ezdxfDump } from './helpers/ezdxf.ts';
import { runAdmesh } from './helpers/admesh.ts';
import { jointsInDxf } from './helpers/standJoints.ts';

/**
 * stand.dxf and stand.stl read back by outside tools: ezdxf's audit (and
 * its reading of units, layers and z), shapely for every tab in its slot as
 * cut (test/helpers/stand_joint_fit.py: the tab's cross-section fits its slot
 * with process.clearance on every side), admesh for the assembled stand
 * (watertight, no repair).
 */

const ROOT = resolve(import.meta.dirname, '..');
const demoRaw = parseSpecText(readFileSync(join(ROOT, 'fixtures/demo.yaml'), 'utf8')) as Record<string, Record<string, unknown>>;
const dir = mkdtempSync(join(tmpdir(), 'umbrafab-stand-'));

const cases = [
  { name: 'demo (laser, 3 mm aluminium)', raw: demoRaw },
  { name: 'router, 6 mm plywood, 70° N (toe, dog-bones)', raw: { ...demoRaw, site: { ...demoRaw.site, latitude: 70 }, process: { method: 'router' }, plate: { thickness: 6, material: 'plywood' } } },
  { name: 'waterjet, 5 mm steel stand under a 3 mm plate, 41° S', raw: { ...demoRaw, site: { latitude: -41.3, longitude: 174.8, timezone: 'Pacific/Auckland' }, process: { method: 'waterjet' }, stand: { material: 'steel', thickness: 5 } } },
];

describe.each(cases)('stand.dxf and stand.stl: $name', ({ name, raw }) => {
  it('ezdxf audit, mm, layers; every tab fits its slot with the clearance (shapely); admesh clean', async () => {
    const spec = parseSpec(raw);
    const result = await buildFiles(spec);
    const names = result.files.map((f) => f.name);
    expect(names).toContain('stand.dxf');
    expect(names).toContain('stand.stl');
    expect(names).not.toContain('wedge.stl');
    const tag = name.split(' ')[0];
    const dxfPath = join(dir, `${tag}-stand.dxf`);
    const stlPath = join(dir, `${tag}-stand.stl`);
    writeFileSync(dxfPath, result.files.find((f) => f.name === 'stand.dxf')!.bytes);
    writeFileSync(stlPath, result.files.find((f) => f.name === 'stand.stl')!.bytes);

    const dump = ezdxfDump(dxfPath);
    expect(dump.errors).toEqual([]);
    expect(dump.insunits).toBe(4);
    expect([...dump.layers].sort()).toEqual(expect.arrayContaining(['CUT_PROFILE', 'REFERENCE_NO_CUT']));
    for (const e of dump.entities) for (const z of e.z ?? []) expect(z).toBe(0);

    // The joints in the drawing's coordinates (each piece's first copy).
    const stand = flatStand(result.layout);
    const pieces = pieceRows(stand.parts);
    const joints = jointsInDxf(stand, pieces);
    const jsonPath = join(dir, `${tag}-joints.json`);
    writeFileSync(jsonPath, JSON.stringify({ dxf: dxfPath, joints }));
    const fit = JSON.parse(execFileSync('/usr/bin/python3', [join(ROOT, 'test/helpers/stand_joint_fit.py'), jsonPath], { encoding: 'utf8' })) as {
      audit: string[];
      joints: { tabLength: number; tabDepth: number; inside: boolean; gap: number }[];
    };
    expect(fit.audit).toEqual([]);
    const c = spec.process.clearance;
    let worstGap = 0;
    fit.joints.forEach((f, i) => {
      expect(f.inside, `joint ${i}: tab inside its slot`).toBe(true);
      worstGap = Math.max(worstGap, Math.abs(f.gap - c));
      expect(f.gap, `joint ${i}: least gap = clearance`).toBeCloseTo(c, 5);
      expect(f.tabLength).toBeCloseTo(joints[i].nominalLength, 5);
      expect(f.tabDepth, `joint ${i}: tab as deep as the slotted part is thick`).toBeCloseTo(joints[i].slottedThickness, 5);
    });
    console.log(`${name}: ${fit.joints.length} joints, least tab-to-slot gap ${c} mm within ${worstGap.toExponential(1)} mm`);

    const a = runAdmesh(stlPath);
    expect(a.parts).toBe(stand.instances.length);
    for (const k of ['disconnectedFacets', 'degenerateFacets', 'edgesFixed', 'facetsRemoved', 'facetsAdded', 'facetsReversed', 'backwardsEdges', 'normalsFixed'] as const) expect(a[k], k).toBe(0);
    expect(a.min[2]).toBeCloseTo(0, 3);
  });
});
