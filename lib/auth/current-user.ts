import { getDb } from '@/db';
import { findUserById } from '@/db/repositories/users';
import type { CurrentUser } from '@/lib/domain';
import { getSessionUserId } from './session-claims';

export type { CurrentUser };

/**
 * The signed-in user as the database knows them now. The role and organisation are read
 * from the database, not trusted from the token, so a demoted or deactivated user loses access at once.
 */
export async function getCurrentUser(): Promise<CurrentUser | null> {
  const id = await getSessionUserId();
  if (id === null) return null;
  const row = await findUserById(getDb(), id);
  if (!row || !row.active) return null;
  return {
    id: row.id,
    organisationId: row.organisation_id,
    organisationName: row.organisation_name,
    role: row.role,
    name: row.name,
    email: row.email,
    units: row.units,
  };
}
