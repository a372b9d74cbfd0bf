// Test-only loader for fixtures/reference/sun/reference-values.json (see its README for sources).
import { readFileSync } from 'node:fs';

const FIXTURES = new URL('../../../../fixtures/reference/', import.meta.url);

/** Parsed reference-values.json. */
export const SUN_REFERENCE = JSON.parse(readFileSync(new URL('sun/reference-values.json', FIXTURES), 'utf8')) as {
  meeus_25b_sun_1992_10_13: {
    jde: number;
    apparentRightAscension: { h: number; m: number; s: number };
    apparentDeclination: { sign: number; d: number; m: number; s: number };
  };
  meeus_28a_equation_of_time_1992_10_13: { jde: number; equationOfTime: { sign: number; m: number; s: number } };
  equation_of_time_extremes: { max: { minutes: number; month: number }; min: { minutes: number; month: number } };
  sun_angular_radius_arcmin: { aphelion: number; perihelion: number; at1Au: number };
  obliquity_j2000_arcsec: { value: number };
};

/** Read a text file under fixtures/reference/. */
export function readReference(relPath: string): string {
  return readFileSync(new URL(relPath, FIXTURES), 'utf8');
}
