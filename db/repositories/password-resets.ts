import type { Kysely } from 'kysely';
import type { Database } from '../schema';

type Db = Kysely<Database>;

/**
 * Stores a new reset link (by its token's hash) for a user, in the caller's transaction. Any unused
 * earlier link of that user stops working: only the newest e-mail counts.
 */
export async function insertPasswordReset(
  db: Db,
  r: { tokenHash: string; organisationId: number; userId: number; requestedBy: number; createdAt: string; expiresAt: string },
): Promise<void> {
  await db.deleteFrom('password_resets').where('user_id', '=', r.userId).where('used_at', 'is', null).execute();
  await db
    .insertInto('password_resets')
    .values({ token_hash: r.tokenHash, organisation_id: r.organisationId, user_id: r.userId, requested_by: r.requestedBy, created_at: r.createdAt, expires_at: r.expiresAt, used_at: null })
    .execute();
}

/** The account an unused, unexpired link belongs to, if that account is active; else undefined. */
export function findUsablePasswordReset(db: Db, tokenHash: string, now: string) {
  return db
    .selectFrom('password_resets')
    .innerJoin('users', 'users.id', 'password_resets.user_id')
    .select(['users.id as user_id', 'users.organisation_id', 'users.name', 'users.email', 'password_resets.expires_at'])
    .where('password_resets.token_hash', '=', tokenHash)
    .where('password_resets.used_at', 'is', null)
    .where('password_resets.expires_at', '>', now)
    .where('users.active', '=', 1)
    .executeTakeFirst();
}

/**
 * Marks a link used, if it still was usable: true for exactly one caller even when two submit the same
 * link at once (the update's own condition decides, inside the caller's transaction).
 */
export async function claimPasswordReset(db: Db, tokenHash: string, now: string): Promise<boolean> {
  const res = await db
    .updateTable('password_resets')
    .set({ used_at: now })
    .where('token_hash', '=', tokenHash)
    .where('used_at', 'is', null)
    .where('expires_at', '>', now)
    .executeTakeFirst();
  return Number(res.numUpdatedRows) === 1;
}
