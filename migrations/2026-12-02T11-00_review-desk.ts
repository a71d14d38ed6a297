import { sql, type Kysely } from 'kysely';
import { isPostgres, autoId, nowText, doubleType, jsonType } from '@/db/dialect';

/**
 * The review desk (issue 13): the "returned" status, submissions with the figures the server computed,
 * pinned comments, in-app notifications and the e-mail outbox.
 */
export async function up(db: Kysely<any>): Promise<void> {
  const now = nowText(db);
  await returnedStatus(db);

  await db.schema
    .createTable('scene_submissions')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('organisation_id', 'integer', (c) => c.notNull().references('organisations.id').onDelete('cascade'))
    .addColumn('scene_id', 'integer', (c) => c.notNull().references('scenes.id').onDelete('cascade'))
    .addColumn('revision', 'integer', (c) => c.notNull())
    .addColumn('submitted_by', 'integer', (c) => c.notNull().references('users.id'))
    .addColumn('submitted_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('engine_version', 'text', (c) => c.notNull())
    .addColumn('figures', jsonType(db), (c) => c.notNull())
    .addColumn('checks', jsonType(db), (c) => c.notNull())
    .addColumn('state', 'text', (c) => c.notNull().defaultTo('pending').check(sql`state in ('pending','approved','returned','withdrawn')`))
    .addColumn('decided_by', 'integer', (c) => c.references('users.id'))
    .addColumn('decided_at', 'text')
    .addColumn('note', 'text')
    .addColumn('conditions', 'text')
    .addColumn('reason', 'text')
    .execute();
  await db.schema.createIndex('scene_submissions_scene_idx').ifNotExists().on('scene_submissions').columns(['scene_id', 'id']).execute();
  await db.schema.createIndex('scene_submissions_org_state_idx').ifNotExists().on('scene_submissions').columns(['organisation_id', 'state']).execute();

  await db.schema
    .createTable('scene_comments')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('organisation_id', 'integer', (c) => c.notNull().references('organisations.id').onDelete('cascade'))
    .addColumn('scene_id', 'integer', (c) => c.notNull().references('scenes.id').onDelete('cascade'))
    .addColumn('author_id', 'integer', (c) => c.notNull().references('users.id'))
    .addColumn('parent_id', 'integer', (c) => c.references('scene_comments.id').onDelete('cascade'))
    .addColumn('revision', 'integer', (c) => c.notNull())
    .addColumn('body', 'text', (c) => c.notNull())
    .addColumn('anchor_x', doubleType(db))
    .addColumn('anchor_y', doubleType(db))
    .addColumn('anchor_object_id', 'text')
    .addColumn('resolved_at', 'text')
    .addColumn('resolved_by', 'integer', (c) => c.references('users.id'))
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex('scene_comments_scene_idx').ifNotExists().on('scene_comments').columns(['scene_id', 'id']).execute();

  await db.schema
    .createTable('notifications')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('organisation_id', 'integer', (c) => c.notNull().references('organisations.id').onDelete('cascade'))
    .addColumn('user_id', 'integer', (c) => c.notNull().references('users.id').onDelete('cascade'))
    .addColumn('scene_id', 'integer', (c) => c.references('scenes.id').onDelete('cascade'))
    .addColumn('kind', 'text', (c) => c.notNull())
    .addColumn('message', 'text', (c) => c.notNull())
    .addColumn('link', 'text', (c) => c.notNull())
    .addColumn('read_at', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex('notifications_user_idx').ifNotExists().on('notifications').columns(['user_id', 'read_at']).execute();

  await db.schema
    .createTable('mail_outbox')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('organisation_id', 'integer', (c) => c.notNull().references('organisations.id').onDelete('cascade'))
    .addColumn('to_user_id', 'integer', (c) => c.references('users.id'))
    .addColumn('to_address', 'text', (c) => c.notNull())
    .addColumn('subject', 'text', (c) => c.notNull())
    .addColumn('text_body', 'text', (c) => c.notNull())
    .addColumn('html_body', 'text', (c) => c.notNull())
    .addColumn('state', 'text', (c) => c.notNull().defaultTo('pending').check(sql`state in ('pending','sent','failed')`))
    .addColumn('attempts', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('next_attempt_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('last_error', 'text')
    .addColumn('message_id', 'text')
    .addColumn('sent_at', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex('mail_outbox_due_idx').ifNotExists().on('mail_outbox').columns(['state', 'next_attempt_at']).execute();
}

/**
 * SQLite cannot alter a CHECK constraint, so the scenes table is rebuilt with "returned" in place of the
 * never-used "rejected" (SQLite's documented 12-step procedure: foreign keys off, so dropping the old table
 * cascades nothing; the new one takes its name and the references resolve to it again). The table's current
 * definition is copied, so columns added by earlier migrations are kept.
 */
async function returnedStatus(db: Kysely<any>) {
  if (isPostgres(db)) {
    // PostgreSQL alters the check in place; the foundation's inline check carries the default name.
    await sql`alter table scenes drop constraint scenes_status_check`.execute(db);
    await sql`update scenes set status = 'returned' where status = 'rejected'`.execute(db);
    await sql`alter table scenes add constraint scenes_status_check check (status in ('draft','submitted','approved','returned','archived'))`.execute(db);
    return;
  }
  const table = (await sql<{ sql: string }>`select sql from sqlite_master where type = 'table' and name = 'scenes'`.execute(db)).rows[0]?.sql;
  if (!table || table.includes("'returned'")) return;
  if (!table.includes("'rejected'")) throw new Error('review-desk migration: the scenes status check is not the one expected');
  const indexes = (await sql<{ sql: string }>`select sql from sqlite_master where type = 'index' and tbl_name = 'scenes' and sql is not null`.execute(db)).rows;
  const created = table.replace("'rejected'", "'returned'").replace(/^CREATE TABLE "?scenes"?/i, 'CREATE TABLE "scenes_rebuilt"');
  await sql`pragma foreign_keys = off`.execute(db);
  try {
    await db.transaction().execute(async (trx) => {
      await sql.raw(created).execute(trx);
      await sql`update scenes set status = 'returned' where status = 'rejected'`.execute(trx);
      await sql`insert into scenes_rebuilt select * from scenes`.execute(trx);
      await sql`drop table scenes`.execute(trx);
      await sql`alter table scenes_rebuilt rename to scenes`.execute(trx);
      for (const i of indexes) await sql.raw(i.sql).execute(trx);
      const broken = await sql`pragma foreign_key_check`.execute(trx);
      if (broken.rows.length) throw new Error('review-desk migration: foreign keys broken by the scenes rebuild');
    });
  } finally {
    await sql`pragma foreign_keys = on`.execute(db);
  }
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const t of ['mail_outbox', 'notifications', 'scene_comments', 'scene_submissions']) await db.schema.dropTable(t).ifExists().execute();
}
