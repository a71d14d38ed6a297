import type { Kysely } from 'kysely';

/**
 * Wrong-password counts shared by every app instance on PostgreSQL (lib/server/sign-in-throttle.ts): one row
 * per throttled key ("signin-account:<e-mail>" or "signin-address:<address>"), its points and when its window
 * ends (ms since the epoch). The columns are the ones rate-limiter-flexible's PostgreSQL store reads and
 * writes; `key` is text rather than its varchar(255), so a 254-character e-mail with its prefix fits. Created
 * on SQLite too, to keep one schema; there the counts stay in memory (one host, usually one process).
 */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('sign_in_throttle')
    .ifNotExists()
    .addColumn('key', 'text', (c) => c.primaryKey())
    .addColumn('points', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('expire', 'bigint')
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('sign_in_throttle').ifExists().execute();
}
