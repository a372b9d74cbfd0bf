import { basename, dirname } from 'node:path';
import type { ShadowReading } from '@umbrafab/geometry';
import { UsageError, type CommandModule } from './commandTypes.ts';

/** Most readings one call accepts. */
const MAX_READINGS = 50;

/** "2027-04-12 10:31:05 62.5" → a reading (the angle in degrees). */
export function parseReading(text: string, index: number): ShadowReading {
  const m = /^\s*(\d{4}-\d{2}-\d{2})[ T](\d{2}:\d{2}(?::\d{2}(?:\.\d+)?)?)\s+(-?\d+(?:\.\d+)?)\s*$/.exec(text);
  if (!m) throw new UsageError(`--reading ${index + 1}: got ${JSON.stringify(text.slice(0, 80))}; allowed: "YYYY-MM-DD HH:MM:SS ANGLE", e.g. "2027-04-12 10:31:05 62.5" (local clock time, angle in degrees)`);
  return { date: m[1], time: m[2], angleDeg: Number(m[3]) };
}

export const wallCommand: CommandModule = {
  command: 'wall <spec>',
  describe: "measure a wall's declination from plumb-line shadows on a level board, and (with --write) set face.wallDeclination in the spec",
  builder: (y) =>
    y
      .positional('spec', { type: 'string', demandOption: true, describe: 'dial spec file (.yaml or .json): the site is read from it' })
      .option('reading', { type: 'string', array: true, demandOption: true, describe: '"YYYY-MM-DD HH:MM:SS ANGLE": local clock time and the angle between the wall (to your right as you face it) and the shadow traced out toward the Sun, degrees; repeat for several readings' })
      .option('write', { type: 'boolean', default: false, describe: 'write the result into the spec (face.type vertical, face.wallDeclination), keeping its comments' }),
  run: async (args, io) => {
    // Loaded only when the command runs, so `--help` and the other commands stay quick.
    const { SpecError, parseDocument, parseSpec, readSpecFile, readSpecText, wallDeclinationFromShadow, writeFilesAtomic } = await import('./wallDeps.ts');
    const path = String(args.spec);
    const spec = readSpecFile(path);
    const raw = ([] as string[]).concat(args.reading ?? []);
    if (raw.length > MAX_READINGS) throw new UsageError(`--reading: got ${raw.length}; allowed: 1 to ${MAX_READINGS} readings`);
    const readings = raw.map((r, i) => parseReading(String(r), i));
    const result = wallDeclinationFromShadow({ latitudeDeg: spec.site.latitude, longitudeDeg: spec.site.longitude, timezone: spec.site.timezone }, readings);
    const sign = (d: number) => `${Math.abs(d).toFixed(2)}° ${d > 0 ? 'west' : d < 0 ? 'east' : ''}`.trim();
    io.out('reading                  angle    sun az   sun alt   wall decl');
    for (const r of result.readings) {
      io.out(`${`${r.reading.date} ${r.reading.time}`.padEnd(22)} ${r.reading.angleDeg.toFixed(2).padStart(7)} ${r.sunAzimuthDeg.toFixed(2).padStart(9)} ${r.sunAltitudeDeg.toFixed(2).padStart(8)} ${r.wallDeclinationDeg.toFixed(2).padStart(10)}`);
    }
    const eqWard = spec.site.latitude >= 0 ? 'south' : 'north';
    io.out(`wall declination ${sign(result.wallDeclinationDeg)} of due ${eqWard} (face.wallDeclination: ${result.wallDeclinationDeg.toFixed(2)}); the wall faces azimuth ${result.normalAzimuthDeg.toFixed(2)}° from true north`);
    io.out(readings.length > 1 ? `spread of the ${readings.length} readings: ${result.spreadDeg.toFixed(2)}° (standard deviation ${result.standardDeviationDeg.toFixed(2)}°)` : 'one reading: take two or three more, some minutes apart, to see the spread');
    if (args.write) {
      const doc = parseDocument(readSpecText(path));
      doc.setIn(['face', 'type'], 'vertical');
      doc.setIn(['face', 'wallDeclination'], Math.round(result.wallDeclinationDeg * 100) / 100);
      const text = doc.toString();
      // The new spec must still be valid before it replaces the old one.
      try {
        parseSpec(doc.toJS());
      } catch (e) {
        if (e instanceof SpecError) throw new UsageError(`--write: the spec with face.wallDeclination ${result.wallDeclinationDeg.toFixed(2)} would not be valid: ${e.message}`);
        throw e;
      }
      writeFilesAtomic(dirname(path), [{ name: basename(path), bytes: new TextEncoder().encode(text) }], true);
      io.out(`umbrafab: wrote face.type vertical, face.wallDeclination ${result.wallDeclinationDeg.toFixed(2)} to ${path}`);
    }
    return 0;
  },
};
