import { join } from 'node:path';
import type { CheckResult } from '@umbrafab/geometry';
import { utf8 } from '../outputs/outputTypes.ts';
import { assertOutFolder } from './build.ts';
import { UsageError, type CommandModule } from './commandTypes.ts';

export const checkCommand: CommandModule = {
  command: 'check <spec>',
  describe: 'simulate a year of sunshine on the built parts and measure every mark against the shadow (exit 1 beyond check.tolerance)',
  builder: (y) =>
    y
      .positional('spec', { type: 'string', demandOption: true, describe: 'dial spec file (.yaml or .json)' })
      .option('plate', { type: 'string', describe: 'read the marks back from this plate DXF (e.g. after editing it in CAD) instead of the layout' })
      .option('year', { type: 'number', describe: 'calendar year to simulate (default: calendar.year of the spec)' })
      .option('out', { type: 'string', alias: 'o', describe: 'also write check.json and check.svg to this folder' })
      .option('force', { type: 'boolean', default: false, describe: 'replace check.json / check.svg if they exist' }),
  run: async (args, io) => {
    // Loaded only when the command runs, so `--help`, `--version` and `init` stay quick; the DXF reader only with --plate.
    const { checkDial, checkFailureLine, checkPlanar, checkTableText, countMarks, curvesFromPlate, drawnCurvesFromLayout, faceOrientationOf, layoutDial, markCountText, layoutPlanar, lowerFacePlateLines, marksFromPlate, parseSpec, planarCheckText, planarMarksFromPlate, readRawSpec, toCheckJson, toCheckSvg, toPlanarCheckSvg, writeFilesAtomic } = await import('./checkDeps.ts');
    if (args.out !== undefined) assertOutFolder(String(args.out));
    // The spec as written, normalised once (with --year in place of calendar.year): the same path as build.
    const raw = readRawSpec(args.spec) as Record<string, unknown>;
    let spec;
    if (args.year !== undefined) {
      const year = Number(args.year);
      if (!Number.isInteger(year) || year < 1900 || year > 2200) throw new UsageError(`--year: got ${args.year}; allowed: a whole year from 1900 to 2200`);
      const calendar = raw.calendar !== null && typeof raw.calendar === 'object' ? raw.calendar : {};
      spec = parseSpec({ ...raw, calendar: { ...calendar, year } });
    } else spec = parseSpec(raw);
    if (faceOrientationOf(spec)) {
      // Horizontal, wall, meridian and equatorial faces: the planar check on their own gnomon.
      // An equatorial plate engraved on both faces: each face checked over the whole year (each is lit about half of it).
      const planarLayout = layoutPlanar(spec);
      const faces = [planarLayout, ...(planarLayout.lowerFace ? [planarLayout.lowerFace] : [])];
      const plateLines = args.plate !== undefined ? (await import('../readPlateDxf.ts')).readPlateDxf(String(args.plate)).lines : undefined;
      const results = faces.map((face, k) => {
        if (!plateLines) return checkPlanar(face);
        // The marks read back from the drawing (the lower face from its _LOWER layers), checked against the shadow of the spec's own gnomon.
        const lines = k === 0 ? plateLines : lowerFacePlateLines(plateLines);
        const which = k === 0 ? '' : ' (lower face)';
        // The date lines and curves first (the polylines of many points), then the marks from the other lines.
        const curves = curvesFromPlate(face.curves, lines, face.plate);
        const found = planarMarksFromPlate(face, lines.filter((l) => !curves.taken.has(l)));
        const r = checkPlanar(face, { marks: found.marks, ...(curves.curves ? { curves: curves.curves } : {}) });
        if (curves.curves === null) io.out(`note: ${args.plate}${which} has no centre-lines of its date lines and curves (etched outlines only); they are checked from the layout`);
        else if (curves.curves.length) io.out(`note: the ${curves.curves.length} date line(s) and curve(s) checked${which} were read from ${args.plate}`);
        if (found.unmatched.length) io.out(`note: ${found.unmatched.length} line(s) in ${args.plate}${which} match no hour line, date line or curve of the spec (first at face x ${found.unmatched[0][0].toFixed(2)} mm, y ${found.unmatched[0][1].toFixed(2)} mm); they are not checked`);
        return r;
      });
      for (const r of results) io.out(planarCheckText(r));
      if (args.out !== undefined) {
        const dir = String(args.out);
        const json = results.length > 1 ? { ...results[0], lowerFace: results[1], pass: results.every((r) => r.pass) } : results[0];
        writeFilesAtomic(dir, [
          { name: 'check.json', bytes: utf8(toCheckJson(json)) },
          { name: 'check.svg', bytes: utf8(toPlanarCheckSvg(results)) },
        ], Boolean(args.force));
        io.out(`umbrafab: wrote check.json, check.svg to ${join(dir)}`);
      }
      const failed = results.find((r) => !r.pass);
      if (failed) {
        io.err(checkFailureLine(failed, (f) => f.edge, failed.side && results.length > 1 ? ` on the ${failed.side} face` : ''));
        return 1;
      }
      return 0;
    }
    const layout = layoutDial(spec);
    let result: CheckResult;
    if (args.plate !== undefined) {
      const { readPlateDxf } = await import('../readPlateDxf.ts');
      const plate = readPlateDxf(String(args.plate));
      // The date lines and curves first (the polylines of many points), then the marks from the other lines.
      const curves = curvesFromPlate(drawnCurvesFromLayout(layout), plate.lines, layout.plate);
      const found = marksFromPlate(layout, plate.lines.filter((l) => !curves.taken.has(l)));
      result = checkDial(layout, { drawn: found.drawn, source: 'plate', ...(curves.curves?.length ? { curves: curves.curves, curveSource: 'plate' as const } : {}) });
      if (curves.curves === null) io.out(`note: ${args.plate} has no centre-lines of its date lines and curves (etched outlines only); they are checked from the layout`);
      if (found.unmatched.length) io.out(`note: ${found.unmatched.length} line(s) in ${args.plate} match no mark, date line or curve of the spec (first at face x ${found.unmatched[0][0].toFixed(2)} mm, y ${found.unmatched[0][1].toFixed(2)} mm); they are not checked`);
    } else {
      result = checkDial(layout);
    }
    io.out(checkTableText(result));
    const count = countMarks(layout.marks);
    if (count.underGnomon.length) io.out(`note: the face has ${markCountText(count)}; the check measures the ${count.engraved} engraved ones`);
    if (args.out !== undefined) {
      const dir = String(args.out);
      writeFilesAtomic(dir, [
        { name: 'check.json', bytes: utf8(toCheckJson(result)) },
        { name: 'check.svg', bytes: utf8(toCheckSvg(result)) },
      ], Boolean(args.force));
      io.out(`umbrafab: wrote check.json, check.svg to ${join(dir)}`);
    }
    if (!result.pass) {
      io.err(checkFailureLine(result, (f) => f.style));
      return 1;
    }
    return 0;
  },
};
