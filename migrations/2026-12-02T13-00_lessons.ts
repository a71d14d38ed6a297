import { type Kysely } from 'kysely';
import { autoId, nowText } from '@/db/dialect';

// Trainers' lessons: an ordered list of steps, each a scene at a chosen revision with talking notes and an
// optional question. Steps live in their own table so a scene's lessons can be found by the scene.
export async function up(db: Kysely<any>): Promise<void> {
  const now = nowText(db);
  await db.schema
    .createTable('lessons')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('organisation_id', 'integer', (c) => c.notNull().references('organisations.id').onDelete('cascade'))
    .addColumn('author_id', 'integer', (c) => c.notNull().references('users.id'))
    .addColumn('title', 'text', (c) => c.notNull())
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex('lessons_org_idx').ifNotExists().on('lessons').column('organisation_id').execute();
  await db.schema
    .createTable('lesson_steps')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('lesson_id', 'integer', (c) => c.notNull().references('lessons.id').onDelete('cascade'))
    .addColumn('position', 'integer', (c) => c.notNull())
    .addColumn('scene_id', 'integer', (c) => c.notNull().references('scenes.id'))
    .addColumn('revision', 'integer', (c) => c.notNull())
    .addColumn('notes', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('question', 'text')
    .addColumn('answer', 'text')
    .addUniqueConstraint('lesson_steps_position_uq', ['lesson_id', 'position'])
    .execute();
  await db.schema.createIndex('lesson_steps_scene_idx').ifNotExists().on('lesson_steps').column('scene_id').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('lesson_steps').ifExists().execute();
  await db.schema.dropTable('lessons').ifExists().execute();
}
