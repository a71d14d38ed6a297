import type { Kysely } from 'kysely';
import type { Database } from '@/db/schema';
import { inTransaction } from '@/db/transaction';
import { recordAudit } from '@/db/repositories/audit';
import { enqueueMail } from '@/db/repositories/outbox';
import { claimPasswordReset, findUsablePasswordReset, insertPasswordReset } from '@/db/repositories/password-resets';
import { findUserById, setUserPassword } from '@/db/repositories/users';
import { HttpError } from '@/lib/api/errors';
import type { CurrentUser } from '@/lib/auth/current-user';
import { hashPassword } from '@/lib/auth/password';
import { composeResetMail } from '@/lib/auth/reset-mail';
import { hashResetToken, newResetToken } from '@/lib/auth/reset-token';
import { RESET_LINK_HOURS, resetLinkPath } from '@/lib/auth/reset-link';
import { appBaseUrl } from './mail/transport';
import { kickOutbox } from './mail/outbox-worker';

/**
 * An admin sends a user a one-time link to set a new password. The token goes only into the e-mail (queued
 * in the outbox with the link's row, in one transaction); the admin's answer says where it went, never the
 * token. The user's current password keeps working until the link is used.
 */
export async function sendPasswordReset(db: Kysely<Database>, admin: CurrentUser, userId: number, now = new Date()) {
  const { token, hash } = newResetToken();
  const expiresAt = new Date(now.getTime() + RESET_LINK_HOURS * 3600_000).toISOString();
  const sentTo = await inTransaction(db, async (trx) => {
    const target = await findUserById(trx, userId);
    if (!target || target.organisation_id !== admin.organisationId) throw new HttpError(404, 'User not found');
    if (target.active !== 1) throw new HttpError(409, `id: ${target.name} is deactivated; reactivate the account before sending a reset link`, [{ path: 'id', message: 'Deactivated' }]);
    await insertPasswordReset(trx, { tokenHash: hash, organisationId: admin.organisationId, userId: target.id, requestedBy: admin.id, createdAt: now.toISOString(), expiresAt });
    const mail = composeResetMail({ userName: target.name, adminName: admin.name, organisationName: target.organisation_name, url: `${appBaseUrl()}${resetLinkPath(token)}`, hours: RESET_LINK_HOURS });
    await enqueueMail(trx, [{ organisationId: admin.organisationId, toUserId: target.id, to: target.email, ...mail }]);
    await recordAudit(trx, { organisationId: admin.organisationId, userId: admin.id, action: 'user.password.reset-sent', detail: { id: target.id } });
    return target.email;
  });
  kickOutbox();
  return { ok: true as const, sentTo, expiresAt };
}

const unusable = () =>
  new HttpError(400, 'token: this reset link has expired or has already been used; ask your admin for a new one', [{ path: 'token', message: 'Expired or already used' }]);

/** Who a link is for, while it works (the reset page shows the name); undefined once expired or used. */
export function usableReset(db: Kysely<Database>, token: string, now = new Date()) {
  return findUsablePasswordReset(db, hashResetToken(token), now.toISOString());
}

/**
 * Sets the new password from a link: the link is claimed in the same transaction as the password change,
 * so it works exactly once; every session of the user ends (as for any password change).
 */
export async function completePasswordReset(db: Kysely<Database>, token: string, newPassword: string, now = new Date()) {
  const tokenHash = hashResetToken(token);
  // Check first, so a dead link costs no bcrypt work; the claim below decides for real.
  if (!(await findUsablePasswordReset(db, tokenHash, now.toISOString()))) throw unusable();
  const passwordHash = await hashPassword(newPassword);
  await inTransaction(db, async (trx) => {
    const reset = await findUsablePasswordReset(trx, tokenHash, now.toISOString());
    if (!reset || !(await claimPasswordReset(trx, tokenHash, now.toISOString()))) throw unusable();
    await setUserPassword(trx, reset.user_id, passwordHash);
    await recordAudit(trx, { organisationId: reset.organisation_id, userId: reset.user_id, action: 'user.password.reset', detail: {} });
  });
  return { ok: true as const };
}
