import { z } from 'zod';
import { boundedNumber as num } from '../boundedNumber.ts';

/** The planar dial kinds (our names; docs/design.md §8). */
export const FACE_TYPES = ['polar', 'horizontal', 'vertical', 'meridian', 'equatorial'] as const;
export type FaceType = (typeof FACE_TYPES)[number];
/** The faces of an equatorial plate a spec asks for (`face.side`). */
export const EQUATORIAL_SIDES = ['upper', 'lower', 'both'] as const;
export type EquatorialSide = (typeof EQUATORIAL_SIDES)[number];

const oneOf = <const T extends readonly [string, ...string[]]>(values: T) =>
  z.enum(values, { error: `allowed: ${values.map((v) => JSON.stringify(v)).join(', ')}` });

/**
 * The optional `face:` section: which planar dial the plate is. Left out,
 * the dial is the polar plate of every earlier spec, and nothing in the
 * normalised spec or the outputs changes (the section stays absent).
 *
 * Wall declination sign (ours): 0 = the wall faces the equator-ward horizon
 * (due south in the northern hemisphere, due north in the southern),
 * positive when it turns toward the WEST (a south-west wall is +45), negative
 * toward the east; ±180 faces the pole-ward horizon.
 */
export const faceSection = z
  .strictObject({
    type: oneOf(FACE_TYPES).default('polar').describe('polar (the tilted plate), horizontal (level), vertical (a wall, see wallDeclination), meridian (a wall facing due east or west) or equatorial (square to the Earth\'s axis)'),
    wallDeclination: num({ min: -180, max: 180, unit: '°' }).default(0).describe('vertical: degrees the wall turns from facing the equator (due south in the north), positive toward the west, e.g. 25 for a wall facing south-south-west; `umbrafab wall` measures it'),
    reclination: num({ min: -75, max: 75, unit: '°' }).default(0).describe('vertical: degrees the face leans back from upright (negative: leans forward)'),
    facing: oneOf(['east', 'west']).default('east').describe('meridian: the horizon the face looks at'),
    side: oneOf(EQUATORIAL_SIDES).default('upper').describe('equatorial: the faces engraved, upper (toward the elevated pole, sunlit from the March to the September equinox in the north) or lower (the other half of the year) alone, or both (one plate read on its upper face in the summer half of the year and on its lower face in the winter half)'),
  })
  .optional();
