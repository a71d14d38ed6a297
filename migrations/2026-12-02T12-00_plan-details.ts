import { sql, type Kysely } from 'kysely';

// Plan details (the job, people, communication, site control, weather, hazards, checklist) saved with a scene
// revision: one row per revision at which they were saved. Revision N's details are the newest row at or below N.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('scene_plan_details')
    .ifNotExists()
    .addColumn('id', 'integer', (c) => c.primaryKey().autoIncrement())
    .addColumn('organisation_id', 'integer', (c) => c.notNull().references('organisations.id').onDelete('cascade'))
    .addColumn('scene_id', 'integer', (c) => c.notNull().references('scenes.id').onDelete('cascade'))
    .addColumn('revision', 'integer', (c) => c.notNull())
    .addColumn('details', 'text', (c) => c.notNull())
    .addColumn('author_id', 'integer', (c) => c.notNull().references('users.id'))
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`))
    .addUniqueConstraint('scene_plan_details_revision_uq', ['scene_id', 'revision'])
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('scene_plan_details').ifExists().execute();
}
