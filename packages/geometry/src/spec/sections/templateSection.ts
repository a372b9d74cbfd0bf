import { z } from 'zod';

/**
 * The `template:` section of the dial spec (owned by the template work; see schema.ts).
 * Every field has a default and a describe() text with its unit.
 */
export const templateSection = z.strictObject({}).prefault({});
