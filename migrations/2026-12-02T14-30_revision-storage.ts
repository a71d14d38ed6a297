import { sql, type Kysely } from 'kysely';
import { isPostgres } from '@/db/dialect';

/**
 * Lean revisions: an autosave's snapshot is stored gzip-compressed (a BLOB in `document`, which
 * db/json-columns.ts inflates on read), while a revision that was submitted or approved is `kept`: a full
 * JSON snapshot that the background thinning (db/repositories/revision-storage.ts) never removes.
 * PostgreSQL has no column that holds both text and bytes, so there `document` becomes bytea: kept
 * revisions hold their JSON as UTF-8 bytes, autosaves gzip bytes (db/json-columns.ts tells them apart).
 */
export async function up(db: Kysely<any>): Promise<void> {
  if (isPostgres(db)) await sql`alter table scene_revisions alter column document type bytea using convert_to(document, 'UTF8')`.execute(db);
  await db.schema.alterTable('scene_revisions').addColumn('kept', 'integer', (c) => c.notNull().defaultTo(0)).execute();
  await db.schema.createIndex('scene_revisions_thinning_idx').on('scene_revisions').columns(['scene_id', 'kept', 'created_at']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropIndex('scene_revisions_thinning_idx').execute();
  await db.schema.alterTable('scene_revisions').dropColumn('kept').execute();
}
