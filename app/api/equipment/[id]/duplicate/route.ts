import { getDb } from '@/db';
import { duplicateEquipmentProfile } from '@/db/repositories/equipment';
import { recordAudit } from '@/db/repositories/audit';
import { idParams, route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { duplicateProfileSchema } from '@/lib/validations/equipment';
import { rolesFor } from '@/lib/auth/permissions';

export const runtime = 'nodejs';

export const POST = route({ roles: rolesFor('manageEquipment'), params: idParams, body: duplicateProfileSchema }, async ({ user, params, body }) => {
  const copy = await getDb()
    .transaction()
    .execute(async (trx) => {
      const p = await duplicateEquipmentProfile(trx, user.organisationId, params.id, body, user.id);
      if (!p) throw new HttpError(404, 'Equipment profile not found');
      await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, action: 'equipment.duplicate', detail: { from: params.id, id: p.id } });
      return p;
    });
  return Response.json(copy, { status: 201 });
});
