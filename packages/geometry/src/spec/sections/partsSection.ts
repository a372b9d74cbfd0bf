import { z } from 'zod';

/**
 * The `parts:` section of the dial spec (owned by the parts work; see schema.ts).
 * Every field has a default and a describe() text with its unit.
 */
export const partsSection = z.strictObject({}).prefault({});
