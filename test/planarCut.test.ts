import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { equatorialStand, equatorialStandApplies, finSheetPart, layoutPlanar, parseSpec, planarGnomonSolid, planarPlateDrawing, plateSheetPart, reliefToolRadius, wallMount, type SheetPart } from '@umbrafab/geometry';
import { buildAnyFiles } from '@umbrafab/cli';
import { expectClose } from './helpers/closeTo.ts';
import { feedRuns, motions, runRs274 } from './helpers/rs274.ts';
import { shapelyCheck } from './helpers/cutCheck.ts';

// Outside validators: Debian's linuxcnc-uspace `rs274 -g` reads cut.ngc; the tool paths
// against the nominal parts are measured with shapely (test/helpers/cut_check.py).
const ROOT = resolve(import.meta.dirname, '..');
/** A router job on 3 mm aluminium with a 1/8 in (3.175 mm) end mill, the fin of the plate's stock. */
const ROUTER = { plate: { thickness: 3, material: 'aluminium' }, process: { method: 'router', kerf: 3.175 } };

describe('cut.ngc of planar faces on a router: plate, sheet fin and wall mount', () => {
  for (const name of ['garden-horizontal', 'meridian-east', 'wall-declining', 'equatorial']) {
    it(`${name}: rs274 reads it, depth = thickness + breakthrough, every part's tool path one tool radius off its nominal edges, never inside a part (shapely)`, async () => {
      const raw = parse(readFileSync(join(ROOT, `fixtures/planar/${name}.yaml`), 'utf8'));
      // A sheet fin of the plate's stock (3 mm); an equatorial rod keeps its own diameter (a 3 mm rod's hole would be drilled with the tool itself).
      const spec = parseSpec({ ...raw, ...ROUTER, gnomon: raw.face.type === 'equatorial' ? raw.gnomon : { ...raw.gnomon, thickness: 3 } });
      const built = await buildAnyFiles(spec);
      const f = built.files.find((x) => x.name === 'cut.ngc');
      expect(f, 'cut.ngc').toBeDefined();
      const report = (built.report as Record<string, any>).cutting;
      const layout = layoutPlanar(spec);
      const o = { material: spec.plate.material, thicknessMm: 3, reliefToolRadiusMm: reliefToolRadius(spec), chordToleranceMm: spec.cutFiles.chordTolerance };
      const gnomon = planarGnomonSolid(layout);
      const mount = wallMount(layout)?.part;
      const stand = equatorialStandApplies(layout) ? equatorialStand(layout, { reliefToolRadiusMm: o.reliefToolRadiusMm }).parts : [];
      const listed: SheetPart[] = [plateSheetPart(planarPlateDrawing(layout), o), ...(gnomon.kind === 'fin' ? [finSheetPart(gnomon.profile, o)] : []), ...(mount ? [mount] : []), ...stand];
      // A part cut more than once (the stand's two cheeks) is each copy in turn, named "<part>-<copy>".
      const parts = listed.flatMap((p) => ((p.quantity ?? 1) > 1 ? Array.from({ length: p.quantity! }, (_, i) => ({ ...p, name: `${p.name}-${i + 1}` })) : [p]));
      expect(report.parts.map((p: { name: string }) => p.name)).toEqual(parts.map((p) => p.name));
      expect(report.otherStock).toEqual([]);
      const { commands } = runRs274(new TextDecoder().decode(f!.bytes), 'cut.ngc'); // throws on an rs274 error
      const ms = motions(commands);
      const planned = -(3 + spec.engrave.cut.breakthroughMm);
      expectClose(ms.reduce((lo, m) => Math.min(lo, m.to.z), Infinity), planned, 0.001, 'deepest Z', ' mm');
      const runs = feedRuns(ms);
      const placed = parts.map((part, i) => ({ part, originMm: report.parts[i].originMm as [number, number] }));
      const checks = shapelyCheck(placed, runs, planned);
      const toolR = spec.process.kerf / 2;
      let worst = 0;
      for (const k of checks) {
        expect(k.inPart, `${k.part} ${k.side}: tool-centre points inside a part`).toBe(0);
        if (k.distMin === null || k.distMax === null) continue;
        worst = Math.max(worst, Math.abs(k.distMin - toolR), Math.abs(k.distMax - toolR));
      }
      console.log(`${name}: cut.ngc ${parts.map((p) => p.name).join(', ')}, ${checks.length} runs, tool centre ${toolR} mm off the nominal edges within ${worst.toExponential(2)} mm`);
      // Drilled holes the tool's own size sit (d − D)/2 off; none here (5.5 mm and larger holes are bored or looped).
      expect(worst).toBeLessThanOrEqual(0.01);
      for (const p of parts) expect(checks.filter((k) => k.part === p.name && k.side === 'outside').length, `${p.name}: one outer profile`).toBe(1);
    });
  }
});
