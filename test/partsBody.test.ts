import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { bodySolid, layoutDial, partsPlan, plateDrawing, validateMesh } from '@umbrafab/geometry';
import { readSpecFile } from '@umbrafab/cli';
import { expectClose } from './helpers/closeTo.ts';

const ROOT = resolve(import.meta.dirname, '..');

describe('body.stl solid (manifold-3d booleans)', () => {
  it('print north: volume = plate prism − groove prism + fin − fin foot over the plate, within 0.1 per cent', async () => {
    const spec = readSpecFile(join(ROOT, 'fixtures/specs/parts-print.yaml'));
    const layout = layoutDial(spec);
    const plan = partsPlan(layout);
    const body = await bodySolid(layout, plateDrawing(layout), plan, null);
    validateMesh(body.mesh);
    const T = layout.plate.thicknessMm;
    const d = body.grooveDepthMm;
    const footArea = plan.gnomon.thicknessMm * plan.gnomon.lengthMm;
    // Right prisms, V = A · height (common practice): the plate section (outline minus holes)
    // over T, less the groove section over d; plus the fin, less the part of it that sinks
    // d into plate material (its foot, except where it stands over a groove).
    const a = body.areasMm2;
    const expected = a.plate * T - a.grooves * d + body.finVolumeMm3 - d * (footArea - a.finOverGrooves);
    expectClose(body.volumeMm3, expected, 0.001 * expected, 'body volume', ' mm³');
    console.log(`body: ${body.volumeMm3.toFixed(1)} mm³ vs ${expected.toFixed(1)} mm³; plate ${a.plate.toFixed(1)} mm², grooves ${a.grooves.toFixed(1)} mm², ${body.mesh.triangles.length} triangles`);
    expect(a.grooves).toBeGreaterThan(0);
  });

  it('is byte-stable: the same spec gives the same mesh', async () => {
    const spec = readSpecFile(join(ROOT, 'fixtures/specs/parts-print.yaml'));
    const layout = layoutDial(spec);
    const run = async () => JSON.stringify((await bodySolid(layout, plateDrawing(layout), partsPlan(layout), null)).mesh);
    expect(await run()).toBe(await run());
  });
});
