import { z } from 'zod';
import { planDetailsSchema } from '@/lib/plan-details/schema';
import { pathId } from './path-id';

/** `?revision=N`: a plain positive whole number; omitted means the route's default revision. */
export const planRevisionQuery = z.object({ revision: pathId('revision').optional() }).strict();

export const savePlanDetailsSchema = z
  .object({
    revision: z.number({ error: 'revision is required: the revision this save is based on' }).int().positive(),
    details: planDetailsSchema,
  })
  .strict();
export type SavePlanDetailsInput = z.input<typeof savePlanDetailsSchema>;
