import { z } from 'zod';
import { pathId } from './path-id';
import { truckSpecSchema } from '@/lib/equipment/truck-spec-rules';

/** A truck profile as the API and the profile form take it: identity fields plus the validated spec. */
export const equipmentProfileSchema = z.object({
  kind: z.enum(['truck']).default('truck'),
  name: z.string({ error: 'Name is required' }).trim().min(2, 'Name needs at least 2 characters').max(80, 'Name can be at most 80 characters'),
  unitNumber: z.string().trim().max(20, 'Unit number can be at most 20 characters').nullable().optional(),
  inService: z.boolean().optional(),
  spec: truckSpecSchema,
});
export type EquipmentProfileInput = z.infer<typeof equipmentProfileSchema>;

/** An update names the version it was edited from, so two admins editing at once cannot overwrite each other. */
export const updateEquipmentProfileSchema = equipmentProfileSchema.extend({
  baseVersion: z.number({ error: 'baseVersion is required: the version this edit started from' }).int().positive(),
});

export const duplicateProfileSchema = z.object({
  name: z.string().trim().min(2, 'Name needs at least 2 characters').max(80).optional(),
  unitNumber: z.string().trim().max(20).nullable().optional(),
});

export const versionParams = z.object({ id: pathId('id'), version: pathId('version') });
