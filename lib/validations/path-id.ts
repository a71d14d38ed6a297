import { z } from 'zod';

/**
 * A path segment that is a positive whole number written plainly ("12", not "1e1", " 12", "012" or
 * "0x0c"). Number() and z.coerce accept all of those, so the text is checked before it is converted.
 * Shared by the route wrapper's idParams and every route with more than one id in its path.
 */
export const pathId = (field: string) =>
  z
    .string({ error: `${field} is required` })
    .regex(/^[1-9][0-9]{0,14}$/, `${field} must be a positive whole number`)
    .transform(Number);
