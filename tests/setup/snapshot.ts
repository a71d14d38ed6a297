import { sql } from 'kysely';
import { getDb, type DB } from '@/db';
import { isPostgres } from '@/db/dialect';

export type DbSnapshot = Record<string, unknown[]>;

/**
 * Every row of every application table (Kysely's migration tables and SQLite's own excluded), in rowid
 * order. New tables are picked up without listing them, so a refused write to them is caught too.
 * Full-text indexes (and their shadow tables) are left out: triggers keep them in step with their table.
 * On PostgreSQL (no rowid) rows come in the order of their first two columns: the id, or scene_figures' key.
 */
export async function snapshotDb(db: DB = getDb()): Promise<DbSnapshot> {
  if (isPostgres(db)) {
    const tables = await sql<{ name: string }>`
      select table_name as name from information_schema.tables
      where table_schema = current_schema() and table_type = 'BASE TABLE' and table_name not like 'kysely!_%' escape '!'
      order by table_name`.execute(db);
    const out: DbSnapshot = {};
    for (const { name } of tables.rows) out[name] = (await sql`select * from ${sql.table(name)} order by 1, 2`.execute(db)).rows;
    return out;
  }
  const tables = await sql<{ name: string }>`
    select name from sqlite_master
    where type = 'table' and name not like 'sqlite_%' and name not like 'kysely_%'
      and name not like '%!_fts' escape '!' and name not like '%!_fts!_%' escape '!'
    order by name`.execute(db);
  const out: DbSnapshot = {};
  for (const { name } of tables.rows) {
    out[name] = (await sql`select * from ${sql.table(name)} order by rowid`.execute(db)).rows;
  }
  return out;
}

/**
 * Tables that database triggers keep from another table's rows (migrations/2026-12-03T14-30_scene-counts.ts):
 * a route writes `scenes`, and these follow. Snapshots hold them, so a refused write that moved them is still
 * caught; changedTables leaves them out of the tables a route is said to write.
 */
export const DERIVED_TABLES: ReadonlySet<string> = new Set(['scene_counts']);

/** Names of the tables whose rows differ between two snapshots (tables kept by triggers left out). */
export function changedTables(before: DbSnapshot, after: DbSnapshot): string[] {
  const names = new Set([...Object.keys(before), ...Object.keys(after)]);
  return [...names].filter((t) => !DERIVED_TABLES.has(t) && JSON.stringify(before[t] ?? null) !== JSON.stringify(after[t] ?? null)).sort();
}

export async function rowCount(table: string, db: DB = getDb()): Promise<number> {
  const r = await sql<{ n: number }>`select count(*) as n from ${sql.table(table)}`.execute(db);
  return Number(r.rows[0].n);
}
