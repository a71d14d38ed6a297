import type { Kysely } from 'kysely';
import type { Database } from '../schema';

export function createOrganisation(db: Kysely<Database>, name: string, slug: string) {
  return db
    .insertInto('organisations')
    .values({ name, slug, created_at: new Date().toISOString() })
    .returningAll()
    .executeTakeFirstOrThrow();
}

export function findOrganisation(db: Kysely<Database>, id: number) {
  return db.selectFrom('organisations').selectAll().where('id', '=', id).executeTakeFirst();
}
