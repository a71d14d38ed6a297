import { sql, type Kysely } from 'kysely';
import { doubleType } from '@/db/dialect';

/**
 * Everyday scene actions and the list's figures.
 * - `archived_from`: the status an archived scene had, so unarchiving puts it back where it was.
 * - `scenes_deleted_idx`: the admins' "Recently deleted" view reads deleted scenes newest first.
 * - `scene_figures`: the server's headline figures of a scene's saved revision (worst % of tipping, highest
 *   ground pressure as % of allowable, least clearance), written on first read so the list never runs the
 *   engine twice for one revision. A row is tied to the engine version that computed it.
 */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('scenes').addColumn('archived_from', 'text').execute();
  await sql`create index scenes_deleted_idx on scenes (organisation_id, deleted_at desc) where deleted_at is not null`.execute(db);
  await db.schema
    .createTable('scene_figures')
    .addColumn('scene_id', 'integer', (c) => c.notNull().references('scenes.id').onDelete('cascade'))
    .addColumn('revision', 'integer', (c) => c.notNull())
    .addColumn('engine_version', 'text', (c) => c.notNull())
    .addColumn('percent_of_tipping', doubleType(db))
    .addColumn('percent_of_bearing', doubleType(db))
    .addColumn('least_clearance', doubleType(db))
    .addColumn('beyond_count', 'integer')
    .addColumn('problem', 'text')
    .addColumn('computed_at', 'text', (c) => c.notNull())
    .addPrimaryKeyConstraint('scene_figures_pk', ['scene_id', 'revision'])
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('scene_figures').execute();
  await sql`drop index if exists scenes_deleted_idx`.execute(db);
  await db.schema.alterTable('scenes').dropColumn('archived_from').execute();
}
