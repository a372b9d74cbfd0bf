import { z } from 'zod';

/**
 * The `engrave:` section of the dial spec (owned by the engrave work; see schema.ts).
 * Every field has a default and a describe() text with its unit.
 */
export const engraveSection = z.strictObject({}).prefault({});
