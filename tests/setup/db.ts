import { getDb } from '@/db';
import { migrateToLatest } from '@/db/migrator';
import { seedDemo } from '@/db/seed/run-seed';
import { DEMO_USERS } from '@/db/seed/demo-users';
import type { CurrentUser } from '@/lib/auth/current-user';
import { findUserById } from '@/db/repositories/users';

/** Migrates this test file's database and loads the demo scenario. */
export async function freshSeededDb() {
  const db = getDb();
  await migrateToLatest(db);
  await seedDemo(db);
  return db;
}

export async function demoUser(email: (typeof DEMO_USERS)[number]['email']): Promise<CurrentUser> {
  const db = getDb();
  const row = await db.selectFrom('users').select('id').where('email', '=', email).executeTakeFirstOrThrow();
  const u = (await findUserById(db, row.id))!;
  return { id: u.id, organisationId: u.organisation_id, organisationName: u.organisation_name, role: u.role, name: u.name, email: u.email, units: u.units };
}
