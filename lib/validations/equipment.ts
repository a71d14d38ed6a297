import { z } from 'zod';

/** Placeholder spec check until the equipment library defines the truck profile schema. */
export const equipmentProfileSchema = z.object({
  kind: z.enum(['truck']).default('truck'),
  name: z.string({ error: 'Name is required' }).trim().min(2, 'Name needs at least 2 characters').max(80),
  unitNumber: z.string().trim().max(20).nullable().optional(),
  inService: z.boolean().optional(),
  spec: z.record(z.string(), z.unknown(), { error: 'spec must be a JSON object' }),
});
export type EquipmentProfileInput = z.infer<typeof equipmentProfileSchema>;
