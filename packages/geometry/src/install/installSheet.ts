import { isSpecError, SpecError } from '../errors.ts';
import { assemblyGuide, type AssemblyGuide } from './assemblyGuide.ts';
import { DEG } from '../guards.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import { describeMeridianTurn } from '../sun/describeMeridianTurn.ts';
import { equationOfTimeMin } from '../sun/equationOfTimeMin.ts';
import { localApparentNoon } from '../sun/localApparentNoon.ts';
import { formatIsoDate, MS_PER_DAY, parseLocalDate, dateToUtcMidnightMs } from '../sun/localDate.ts';
import { magneticDeclinationDeg, WMM2025_VALID_FROM, WMM2025_VALID_UNTIL } from '../sun/magneticDeclinationDeg.ts';
import { sunDeclinationRad } from '../sun/sunDeclinationRad.ts';
import { offsetHoursAt, zoneYearOffsets } from '../sun/zoneOffsets.ts';

/** One row of the noon table. */
export interface NoonRow {
  /** local date 'YYYY-MM-DD' */
  readonly date: string;
  /** local clock time of local apparent noon, 'HH:MM:SS' (daylight saving included when in force) */
  readonly clock: string;
  readonly daylightSaving: boolean;
  /** UTC offset of that clock reading, hours */
  readonly utcOffsetHours: number;
}

/** How often the Sun reaches one mark over `calendar.year`. */
export interface MarkReach {
  readonly label: string;
  readonly hourAngleDeg: number;
  /** days of the year on which the Sun is above the horizon at this hour angle (and |H| < 90°, in front of the face) */
  readonly daysReached: number;
  readonly reached: boolean;
}

/** Everything the installation sheet says, as plain data (written out by fabricate's toInstallMd). */
export interface InstallSheet {
  readonly dialName: string;
  readonly site: { readonly latitudeDeg: number; readonly longitudeDeg: number; readonly timezone: string; readonly place?: string };
  readonly hemisphere: 'north' | 'south';
  /** the installation date the figures are for, 'YYYY-MM-DD' */
  readonly date: string;
  readonly tilt: {
    /** plate angle to the horizontal = |latitude|, degrees */
    readonly angleDeg: number;
    readonly plateLengthMm: number;
    /** height of the raised end above the lower end, mm: L·sin(tilt) */
    readonly riseMm: number;
    /** horizontal distance between the two ends, mm: L·cos(tilt) */
    readonly runMm: number;
    /** the end that is raised points to this geographic direction (the elevated pole) */
    readonly raisedEndToward: 'north' | 'south';
  };
  readonly trueNorth: {
    readonly model: 'WMM2025';
    /** magnetic declination at the site at 12:00 UT of `date`, degrees east positive; null outside WMM2025's validity */
    readonly magneticDeclinationDeg: number | null;
    /** the turn in words, or why it is not available */
    readonly sentence: string;
  };
  readonly noon: readonly NoonRow[];
  readonly reading: {
    readonly reads: 'solar' | 'standard';
    readonly standardOffsetHours: number;
    readonly daylightShiftHours: number;
    readonly longitudeCorrectionMin: number;
    /** E at 12:00 UT on the 1st and 15th of each month of calendar.year, minutes */
    readonly equationOfTime: readonly { readonly date: string; readonly minutes: number }[];
  };
  readonly reach: readonly MarkReach[];
  readonly cautions: readonly string[];
  /** putting the dial together: steps, nodus, reading, weights, fasteners (assemblyGuide) */
  readonly assembly: AssemblyGuide;
}

/** The cautions printed on every sheet (common practice for outdoor instruments). */
export const INSTALL_CAUTIONS: readonly string[] = [
  'Never look at the Sun, not even briefly and never through binoculars, a camera, a phone or any other optics: read the shadow, not the Sun.',
  'Mount and anchor the dial and its pedestal or wall bracket according to local building codes; check that the support carries the weight and the wind load.',
  'Heavy plates and stone or metal pedestals are lifted by two people or with lifting gear; wear gloves against sharp cut edges.',
  'Round or cover the gnomon\'s top corners where people, children or animals pass close by.',
  'Making the parts: follow the machine maker\'s instructions and your shop\'s rules; never laser-cut PVC, vinyl or other chlorinated plastics (chlorine gas); run fume extraction for lasers and ventilate 3D printing; dry-run every G-code program above the stock; wear eye and hearing protection at waterjets, routers and mills.',
];

/**
 * The installation sheet of a layout (docs/design.md §4), for `install.date`
 * (default April 1 of `calendar.year`, never today's date):
 * - tilt = |latitude|, and the rise L·sin(tilt) over the plate length L;
 * - true north from the WMM2025 magnetic declination at the site at 12:00 UT
 *   of that date (`magneticDeclinationDeg`), the turn spelled out by
 *   `describeDeclination`;
 * - local apparent noon (`localApparentNoon`, clock time with daylight
 *   saving when in force) for each day of the `install.weeks` weeks from
 *   that date, to align the style on a plumb line's shadow (a date on
 *   which apparent noon falls outside the local day gets no row);
 * - per mark, the days of `calendar.year` on which the Sun reaches it:
 *   above the horizon at the mark's hour angle H (sin h = sin φ sin δ +
 *   cos φ cos δ cos H > 0, geometric, δ at 12:00 UT of each day) and in front
 *   of the face (|H| < 90°, true of every mark);
 * - the cautions.
 *
 * @throws SpecError naming `install.date` for a date that is not a real day
 * @example installSheet(layoutDial(spec)).tilt.angleDeg // 50.62 for the demo
 */
export function installSheet(layout: DialLayout): InstallSheet {
  const { spec, plate, hemisphere, time } = layout;
  const year = spec.calendar.year;
  const date = spec.install.date ?? `${year}-04-01`;
  let day;
  try {
    day = parseLocalDate(date, 'install.date');
  } catch {
    throw new SpecError('install.date', date, 'allowed: a real calendar date "YYYY-MM-DD"');
  }
  const lat = spec.site.latitude;
  const lon = spec.site.longitude;
  const tiltDeg = Math.abs(lat);
  const startMs = dateToUtcMidnightMs(day);

  const at = new Date(startMs + MS_PER_DAY / 2);
  let decl: number | null = null;
  let sentence: string;
  if (at < WMM2025_VALID_FROM || at > WMM2025_VALID_UNTIL) {
    sentence = `no magnetic declination: ${date} is outside WMM2025's validity (2024-11-13 to 2029-11-13); use the noon table below, or a newer World Magnetic Model`;
  } else {
    decl = magneticDeclinationDeg({ latitudeDeg: lat, longitudeDeg: lon, date: at });
    sentence = describeMeridianTurn(decl, layout.hemisphere);
  }

  const site = { latitudeDeg: lat, longitudeDeg: lon, timezone: spec.site.timezone };
  const noon: NoonRow[] = [];
  for (let d = 0; d < 7 * spec.install.weeks; d++) {
    const local = formatIsoDate(startMs + d * MS_PER_DAY);
    let n;
    try {
      n = localApparentNoon(site, local);
    } catch (e) {
      // Apparent noon falls outside this local date (a site about 12 h from its zone's meridian): no row.
      if (isSpecError(e)) continue;
      throw e;
    }
    noon.push({ date: local, clock: n.clock, daylightSaving: n.daylightSaving, utcOffsetHours: offsetHoursAt(spec.site.timezone, n.utc.getTime()) });
  }

  const decls: number[] = [];
  for (let ms = Date.UTC(year, 0, 1); ms < Date.UTC(year + 1, 0, 1); ms += MS_PER_DAY) decls.push(sunDeclinationRad(new Date(ms + MS_PER_DAY / 2)));
  const phi = lat * DEG;
  const seen = new Map<string, number>();
  for (const m of layout.marks) seen.set(m.label, m.hourAngleDeg);
  const reach = [...seen].map(([label, hDeg]): MarkReach => {
    const H = hDeg * DEG;
    const daysReached = Math.abs(hDeg) < 90 ? decls.filter((dl) => Math.sin(phi) * Math.sin(dl) + Math.cos(phi) * Math.cos(dl) * Math.cos(H) > 0).length : 0;
    return { label, hourAngleDeg: hDeg, daysReached, reached: daysReached > 0 };
  });

  const offsets = zoneYearOffsets(spec.site.timezone, year);
  const equationOfTime = Array.from({ length: 24 }, (_, i) => {
    const ms = Date.UTC(year, Math.floor(i / 2), i % 2 === 0 ? 1 : 15);
    return { date: formatIsoDate(ms), minutes: equationOfTimeMin(new Date(ms + MS_PER_DAY / 2)) };
  });

  return {
    dialName: spec.name,
    site: { ...site, ...(spec.site.place ? { place: spec.site.place } : {}) },
    hemisphere,
    date,
    tilt: {
      angleDeg: tiltDeg,
      plateLengthMm: plate.lengthMm,
      riseMm: plate.lengthMm * Math.sin(tiltDeg * DEG),
      runMm: plate.lengthMm * Math.cos(tiltDeg * DEG),
      raisedEndToward: hemisphere,
    },
    trueNorth: { model: 'WMM2025', magneticDeclinationDeg: decl, sentence },
    noon,
    reading: {
      reads: time.reads,
      standardOffsetHours: offsets.standardOffsetHours,
      daylightShiftHours: offsets.daylightShiftHours,
      longitudeCorrectionMin: time.longitudeCorrectionMin,
      equationOfTime,
    },
    reach,
    cautions: INSTALL_CAUTIONS,
    assembly: assemblyGuide(layout),
  };
}
