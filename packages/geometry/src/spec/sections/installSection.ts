import { z } from 'zod';
import { dateField } from '../textFields.ts';

/**
 * The `install:` section of the dial spec: what the installation sheet
 * (install.md) covers. Outputs never depend on today's date: without
 * `install.date` the sheet is made for April 1 of `calendar.year`.
 */
export const installSection = z
  .strictObject({
    date: dateField('2027-04-01')
      .optional()
      .describe('installation date "YYYY-MM-DD" for the magnetic declination and the noon table (default April 1 of calendar.year)'),
    weeks: z
      .number({ error: 'allowed: a whole number from 1 to 12 (weeks)' })
      .int({ error: 'allowed: a whole number from 1 to 12 (weeks)' })
      .gte(1, { error: 'allowed: a whole number from 1 to 12 (weeks)' })
      .lte(12, { error: 'allowed: a whole number from 1 to 12 (weeks)' })
      .default(4)
      .describe('weeks of daily local-apparent-noon times listed after install.date'),
  })
  .prefault({});
