import { type Kysely } from 'kysely';
import { autoId, nowText, jsonType } from '@/db/dialect';

// Plan details (the job, people, communication, site control, weather, hazards, checklist) saved with a scene
// revision: one row per revision at which they were saved. Revision N's details are the newest row at or below N.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('scene_plan_details')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('organisation_id', 'integer', (c) => c.notNull().references('organisations.id').onDelete('cascade'))
    .addColumn('scene_id', 'integer', (c) => c.notNull().references('scenes.id').onDelete('cascade'))
    .addColumn('revision', 'integer', (c) => c.notNull())
    .addColumn('details', jsonType(db), (c) => c.notNull())
    .addColumn('author_id', 'integer', (c) => c.notNull().references('users.id'))
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(nowText(db)))
    .addUniqueConstraint('scene_plan_details_revision_uq', ['scene_id', 'revision'])
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('scene_plan_details').ifExists().execute();
}
