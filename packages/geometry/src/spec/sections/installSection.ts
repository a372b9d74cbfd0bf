import { z } from 'zod';

/**
 * The `install:` section of the dial spec (owned by the install work; see schema.ts).
 * Every field has a default and a describe() text with its unit.
 */
export const installSection = z.strictObject({}).prefault({});
