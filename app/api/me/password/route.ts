import { getDb } from '@/db';
import { inTransaction } from '@/db/transaction';
import { recordAudit } from '@/db/repositories/audit';
import { setUserPassword } from '@/db/repositories/users';
import { hashPassword, verifyPassword } from '@/lib/auth/password';
import { route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { changePasswordSchema } from '@/lib/validations/users';

export const runtime = 'nodejs';

/**
 * Changes the signed-in user's password. Every session of the user ends, this one included: the client
 * signs in again with the new password.
 */
export const POST = route({ body: changePasswordSchema }, async ({ user, body }) => {
  const db = getDb();
  const row = await db.selectFrom('users').select('password_hash').where('id', '=', user.id).executeTakeFirstOrThrow();
  if (!(await verifyPassword(body.currentPassword, row.password_hash))) {
    throw new HttpError(400, 'currentPassword: does not match your current password', [{ path: 'currentPassword', message: 'Does not match' }]);
  }
  if (body.newPassword === body.currentPassword) {
    throw new HttpError(400, 'newPassword: must differ from the current password', [{ path: 'newPassword', message: 'Same as the current password' }]);
  }
  // Hash first: bcrypt takes tens of milliseconds and must not hold the write transaction open.
  const hash = await hashPassword(body.newPassword);
  await inTransaction(db, async (trx) => {
    await setUserPassword(trx, user.id, hash);
    await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, action: 'user.password.change', detail: {} });
  });
  return { ok: true, signedOut: true };
});
