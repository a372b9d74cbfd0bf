import { dateToUtcMidnightMs, MS_PER_DAY, parseLocalDate } from '../sun/localDate.ts';
import { magneticDeclinationDeg, WMM2025_VALID_FROM, WMM2025_VALID_UNTIL } from '../sun/magneticDeclinationDeg.ts';
import type { PlanarLayout } from './layoutPlanar.ts';

const f1 = (x: number) => x.toFixed(1);

/**
 * The compass correction at the site, in words: the WMM2025 magnetic
 * declination at 12:00 UT of install.date (default April 1 of
 * calendar.year), or a pointer to the noon shadow outside the model's
 * validity or for a date that is not a real day.
 */
export function compassSentence(layout: PlanarLayout): string {
  const spec = layout.spec;
  const date = spec.install.date ?? `${spec.calendar.year}-04-01`;
  let at: Date;
  try {
    at = new Date(dateToUtcMidnightMs(parseLocalDate(date, 'install.date')) + MS_PER_DAY / 2);
  } catch {
    return 'find the meridian from the noon shadow below';
  }
  if (at < WMM2025_VALID_FROM || at > WMM2025_VALID_UNTIL) return `${date} is outside WMM2025's validity: find the meridian from the noon shadow below`;
  const d = magneticDeclinationDeg({ latitudeDeg: spec.site.latitude, longitudeDeg: spec.site.longitude, date: at });
  const shown = f1(Math.abs(d));
  if (shown === '0.0') return 'the compass needle points to true north here (magnetic declination 0.0°, WMM2025)';
  return `the compass needle's north end points ${shown}° ${d > 0 ? 'east' : 'west'} of true north here (magnetic declination, WMM2025, ${date}), so true north lies ${shown}° ${d > 0 ? 'west' : 'east'} of the needle`;
}
