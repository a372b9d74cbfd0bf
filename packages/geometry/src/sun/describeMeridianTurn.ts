import type { Hemisphere } from '../types.ts';
import { describeDeclination } from './describeDeclination.ts';

/**
 * An English sentence for turning a polar dial from the compass to the
 * geographic meridian, with its raised end toward the elevated pole
 * (docs/design.md §4: true north in the north, true south in the south), for a
 * magnetic declination D (degrees, east positive), rounded to 0.1°.
 *
 * North: the raised end points to true north, D west of the compass's north
 * for an east declination (describeDeclination). South: the needle is turned
 * by the same D, so its south end points D west of true south for an east
 * declination; the raised end must point to true south, D east of the
 * compass's south (a west declination mirrors both).
 *
 * @example describeMeridianTurn(22.8, 'south')
 *   // "magnetic north lies 22.8° east of true north, so the compass's south end points 22.8° west of true south: turn the dial until its raised end points 22.8° east of the compass's south, at true south"
 */
export function describeMeridianTurn(declinationDeg: number, hemisphere: Hemisphere): string {
  if (hemisphere === 'north') return describeDeclination(declinationDeg);
  const shown = (Math.round(Math.abs(declinationDeg) * 10) / 10).toFixed(1);
  if (shown === '0.0') {
    return "magnetic north and true north coincide here (declination 0.0°): point the dial's raised end at the compass's south, which is true south";
  }
  const east = declinationDeg > 0;
  return `magnetic north lies ${shown}° ${east ? 'east' : 'west'} of true north, so the compass's south end points ${shown}° ${east ? 'west' : 'east'} of true south: turn the dial until its raised end points ${shown}° ${east ? 'east' : 'west'} of the compass's south, at true south`;
}
