import type { Kysely } from 'kysely';
import type { Database, NewUser } from '../schema';
import type { Role } from '@/lib/domain';

type Db = Kysely<Database>;

const publicColumns = ['users.id', 'users.organisation_id', 'users.email', 'users.name', 'users.role', 'users.units', 'users.active', 'users.created_at'] as const;

/** Every account under this address: an address may repeat across organisations (never within one). */
export function findUsersByEmail(db: Db, email: string) {
  return db.selectFrom('users').selectAll().where('email', '=', email.trim().toLowerCase()).orderBy('id').execute();
}

export function findUserByEmail(db: Db, email: string, organisationId?: number) {
  let q = db.selectFrom('users').selectAll().where('email', '=', email.trim().toLowerCase());
  if (organisationId !== undefined) q = q.where('organisation_id', '=', organisationId);
  return q.orderBy('id').executeTakeFirst();
}

/**
 * Ends every session of this user at once: each session carries the version it began with, and
 * getCurrentUser refuses one that is behind. Called on sign-out, password change and deactivation.
 */
export async function endUserSessions(db: Db, id: number, onlyFromVersion?: number): Promise<void> {
  let q = db.updateTable('users').set((eb) => ({ session_version: eb('session_version', '+', 1) })).where('id', '=', id);
  // A sign-out with an already-ended token must not end the sessions that began after it.
  if (onlyFromVersion !== undefined) q = q.where('session_version', '=', onlyFromVersion);
  await q.execute();
}

/** Sets a new password hash and ends the user's sessions, in the caller's transaction. */
export async function setUserPassword(db: Db, id: number, passwordHash: string): Promise<void> {
  await db.updateTable('users').set((eb) => ({ password_hash: passwordHash, session_version: eb('session_version', '+', 1) })).where('id', '=', id).execute();
}

export function findUserById(db: Db, id: number) {
  return db
    .selectFrom('users')
    .innerJoin('organisations', 'organisations.id', 'users.organisation_id')
    .select([...publicColumns, 'users.session_version', 'organisations.name as organisation_name'])
    .where('users.id', '=', id)
    .executeTakeFirst();
}

export function listUsers(db: Db, organisationId: number) {
  return db
    .selectFrom('users')
    .select([...publicColumns])
    .where('organisation_id', '=', organisationId)
    .orderBy('name')
    .execute();
}

export async function createUser(db: Db, user: Omit<NewUser, 'created_at'>) {
  return db
    .insertInto('users')
    .values({ ...user, email: user.email.trim().toLowerCase(), created_at: new Date().toISOString() })
    .returning(['id', 'organisation_id', 'email', 'name', 'role', 'units', 'active', 'created_at'])
    .executeTakeFirstOrThrow();
}

export function setUserRole(db: Db, organisationId: number, id: number, role: Role) {
  return db.updateTable('users').set({ role }).where('id', '=', id).where('organisation_id', '=', organisationId).executeTakeFirst();
}

export function setUserUnits(db: Db, id: number, units: 'imperial' | 'metric') {
  return db.updateTable('users').set({ units }).where('id', '=', id).executeTakeFirst();
}

/** Active admins of an organisation other than `exceptId`: an organisation must always keep one. */
export async function otherActiveAdmins(db: Db, organisationId: number, exceptId: number): Promise<number> {
  const row = await db
    .selectFrom('users')
    .select((eb) => eb.fn.countAll<number>().as('n'))
    .where('organisation_id', '=', organisationId)
    .where('role', '=', 'admin')
    .where('active', '=', 1)
    .where('id', '!=', exceptId)
    .executeTakeFirstOrThrow();
  return Number(row.n);
}

/** A new role and/or deactivation; deactivating also raises the session version, ending the user's sessions. */
export function updateUser(db: Db, organisationId: number, id: number, changes: { role?: Role; active?: boolean }) {
  return db
    .updateTable('users')
    .set((eb) => ({
      ...(changes.role !== undefined && { role: changes.role }),
      ...(changes.active !== undefined && { active: changes.active ? 1 : 0 }),
      ...(changes.active === false && { session_version: eb('session_version', '+', 1) }),
    }))
    .where('id', '=', id)
    .where('organisation_id', '=', organisationId)
    .returning(['id', 'organisation_id', 'email', 'name', 'role', 'units', 'active', 'created_at'])
    .executeTakeFirst();
}
