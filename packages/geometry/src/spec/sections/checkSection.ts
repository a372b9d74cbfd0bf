import { z } from 'zod';
import { boundedNumber } from '../boundedNumber.ts';

/**
 * The `check:` section of the dial spec: how `umbrafab check` simulates the
 * Sun over the built parts. Every field has a default and a describe() text
 * with its unit; errors use the "allowed: …" style of schema.ts.
 */

/** A bounded number with its unit (see boundedNumber). */
const bounded = (min: number, max: number, unit: string, opts: { exclusiveMin?: boolean; int?: boolean } = {}) => boundedNumber({ min, max, unit, ...opts });

export const CHECK_REFRACTION = ['none', 'normal'] as const;

export const checkSection = z
  .strictObject({
    tolerance: bounded(0, 10, 'mm', { exclusiveMin: true })
      .default(0.05)
      .describe('largest shadow-to-mark distance accepted on any day, mm; umbrafab check exits 1 beyond it'),
    sampling: z
      .strictObject({
        stepMinutes: bounded(0.25, 60, 'min').default(1).describe('time step of the shadow sweep across each day, minutes'),
        everyDays: bounded(1, 60, 'days', { int: true }).default(1).describe('simulate every n-th day of the year (1 = every day)'),
      })
      .prefault({}),
    refraction: z
      .enum(CHECK_REFRACTION, { error: 'allowed: "none" or "normal"' })
      .default('none')
      .describe('none: the geometric Sun (the layout\'s own model); normal: lift the Sun by standard atmospheric refraction (up to 0.57° at the horizon), which shows as extra error near sunrise and sunset'),
    tiltError: bounded(-15, 15, '°').default(0).describe('simulate the plate set this many degrees steeper (+) or flatter (−) than |latitude|, degrees'),
    azimuthError: bounded(-30, 30, '°').default(0).describe('simulate the style turned this many degrees clockwise (seen from above) off the true meridian, degrees'),
  })
  .prefault({});
