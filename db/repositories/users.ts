import type { Kysely } from 'kysely';
import type { Database, NewUser } from '../schema';
import type { Role } from '@/lib/domain';

type Db = Kysely<Database>;

const publicColumns = ['users.id', 'users.organisation_id', 'users.email', 'users.name', 'users.role', 'users.units', 'users.active', 'users.created_at'] as const;

export function findUserByEmail(db: Db, email: string) {
  return db.selectFrom('users').selectAll().where('email', '=', email.trim().toLowerCase()).executeTakeFirst();
}

export function findUserById(db: Db, id: number) {
  return db
    .selectFrom('users')
    .innerJoin('organisations', 'organisations.id', 'users.organisation_id')
    .select([...publicColumns, 'organisations.name as organisation_name'])
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

export function updateUser(db: Db, organisationId: number, id: number, changes: { role?: Role; active?: boolean }) {
  return db
    .updateTable('users')
    .set({ ...(changes.role !== undefined && { role: changes.role }), ...(changes.active !== undefined && { active: changes.active ? 1 : 0 }) })
    .where('id', '=', id)
    .where('organisation_id', '=', organisationId)
    .returning(['id', 'organisation_id', 'email', 'name', 'role', 'units', 'active', 'created_at'])
    .executeTakeFirst();
}
