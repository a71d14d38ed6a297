import type { Kysely } from 'kysely';

/**
 * One-time password-reset links an admin sends to a user. Only the SHA-256 of the token is stored (the
 * token itself exists only in the e-mail), so a copy of the database cannot be used to reset anyone's
 * password. A link works once (`used_at`) and until `expires_at`; a newer link replaces an unused older one.
 * The token hash is the key, so the table needs no generated id.
 */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('password_resets')
    .ifNotExists()
    .addColumn('token_hash', 'text', (c) => c.primaryKey())
    .addColumn('organisation_id', 'integer', (c) => c.notNull().references('organisations.id').onDelete('cascade'))
    .addColumn('user_id', 'integer', (c) => c.notNull().references('users.id').onDelete('cascade'))
    .addColumn('requested_by', 'integer', (c) => c.notNull().references('users.id'))
    .addColumn('created_at', 'text', (c) => c.notNull())
    .addColumn('expires_at', 'text', (c) => c.notNull())
    .addColumn('used_at', 'text')
    .execute();
  await db.schema.createIndex('password_resets_user_idx').ifNotExists().on('password_resets').columns(['user_id']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('password_resets').ifExists().execute();
}
