import { getDb } from '@/db';
import { inTransaction } from '@/db/transaction';
import { recordAudit } from '@/db/repositories/audit';
import { findUserById, otherActiveAdmins, updateUser } from '@/db/repositories/users';
import { idParams, route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { updateUserSchema } from '@/lib/validations/users';
import { rolesFor } from '@/lib/auth/permissions';

export const runtime = 'nodejs';

/**
 * An admin changes a user's role or deactivates (or reactivates) them. A deactivated user cannot sign in,
 * and their open sessions end at once: every request looks the user up and refuses an inactive one.
 * The organisation's last active admin can be neither demoted nor deactivated.
 */
export const PATCH = route({ roles: rolesFor('manageUsers'), params: idParams, body: updateUserSchema }, async ({ user, params, body }) => {
  return inTransaction(getDb(), async (trx) => {
    const target = await findUserById(trx, params.id);
    if (!target || target.organisation_id !== user.organisationId) throw new HttpError(404, 'User not found');
    const losesAdmin = target.role === 'admin' && target.active === 1 && ((body.role !== undefined && body.role !== 'admin') || body.active === false);
    if (losesAdmin && (await otherActiveAdmins(trx, user.organisationId, target.id)) === 0) {
      const field = body.active === false ? 'active' : 'role';
      throw new HttpError(409, `${field}: ${target.name} is the organisation's last active admin; make someone else an admin first`, [{ path: field, message: 'Last active admin' }]);
    }
    const updated = (await updateUser(trx, user.organisationId, target.id, body))!;
    await recordAudit(trx, {
      organisationId: user.organisationId,
      userId: user.id,
      action: 'user.update',
      detail: { id: target.id, ...(body.role !== undefined && { role: body.role, from: target.role }), ...(body.active !== undefined && { active: body.active }) },
    });
    return updated;
  });
});
