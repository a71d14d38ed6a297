import { sql, type Kysely } from 'kysely';

/**
 * The scene list at scale: an index that fits the list's filter and order (so page 1 and every keyset page
 * read a few index entries, not the organisation's whole table), the two free-text fields the search covers
 * (location, notes), and an FTS5 index over title, location and notes kept in step by triggers.
 * `remove_diacritics 2` folds accents on both sides, so "Chateau" finds "Château".
 */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('scenes').addColumn('location', 'text').execute();
  await db.schema.alterTable('scenes').addColumn('notes', 'text').execute();
  await sql`create index scenes_list_idx on scenes (organisation_id, deleted_at, updated_at desc, id desc)`.execute(db);
  await sql`create virtual table scenes_fts using fts5(title, location, notes, content='scenes', content_rowid='id', tokenize='unicode61 remove_diacritics 2')`.execute(db);
  await sql`create trigger scenes_fts_insert after insert on scenes begin
    insert into scenes_fts(rowid, title, location, notes) values (new.id, new.title, coalesce(new.location, ''), coalesce(new.notes, ''));
  end`.execute(db);
  await sql`create trigger scenes_fts_delete after delete on scenes begin
    insert into scenes_fts(scenes_fts, rowid, title, location, notes) values ('delete', old.id, old.title, coalesce(old.location, ''), coalesce(old.notes, ''));
  end`.execute(db);
  // Only the three indexed columns matter: an autosave (document, revision, updated_at) leaves the index alone.
  await sql`create trigger scenes_fts_update after update of title, location, notes on scenes begin
    insert into scenes_fts(scenes_fts, rowid, title, location, notes) values ('delete', old.id, old.title, coalesce(old.location, ''), coalesce(old.notes, ''));
    insert into scenes_fts(rowid, title, location, notes) values (new.id, new.title, coalesce(new.location, ''), coalesce(new.notes, ''));
  end`.execute(db);
  await sql`insert into scenes_fts(rowid, title, location, notes) select id, title, coalesce(location, ''), coalesce(notes, '') from scenes`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop trigger if exists scenes_fts_update`.execute(db);
  await sql`drop trigger if exists scenes_fts_delete`.execute(db);
  await sql`drop trigger if exists scenes_fts_insert`.execute(db);
  await sql`drop table if exists scenes_fts`.execute(db);
  await sql`drop index if exists scenes_list_idx`.execute(db);
  await db.schema.alterTable('scenes').dropColumn('notes').execute();
  await db.schema.alterTable('scenes').dropColumn('location').execute();
}
