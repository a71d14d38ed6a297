import { z } from 'zod';
import { getDb } from '@/db';
import { createEquipmentProfile, listEquipmentProfiles } from '@/db/repositories/equipment';
import { recordAudit } from '@/db/repositories/audit';
import { route } from '@/lib/api/route';
import { equipmentProfileSchema } from '@/lib/validations/equipment';
import { rolesFor } from '@/lib/auth/permissions';

export const runtime = 'nodejs';

const listQuery = z.object({ includeRetired: z.enum(['true', 'false']).optional() });

export const GET = route({ query: listQuery }, async ({ user, query }) => {
  return { items: await listEquipmentProfiles(getDb(), user.organisationId, { includeRetired: query.includeRetired === 'true' }) };
});

export const POST = route({ roles: rolesFor('manageEquipment'), body: equipmentProfileSchema }, async ({ user, body }) => {
  const profile = await getDb()
    .transaction()
    .execute(async (trx) => {
      const p = await createEquipmentProfile(trx, user.organisationId, body, user.id);
      await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, action: 'equipment.create', detail: { id: p.id, version: p.version } });
      return p;
    });
  return Response.json(profile, { status: 201 });
});
