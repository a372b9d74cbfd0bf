import { assertRange } from '../guards.ts';

/**
 * An English sentence for a magnetic declination (degrees, east positive),
 * rounded to 0.1°, telling which way to turn from the compass to true north.
 *
 * Direction logic: with an east declination D the compass needle points D
 * east of true north, so true north lies D west of the needle: turn the dial
 * D west of the compass's north. A west declination is the mirror image.
 * Below 0.05° (it rounds to 0.0°) the two norths are taken as one.
 *
 * @example describeDeclination(-9.8)
 *   // 'magnetic north lies 9.8° west of true north: turn the dial 9.8° east of the compass's north to face true north'
 */
export function describeDeclination(declinationDeg: number): string {
  const d = assertRange('declinationDeg', declinationDeg, -180, 180, '°');
  const shown = (Math.round(Math.abs(d) * 10) / 10).toFixed(1);
  if (shown === '0.0') {
    return "magnetic north and true north coincide here (declination 0.0°): face the dial to the compass's north";
  }
  const needleSide = d > 0 ? 'east' : 'west';
  const turnSide = d > 0 ? 'west' : 'east';
  return `magnetic north lies ${shown}° ${needleSide} of true north: turn the dial ${shown}° ${turnSide} of the compass's north to face true north`;
}
