import { getDb } from '@/db';
import { findUserById } from '@/db/repositories/users';
import type { CurrentUser } from '@/lib/domain';
import { getSessionClaims } from './session-claims';

export type { CurrentUser };

/**
 * The signed-in user as the database knows them now. The role and organisation are read
 * from the database, not trusted from the token, so a demoted or deactivated user loses access at once;
 * a session whose version is behind the user's (signed out, password changed) is no session at all.
 */
export async function getCurrentUser(): Promise<CurrentUser | null> {
  const claims = await getSessionClaims();
  if (claims === null) return null;
  const row = await findUserById(getDb(), claims.userId);
  if (!row || !row.active || row.session_version !== claims.sessionVersion) return null;
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
