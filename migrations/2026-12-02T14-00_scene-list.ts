import { sql, type Kysely } from 'kysely';
import { isPostgres } from '@/db/dialect';

/**
 * The scene list at scale: an index that fits the list's filter and order (so page 1 and every keyset page
 * read a few index entries, not the organisation's whole table), the two free-text fields the search covers
 * (location, notes), and an FTS5 index over title, location and notes kept in step by triggers.
 * `remove_diacritics 2` folds accents on both sides, so "Chateau" finds "Château".
 * On PostgreSQL the same search is a GIN index over a tsvector expression (see postgresSearch below).
 */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('scenes').addColumn('location', 'text').execute();
  await db.schema.alterTable('scenes').addColumn('notes', 'text').execute();
  await sql`create index scenes_list_idx on scenes (organisation_id, deleted_at, updated_at desc, id desc)`.execute(db);
  if (isPostgres(db)) return postgresSearch(db);
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

/**
 * PostgreSQL: no triggers and no extra column. Two immutable functions: arcline_scene_search(title, location,
 * notes) is the tsvector of the three fields with accents removed (the `unaccent` extension, which ships with
 * PostgreSQL and is trusted: a database owner may create it), and arcline_search_query(text) turns the prefix
 * query the app builds ("word:* & other:*") into a tsquery folded the same way. A GIN index over the first
 * keeps it current on every insert and update by itself. The 'simple' configuration lower-cases and keeps
 * every word (no stemming, no stop words), as SQLite's unicode61 tokenizer does. Names are schema-qualified
 * so the index expression means the same under any search_path (pg_dump restores with an empty one).
 */
async function postgresSearch(db: Kysely<any>): Promise<void> {
  await sql`create extension if not exists unaccent`.execute(db);
  const row = (await sql<{ schema: string }>`select n.nspname as schema from pg_extension e join pg_namespace n on n.oid = e.extnamespace where e.extname = 'unaccent'`.execute(db)).rows[0];
  if (!row) throw new Error('scene-list migration: the unaccent extension is not installed');
  const ext = sql.id(row.schema);
  const here = (await sql<{ schema: string }>`select current_schema() as schema`.execute(db)).rows[0].schema;
  const own = sql.id(here);
  await sql`create function ${own}.arcline_scene_search(title text, location text, notes text) returns tsvector
    language sql immutable parallel safe
    as $$ select pg_catalog.to_tsvector('pg_catalog.simple'::regconfig, ${ext}.unaccent(${sql.lit(`${row.schema}.unaccent`)}::regdictionary,
      coalesce(title, '') || ' ' || coalesce(location, '') || ' ' || coalesce(notes, ''))) $$`.execute(db);
  await sql`create function ${own}.arcline_search_query(q text) returns tsquery
    language sql immutable parallel safe
    as $$ select pg_catalog.to_tsquery('pg_catalog.simple'::regconfig, ${ext}.unaccent(${sql.lit(`${row.schema}.unaccent`)}::regdictionary, q)) $$`.execute(db);
  await sql`create index scenes_search_idx on scenes using gin (${own}.arcline_scene_search(title, location, notes))`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  if (isPostgres(db)) {
    await sql`drop index if exists scenes_search_idx`.execute(db);
    await sql`drop function if exists arcline_search_query(text)`.execute(db);
    await sql`drop function if exists arcline_scene_search(text, text, text)`.execute(db);
    await sql`drop index if exists scenes_list_idx`.execute(db);
    await db.schema.alterTable('scenes').dropColumn('notes').execute();
    await db.schema.alterTable('scenes').dropColumn('location').execute();
    return;
  }
  await sql`drop trigger if exists scenes_fts_update`.execute(db);
  await sql`drop trigger if exists scenes_fts_delete`.execute(db);
  await sql`drop trigger if exists scenes_fts_insert`.execute(db);
  await sql`drop table if exists scenes_fts`.execute(db);
  await sql`drop index if exists scenes_list_idx`.execute(db);
  await db.schema.alterTable('scenes').dropColumn('notes').execute();
  await db.schema.alterTable('scenes').dropColumn('location').execute();
}
