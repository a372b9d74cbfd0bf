import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { layoutPlanar, METRIC_SIZES, parseSpec, wallMount, WALL_MOUNT_RIM_MM, type PlanarLayout } from '@umbrafab/geometry';
import { buildAnyFiles, parseSpecText, type PlanarReport } from '@umbrafab/cli';
import { ezdxfDump } from './helpers/ezdxf.ts';
import { runAdmesh } from './helpers/admesh.ts';

/**
 * The wall mount of a wall face (mount.dxf, mount.stl): read back by ezdxf
 * (audit), admesh (watertight, no repair) and shapely (test/helpers/
 * mount_fit.py: the dial plate's footprint inside the mount, the anchors'
 * washers clear of it). The mount's dial holes are checked against
 * plate.dxf's own holes as ezdxf reads them: same centres (moved by the
 * rim), the tap drill inside the plate's clearance hole. Tap drill = nominal
 * − pitch for ISO coarse threads (common practice); washer diameters from
 * ISO 7089 (recalled from memory, as in metricFasteners.ts).
 */

const ROOT = resolve(import.meta.dirname, '..');
const dir = mkdtempSync(join(tmpdir(), 'umbrafab-mount-'));
const specOf = (name: string) => parseSpec({ ...(parseSpecText(readFileSync(join(ROOT, `fixtures/planar/${name}.yaml`), 'utf8')) as object), pictures: { write: false } });

describe.each(['wall-declining', 'wall-reclining', 'meridian-east'])('wall mount: %s', (name) => {
  it('mount.dxf holes on plate.dxf holes, anchors clear of the plate (shapely), ezdxf and admesh clean, report and install.md list it', async () => {
    const result = await buildAnyFiles(specOf(name));
    const file = (n: string) => {
      const f = result.files.find((x) => x.name === n);
      if (!f) throw new Error(`${name}: no ${n}`);
      const p = join(dir, `${name}-${n}`);
      writeFileSync(p, f.bytes);
      return p;
    };
    const mountDump = ezdxfDump(file('mount.dxf'));
    const plateDump = ezdxfDump(file('plate.dxf'));
    expect(mountDump.errors).toEqual([]);
    expect(mountDump.insunits).toBe(4);
    const R = WALL_MOUNT_RIM_MM;
    const circles = (d: typeof mountDump) => d.entities.filter((e) => e.type === 'CIRCLE' && e.layer === 'CUT_PROFILE');
    const plateHoles = circles(plateDump);
    const mountHoles = circles(mountDump);
    expect(plateHoles.length).toBeGreaterThan(0);
    expect(mountHoles.length).toBe(plateHoles.length + 4);
    for (const h of plateHoles) {
      const m = mountHoles.find((c) => Math.hypot(c.center![0] - h.center![0] - R, c.center![1] - h.center![1] - R) < 1e-6);
      expect(m, `a mount hole under the plate hole at ${h.center}`).toBeDefined();
      const screw = [...METRIC_SIZES].reverse().find((s) => s.clearanceHoleMm <= 2 * h.radius! + 1e-9)!;
      expect(2 * m!.radius!).toBeCloseTo(screw.nominalMm - screw.pitchMm, 6);
      expect(m!.radius!).toBeLessThan(h.radius!);
    }
    const outer = mountDump.entities.find((e) => e.type === 'LWPOLYLINE' && e.layer === 'CUT_PROFILE')!;
    const planar = result.report as PlanarReport;
    const report = { plate: planar.plate, mount: planar.mount! };
    const anchors = report.mount.anchors;
    for (const a of anchors) expect(mountHoles.some((c) => Math.hypot(c.center![0] - a.xMm, c.center![1] - a.yMm) < 1e-6 && Math.abs(2 * c.radius! - a.diameterMm) < 1e-6)).toBe(true);
    const job = join(dir, `${name}-fit.json`);
    writeFileSync(job, JSON.stringify({ mount: outer.points!.map(([x, y]) => [x, y]), plate: [R, R, R + report.plate.widthMm, R + report.plate.lengthMm], anchors: anchors.map((a) => [a.xMm, a.yMm, a.diameterMm]), washerMm: 12 }));
    const fit = JSON.parse(execFileSync('/usr/bin/python3', [join(ROOT, 'test/helpers/mount_fit.py'), job], { encoding: 'utf8' })) as Record<string, number | boolean>;
    console.log(`${name}: mount ${report.mount.widthMm} x ${report.mount.lengthMm} mm, anchor washer to plate ${(fit.washerToPlateMm as number).toFixed(2)} mm, to edge ${(fit.washerToEdgeMm as number).toFixed(2)} mm`);
    expect(fit).toMatchObject({ mountValid: true, plateInside: true, washersInside: true });
    expect(fit.washerToPlateMm as number).toBeGreaterThan(5);
    expect(fit.washerToEdgeMm as number).toBeGreaterThan(5);

    const stl = runAdmesh(file('mount.stl'));
    expect({ parts: stl.parts, degenerate: stl.degenerateFacets, edgesFixed: stl.edgesFixed, removed: stl.facetsRemoved, added: stl.facetsAdded, reversed: stl.facetsReversed, backwards: stl.backwardsEdges, normals: stl.normalsFixed }).toEqual({ parts: 1, degenerate: 0, edgesFixed: 0, removed: 0, added: 0, reversed: 0, backwards: 0, normals: 0 });
    expect(stl.max[0]).toBeCloseTo(report.mount.widthMm, 3);
    expect(stl.max[1]).toBeCloseTo(report.mount.lengthMm, 3);

    expect(report.mount.fixings.length).toBe(plateHoles.length);
    expect(report.mount.fasteners.map((f) => [f.use, f.count])).toEqual([['dial plate to mount', plateHoles.length], ['mount to the wall', 4]]);
    // Tapped in an aluminium mount: the screw's tip stays inside the mount (its back lies flat on the wall), with at least three threads engaged (common practice for thin sheet).
    const t = report.plate.thicknessMm;
    const screwLength = report.mount.fasteners[0].lengthMm!;
    expect(report.mount.dialFixing).toBe('tapped');
    expect(screwLength).toBeLessThanOrEqual(t + report.mount.thicknessMm);
    expect(report.mount.threadEngagementMm).toBeCloseTo(screwLength - t, 9);
    const pitch = [...METRIC_SIZES].reverse().find((s) => s.clearanceHoleMm <= 2 * plateHoles[0].radius! + 1e-9)!.pitchMm;
    expect(report.mount.threadEngagementMm!).toBeGreaterThanOrEqual(3 * pitch);
    const md = readFileSync(file('install.md'), 'utf8');
    expect(md).toMatch(/plumb line \(plumb bob\) and a level line \(spirit level\)/);
    expect(md).toMatch(new RegExp(`fix the mount through its 4 anchor holes`));
  });
});

describe('wall mount: a mount that cannot hold a thread', () => {
  it.each([
    ['slate', 5],
    ['aluminium', 2],
  ] as const)('a %s mount of %d mm takes the dial plate through it into wall plugs: clearance holes like the plate\'s', async (material, thickness) => {
    const spec = parseSpec({ ...(parseSpecText(readFileSync(join(ROOT, 'fixtures/planar/wall-declining.yaml'), 'utf8')) as object), plate: { material, thickness }, pictures: { write: false } });
    const m = wallMount(layoutPlanar(spec))!;
    expect(m.dialFixing).toBe('through');
    expect(m.threadEngagementMm).toBeNull();
    for (const f of m.fixings) expect(f.mountHoleMm).toBe(f.plateHoleMm);
    expect(m.fasteners[0].use).toBe('dial plate through the mount to the wall');
    // long enough to pass plate and mount and reach a plug's depth (ANCHOR_EMBED_MM 45 as a first figure)
    expect(m.fasteners[0].lengthMm!).toBeGreaterThanOrEqual(2 * thickness + 45);
    const r = await buildAnyFiles(spec);
    const md = new TextDecoder().decode(r.files.find((f) => f.name === 'install.md')!.bytes);
    expect(md).toMatch(/Drill the wall through the mount's \d+ dial holes, set a wall plug in each/);
    expect(md).not.toMatch(/tap them/);
  });
});

describe('wall mount: plumb and level reference lines', () => {
  it('the plumb line leans from the mount\'s long edges by the plate\'s turn, the level line square to it, both through the root', () => {
    const layout = buildLayout('wall-declining');
    const m = wallMount(layout)!;
    const ref = (label: string) => m.part.reference!.find((r) => r.label === label)!.path.points;
    const [p0, p1] = ref('plumb line');
    const [l0, l1] = ref('level line');
    const lean = (Math.atan2(-(p1[0] - p0[0]), p1[1] - p0[1]) * 180) / Math.PI;
    expect(Math.abs(layout.plateTurnDeg)).toBeGreaterThan(1);
    expect(lean).toBeCloseTo(layout.plateTurnDeg, 9);
    expect((p1[0] - p0[0]) * (l1[0] - l0[0]) + (p1[1] - p0[1]) * (l1[1] - l0[1])).toBeCloseTo(0, 6);
    const root = [layout.plate.substyleX + WALL_MOUNT_RIM_MM, layout.plate.faceOriginY + WALL_MOUNT_RIM_MM];
    const off = (a: readonly number[], b: readonly number[]) => Math.abs((b[0] - a[0]) * (root[1] - a[1]) - (b[1] - a[1]) * (root[0] - a[0])) / Math.hypot(b[0] - a[0], b[1] - a[1]);
    expect(off(p0, p1)).toBeLessThan(1e-9);
    expect(off(l0, l1)).toBeLessThan(1e-9);
  });

  it('no mount for a horizontal or equatorial face (they stand on a pillar or a stand)', async () => {
    for (const name of ['garden-horizontal', 'equatorial']) {
      expect(wallMount(buildLayout(name))).toBeNull();
      const r = await buildAnyFiles(specOf(name));
      expect(r.files.map((f) => f.name)).not.toContain('mount.dxf');
      expect(r.files.map((f) => f.name)).not.toContain('mount.stl');
    }
  });
});

function buildLayout(name: string): PlanarLayout {
  return layoutPlanar(specOf(name));
}
