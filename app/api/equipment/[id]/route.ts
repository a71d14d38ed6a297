import { getDb } from '@/db';
import { findEquipmentProfile, retireEquipmentProfile, updateEquipmentProfile } from '@/db/repositories/equipment';
import { recordAudit } from '@/db/repositories/audit';
import { idParams, route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { equipmentProfileSchema } from '@/lib/validations/equipment';

export const runtime = 'nodejs';

const notFound = () => new HttpError(404, 'Equipment profile not found');

export const GET = route({ params: idParams }, async ({ user, params }) => {
  const p = await findEquipmentProfile(getDb(), user.organisationId, params.id);
  if (!p) throw notFound();
  return p;
});

export const PUT = route({ roles: ['admin'], params: idParams, body: equipmentProfileSchema }, async ({ user, params, body }) => {
  return getDb()
    .transaction()
    .execute(async (trx) => {
      const p = await updateEquipmentProfile(trx, user.organisationId, params.id, body);
      if (!p) throw notFound();
      await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, action: 'equipment.update', detail: { id: p.id, version: p.version } });
      return p;
    });
});

export const DELETE = route({ roles: ['admin'], params: idParams }, async ({ user, params }) => {
  await getDb()
    .transaction()
    .execute(async (trx) => {
      if (!(await retireEquipmentProfile(trx, user.organisationId, params.id))) throw notFound();
      await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, action: 'equipment.retire', detail: { id: params.id } });
    });
  return { ok: true };
});
