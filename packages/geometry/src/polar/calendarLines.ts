import { dateLinePoints } from '../calendar/dateLinePoints.ts';
import { declinationOnDate } from '../calendar/declinationOnDate.ts';
import { declinationTowardPoleRad } from '../calendar/declinationTowardPoleRad.ts';
import { standardDateLines } from '../calendar/standardDateLines.ts';
import type { FacePolyline } from '../calendar/types.ts';
import { SpecError } from '../errors.ts';
import { DEG } from '../guards.ts';
import { formatIsoDate, parseLocalDate } from '../sun/localDate.ts';
import { offsetHoursAt } from '../sun/zoneOffsets.ts';
import type { DialLayout } from './layoutDial.ts';
import type { DialSpec } from '../spec/schema.ts';
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
   * the elevated pole), mm; clipped to the hour-mark field
   */
  readonly branches: readonly FacePolyline[];
}

/** Sampling step of the date lines along x, mm. */
export const DATE_LINE_STEP_MM = 1;
/** Entries closer than this in declination share one line (e.g. the two equinoxes), degrees. */
const SAME_LINE_DEG = 0.1;
const MONTHS = ['JAN', 'FEB', 'MAR', 'APR', 'MAY', 'JUN', 'JUL', 'AUG', 'SEP', 'OCT', 'NOV', 'DEC'] as const;

export interface DateLineEntry {
  readonly label: string;
  readonly engraved: string;
  readonly date: string;
  readonly declinationRad: number;
  readonly custom: boolean;
}

/**
 * The date lines of a nodus dial (docs/design.md §2): for each chosen declination δ,
 * the hyperbola y = −tan δp · √(h² + (|x| − t/2)²) measured from the style
 * edge that casts the shadow, with δp the declination toward the elevated
 * pole. `calendar.lines` picks the solstices (moments from astronomy-engine
 * `SearchSunLongitude`, via `standardDateLines`), the equinox line, or all
 * twelve zodiac entries (seven distinct lines); `calendar.dates` adds custom
 * dates (declination at local mean noon of that date). Entries within 0.1° of
 * declination share one line. Each line is cut exactly where it leaves the
 * hour-mark field (the end points are solved on the curve, not interpolated).
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
    branches: lineBranches(layout, g[0].declinationRad),
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
      out.push({ label: l.label, engraved: shortDate(date), date, declinationRad: l.declinationRad, custom: false });
    }
  }
  spec.calendar.dates.forEach((d, i) => {
    const date = `${year}-${d.date}`;
    try {
      parseLocalDate(date);
    } catch {
      throw new SpecError(`calendar.dates.${i}.date`, d.date, `allowed: a real date in ${year} written "MM-DD"`);
    }
    out.push({ label: d.label, engraved: d.label, date, declinationRad: declinationOnDate(date, spec.site.longitude), custom: true });
  });
  return out;
}

/** "2027-06-21" → "21 JUN". */
function shortDate(iso: string): string {
  return `${Number(iso.slice(8, 10))} ${MONTHS[Number(iso.slice(5, 7)) - 1]}`;
}

/** The branches of one date line inside the mark field, y from the nodus foot. */
function lineBranches(layout: DialLayout, declinationRad: number): FacePolyline[] {
  const f = markField(layout);
  const ny = nodusFootY(layout);
  const h = layout.gnomon.heightMm;
  const t = layout.gnomon.thicknessMm;
  const dp = declinationTowardPoleRad(declinationRad, layout.hemisphere);
  const tanD = Math.tan(dp);
  let xMin = f.xMinMm;
  let xMax = f.xMaxMm;
  if (Math.abs(tanD) > 1e-12) {
    // |y| grows with |x|: the line leaves the field where |y| reaches the field edge on its side.
    const room = tanD > 0 ? ny - f.yMinMm : f.yMaxMm - ny;
    const r = room / Math.abs(tanD);
    if (r <= h) return [];
    const uMax = Math.sqrt(r * r - h * h);
    xMin = Math.max(xMin, -(t / 2 + uMax));
    xMax = Math.min(xMax, t / 2 + uMax);
  }
  if (!(xMax > xMin)) return [];
  const b = dateLinePoints({ declinationRad: dp, heightMm: h, thicknessMm: t, xMinMm: xMin, xMaxMm: xMax, stepMm: DATE_LINE_STEP_MM, hemisphere: layout.hemisphere });
  return [b.west, b.east].filter((p) => p.length >= 2).sort((p, q) => p[0][0] - q[0][0]);
}
