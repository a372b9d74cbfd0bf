import { z } from 'zod';
import { boundedNumber } from '../boundedNumber.ts';
import { clockField, dateField } from '../textFields.ts';

/**
 * The `pictures:` section of the dial spec: preview.png and the assembly
 * picture (assembly.svg, assembly.png) with the gnomon's shadow for a chosen
 * date and dial reading. Every field has a default and a describe() text with
 * its unit.
 */

/** A bounded number with its unit (see boundedNumber). */
const bounded = (min: number, max: number, unit: string) => boundedNumber({ min, max, unit });


export const picturesSection = z
  .strictObject({
    write: z.boolean({ error: 'allowed: true or false' }).default(true).describe('write preview.png, assembly.svg and assembly.png'),
    pxPerMm: bounded(1, 20, 'px/mm').default(4).describe('pixels per millimetre of preview.png and assembly.png (4 px/mm is about 100 dpi)'),
    date: dateField('2027-06-21')
      .optional()
      .describe('local date of the shadow in the assembly picture, "YYYY-MM-DD" (default: the local summer solstice of calendar.year, June 21 north, December 21 south; the winter solstice for an equatorial dial\'s lower face)'),
    time: clockField('10:00')
      .default('10:00')
      .describe('dial reading the shadow shows in the assembly picture, "HH:MM" (the moment the real sun puts the shadow on that line; the report gives its clock time)'),
    viewAzimuth: bounded(-80, 80, '°').default(35).describe('viewpoint of the assembly picture, degrees east of the equator-ward direction (negative: west); a horizontal, wall or equatorial face is seen that far from its front, on the side away from the sun'),
    viewElevation: bounded(5, 85, '°').default(30).describe('viewpoint height above the horizon, degrees'),
  })
  .prefault({});

export type PicturesSpec = z.output<typeof picturesSection>;
