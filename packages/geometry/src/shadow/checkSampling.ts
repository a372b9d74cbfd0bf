import { SpecError } from '../errors.ts';
import type { DialSpec } from '../spec/schema.ts';
import { sunTrack, type RefractionModel, type SunTrack } from '../sun/sunTrack.ts';

/** The sampling options both checks take; each defaults from the spec's `check:` section. */
export interface SamplingOptions {
  /** largest accepted distance of the shadow from a drawn mark, mm (default spec.check.tolerance, 0.05) */
  readonly toleranceMm?: number;
  /** shadow sweep step, minutes (default spec.check.sampling.stepMinutes, 1) */
  readonly stepMinutes?: number;
  /** simulate every n-th day (default spec.check.sampling.everyDays, 1) */
  readonly everyDays?: number;
  /** (default spec.check.refraction) */
  readonly refraction?: RefractionModel;
  /** calendar year simulated (default spec.calendar.year) */
  readonly year?: number;
}

/**
 * The sampling of a check over the year, shared by `checkDial` (polar) and
 * `checkPlanar`: options over the spec's `check:` defaults, refused when out
 * of range, and the real Sun's track for the site and year (`sunTrack`).
 * @example checkSampling(spec, { everyDays: 7 }).track.days.length
 */
export function checkSampling(spec: DialSpec, options: SamplingOptions) {
  const c = spec.check;
  const toleranceMm = options.toleranceMm ?? c.tolerance;
  const stepMinutes = options.stepMinutes ?? c.sampling.stepMinutes;
  const everyDays = options.everyDays ?? c.sampling.everyDays;
  const refraction = options.refraction ?? c.refraction;
  const year = options.year ?? spec.calendar.year;
  if (!(toleranceMm > 0)) throw new SpecError('check.tolerance', toleranceMm, 'allowed: a number greater than 0 mm');
  if (!(stepMinutes >= 0.25 && stepMinutes <= 60)) throw new SpecError('check.sampling.stepMinutes', stepMinutes, 'allowed: a number from 0.25 to 60 min');
  const track: SunTrack = sunTrack({ latitudeDeg: spec.site.latitude, longitudeDeg: spec.site.longitude, timezone: spec.site.timezone, year, everyDays, refraction });
  return { toleranceMm, stepMinutes, everyDays, refraction, year, track };
}
