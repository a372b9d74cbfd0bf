import { declinationOnDate } from '../calendar/declinationOnDate.ts';
import { siteDateLine } from '../calendar/siteDateLine.ts';
import { standardDateLines } from '../calendar/standardDateLines.ts';
import type { FacePolyline } from '../calendar/types.ts';
import { SpecError } from '../errors.ts';
import { DEG } from '../guards.ts';
import { formatIsoDate, parseLocalDate } from '../sun/localDate.ts';
import { sunEquatorOfDate } from '../sun/sunEquatorOfDate.ts';
import { offsetHoursAt } from '../sun/zoneOffsets.ts';
import type { DialLayout } from './layoutDial.ts';
import type { DialSpec } from '../spec/schema.ts';
import { clipPolyline } from './clipPolyline.ts';
import { markField, nodusFootY } from './markField.ts';

/** One date (declination) line of a nodus dial. */
export interface CalendarLine {
  /** plain-English label, e.g. "June solstice" or "Sun enters Taurus & Sun enters Virgo" */
  readonly label: string;
  /** the short text engraved beside the line, e.g. "21 JUN" ("20 MAR / 23 SEP" for a shared line) */
  readonly engravedLabel: string;
  /** the same per date: a shared line is labelled once on each half of the face */
  readonly engravedLabels: readonly string[];
  /** local dates (site zone) of the moments the line stands for, 'YYYY-MM-DD' */
  readonly dates: readonly string[];
  /** the Sun's geocentric apparent declination, degrees, north positive */
  readonly declinationDeg: number;
  /**
   * the line as polylines, one per style edge that casts the nodus shadow,
   * in face x (as for the marks) and y from the nodus foot (positive toward
   * the elevated pole), mm; clipped to the hour-mark field; within 0.0005 mm
   * of the shadow of the Sun at this declination seen from the site
   */
  readonly branches: readonly FacePolyline[];
}

/** Hour angle sampled beyond the field's outermost line, so the clipped ends lie on the curve's chords. */
const END_MARGIN_RAD = 0.5 * DEG;
/** Entries closer than this in declination share one line (e.g. the two equinoxes), degrees. */
const SAME_LINE_DEG = 0.1;
const MONTHS = ['JAN', 'FEB', 'MAR', 'APR', 'MAY', 'JUN', 'JUL', 'AUG', 'SEP', 'OCT', 'NOV', 'DEC'] as const;

export interface DateLineEntry {
  readonly label: string;
  readonly engraved: string;
  readonly date: string;
  /** the Sun's geocentric apparent declination, north positive */
  readonly declinationRad: number;
  /** the Sun's distance on that date (at 12:00 UT), AU: for its parallax as seen from the site */
  readonly distanceAu: number;
  readonly custom: boolean;
}

/**
 * The date lines of a nodus dial (docs/design.md §2): for each chosen declination δ,
 * the nodus shadow of the Sun at δ seen from the site (`siteDateLine`: the
 * handbook hyperbola y = −tan δp · √(h² + (|x| − t/2)²) from the style edge
 * that casts the shadow, δp toward the elevated pole, moved by the diurnal
 * parallax of up to 8.8″: a few µm), sampled until every chord lies within
 * 0.0005 mm of the curve. `calendar.lines` picks the solstices (moments from astronomy-engine
 * `SearchSunLongitude`, via `standardDateLines`), the equinox line, or all
 * twelve zodiac entries (seven distinct lines); `calendar.dates` adds custom
 * dates (declination at local mean noon of that date). Entries within 0.1° of
 * declination share one line. Each line is cut where it leaves the
 * hour-mark field (`clipPolyline`: on a chord, so within 0.0005 mm of the
 * curve).
 * Empty when `gnomon.nodus` is false.
 *
 * @throws SpecError naming `calendar.dates` or `dial.meanTimeCurves` when those need a nodus
 * @example calendarLines(layoutDial(parseSpec({site, gnomon: {nodus: true}})))[0].label // 'June solstice'
 */
export function calendarLines(layout: DialLayout): readonly CalendarLine[] {
  const { spec } = layout;
  if (!spec.gnomon.nodus) {
    if (spec.calendar.dates.length > 0) {
      throw new SpecError('calendar.dates', spec.calendar.dates, 'allowed: an empty list unless gnomon.nodus is true (date lines are read off the nodus shadow)');
    }
    return [];
  }
  const entries = dateLineEntries(spec);
  const groups: DateLineEntry[][] = [];
  for (const e of entries) {
    const g = e.custom ? undefined : groups.find((gr) => !gr[0].custom && Math.abs(gr[0].declinationRad - e.declinationRad) < SAME_LINE_DEG * DEG);
    if (g) g.push(e);
    else groups.push([e]);
  }
  const lines = groups.map((g): CalendarLine => ({
    label: g.map((e) => e.label).join(' & '),
    engravedLabel: g.map((e) => e.engraved).join(' / '),
    engravedLabels: g.map((e) => e.engraved),
    dates: g.map((e) => e.date),
    declinationDeg: g[0].declinationRad / DEG,
    branches: lineBranches(layout, g[0]),
  }));
  return lines.sort((a, b) => b.declinationDeg - a.declinationDeg);
}

/** The dates a spec asks to draw (calendar.lines and calendar.dates), each with its declination (shared by every face type). */
export function dateLineEntries(spec: DialSpec): DateLineEntry[] {
  const year = spec.calendar.year;
  const zone = spec.site.timezone;
  const sets = new Set(spec.calendar.lines);
  const out: DateLineEntry[] = [];
  if (sets.size > 0) {
    for (const l of standardDateLines(year)) {
      const pick = sets.has('zodiac') || (sets.has('solstices') && l.kind === 'solstice') || (sets.has('equinox') && l.kind === 'equinox');
      if (!pick) continue;
      const ms = l.dateUtc.getTime();
      const date = formatIsoDate(ms + offsetHoursAt(zone, ms) * 3_600_000);
      out.push({ label: l.label, engraved: shortDate(date), date, declinationRad: l.declinationRad, distanceAu: distanceOn(date), custom: false });
    }
  }
  spec.calendar.dates.forEach((d, i) => {
    const date = `${year}-${d.date}`;
    try {
      parseLocalDate(date);
    } catch {
      throw new SpecError(`calendar.dates.${i}.date`, d.date, `allowed: a real date in ${year} written "MM-DD"`);
    }
    out.push({ label: d.label, engraved: d.label, date, declinationRad: declinationOnDate(date, spec.site.longitude), distanceAu: distanceOn(date), custom: true });
  });
  return out;
}

/** The Sun's distance at 12:00 UT of a date, AU (it changes by at most 0.0003 AU a day). */
function distanceOn(date: string): number {
  return sunEquatorOfDate(new Date(Date.parse(`${date}T12:00:00Z`))).distanceAu;
}

/** "2027-06-21" → "21 JUN". */
function shortDate(iso: string): string {
  return `${Number(iso.slice(8, 10))} ${MONTHS[Number(iso.slice(5, 7)) - 1]}`;
}

/** The branches of one date line inside the mark field, y from the nodus foot. */
function lineBranches(layout: DialLayout, entry: DateLineEntry): FacePolyline[] {
  const f = markField(layout);
  const ny = nodusFootY(layout);
  const h = layout.gnomon.heightMm;
  const t = layout.gnomon.thicknessMm;
  // The hour angle of the field's farthest x from the style edge on either side, and a margin.
  const reach = Math.max(-f.xMinMm, f.xMaxMm) - t / 2;
  if (!(reach > 0)) return [];
  const maxHourAngleRad = Math.min(Math.atan(reach / h) + END_MARGIN_RAD, 89 * DEG);
  const b = siteDateLine({ declinationRad: entry.declinationRad, distanceAu: entry.distanceAu, latitudeDeg: layout.spec.site.latitude, heightMm: h, thicknessMm: t, hemisphere: layout.hemisphere, maxHourAngleRad });
  const box = { xMinMm: f.xMinMm, xMaxMm: f.xMaxMm, yMinMm: f.yMinMm - ny, yMaxMm: f.yMaxMm - ny };
  return [b.west, b.east].flatMap((p) => clipPolyline(p, box)).sort((p, q) => p[0][0] - q[0][0]);
}
