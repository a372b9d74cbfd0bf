import { SpecError } from '../errors.ts';
import type { PlanarLayout } from '../planar/layoutPlanar.ts';
import { formatClock, parseClock } from '../spec/parseClock.ts';
import { sunForPicture, type PictureSun } from './sunForPicture.ts';

/**
 * The sun for a planar face's assembly picture: `sunForPicture` at
 * pictures.time with the face's lit test; when the face does not see the
 * sun then (a west wall at the default 10:00), the face's whole-hour line
 * nearest in time to it that the sun does light on that date, with a note
 * saying so. The first refusal stands when no hour line is lit that day.
 *
 * @example planarPictureSun(layoutPlanar(spec), '2027-06-21', '10:00').sun.dialTime
 */
export function planarPictureSun(layout: PlanarLayout, date: string, time: string): { sun: PictureSun; note: string | null } {
  const n = layout.face.normal;
  try {
    return { sun: sunForPicture(layout, date, time, n), note: null };
  } catch (e) {
    if (!(e instanceof SpecError)) throw e;
    const asked = parseClock('pictures.time', time);
    const hours = [...new Set(layout.marks.filter((m) => m.kind === 'hour').map((m) => m.minutes))].sort((a, b) => Math.abs(a - asked) - Math.abs(b - asked) || a - b);
    for (const minutes of hours) {
      try {
        const sun = sunForPicture(layout, date, formatClock(minutes), n);
        return { sun, note: `pictures: the ${layout.faceType} face does not see the sun at ${time} on ${date}; assembly.png shows ${sun.dialTime} instead (set pictures.time to choose)` };
      } catch (again) {
        if (!(again instanceof SpecError)) throw again;
      }
    }
    throw e;
  }
}
