import { getDb } from '@/db';
import { findEquipmentProfile, retireEquipmentProfile } from '@/db/repositories/equipment';
import { recordAudit } from '@/db/repositories/audit';
import { HttpError } from '@/lib/api/errors';

/** Retires a profile in a transaction: 404 for another organisation's id, 409 when already retired. */
export async function retire(user: { id: number; organisationId: number }, id: number) {
  await getDb()
    .transaction()
    .execute(async (trx) => {
      if (!(await retireEquipmentProfile(trx, user.organisationId, id))) {
        if (await findEquipmentProfile(trx, user.organisationId, id)) throw new HttpError(409, 'This profile is already retired');
        throw new HttpError(404, 'Equipment profile not found');
      }
      await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, action: 'equipment.retire', detail: { id } });
    });
  return { ok: true };
}
