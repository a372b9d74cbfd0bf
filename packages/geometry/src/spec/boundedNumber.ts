import { z } from 'zod';

export interface BoundedNumberOptions {
  readonly min: number;
  /** Upper bound; Infinity for none. */
  readonly max: number;
  /** Unit shown in the message: '' for none, '°' written without a space, anything else after a space. */
  readonly unit: string;
  readonly exclusiveMin?: boolean;
  readonly exclusiveMax?: boolean;
  readonly int?: boolean;
}

/**
 * A zod number field with bounds, whose every error says what is allowed
 * ("allowed: a number from 0 mm to 10 mm"). The one builder behind every
 * numeric field of the spec schema and its sections (this module imports
 * nothing of the schema, so the sections can use it too).
 * @example boundedNumber({ min: 0, max: 90, unit: '°' }).default(45)
 */
export function boundedNumber(opts: BoundedNumberOptions) {
  const { min, max, unit, exclusiveMin, exclusiveMax, int } = opts;
  const u = unit === '' ? '' : unit === '°' ? unit : ` ${unit}`;
  const upper = max === Infinity ? '' : ` ${exclusiveMax ? 'and less than' : exclusiveMin ? 'up to' : 'to'} ${max}${u}`;
  const allowed = `allowed: ${int ? 'a whole number' : 'a number'} ${exclusiveMin ? 'greater than' : 'from'} ${min}${u}${upper}`;
  let s = z.number({ error: allowed });
  s = exclusiveMin ? s.gt(min, { error: allowed }) : s.gte(min, { error: allowed });
  if (max !== Infinity) s = exclusiveMax ? s.lt(max, { error: allowed }) : s.lte(max, { error: allowed });
  if (int) s = s.int({ error: allowed });
  return s;
}
