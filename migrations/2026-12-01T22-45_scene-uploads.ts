import { sql, type Kysely } from 'kysely';
import { autoId, nowText } from '@/db/dialect';

// Uploaded files attached to a scene (for now: site background images). The bytes live in lib/storage.ts
// under storage_key; this row says whose they are.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('scene_uploads')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('organisation_id', 'integer', (c) => c.notNull().references('organisations.id').onDelete('cascade'))
    .addColumn('scene_id', 'integer', (c) => c.notNull().references('scenes.id').onDelete('cascade'))
    .addColumn('storage_key', 'text', (c) => c.notNull().unique())
    .addColumn('mime', 'text', (c) => c.notNull().check(sql`mime in ('image/png','image/jpeg','image/webp')`))
    .addColumn('bytes', 'integer', (c) => c.notNull())
    .addColumn('width', 'integer')
    .addColumn('height', 'integer')
    .addColumn('uploader_id', 'integer', (c) => c.notNull().references('users.id'))
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(nowText(db)))
    .execute();
  await db.schema.createIndex('scene_uploads_scene_idx').ifNotExists().on('scene_uploads').columns(['organisation_id', 'scene_id']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('scene_uploads').ifExists().execute();
}
