import { z } from 'zod';

/**
 * The `check:` section of the dial spec (owned by the check work; see schema.ts).
 * Every field has a default and a describe() text with its unit.
 */
export const checkSection = z.strictObject({}).prefault({});
