import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { engraveFromSpec, joinEngravings, twoFaceEngraving } from '@umbrafab/fabricate';
import { buildContext, readSpecFile } from '@umbrafab/cli';
import { layoutPlanar, planarPlateDrawing } from '@umbrafab/geometry';

// `umbrafab build` plans a spec's two engraving programs apart (the laser's on
// the worker thread, the router's in the build's own thread: engraveBeside.ts)
// and joins them: the result must be the one-thread engraving, byte for byte.

const ROOT = resolve(import.meta.dirname, '..');
const json = (x: unknown) => JSON.stringify(x);

describe('joinEngravings: two programs planned apart are the engraving planned at once', () => {
  for (const file of ['fixtures/specs/engrave-demo-both.yaml', 'fixtures/specs/engrave-laser-south.yaml']) {
    it(file, async () => {
      const spec = readSpecFile(resolve(ROOT, file));
      const { drawing } = buildContext(spec);
      const whole = await engraveFromSpec(spec, drawing);
      const ngc = await engraveFromSpec(spec, drawing, undefined, ['ngc']);
      const laser = await engraveFromSpec(spec, drawing, undefined, ['laser']);
      expect(ngc.files.map((f) => f.name)).toEqual(['engrave.ngc']);
      expect(laser.files.map((f) => f.name)).toEqual(['engrave-laser.gcode']);
      const joined = joinEngravings([laser, ngc], whole.report.programs);
      expect(joined.files).toEqual(whole.files);
      // report.json's bytes: the same keys in the same order.
      expect(json(joined.report)).toBe(json(whole.report));
    });
  }

  it('one face of a plate engraved on both (file names and header lines of that face)', async () => {
    const spec = readSpecFile(resolve(ROOT, 'fixtures/planar/equatorial-both.yaml'));
    const both = { ...spec, engrave: { ...spec.engrave, programs: 'both' as const } };
    const drawing = planarPlateDrawing(layoutPlanar(both));
    const face = twoFaceEngraving(drawing)!.lower;
    const whole = await engraveFromSpec(both, drawing, face);
    const joined = joinEngravings([await engraveFromSpec(both, drawing, face, ['ngc']), await engraveFromSpec(both, drawing, face, ['laser'])], whole.report.programs);
    expect(whole.files.map((f) => f.name)).toEqual(['engrave-lower.ngc', 'engrave-laser-lower.gcode']);
    expect(joined.files).toEqual(whole.files);
    expect(json(joined.report)).toBe(json(whole.report));
  });

  it('refuses parts that do not hold each program once', async () => {
    const spec = readSpecFile(resolve(ROOT, 'fixtures/specs/engrave-demo-both.yaml'));
    const { drawing } = buildContext(spec);
    const ngc = await engraveFromSpec(spec, drawing, undefined, ['ngc']);
    expect(() => joinEngravings([ngc], ['ngc', 'laser'])).toThrow(/laser is in 0 parts/);
    expect(() => joinEngravings([ngc, ngc], ['ngc'])).toThrow(/ngc is in 2 parts/);
  });
});
