import { sql, type Kysely } from 'kysely';
import { isPostgres } from '@/db/dialect';

/**
 * Scene counts kept per organisation, owner, status and training flag, for the scene list's total: live
 * (not deleted) scenes only, kept in step by triggers on every insert, delete and change of those columns.
 * The list's total without a search is then a sum over a handful of rows, whatever the organisation's
 * history (db/repositories/scene-list.ts countQuery). A search still counts its matches.
 */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('scene_counts')
    .ifNotExists()
    .addColumn('organisation_id', 'integer', (c) => c.notNull())
    .addColumn('owner_id', 'integer', (c) => c.notNull())
    .addColumn('status', 'text', (c) => c.notNull())
    .addColumn('in_training_set', 'integer', (c) => c.notNull())
    .addColumn('n', 'integer', (c) => c.notNull())
    .addPrimaryKeyConstraint('scene_counts_pk', ['organisation_id', 'owner_id', 'status', 'in_training_set'])
    .execute();
  if (isPostgres(db)) {
    await sql`create function arcline_scene_counts() returns trigger language plpgsql as $$
      begin
        if tg_op in ('UPDATE', 'DELETE') and old.deleted_at is null then
          update scene_counts set n = n - 1
            where organisation_id = old.organisation_id and owner_id = old.owner_id and status = old.status and in_training_set = old.in_training_set;
        end if;
        if tg_op in ('INSERT', 'UPDATE') and new.deleted_at is null then
          insert into scene_counts (organisation_id, owner_id, status, in_training_set, n)
            values (new.organisation_id, new.owner_id, new.status, new.in_training_set, 1)
            on conflict (organisation_id, owner_id, status, in_training_set) do update set n = scene_counts.n + 1;
        end if;
        return null;
      end $$`.execute(db);
    await sql`create trigger scene_counts_change after insert or delete or update of organisation_id, owner_id, status, in_training_set, deleted_at
      on scenes for each row execute function arcline_scene_counts()`.execute(db);
  } else {
    const add = (row: 'new') => sql.raw(`insert into scene_counts (organisation_id, owner_id, status, in_training_set, n)
        select ${row}.organisation_id, ${row}.owner_id, ${row}.status, ${row}.in_training_set, 1 where ${row}.deleted_at is null
        on conflict (organisation_id, owner_id, status, in_training_set) do update set n = n + 1;`);
    const take = (row: 'old') => sql.raw(`update scene_counts set n = n - 1
        where ${row}.deleted_at is null and organisation_id = ${row}.organisation_id and owner_id = ${row}.owner_id and status = ${row}.status and in_training_set = ${row}.in_training_set;`);
    await sql`create trigger scene_counts_insert after insert on scenes begin ${add('new')} end`.execute(db);
    await sql`create trigger scene_counts_delete after delete on scenes begin ${take('old')} end`.execute(db);
    await sql`create trigger scene_counts_update after update of organisation_id, owner_id, status, in_training_set, deleted_at on scenes begin ${take('old')} ${add('new')} end`.execute(db);
  }
  await sql`insert into scene_counts (organisation_id, owner_id, status, in_training_set, n)
    select organisation_id, owner_id, status, in_training_set, count(*) from scenes where deleted_at is null
    group by organisation_id, owner_id, status, in_training_set`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  if (isPostgres(db)) {
    await sql`drop trigger if exists scene_counts_change on scenes`.execute(db);
    await sql`drop function if exists arcline_scene_counts()`.execute(db);
  } else {
    for (const t of ['scene_counts_insert', 'scene_counts_delete', 'scene_counts_update']) await sql`drop trigger if exists ${sql.id(t)}`.execute(db);
  }
  await db.schema.dropTable('scene_counts').ifExists().execute();
}
