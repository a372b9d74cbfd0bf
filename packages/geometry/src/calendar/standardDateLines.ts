import { SearchSunLongitude } from 'astronomy-engine';
import { SpecError } from '../errors.ts';
import { sunDeclinationRad } from '../sun/sunDeclinationRad.ts';

/** One of the twelve classic date lines. */
export interface StandardDateLine {
  /** plain-English label, e.g. "June solstice", "Sun enters Leo" */
  readonly label: string;
  /** 'solstice' | 'equinox' for the four cardinal points, 'sign' for the other eight */
  readonly kind: 'solstice' | 'equinox' | 'sign';
  /** the zodiac sign the Sun enters at that moment (tropical signs) */
  readonly sign: string;
  /** the Sun's apparent ecliptic longitude of date at that moment, degrees (a multiple of 30) */
  readonly eclipticLongitudeDeg: number;
  /** the moment, UTC */
  readonly dateUtc: Date;
  /** geocentric apparent declination at that moment, radians, north positive */
  readonly declinationRad: number;
}

const SIGNS = [
  'Aries', 'Taurus', 'Gemini', 'Cancer', 'Leo', 'Virgo',
  'Libra', 'Scorpio', 'Sagittarius', 'Capricorn', 'Aquarius', 'Pisces',
] as const;

const CARDINAL: Readonly<Record<number, { readonly label: string; readonly kind: 'solstice' | 'equinox' }>> = {
  0: { label: 'March equinox', kind: 'equinox' },
  90: { label: 'June solstice', kind: 'solstice' },
  180: { label: 'September equinox', kind: 'equinox' },
  270: { label: 'December solstice', kind: 'solstice' },
};

/** Mean tropical year, days (common practice, rounded). */
const TROPICAL_YEAR_DAYS = 365.2422;

/**
 * The twelve moments of a calendar year when the Sun's apparent ecliptic
 * longitude is a multiple of 30°: both solstices (90°, 270°), both equinoxes
 * (0°, 180° — one date line, δ ≈ 0) and the entries into the other eight
 * zodiac signs, in date order. Each moment is found with astronomy-engine
 * `SearchSunLongitude` (apparent longitude of date, to 0.01 s) and carries
 * the declination at that moment (`sunDeclinationRad`).
 *
 * The date line of an entry is used for the whole sign's boundary: the lines
 * for "Sun enters Taurus" and "Sun enters Virgo" nearly coincide (same |λ−90°|),
 * which is why a dial draws seven distinct lines from twelve entries.
 *
 * @example standardDateLines(2025).find((l) => l.label === 'June solstice')?.dateUtc // 2025-06-21T02:42Z
 */
export function standardDateLines(year: number): readonly StandardDateLine[] {
  if (!Number.isInteger(year) || year < 1700 || year > 2300) {
    throw new SpecError('year', year, 'allowed: an integer year from 1700 to 2300');
  }
  const lines = SIGNS.map((sign, i): StandardDateLine => {
    const lon = 30 * i;
    // Estimate from the March equinox (about March 20) at the mean rate,
    // folded into the calendar year; the true moment is within ±5 days.
    let estMs = Date.UTC(year, 2, 20) + (lon / 360) * TROPICAL_YEAR_DAYS * 86_400_000;
    if (estMs >= Date.UTC(year + 1, 0, 1)) estMs -= TROPICAL_YEAR_DAYS * 86_400_000;
    const found = SearchSunLongitude(lon, new Date(estMs - 15 * 86_400_000), 30);
    if (!found) throw new Error(`standardDateLines: no Sun longitude ${lon}° near ${new Date(estMs).toISOString()}`);
    const dateUtc = found.date;
    const cardinal = CARDINAL[lon];
    return {
      label: cardinal ? cardinal.label : `Sun enters ${sign}`,
      kind: cardinal ? cardinal.kind : 'sign',
      sign,
      eclipticLongitudeDeg: lon,
      dateUtc,
      declinationRad: sunDeclinationRad(dateUtc),
    };
  });
  return [...lines].sort((a, b) => a.dateUtc.getTime() - b.dateUtc.getTime());
}
