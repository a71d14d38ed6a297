import { getDb } from '@/db';
import { findEquipmentProfile, updateEquipmentProfile } from '@/db/repositories/equipment';
import { recordAudit } from '@/db/repositories/audit';
import { idParams, route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { updateEquipmentProfileSchema } from '@/lib/validations/equipment';
import { retire } from '../retire-profile';
import { rolesFor } from '@/lib/auth/permissions';

export const runtime = 'nodejs';

const notFound = () => new HttpError(404, 'Equipment profile not found');

export const GET = route({ params: idParams }, async ({ user, params }) => {
  const p = await findEquipmentProfile(getDb(), user.organisationId, params.id);
  if (!p) throw notFound();
  return p;
});

/** Saves a new version; the old one stays in the history so scenes planned with it still load it. */
export const PUT = route({ roles: rolesFor('manageEquipment'), params: idParams, body: updateEquipmentProfileSchema }, async ({ user, params, body }) => {
  return getDb()
    .transaction()
    .execute(async (trx) => {
      const out = await updateEquipmentProfile(trx, user.organisationId, params.id, body, user.id);
      if (out.kind === 'missing') throw notFound();
      if (out.kind === 'retired') throw new HttpError(409, 'This profile is retired; duplicate it to make changes', [{ path: 'baseVersion', message: 'Profile retired' }]);
      if (out.kind === 'stale') {
        throw new HttpError(409, `baseVersion: this profile is now at version ${out.current}; you edited version ${body.baseVersion}. Reload it and make your change again.`, [
          { path: 'baseVersion', message: `Current version is ${out.current}` },
        ]);
      }
      await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, action: 'equipment.update', detail: { id: out.profile.id, version: out.profile.version } });
      return out.profile;
    });
});

/** Retires the profile (kept for the scenes that point at it). */
export const DELETE = route({ roles: rolesFor('manageEquipment'), params: idParams }, async ({ user, params }) => retire(user, params.id));
